package org.swingclearance.engine.scoring;

import java.util.List;
import java.util.Objects;
import org.swingclearance.engine.evidence.Citations;

/**
 * Change of an outcome score since a previous screening and whether it reaches the MCID. Every instrument here is
 * "lower is better", so improvement = previous − current.
 *
 * @param improvement           previous − current, in the instrument's unit (negative when worse)
 * @param percentImprovement    improvement ÷ previous × 100, {@link Unit#PERCENT}; not scorable when previous is 0
 * @param importantImprovement  1 when improvement ≥ MCID points or (where given) ≥ MCID percent, {@link Unit#YES_NO}
 * @param importantWorsening    1 when current − previous ≥ MCID points (product convention), {@link Unit#YES_NO}
 * @param mcid                  the MCID applied
 */
public record ImportantChange(Score improvement, Score percentImprovement, Score importantImprovement,
        Score importantWorsening, Mcid mcid) {

    // Scores are computed in double; a change of exactly the MCID must count despite rounding.
    private static final double TOLERANCE = 1e-9;

    public ImportantChange {
        Objects.requireNonNull(improvement, "improvement");
        Objects.requireNonNull(percentImprovement, "percentImprovement");
        Objects.requireNonNull(importantImprovement, "importantImprovement");
        Objects.requireNonNull(importantWorsening, "importantWorsening");
        Objects.requireNonNull(mcid, "mcid");
    }

    /**
     * Compares two scores of the same instrument.
     *
     * @param previous score at the previous signed screening, within the instrument's range; null = none
     * @param current  score now, within the instrument's range; null = not scorable now
     * @param mcid     threshold to apply; never null
     * @throws IllegalArgumentException when a score is outside the instrument's range
     */
    public static ImportantChange between(Double previous, Double current, Mcid mcid) {
        Objects.requireNonNull(mcid, "mcid");
        Instrument instrument = mcid.instrument();
        Unit unit = instrument.unit();
        List<String> missing = Inputs.missing("previous score", previous, "current score", current);
        if (!missing.isEmpty()) {
            String rule = Inputs.notTestedRule("a change needs a previous and a current score", missing);
            return new ImportantChange(Score.notTested(unit, mcid.citation(), rule),
                    Score.notTested(Unit.PERCENT, mcid.citation(), rule),
                    Score.notTested(Unit.YES_NO, mcid.citation(), rule),
                    Score.notTested(Unit.YES_NO, Citations.MCID_WORSENING, rule), mcid);
        }
        Inputs.inRange(previous, instrument.min(), instrument.max(), instrument + " previous score");
        Inputs.inRange(current, instrument.min(), instrument.max(), instrument + " current score");
        double improvement = previous - current;
        boolean absoluteMet = improvement >= mcid.points() - TOLERANCE;
        Score percent;
        boolean relativeMet = false;
        if (previous == 0) {
            percent = Score.notScorable(Unit.PERCENT, mcid.citation(), NotScorable.Reason.UNDEFINED,
                    "a relative change is undefined from a previous score of 0");
        } else {
            double relative = improvement / previous * 100;
            percent = Score.of(relative, Unit.PERCENT, mcid.citation());
            relativeMet = mcid.percent().isPresent() && relative >= mcid.percent().getAsDouble() - TOLERANCE;
        }
        return new ImportantChange(Score.of(improvement, unit, mcid.citation()), percent,
                Score.yesNo(absoluteMet || relativeMet, mcid.citation()),
                Score.yesNo(-improvement >= mcid.points() - TOLERANCE, Citations.MCID_WORSENING), mcid);
    }
}
