package org.swingclearance.engine.load;

/**
 * Window lengths of the EWMA acute:chronic ratio (Williams 2017: λ = 2/(N + 1), N = 7 and 28) and the warm-up
 * during which the ratio is not shown (clinical.md §7.4, convention [C]).
 *
 * @param acuteDays  N of the acute average, ≥ 1 (default 7)
 * @param chronicDays N of the chronic average, &gt; acuteDays (default 28)
 * @param warmUpDays days from the first known day during which the ratio is suppressed, ≥ 0 (default 28)
 */
public record EwmaPolicy(int acuteDays, int chronicDays, int warmUpDays) {

    /** N = 7 and 28, ratio suppressed for the first 28 days. */
    public static final EwmaPolicy DEFAULT = new EwmaPolicy(7, 28, 28);

    public EwmaPolicy {
        if (acuteDays < 1 || chronicDays <= acuteDays || warmUpDays < 0) {
            throw new IllegalArgumentException("need 1 ≤ acute < chronic and warm-up ≥ 0, got " + acuteDays + "/"
                    + chronicDays + "/" + warmUpDays);
        }
    }

    /** Decay factor of the acute average, 2/(N + 1). */
    public double acuteLambda() {
        return lambda(acuteDays);
    }

    /** Decay factor of the chronic average, 2/(N + 1). */
    public double chronicLambda() {
        return lambda(chronicDays);
    }

    /** λ = 2/(N + 1). */
    public static double lambda(int days) {
        return 2.0 / (days + 1);
    }
}
