package org.swingclearance.engine.plan;

/**
 * The pain-monitoring rule printed with every step: pain during the session up to the limit (0–10 numeric rating)
 * is acceptable if it has settled by the next morning; otherwise go back one step (Silbernagel et al. 2007, Am J
 * Sports Med 35:897, limit 5/10 in that trial; the clinic's rules may set another limit).
 */
public record PainRule(int painDuringLimit) {

    /** Limit used in the Silbernagel 2007 pain-monitoring model. */
    public static final int SILBERNAGEL_LIMIT = 5;

    public PainRule {
        if (painDuringLimit < 0 || painDuringLimit > 10) {
            throw new IllegalArgumentException("Pain limit is on the 0–10 scale, was " + painDuringLimit);
        }
    }

    /** Message key; argument {0} is the limit. The first step has no step to go back to, so it says to stop. */
    public String messageKey(boolean firstStep) {
        return firstStep ? "engine.plan.painRule.first" : "engine.plan.painRule";
    }
}
