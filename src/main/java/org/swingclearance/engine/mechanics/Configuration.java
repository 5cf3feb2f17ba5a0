package org.swingclearance.engine.mechanics;

/**
 * One swing configuration: a body, a club held at a grip mark, a swing pattern and a cycle time (engine.md §4).
 * Holds the geometry and inertia of arm plus club about the shoulder; {@link DemandCalculator} turns it into
 * peak loads. Values are per arm: with two hands each arm carries the share s = 1/n of the club.
 *
 * @param body       never null
 * @param club       never null
 * @param gripMarkM  x_g, where the centre of the hand sits, from the knob, m, in [0, handle length]
 * @param pattern    never null
 * @param cycleTimeS T, one full out-and-back swing, s, in (0, {@value #MAX_CYCLE_TIME_S}]
 * @param gravity    g, m/s², see {@link Gravity}
 */
public record Configuration(Body body, Club club, double gripMarkM, SwingPattern pattern, double cycleTimeS,
                            double gravity) {

    public static final double MAX_CYCLE_TIME_S = 60.0;

    public Configuration {
        Checks.present("body", body);
        Checks.present("club", club);
        Checks.present("swing pattern", pattern);
        Checks.inRange("grip mark (m)", gripMarkM, 0.0, club.handleLengthM());
        Checks.aboveAtMost("cycle time (s)", cycleTimeS, 0.0, MAX_CYCLE_TIME_S);
        Gravity.checked(gravity);
        double momentArm = pattern.reach() * body.shoulderToGripM() + club.balancePointM() - gripMarkM;
        if (!(momentArm > 0.0)) {
            throw new IllegalArgumentException("the club's centre of mass would lie behind the shoulder (moment arm "
                    + momentArm + " m): grip nearer the knob or use a longer reach");
        }
    }

    /** Shoulder-to-grip distance in this pattern, ρ·R_g, m. */
    public double shoulderToGripM() {
        return pattern.reach() * body.shoulderToGripM();
    }

    /** d = x_cm − x_g, the club's centre of mass beyond the hand, m (negative when the hand is above it). */
    public double comBeyondGripM() {
        return club.balancePointM() - gripMarkM;
    }

    /** r_c = ρ·R_g + x_cm − x_g, shoulder to the club's centre of mass, m: the moment arm. */
    public double momentArmM() {
        return shoulderToGripM() + comBeyondGripM();
    }

    /** The whole club's inertia about the shoulder, I_cm + m_c·r_c², kg·m² (not split between hands). */
    public double clubInertiaAboutShoulderKgM2() {
        double r = momentArmM();
        return club.inertia().aboutBalancePointKgM2() + club.massKg() * r * r;
    }

    /** I_tot = I_arm + s·(I_cm + m_c·r_c²), kg·m², per arm. */
    public double systemInertiaKgM2() {
        return body.armInertiaAboutShoulderKgM2() + pattern.share() * clubInertiaAboutShoulderKgM2();
    }

    /** The whole club's first moment about the shoulder, m_c·r_c, kg·m. */
    public double clubFirstMomentKgM() {
        return club.massKg() * momentArmM();
    }

    /** S = m_arm·r_arm + s·m_c·r_c, kg·m, per arm. */
    public double firstMomentKgM() {
        return body.armFirstMomentKgM() + pattern.share() * clubFirstMomentKgM();
    }

    /** Torque to hold arm and club still at angle θ, g·S·sin θ, N·m, per arm. */
    public double staticShoulderTorqueNm(double angleRad) {
        return gravity * firstMomentKgM() * Math.sin(angleRad);
    }

    /** Wrist moment about the grip to hold the club still at angle θ, s·m_c·g·d·sin θ, N·m, per hand. */
    public double staticWristMomentNm(double angleRad) {
        return pattern.share() * club.massKg() * gravity * comBeyondGripM() * Math.sin(angleRad);
    }

    /** Small-amplitude natural period of arm plus club as a free pendulum, 2π·√(I_tot/(g·S)), s. */
    public double naturalPeriodS() {
        return 2.0 * Math.PI * Math.sqrt(systemInertiaKgM2() / (gravity * firstMomentKgM()));
    }

    /** Length of the simple pendulum with the same period, I_tot/S, m. */
    public double equivalentPendulumLengthM() {
        return systemInertiaKgM2() / firstMomentKgM();
    }

    /** This configuration at another grip mark. */
    public Configuration withGripMark(double newGripMarkM) {
        return new Configuration(body, club, newGripMarkM, pattern, cycleTimeS, gravity);
    }

    /** This configuration at another cycle time. */
    public Configuration withCycleTime(double newCycleTimeS) {
        return new Configuration(body, club, gripMarkM, pattern, newCycleTimeS, gravity);
    }

    /** This configuration with the same club shape at another mass. */
    public Configuration withClubMass(double newMassKg) {
        return new Configuration(body, club.withMass(newMassKg), gripMarkM, pattern, cycleTimeS, gravity);
    }

    /** This configuration with another pattern. */
    public Configuration withPattern(SwingPattern newPattern) {
        return new Configuration(body, club, gripMarkM, newPattern, cycleTimeS, gravity);
    }
}
