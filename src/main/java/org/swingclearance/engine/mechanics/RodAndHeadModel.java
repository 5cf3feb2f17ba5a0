package org.swingclearance.engine.mechanics;

/**
 * A club modelled as a uniform rod over its full length plus a point mass at the head centre, constrained to the
 * club's measured mass and balance point (biomechanics.md §2.3). Needs L/2 &lt; x_cm &lt; x_b ≤ L.
 *
 * @param headMassKg                   point mass at the head centre, kg
 * @param rodMassKg                    uniform rod mass, kg
 * @param inertiaAboutBalancePointKgM2 resulting inertia about the balance point, kg·m²
 */
public record RodAndHeadModel(double headMassKg, double rodMassKg, double inertiaAboutBalancePointKgM2) {

    /** Whether the rod-plus-head split exists for this geometry (L/2 &lt; x_cm &lt; x_b ≤ L). */
    public static boolean applies(double lengthM, double balancePointM, double headCentreM) {
        return lengthM / 2.0 < balancePointM && balancePointM < headCentreM && headCentreM <= lengthM;
    }

    /**
     * Splits the club's mass so that rod + head have the given balance point, and returns the inertia.
     *
     * @throws IllegalArgumentException when {@link #applies} is false
     */
    public static RodAndHeadModel of(double massKg, double lengthM, double balancePointM, double headCentreM) {
        if (!applies(lengthM, balancePointM, headCentreM)) {
            throw new IllegalArgumentException("rod-plus-head model needs length/2 < balance point < head centre"
                    + " <= length; was length " + lengthM + ", balance point " + balancePointM + ", head centre "
                    + headCentreM);
        }
        double half = lengthM / 2.0;
        double head = massKg * (balancePointM - half) / (headCentreM - half);
        double rod = massKg - head;
        double rodOffset = half - balancePointM;
        double headOffset = headCentreM - balancePointM;
        double inertia = rod * lengthM * lengthM / 12.0 + rod * rodOffset * rodOffset
                + head * headOffset * headOffset;
        return new RodAndHeadModel(head, rod, inertia);
    }
}
