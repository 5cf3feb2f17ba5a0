package org.swingclearance.engine.mechanics;

/**
 * Computes the {@link Demand} of a configuration (engine.md §4): shoulder torque τ = I_tot·θ̈ + g·S·sin θ, hold
 * torque, grip pull F = s·m_c·(θ̇²·r_c + g·cos θ), wrist moment M_w = s·((I_cm + m_c·d·r_c)·θ̈ + m_c·g·d·sin θ),
 * natural period and positive work per cycle. Stateless and thread-safe.
 */
public final class DemandCalculator {

    private DemandCalculator() {
    }

    /** The full demand with provenance and assumptions. */
    public static Demand calculate(Configuration configuration) {
        SwingPattern pattern = configuration.pattern();
        SwingKind kind = pattern.kind();
        double centre = pattern.centreRad();
        double halfArc = pattern.halfArcRad();
        double cycleTime = configuration.cycleTimeS();
        double inertia = configuration.systemInertiaKgM2();
        double gravityMoment = configuration.gravity() * configuration.firstMomentKgM();
        return new Demand(configuration,
                configuration.shoulderToGripM(),
                configuration.body().shoulderToGripSource(),
                configuration.momentArmM(),
                configuration.club().inertia().aboutBalancePointKgM2(),
                configuration.club().inertia().source(),
                inertia,
                configuration.firstMomentKgM(),
                configuration.naturalPeriodS(),
                SwingLoads.peakAngularVelocity(kind, halfArc, cycleTime),
                SwingLoads.peakAngularAcceleration(kind, halfArc, cycleTime),
                peakShoulderTorqueNm(configuration),
                holdTorqueNm(configuration),
                peakGripPullN(configuration),
                peakWristMomentNm(configuration),
                SwingLoads.positiveWork(kind, centre, halfArc, cycleTime, inertia, gravityMoment),
                Assumptions.provenance(configuration),
                Assumptions.of(configuration),
                EngineVersion.ENGINE_VERSION);
    }

    /** Peak |τ| over the cycle, N·m (exact for rhythmic swings; sampled and refined for single arcs). */
    public static double peakShoulderTorqueNm(Configuration c) {
        SwingPattern p = c.pattern();
        return SwingLoads.peakTorqueLike(p.kind(), p.centreRad(), p.halfArcRad(), c.cycleTimeS(),
                c.systemInertiaKgM2(), c.gravity() * c.firstMomentKgM());
    }

    /** Torque to hold arm and club still anywhere in the arc, g·S·max|sin θ|, N·m. */
    public static double holdTorqueNm(Configuration c) {
        SwingPattern p = c.pattern();
        return c.gravity() * c.firstMomentKgM() * SwingLoads.maxAbsSine(p.centreRad(), p.halfArcRad());
    }

    /** Peak pull along the arm at the grip over the cycle, N. */
    public static double peakGripPullN(Configuration c) {
        SwingPattern p = c.pattern();
        return SwingLoads.peakGripPull(p.kind(), p.centreRad(), p.halfArcRad(), c.cycleTimeS(),
                p.share() * c.club().massKg(), c.momentArmM(), c.gravity());
    }

    /** Peak |M_w| about the grip over the cycle, N·m. */
    public static double peakWristMomentNm(Configuration c) {
        SwingPattern p = c.pattern();
        Club club = c.club();
        double beyond = c.comBeyondGripM();
        double k = p.share() * (club.inertia().aboutBalancePointKgM2() + club.massKg() * beyond * c.momentArmM());
        double q = p.share() * club.massKg() * c.gravity() * beyond;
        return SwingLoads.peakTorqueLike(p.kind(), p.centreRad(), p.halfArcRad(), c.cycleTimeS(), k, q);
    }
}
