package org.swingclearance.engine.mechanics;

/**
 * A club's moment of inertia about its balance point with its source label (engine.md §2).
 *
 * @param aboutBalancePointKgM2 I_cm, kg·m², &gt; 0
 * @param source                where it came from; never null
 */
public record ClubInertia(double aboutBalancePointKgM2, InertiaSource source) {

    public ClubInertia {
        Checks.present("inertia source", source);
        if (!(aboutBalancePointKgM2 > 0.0 && aboutBalancePointKgM2 < 1.0e3)) {
            throw new IllegalArgumentException("club inertia about the balance point must be positive and below"
                    + " 1000 kg·m², was " + aboutBalancePointKgM2);
        }
    }

    /** A measured I_cm (e.g. stored from an earlier pendulum or bifilar measurement). */
    public static ClubInertia measured(double aboutBalancePointKgM2) {
        return new ClubInertia(aboutBalancePointKgM2, InertiaSource.MEASURED);
    }

    /** I_cm from a pendulum timing; refuses a timing that gives I_cm ≤ 0 (see {@link PendulumTiming}). */
    public static ClubInertia fromPendulum(double clubMassKg, PendulumTiming timing, double gravity) {
        return measured(timing.inertiaAboutBalancePointKgM2(clubMassKg, gravity));
    }

    /** I_cm of the rod-plus-head model; refuses a geometry the model cannot represent. */
    public static ClubInertia modelled(double massKg, double lengthM, double balancePointM, double headCentreM) {
        return new ClubInertia(RodAndHeadModel.of(massKg, lengthM, balancePointM, headCentreM)
                .inertiaAboutBalancePointKgM2(), InertiaSource.MODELLED);
    }

    /**
     * The safe upper bound m·x_cm·(L − x_cm): the inertia of the whole mass split between the two ends, the most
     * spread-out distribution on [0, L] with that balance point. Errs toward more demand, never less.
     */
    public static ClubInertia bound(double massKg, double lengthM, double balancePointM) {
        return new ClubInertia(massKg * balancePointM * (lengthM - balancePointM), InertiaSource.BOUND);
    }
}
