package org.swingclearance.engine.scoring;

import java.util.List;
import java.util.Objects;
import org.swingclearance.engine.evidence.Citations;

/**
 * Closed-kinetic-chain upper-extremity stability test (clinical.md §2.1): mean of the maximal 15-s trials, the power
 * score and the height-normalised score.
 *
 * @param mean            mean touches of the maximal trials, {@link Unit#TOUCHES}
 * @param powerScore      mean × 0.68 × body mass (kg) ÷ 15, {@link Unit#POWER_SCORE}; no validated threshold
 * @param touchesPerMetre mean ÷ stature in m, {@link Unit#TOUCHES_PER_METRE}
 * @param touchesPerInch  mean ÷ stature in inches (early reports), {@link Unit#TOUCHES_PER_INCH}
 */
public record Ckcuest(Score mean, Score powerScore, Score touchesPerMetre, Score touchesPerInch) {

    /** Mass fraction of head, arms and trunk used by the power score. */
    public static final double UPPER_BODY_MASS_FRACTION = 0.68;
    /** Test duration in seconds. */
    public static final double TEST_SECONDS = 15;

    public Ckcuest {
        Objects.requireNonNull(mean, "mean");
        Objects.requireNonNull(powerScore, "powerScore");
        Objects.requireNonNull(touchesPerMetre, "touchesPerMetre");
        Objects.requireNonNull(touchesPerInch, "touchesPerInch");
    }

    /**
     * Scores the test.
     *
     * @param maximalTrials touches of each maximal trial (warm-up excluded), each 0–100; null or empty = not tested
     * @param bodyMassKg    body mass in kg, &gt; 0; null = not measured (power score not scorable)
     * @param statureMetres stature in m, &gt; 0; null = not measured (normalised scores not scorable)
     * @throws IllegalArgumentException when a trial is null, negative or above 100, or mass or stature ≤ 0
     */
    public static Ckcuest of(List<Integer> maximalTrials, Double bodyMassKg, Double statureMetres) {
        if (maximalTrials == null || maximalTrials.isEmpty()) {
            String rule = "CKCUEST needs at least one maximal trial; not tested: trials";
            return new Ckcuest(Score.notTested(Unit.TOUCHES, Citations.CKCUEST_PROTOCOL, rule),
                    Score.notTested(Unit.POWER_SCORE, Citations.CKCUEST_POWER, rule),
                    Score.notTested(Unit.TOUCHES_PER_METRE, Citations.CKCUEST_NORMALISED, rule),
                    Score.notTested(Unit.TOUCHES_PER_INCH, Citations.CKCUEST_NORMALISED, rule));
        }
        for (Integer trial : maximalTrials) {
            if (trial == null) {
                throw new IllegalArgumentException("a recorded CKCUEST trial must have a touch count");
            }
            Inputs.inRange(trial, 0, 100, "CKCUEST touches");
        }
        double mean = maximalTrials.stream().mapToInt(Integer::intValue).average().orElseThrow();
        Score power = bodyMassKg == null
                ? Score.notTested(Unit.POWER_SCORE, Citations.CKCUEST_POWER,
                        "CKCUEST power score needs body mass; not tested: body mass")
                : Score.of(mean * UPPER_BODY_MASS_FRACTION * Inputs.positive(bodyMassKg, "body mass") / TEST_SECONDS,
                        Unit.POWER_SCORE, Citations.CKCUEST_POWER);
        Score perMetre;
        Score perInch;
        if (statureMetres == null) {
            String rule = "normalised CKCUEST needs stature; not tested: stature";
            perMetre = Score.notTested(Unit.TOUCHES_PER_METRE, Citations.CKCUEST_NORMALISED, rule);
            perInch = Score.notTested(Unit.TOUCHES_PER_INCH, Citations.CKCUEST_NORMALISED, rule);
        } else {
            double stature = Inputs.positive(statureMetres, "stature");
            perMetre = Score.of(mean / stature, Unit.TOUCHES_PER_METRE, Citations.CKCUEST_NORMALISED);
            perInch = Score.of(mean / (stature / 0.0254), Unit.TOUCHES_PER_INCH, Citations.CKCUEST_NORMALISED);
        }
        return new Ckcuest(Score.of(mean, Unit.TOUCHES, Citations.CKCUEST_PROTOCOL), power, perMetre, perInch);
    }
}
