package org.swingclearance.engine.scoring;

import java.util.List;
import org.swingclearance.engine.evidence.Citations;

/** Upper-quarter three-direction reach test (Gorman 2012 method, clinical.md §2.5). */
public final class UpperQuarterReach {

    private UpperQuarterReach() {
    }

    /**
     * Composite (%) = (medial + inferolateral + superolateral) ÷ (3 × upper-limb length) × 100.
     *
     * @param medialCm        best medial reach in cm, ≥ 0; null = not tested
     * @param inferolateralCm best inferolateral reach in cm, ≥ 0; null = not tested
     * @param superolateralCm best superolateral reach in cm, ≥ 0; null = not tested
     * @param limbLengthCm    C7 to longest fingertip, arm abducted 90°, in cm, &gt; 0; null = not measured
     * @return composite in {@link Unit#PERCENT}
     */
    public static Score composite(Double medialCm, Double inferolateralCm, Double superolateralCm,
            Double limbLengthCm) {
        List<String> missing = Inputs.missing("medial reach", medialCm, "inferolateral reach", inferolateralCm,
                "superolateral reach", superolateralCm, "limb length", limbLengthCm);
        if (!missing.isEmpty()) {
            return Score.notTested(Unit.PERCENT, Citations.GORMAN_2012,
                    Inputs.notTestedRule("reach composite needs all three directions and limb length", missing));
        }
        double sum = Inputs.nonNegative(medialCm, "medial reach") + Inputs.nonNegative(inferolateralCm,
                "inferolateral reach") + Inputs.nonNegative(superolateralCm, "superolateral reach");
        return Score.of(sum / (3 * Inputs.positive(limbLengthCm, "limb length")) * 100, Unit.PERCENT,
                Citations.GORMAN_2012);
    }

    /** One direction's reach as % of limb length; null inputs give a not-scorable score. */
    public static Score normalised(Double reachCm, Double limbLengthCm) {
        List<String> missing = Inputs.missing("reach", reachCm, "limb length", limbLengthCm);
        if (!missing.isEmpty()) {
            return Score.notTested(Unit.PERCENT, Citations.GORMAN_2012,
                    Inputs.notTestedRule("normalised reach needs reach and limb length", missing));
        }
        return Score.of(Inputs.nonNegative(reachCm, "reach") / Inputs.positive(limbLengthCm, "limb length") * 100,
                Unit.PERCENT, Citations.GORMAN_2012);
    }

    /**
     * Side-to-side difference of one direction, |left − right| in cm (flag above 4 cm, provisional).
     *
     * @return absolute difference in {@link Unit#CENTIMETRE}
     */
    public static Score sideDifference(Double leftCm, Double rightCm) {
        List<String> missing = Inputs.missing("left reach", leftCm, "right reach", rightCm);
        if (!missing.isEmpty()) {
            return Score.notTested(Unit.CENTIMETRE, Citations.REACH_ASYMMETRY,
                    Inputs.notTestedRule("a reach side difference needs both sides", missing));
        }
        return Score.of(Math.abs(Inputs.nonNegative(leftCm, "left reach") - Inputs.nonNegative(rightCm,
                "right reach")), Unit.CENTIMETRE, Citations.REACH_ASYMMETRY);
    }
}
