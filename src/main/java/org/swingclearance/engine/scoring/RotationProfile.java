package org.swingclearance.engine.scoring;

import java.util.List;
import java.util.Objects;
import org.swingclearance.engine.evidence.Citation;
import org.swingclearance.engine.evidence.Citations;

/**
 * Glenohumeral rotation deficits of one screening (clinical.md §1.4). "Involved" stands for the dominant arm in
 * Wilk's thrower data and "uninvolved" for the non-dominant one. All values in {@link Unit#DEGREE} except
 * {@code girdPercentOfUninvolvedTrm} in {@link Unit#PERCENT}.
 *
 * @param gird                      internal rotation deficit = IR uninvolved − IR involved
 * @param trmInvolved               total rotation (IR + ER) of the involved side
 * @param trmUninvolved             total rotation of the uninvolved side
 * @param trmDeficit                total rotation deficit = TRM uninvolved − TRM involved
 * @param girdPercentOfUninvolvedTrm GIRD ÷ TRM uninvolved × 100 (Burkhart's "> 10 %" alternative definition)
 * @param erGain                    external rotation gain = ER involved − ER uninvolved
 */
public record RotationProfile(Score gird, Score trmInvolved, Score trmUninvolved, Score trmDeficit,
        Score girdPercentOfUninvolvedTrm, Score erGain) {

    public RotationProfile {
        Objects.requireNonNull(gird, "gird");
        Objects.requireNonNull(trmInvolved, "trmInvolved");
        Objects.requireNonNull(trmUninvolved, "trmUninvolved");
        Objects.requireNonNull(trmDeficit, "trmDeficit");
        Objects.requireNonNull(girdPercentOfUninvolvedTrm, "girdPercentOfUninvolvedTrm");
        Objects.requireNonNull(erGain, "erGain");
    }

    /**
     * Computes every rotation value from internal and external rotation at 90° abduction (degrees, 0–180; null = not
     * tested). Each value is scorable as soon as its own inputs are present.
     *
     * @throws IllegalArgumentException when an angle is outside 0–180°
     */
    public static RotationProfile of(Double irInvolved, Double erInvolved, Double irUninvolved, Double erUninvolved) {
        checkAngle(irInvolved, "IR involved");
        checkAngle(erInvolved, "ER involved");
        checkAngle(irUninvolved, "IR uninvolved");
        checkAngle(erUninvolved, "ER uninvolved");
        Score gird = difference(irUninvolved, irInvolved, "GIRD needs internal rotation on both sides",
                "IR uninvolved", "IR involved", Citations.WILK_2011);
        Score trmInvolved = total(irInvolved, erInvolved, "involved");
        Score trmUninvolved = total(irUninvolved, erUninvolved, "uninvolved");
        Score trmDeficit = trmInvolved.scorable() && trmUninvolved.scorable()
                ? Score.of(trmUninvolved.orElseThrow() - trmInvolved.orElseThrow(), Unit.DEGREE,
                        Citations.WILK_2011_MANSKE_2013)
                : Score.notTested(Unit.DEGREE, Citations.WILK_2011_MANSKE_2013, Inputs.notTestedRule(
                        "total rotation deficit needs internal and external rotation on both sides",
                        Inputs.missing("IR involved", irInvolved, "ER involved", erInvolved,
                                "IR uninvolved", irUninvolved, "ER uninvolved", erUninvolved)));
        Score girdPercent = girdPercent(gird, trmUninvolved, irInvolved, irUninvolved, erUninvolved);
        Score erGain = difference(erInvolved, erUninvolved, "ER gain needs external rotation on both sides",
                "ER involved", "ER uninvolved", Citations.WILK_2011_MANSKE_2013);
        return new RotationProfile(gird, trmInvolved, trmUninvolved, trmDeficit, girdPercent, erGain);
    }

    private static Score girdPercent(Score gird, Score trmUninvolved, Double irInvolved, Double irUninvolved,
            Double erUninvolved) {
        if (!gird.scorable() || !trmUninvolved.scorable()) {
            return Score.notTested(Unit.PERCENT, Citations.BURKHART_2003, Inputs.notTestedRule(
                    "GIRD as % of total rotation needs IR on both sides and ER on the uninvolved side",
                    Inputs.missing("IR involved", irInvolved, "IR uninvolved", irUninvolved,
                            "ER uninvolved", erUninvolved)));
        }
        if (trmUninvolved.orElseThrow() == 0) {
            return Score.notScorable(Unit.PERCENT, Citations.BURKHART_2003, NotScorable.Reason.UNDEFINED,
                    "GIRD as % of total rotation is undefined when the uninvolved total rotation is 0°");
        }
        return Score.of(gird.orElseThrow() / trmUninvolved.orElseThrow() * 100, Unit.PERCENT,
                Citations.BURKHART_2003);
    }

    private static Score total(Double ir, Double er, String side) {
        List<String> missing = Inputs.missing("IR " + side, ir, "ER " + side, er);
        if (!missing.isEmpty()) {
            return Score.notTested(Unit.DEGREE, Citations.WILK_2011_MANSKE_2013,
                    Inputs.notTestedRule("total rotation needs internal and external rotation", missing));
        }
        return Score.of(ir + er, Unit.DEGREE, Citations.WILK_2011_MANSKE_2013);
    }

    private static Score difference(Double minuend, Double subtrahend, String needs, String minuendName,
            String subtrahendName, Citation citation) {
        List<String> missing = Inputs.missing(minuendName, minuend, subtrahendName, subtrahend);
        if (!missing.isEmpty()) {
            return Score.notTested(Unit.DEGREE, citation, Inputs.notTestedRule(needs, missing));
        }
        return Score.of(minuend - subtrahend, Unit.DEGREE, citation);
    }

    private static void checkAngle(Double angle, String name) {
        if (angle != null) {
            Inputs.inRange(angle, 0, 180, name);
        }
    }
}
