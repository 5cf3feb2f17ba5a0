package org.swingclearance.equipment;

/**
 * A club's inertia about its balance point as worked out from its measurements, beside the safe upper bound
 * m·x_cm·(L − x_cm) it must not exceed; for a pendulum also the period and the equivalent pendulum length.
 *
 * @param source MEASURED, MODELLED or BOUND
 */
public record InertiaEstimate(double aboutBalancePointKgM2, String source, double boundKgM2, Double periodS,
                              Double equivalentLengthM) {

    /** The estimate's share of the bound, 0–1 (a plausible pendulum result lies inside). */
    public double shareOfBound() {
        return aboutBalancePointKgM2 / boundKgM2;
    }
}
