package org.swingclearance.engine.mechanics;

/**
 * A clinic's pendulum measurement of a club: "N full swings in S seconds about a pivot at distance d from the
 * balance point". Small-amplitude physical pendulum: T = 2π·√(I_pivot/(m·g·d)), so
 * I_pivot = m·g·d·T²/(4π²) and, by the parallel-axis theorem, I_cm = I_pivot − m·d² (the relation ASTM F2398
 * uses for bats; any physics text's physical pendulum).
 *
 * @param pivotFromBalancePointM distance d from the pivot to the balance point, m, in (0, {@value #MAX_PIVOT_M}]
 * @param swings                 number of full (out-and-back) swings timed, [1, {@value #MAX_SWINGS}]
 * @param seconds                time for those swings, s, in (0, {@value #MAX_SECONDS}]
 */
public record PendulumTiming(double pivotFromBalancePointM, int swings, double seconds) {

    public static final double MAX_PIVOT_M = 2.0;
    public static final int MAX_SWINGS = 1000;
    public static final double MAX_SECONDS = 3600.0;

    private static final double FOUR_PI_SQUARED = 4.0 * Math.PI * Math.PI;

    public PendulumTiming {
        Checks.aboveAtMost("pendulum pivot distance from the balance point (m)", pivotFromBalancePointM, 0.0,
                MAX_PIVOT_M);
        if (swings < 1 || swings > MAX_SWINGS) {
            throw new IllegalArgumentException("pendulum swings must be between 1 and " + MAX_SWINGS
                    + ", was " + swings);
        }
        Checks.aboveAtMost("pendulum time (s)", seconds, 0.0, MAX_SECONDS);
    }

    /** Period of one full swing, s. */
    public double periodS() {
        return seconds / swings;
    }

    /** Equivalent simple-pendulum length g·T²/(4π²), m (the centre of oscillation for this pivot). */
    public double equivalentLengthM(double gravity) {
        double period = periodS();
        return Gravity.checked(gravity) * period * period / FOUR_PI_SQUARED;
    }

    /** Inertia about the pivot, m·g·d·T²/(4π²), kg·m². */
    public double inertiaAboutPivotKgM2(double clubMassKg, double gravity) {
        return clubMassKg * pivotFromBalancePointM * equivalentLengthM(gravity);
    }

    /** Whether this timing gives a positive inertia about the balance point for a club of this mass. */
    public boolean givesPositiveInertia(double clubMassKg, double gravity) {
        double d = pivotFromBalancePointM;
        return inertiaAboutPivotKgM2(clubMassKg, gravity) - clubMassKg * d * d > 0.0;
    }

    /**
     * Inertia about the balance point, I_pivot − m·d², kg·m².
     *
     * @throws IllegalArgumentException when the result is not positive: the timing or the pivot distance was
     *                                  mis-measured (a period shorter than a point mass at d could swing)
     */
    public double inertiaAboutBalancePointKgM2(double clubMassKg, double gravity) {
        double d = pivotFromBalancePointM;
        double inertia = inertiaAboutPivotKgM2(clubMassKg, gravity) - clubMassKg * d * d;
        if (!(inertia > 0.0)) {
            throw new IllegalArgumentException("pendulum timing gives a non-positive inertia about the balance"
                    + " point (" + inertia + " kg·m²): re-time the swings and re-measure the pivot distance");
        }
        return inertia;
    }
}
