package org.swingclearance.engine.envelope;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;
import org.swingclearance.engine.mechanics.Body;
import org.swingclearance.engine.mechanics.Capacity;
import org.swingclearance.engine.mechanics.Club;
import org.swingclearance.engine.mechanics.ClubInertia;
import org.swingclearance.engine.mechanics.Configuration;
import org.swingclearance.engine.mechanics.Constraint;
import org.swingclearance.engine.mechanics.EngineVersion;
import org.swingclearance.engine.mechanics.Gravity;
import org.swingclearance.engine.mechanics.LoadRules;
import org.swingclearance.engine.mechanics.SwingKind;
import org.swingclearance.engine.mechanics.SwingPattern;
import org.swingclearance.engine.rules.LoadBand;

/** The envelope as a whole: gates exclude every limit, Hold permits nothing, results say how they were found. */
class EnvelopeTests {

    private final Configuration swing = new Configuration(Body.of(1.78, 80), new Club(6.0, 0.6, 0.45, 0.3,
            ClubInertia.modelled(6.0, 0.6, 0.45, 0.5)), 0.05,
            SwingPattern.ofDegrees(0, 60, 1, 1.0, SwingKind.RHYTHMIC, false), 2.0, Gravity.STANDARD);

    @Test
    void envelopeOfAPermittedConfigurationHasAllThreeLimitsAroundIt() {
        Envelope envelope = EnvelopeCalculator.envelope(swing, Capacity.of(200, 45.0), LoadRules.forFraction(0.6));
        assertThat(envelope.atConfiguration().permitted()).isTrue();
        assertThat(envelope.furthestGrip().status()).isEqualTo(LimitStatus.OK);
        assertThat(envelope.furthestGrip().gripMarkM()).isLessThanOrEqualTo(swing.gripMarkM());
        assertThat(envelope.shortestCycle().cycleTimeS()).isLessThanOrEqualTo(swing.cycleTimeS());
        assertThat(envelope.shortestCycle().cyclesPerMinute())
                .isCloseTo(60.0 / envelope.shortestCycle().cycleTimeS(), within(1e-12));
        assertThat(envelope.heaviestMass().massKg()).isGreaterThanOrEqualTo(swing.club().massKg());
        assertThat(envelope.maxHalfArcRad()).isNull();
        assertThat(envelope.engineVersion()).isEqualTo(EngineVersion.ENGINE_VERSION);
        assertThat(envelope.assumptions()).contains(EnvelopeCalculator.SEARCH, EnvelopeCalculator.SHAPE);
    }

    @Test
    void aPatternBeyondTheRangeOfMotionHasNoLimitsButALargestHalfArc() {
        Capacity capacity = Capacity.of(200, 45.0).withShoulderFlexionRangeDeg(60.0);
        Envelope envelope = EnvelopeCalculator.envelope(swing, capacity, LoadRules.forFraction(0.6));
        assertThat(envelope.furthestGrip().status()).isEqualTo(LimitStatus.NOT_PERMISSIBLE);
        assertThat(envelope.shortestCycle().status()).isEqualTo(LimitStatus.NOT_PERMISSIBLE);
        assertThat(envelope.heaviestMass().status()).isEqualTo(LimitStatus.NOT_PERMISSIBLE);
        assertThat(envelope.furthestGrip().verdict().binding()).isEqualTo(Constraint.RANGE_OF_MOTION);
        assertThat(Math.toDegrees(envelope.maxHalfArcRad())).isCloseTo(50.0, within(1e-9));
    }

    @Test
    void holdBandHasNothingPermissibleAndNamesTheBlockingConstraint() {
        Envelope envelope = EnvelopeCalculator.envelope(swing, Capacity.of(200, 45.0),
                LoadRules.forBand(LoadBand.HOLD));
        assertThat(envelope.furthestGrip().status()).isEqualTo(LimitStatus.NOT_PERMISSIBLE);
        assertThat(envelope.furthestGrip().gripMarkM()).isNull();
        assertThat(envelope.shortestCycle().status()).isEqualTo(LimitStatus.NOT_PERMISSIBLE);
        assertThat(envelope.heaviestMass().status()).isEqualTo(LimitStatus.NOT_PERMISSIBLE);
        assertThat(envelope.heaviestMass().verdict().permitted()).isFalse();
    }

    @Test
    void holdTorqueThatFailsAtEveryTempoMakesTheCycleTimeNotPermissible() {
        // C2 does not depend on the tempo: 66 N·m to hold at ±60° against 0.4 × 100 N·m.
        CycleTimeLimit limit = EnvelopeCalculator.shortestCycleTime(swing, Capacity.of(100, 45.0),
                LoadRules.forFraction(0.4));
        assertThat(limit.status()).isEqualTo(LimitStatus.NOT_PERMISSIBLE);
        assertThat(limit.verdict().binding()).isEqualTo(Constraint.HOLD_TORQUE);
    }
}
