package org.swingclearance.engine.mechanics;

/**
 * A club as the engine sees it: a rigid implement along the arm line, positions measured from the knob end
 * (x = 0) toward the head (engine.md §2).
 *
 * @param massKg        m_c, kg, in (0, {@value #MAX_MASS_KG}]
 * @param lengthM       L_c, m, in (0, {@value #MAX_LENGTH_M}]
 * @param balancePointM x_cm, the centre of mass from the knob, m, in (0, L_c)
 * @param handleLengthM x_h, the furthest grip mark from the knob, m, in [0, L_c]
 * @param inertia       inertia about the balance point with its source; never null
 */
public record Club(double massKg, double lengthM, double balancePointM, double handleLengthM, ClubInertia inertia) {

    public static final double MAX_MASS_KG = 50.0;
    public static final double MAX_LENGTH_M = 2.0;

    public Club {
        Checks.aboveAtMost("club mass (kg)", massKg, 0.0, MAX_MASS_KG);
        Checks.aboveAtMost("club length (m)", lengthM, 0.0, MAX_LENGTH_M);
        if (!(balancePointM > 0.0 && balancePointM < lengthM)) {
            throw new IllegalArgumentException("balance point must lie between the knob and the end of the club"
                    + " (0 < x < " + lengthM + " m), was " + balancePointM);
        }
        Checks.inRange("handle length (m)", handleLengthM, 0.0, lengthM);
        Checks.present("club inertia", inertia);
    }

    /**
     * A club with its inertia from the best source available: a measured I_cm, else a pendulum timing, else the
     * rod-plus-head model when a usable head centre is given, else the safe upper bound.
     *
     * @param measuredInertiaKgM2 measured I_cm, kg·m², or null
     * @param pendulum            pendulum timing, or null
     * @param headCentreM         head centre x_b from the knob, m, or null; ignored when the rod-plus-head split
     *                            does not exist for this geometry (then the bound is used)
     * @param gravity             g for the pendulum relation, m/s²
     */
    public static Club withBestInertia(double massKg, double lengthM, double balancePointM, double handleLengthM,
                                       Double measuredInertiaKgM2, PendulumTiming pendulum, Double headCentreM,
                                       double gravity) {
        ClubInertia inertia;
        if (measuredInertiaKgM2 != null) {
            inertia = ClubInertia.measured(measuredInertiaKgM2);
        } else if (pendulum != null) {
            inertia = ClubInertia.fromPendulum(massKg, pendulum, gravity);
        } else if (headCentreM != null && RodAndHeadModel.applies(lengthM, balancePointM, headCentreM)) {
            inertia = ClubInertia.modelled(massKg, lengthM, balancePointM, headCentreM);
        } else {
            inertia = ClubInertia.bound(massKg, lengthM, balancePointM);
        }
        return new Club(massKg, lengthM, balancePointM, handleLengthM, inertia);
    }

    /** Inertia about a transverse axis at distance x from the knob, I_cm + m·(x − x_cm)², kg·m². */
    public double inertiaAboutKgM2(double xFromKnobM) {
        double offset = xFromKnobM - balancePointM;
        return inertia.aboutBalancePointKgM2() + massKg * offset * offset;
    }

    /** Radius of gyration about the balance point, √(I_cm/m), m. */
    public double radiusOfGyrationM() {
        return Math.sqrt(inertia.aboutBalancePointKgM2() / massKg);
    }

    /** Small-amplitude period of the club swinging as a physical pendulum about a pivot d from the balance point. */
    public double pendulumPeriodS(double pivotFromBalancePointM, double gravity) {
        Checks.aboveAtMost("pivot distance (m)", pivotFromBalancePointM, 0.0, MAX_LENGTH_M);
        double d = pivotFromBalancePointM;
        double aboutPivot = inertia.aboutBalancePointKgM2() + massKg * d * d;
        return 2.0 * Math.PI * Math.sqrt(aboutPivot / (massKg * Gravity.checked(gravity) * d));
    }

    /**
     * The same shape at another mass: balance point and radius of gyration fixed, so I_cm scales with the mass
     * (the heaviest-mass inversion of engine.md §6). The inertia source label is kept.
     */
    public Club withMass(double newMassKg) {
        Checks.aboveAtMost("club mass (kg)", newMassKg, 0.0, MAX_MASS_KG);
        double scaled = inertia.aboutBalancePointKgM2() * newMassKg / massKg;
        return new Club(newMassKg, lengthM, balancePointM, handleLengthM, new ClubInertia(scaled, inertia.source()));
    }
}
