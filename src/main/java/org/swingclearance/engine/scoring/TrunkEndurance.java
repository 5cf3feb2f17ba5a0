package org.swingclearance.engine.scoring;

import java.util.List;
import java.util.Objects;
import org.swingclearance.engine.evidence.Citations;

/**
 * Trunk endurance ratios from McGill's battery (clinical.md §3.1). Criteria suggesting imbalance (applied by the
 * practice rules, not here): flexor/extensor &gt; 1.0, side bridge/extensor &gt; 0.75, |1 − right/left| &gt; 0.05.
 *
 * @param flexorExtensor           flexor hold ÷ extensor hold, {@link Unit#RATIO}
 * @param rightSideBridgeExtensor  right side bridge ÷ extensor, {@link Unit#RATIO}
 * @param leftSideBridgeExtensor   left side bridge ÷ extensor, {@link Unit#RATIO}
 * @param rightLeftSideBridge      right side bridge ÷ left side bridge, {@link Unit#RATIO}
 * @param sideBridgeImbalance      |1 − right ÷ left|, {@link Unit#RATIO}
 */
public record TrunkEndurance(Score flexorExtensor, Score rightSideBridgeExtensor, Score leftSideBridgeExtensor,
        Score rightLeftSideBridge, Score sideBridgeImbalance) {

    public TrunkEndurance {
        Objects.requireNonNull(flexorExtensor, "flexorExtensor");
        Objects.requireNonNull(rightSideBridgeExtensor, "rightSideBridgeExtensor");
        Objects.requireNonNull(leftSideBridgeExtensor, "leftSideBridgeExtensor");
        Objects.requireNonNull(rightLeftSideBridge, "rightLeftSideBridge");
        Objects.requireNonNull(sideBridgeImbalance, "sideBridgeImbalance");
    }

    /**
     * Computes the ratios from hold times in seconds (each ≥ 0; null = not tested).
     *
     * @throws IllegalArgumentException when a time is negative
     */
    public static TrunkEndurance of(Double flexorSeconds, Double extensorSeconds, Double rightSideBridgeSeconds,
            Double leftSideBridgeSeconds) {
        for (Double time : new Double[] {flexorSeconds, extensorSeconds, rightSideBridgeSeconds,
                leftSideBridgeSeconds}) {
            if (time != null) {
                Inputs.nonNegative(time, "hold time");
            }
        }
        Score rightLeft = ratio(rightSideBridgeSeconds, leftSideBridgeSeconds, "right side bridge",
                "left side bridge");
        Score imbalance = rightLeft.scorable()
                ? Score.of(Math.abs(1 - rightLeft.orElseThrow()), Unit.RATIO, Citations.MCGILL_RATIOS)
                : new Score(rightLeft.value(), Unit.RATIO, Citations.MCGILL_RATIOS, rightLeft.notScorable());
        return new TrunkEndurance(
                ratio(flexorSeconds, extensorSeconds, "flexor hold", "extensor hold"),
                ratio(rightSideBridgeSeconds, extensorSeconds, "right side bridge", "extensor hold"),
                ratio(leftSideBridgeSeconds, extensorSeconds, "left side bridge", "extensor hold"),
                rightLeft, imbalance);
    }

    private static Score ratio(Double numerator, Double denominator, String numeratorName, String denominatorName) {
        List<String> missing = Inputs.missing(numeratorName, numerator, denominatorName, denominator);
        if (!missing.isEmpty()) {
            return Score.notTested(Unit.RATIO, Citations.MCGILL_RATIOS,
                    Inputs.notTestedRule(numeratorName + " ÷ " + denominatorName + " needs both times", missing));
        }
        if (denominator == 0) {
            return Score.notScorable(Unit.RATIO, Citations.MCGILL_RATIOS, NotScorable.Reason.UNDEFINED,
                    numeratorName + " ÷ " + denominatorName + " is undefined when the " + denominatorName + " is 0 s");
        }
        return Score.of(numerator / denominator, Unit.RATIO, Citations.MCGILL_RATIOS);
    }
}
