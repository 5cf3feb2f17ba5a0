package org.swingclearance.engine.scoring;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import org.swingclearance.engine.evidence.Citations;

/**
 * Hicks 2005 stabilisation prediction rule (clinical.md §3.4): predictors age &lt; 40 y, average straight-leg raise
 * &gt; 91°, aberrant movement during lumbar flexion, positive prone instability test; positive with at least 3 of 4.
 * A treatment-response prediction, not a diagnosis.
 *
 * @param predictorsPresent number of predictors present (0–4), {@link Unit#COUNT}; not scorable while any is unknown
 * @param positive          1 when ≥ 3 present, {@link Unit#YES_NO}; scorable as soon as the known predictors decide
 *                          it (≥ 3 present, or too few possible)
 */
public record StabilisationPrediction(Score predictorsPresent, Score positive) {

    /** Predictors needed for a positive rule. */
    public static final int PREDICTORS_FOR_POSITIVE = 3;

    public StabilisationPrediction {
        Objects.requireNonNull(predictorsPresent, "predictorsPresent");
        Objects.requireNonNull(positive, "positive");
    }

    /**
     * Evaluates the rule.
     *
     * @param ageYears                 age in years, ≥ 0; null = unknown
     * @param averageStraightLegRaise  mean of left and right straight-leg raise in degrees, 0–180; null = not tested
     * @param aberrantMovement         aberrant movement seen during lumbar flexion; null = not observed
     * @param proneInstabilityPositive result of {@link ProneInstability#classify}; null = not scorable
     */
    public static StabilisationPrediction evaluate(Double ageYears, Double averageStraightLegRaise,
            Boolean aberrantMovement, Boolean proneInstabilityPositive) {
        List<Boolean> predictors = new ArrayList<>();
        predictors.add(ageYears == null ? null : Inputs.nonNegative(ageYears, "age") < 40);
        predictors.add(averageStraightLegRaise == null ? null
                : Inputs.inRange(averageStraightLegRaise, 0, 180, "straight-leg raise") > 91);
        predictors.add(aberrantMovement);
        predictors.add(proneInstabilityPositive);
        List<String> unknown = Inputs.missing("age", ageYears, "average straight-leg raise", averageStraightLegRaise,
                "aberrant movement", aberrantMovement, "prone instability test", proneInstabilityPositive);
        long present = predictors.stream().filter(Boolean.TRUE::equals).count();
        Score count = unknown.isEmpty()
                ? Score.of(present, Unit.COUNT, Citations.HICKS_2005_RULE_COUNT)
                : Score.notTested(Unit.COUNT, Citations.HICKS_2005_RULE_COUNT,
                        Inputs.notTestedRule("the predictor count needs all four predictors", unknown));
        Score positive;
        if (present >= PREDICTORS_FOR_POSITIVE) {
            positive = Score.yesNo(true, Citations.HICKS_2005_RULE_COUNT);
        } else if (present + unknown.size() < PREDICTORS_FOR_POSITIVE) {
            positive = Score.yesNo(false, Citations.HICKS_2005_RULE_COUNT);
        } else {
            positive = Score.notTested(Unit.YES_NO, Citations.HICKS_2005_RULE_COUNT, Inputs.notTestedRule(
                    "the rule is undecided until the unknown predictors are known (" + present + " present)",
                    unknown));
        }
        return new StabilisationPrediction(count, positive);
    }
}
