package org.swingclearance.engine.plan;

/**
 * The slice of the clinic's practice rules the plan uses: the step limit on the rise of the demand ratio, the
 * pain-monitoring rule and the dosage for steps within the current band and for provisional steps (next band).
 *
 * @param stepLimit largest relative rise of D allowed in one step (0.10 = +10 %)
 */
public record PlanRules(double stepLimit, PainRule painRule, Dosage withinBand, Dosage provisional) {

    /** +10 % per step: common practice, no source. */
    public static final double DEFAULT_STEP_LIMIT = 0.10;

    public PlanRules {
        if (!(stepLimit >= 0) || !Double.isFinite(stepLimit)) {
            throw new IllegalArgumentException("Step limit must be zero or more, was " + stepLimit);
        }
        if (painRule == null || withinBand == null || provisional == null) {
            throw new IllegalArgumentException("Plan rules need a pain rule and a dosage for each band.");
        }
    }

    /** Default step limit and the Silbernagel pain limit with the given per-band dosages. */
    public static PlanRules withDefaults(Dosage withinBand, Dosage provisional) {
        return new PlanRules(DEFAULT_STEP_LIMIT, new PainRule(PainRule.SILBERNAGEL_LIMIT), withinBand, provisional);
    }
}
