package org.swingclearance.engine.envelope;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.Random;
import java.util.function.DoubleFunction;
import java.util.stream.Stream;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.swingclearance.engine.mechanics.Assessor;
import org.swingclearance.engine.mechanics.Body;
import org.swingclearance.engine.mechanics.Capacity;
import org.swingclearance.engine.mechanics.Club;
import org.swingclearance.engine.mechanics.Configuration;
import org.swingclearance.engine.mechanics.Gravity;
import org.swingclearance.engine.mechanics.LoadRules;
import org.swingclearance.engine.mechanics.SwingKind;
import org.swingclearance.engine.mechanics.SwingPattern;

/**
 * The envelope inversions against a general-purpose reference root finder: Apache Commons Math's Brent solver on
 * the same constraint function D(x) − 1, bracketed by an independent fine scan (2,000 steps) for the first
 * permitted value from the demanding end. Agreement is required to 1e-4 relative (engine.md §6).
 */
class EnvelopeCrossCheckTests {

    private static final int SCAN = 2000;

    /** One invented patient-club-rules case. */
    record Case(Configuration configuration, Capacity capacity, LoadRules rules) {
    }

    static Stream<Case> cases() {
        Random random = new Random(20_261);
        return Stream.generate(() -> randomCase(random)).limit(40);
    }

    private static Case randomCase(Random random) {
        double length = 0.4 + 0.6 * random.nextDouble();
        double balance = length * (0.6 + 0.3 * random.nextDouble());
        double mass = 2 + 12 * random.nextDouble();
        Club club = Club.withBestInertia(mass, length, balance, length * (0.2 + 0.5 * random.nextDouble()), null,
                null, random.nextBoolean() ? (balance + length) / 2 : null, Gravity.STANDARD);
        double centre = -20 + 110 * random.nextDouble();
        SwingPattern pattern = SwingPattern.ofDegrees(centre, Math.min(10 + 90 * random.nextDouble(),
                180 - Math.abs(centre)), 1 + random.nextInt(2), 0.7 + 0.3 * random.nextDouble(),
                random.nextBoolean() ? SwingKind.RHYTHMIC : SwingKind.SINGLE_ARC, false);
        Configuration configuration = new Configuration(Body.of(1.5 + 0.5 * random.nextDouble(),
                50 + 70 * random.nextDouble()), club, club.handleLengthM() * random.nextDouble(), pattern,
                0.8 + 3 * random.nextDouble(), Gravity.STANDARD);
        Capacity capacity = Capacity.of(20 + 100 * random.nextDouble(),
                random.nextBoolean() ? 15 + 45 * random.nextDouble() : null);
        LoadRules rules = LoadRules.forFraction(0.2 + 0.7 * random.nextDouble())
                .withControlledStop(random.nextBoolean());
        return new Case(configuration, capacity, rules);
    }

    @ParameterizedTest
    @MethodSource("cases")
    void furthestGripAgreesWithBrent(Case c) {
        GripLimit limit = EnvelopeCalculator.furthestGrip(c.configuration(), c.capacity(), c.rules());
        double reference = reference(grip -> c.configuration().withGripMark(grip), c, 0.0,
                c.configuration().club().handleLengthM());
        assertAgrees(limit.status(), limit.gripMarkM(), reference);
    }

    @ParameterizedTest
    @MethodSource("cases")
    void shortestCycleTimeAgreesWithBrent(Case c) {
        CycleTimeLimit limit = EnvelopeCalculator.shortestCycleTime(c.configuration(), c.capacity(), c.rules());
        double reference = reference(time -> c.configuration().withCycleTime(time), c,
                EnvelopeCalculator.MIN_CYCLE_TIME_S, EnvelopeCalculator.MAX_CYCLE_TIME_S);
        assertAgrees(limit.status(), limit.cycleTimeS(), reference);
    }

    @ParameterizedTest
    @MethodSource("cases")
    void heaviestMassAgreesWithBrent(Case c) {
        MassLimit limit = EnvelopeCalculator.heaviestMass(c.configuration(), c.capacity(), c.rules());
        double reference = reference(mass -> c.configuration().withClubMass(mass), c,
                EnvelopeCalculator.MAX_CLUB_MASS_KG, EnvelopeCalculator.MIN_CLUB_MASS_KG);
        assertAgrees(limit.status(), limit.massKg(), reference);
    }

    private static void assertAgrees(LimitStatus status, Double engine, double reference) {
        if (Double.isNaN(reference)) {
            assertThat(status).isEqualTo(LimitStatus.NOT_PERMISSIBLE);
            return;
        }
        assertThat(status).isEqualTo(LimitStatus.OK);
        assertThat(engine).isCloseTo(reference, within(1e-4 * Math.abs(reference) + 1e-9));
    }

    /** First permitted value from {@code demanding} by a fine scan, refined by Brent; NaN when none. */
    private static double reference(DoubleFunction<Configuration> at, Case c, double demanding, double lenient) {
        java.util.function.DoubleUnaryOperator margin =
                x -> Assessor.demandRatio(at.apply(x), c.capacity(), c.rules()) - 1.0;
        double previous = demanding;
        for (int i = 0; i <= SCAN; i++) {
            double x = i == SCAN ? lenient : demanding + (lenient - demanding) * i / SCAN;
            if (margin.applyAsDouble(x) <= 0.0) {
                if (i == 0) {
                    return x;
                }
                BrentSolver brent = new BrentSolver(1e-12, 1e-12);
                return brent.solve(10_000, margin::applyAsDouble, Math.min(previous, x), Math.max(previous, x));
            }
            previous = x;
        }
        return Double.NaN;
    }
}
