package org.swingclearance.engine.mechanics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.Random;
import java.util.stream.Stream;
import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.analysis.integration.RombergIntegrator;
import org.apache.commons.math3.analysis.integration.SimpsonIntegrator;
import org.apache.commons.math3.analysis.integration.UnivariateIntegrator;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Positive work per cycle against general-purpose quadrature: Apache Commons Math's Romberg and Simpson
 * integrators applied directly to ∫max(τ·θ̇, 0)dt, with τ and θ̇ written out here from engine.md §3–4 (the engine
 * itself uses the energy turning points instead of quadrature). The integrand has kinks where the power changes
 * sign, so the cycle is cut into many short pieces and each is integrated to 1e-9 relative.
 */
class WorkCrossCheckTests {

    private static final int PIECES = 400;

    static Stream<Configuration> configurations() {
        Random random = new Random(8);
        return Stream.generate(() -> {
            double centre = -20 + 120 * random.nextDouble();
            SwingPattern pattern = SwingPattern.ofDegrees(centre, Math.min(10 + 100 * random.nextDouble(),
                            180 - Math.abs(centre)), 1 + random.nextInt(2), 0.7 + 0.3 * random.nextDouble(),
                    random.nextBoolean() ? SwingKind.RHYTHMIC : SwingKind.SINGLE_ARC, false);
            double mass = 1 + 14 * random.nextDouble();
            Club club = new Club(mass, 0.6, 0.45, 0.3, ClubInertia.modelled(mass, 0.6, 0.45, 0.5));
            return new Configuration(Body.of(1.5 + 0.5 * random.nextDouble(), 50 + 60 * random.nextDouble()), club,
                    0.3 * random.nextDouble(), pattern, 0.7 + 4 * random.nextDouble(), Gravity.STANDARD);
        }).limit(40);
    }

    @ParameterizedTest
    @MethodSource("configurations")
    void engineWorkMatchesSimpsonQuadrature(Configuration c) {
        double reference = integrate(new SimpsonIntegrator(1e-9, 1e-11, 3, 30), positivePower(c), c.cycleTimeS());
        assertThat(DemandCalculator.calculate(c).positiveWorkPerCycleJ())
                .isCloseTo(reference, within(1e-5 * reference + 1e-9));
    }

    @ParameterizedTest
    @MethodSource("configurations")
    void engineWorkMatchesRombergQuadrature(Configuration c) {
        double reference = integrate(new RombergIntegrator(1e-9, 1e-11, 3, 30), positivePower(c), c.cycleTimeS());
        assertThat(DemandCalculator.calculate(c).positiveWorkPerCycleJ())
                .isCloseTo(reference, within(1e-5 * reference + 1e-9));
    }

    @Test
    void publishedWorkOfCaseM80AlsoFollowsFromQuadrature() {
        Configuration swing = CheckCases.m80(2.0);
        double reference = integrate(new RombergIntegrator(1e-9, 1e-11, 3, 30), positivePower(swing), 2.0);
        assertThat(reference).isCloseTo(7.730, within(0.0005)); // S33, derived (numeric), via Commons Math
    }

    private static double integrate(UnivariateIntegrator integrator, UnivariateFunction f, double period) {
        double sum = 0.0;
        for (int i = 0; i < PIECES; i++) {
            sum += integrator.integrate(50_000_000, f, period * i / PIECES, period * (i + 1) / PIECES);
        }
        return sum;
    }

    /** max(τ·θ̇, 0) at time t, with τ = I_tot·θ̈ + g·S·sin θ (engine.md §4) and the pattern's θ(t) (§3). */
    private static UnivariateFunction positivePower(Configuration c) {
        SwingPattern p = c.pattern();
        double inertia = c.systemInertiaKgM2();
        double gravityMoment = c.gravity() * c.firstMomentKgM();
        double centre = p.centreRad();
        double halfArc = p.halfArcRad();
        double period = c.cycleTimeS();
        return t -> {
            double angle;
            double velocity;
            double acceleration;
            if (p.kind() == SwingKind.RHYTHMIC) {
                double omega = 2 * Math.PI / period;
                angle = centre + halfArc * Math.sin(omega * t);
                velocity = halfArc * omega * Math.cos(omega * t);
                acceleration = -halfArc * omega * omega * Math.sin(omega * t);
            } else {
                double duration = period / 2;
                boolean out = t < duration;
                double u = (out ? t : t - duration) / duration;
                double sign = out ? 1 : -1;
                double start = out ? centre - halfArc : centre + halfArc;
                double s = u * u * u * (10 - 15 * u + 6 * u * u);
                angle = start + sign * 2 * halfArc * s;
                velocity = sign * 2 * halfArc / duration * 30 * u * u * (1 - u) * (1 - u);
                acceleration = sign * 2 * halfArc / (duration * duration) * 60 * u * (1 - u) * (1 - 2 * u);
            }
            double torque = inertia * acceleration + gravityMoment * Math.sin(angle);
            return Math.max(torque * velocity, 0.0);
        };
    }
}
