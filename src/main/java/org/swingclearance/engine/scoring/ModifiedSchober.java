package org.swingclearance.engine.scoring;

import java.util.List;
import java.util.Objects;
import org.swingclearance.engine.evidence.Citations;

/**
 * Modified Schober lumbar flexion (clinical.md §3.5) and its BASMI lumbar-flexion component (Jenkinson 1994).
 * The 10 cm and 15 cm versions are not interchangeable; the clinic fixes one.
 *
 * @param increase        increase in distance on flexion, {@link Unit#CENTIMETRE}
 * @param basmiThreePoint 0 when increase &gt; 4 cm, 1 when 2–4 cm (both ends included), 2 when &lt; 2 cm;
 *                        {@link Unit#POINTS}
 * @param basmiLinear     (7.4 − increase) ÷ 0.7 clipped to 0–10, {@link Unit#POINTS}
 */
public record ModifiedSchober(Score increase, Score basmiThreePoint, Score basmiLinear) {

    public ModifiedSchober {
        Objects.requireNonNull(increase, "increase");
        Objects.requireNonNull(basmiThreePoint, "basmiThreePoint");
        Objects.requireNonNull(basmiLinear, "basmiLinear");
    }

    /**
     * The increase from the standing to the flexed distance between the marks.
     *
     * @param standingCm distance between the marks standing, &gt; 0; null = not tested
     * @param flexedCm   distance in full flexion, ≥ standing; null = not tested
     * @return increase in {@link Unit#CENTIMETRE}
     * @throws IllegalArgumentException when the flexed distance is shorter than the standing one
     */
    public static Score increase(Double standingCm, Double flexedCm) {
        List<String> missing = Inputs.missing("standing distance", standingCm, "flexed distance", flexedCm);
        if (!missing.isEmpty()) {
            return Score.notTested(Unit.CENTIMETRE, Citations.JENKINSON_1994_BASMI,
                    Inputs.notTestedRule("the Schober increase needs both distances", missing));
        }
        Inputs.positive(standingCm, "standing distance");
        if (flexedCm < standingCm) {
            throw new IllegalArgumentException("flexed distance " + flexedCm + " cm is shorter than standing "
                    + standingCm + " cm");
        }
        return Score.of(flexedCm - standingCm, Unit.CENTIMETRE, Citations.JENKINSON_1994_BASMI);
    }

    /**
     * Scores an increase.
     *
     * @param increaseCm increase in cm, 0–20; null = not tested
     * @throws IllegalArgumentException when outside 0–20 cm
     */
    public static ModifiedSchober of(Double increaseCm) {
        if (increaseCm == null) {
            String rule = "BASMI lumbar flexion needs the Schober increase; not tested: Schober increase";
            return new ModifiedSchober(
                    Score.notTested(Unit.CENTIMETRE, Citations.JENKINSON_1994_BASMI, rule),
                    Score.notTested(Unit.POINTS, Citations.JENKINSON_1994_BASMI, rule),
                    Score.notTested(Unit.POINTS, Citations.JENKINSON_1994_BASMI, rule));
        }
        double increase = Inputs.inRange(increaseCm, 0, 20, "Schober increase");
        int threePoint = increase > 4 ? 0 : increase >= 2 ? 1 : 2;
        double linear = Math.max(0, Math.min(10, (7.4 - increase) / 0.7));
        return new ModifiedSchober(Score.of(increase, Unit.CENTIMETRE, Citations.JENKINSON_1994_BASMI),
                Score.of(threePoint, Unit.POINTS, Citations.JENKINSON_1994_BASMI),
                Score.of(linear, Unit.POINTS, Citations.JENKINSON_1994_BASMI));
    }
}
