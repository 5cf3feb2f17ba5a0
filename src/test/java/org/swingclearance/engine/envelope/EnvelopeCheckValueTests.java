package org.swingclearance.engine.envelope;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;
import org.swingclearance.engine.mechanics.Body;
import org.swingclearance.engine.mechanics.Capacity;
import org.swingclearance.engine.mechanics.Club;
import org.swingclearance.engine.mechanics.ClubInertia;
import org.swingclearance.engine.mechanics.Configuration;
import org.swingclearance.engine.mechanics.Constraint;
import org.swingclearance.engine.mechanics.Assessor;
import org.swingclearance.engine.mechanics.LoadRules;
import org.swingclearance.engine.mechanics.SwingKind;
import org.swingclearance.engine.mechanics.SwingPattern;

/**
 * The inversions of biomechanics.md §2.8 on CASE-M80 (g = 9.81 m/s²): S47 (heaviest club for a static
 * horizontal hold), S48 and the other tempo windows, and the grip position for a given club, including the
 * "no legal grip" case that must be reported as not permissible rather than clipped.
 */
class EnvelopeCheckValueTests {

    private static final double G = 9.81;
    /** Band fraction used with a capacity of 2·τ_allow, so that f·τ_cap = τ_allow. */
    private static final double HALF = 0.5;

    private static Club m80Club(double handleLengthM) {
        return new Club(6.0, 0.60, 0.45, handleLengthM, ClubInertia.modelled(6.0, 0.60, 0.45, 0.50));
    }

    /** An arc from hanging to horizontal, slow enough that holding still (C2) decides: the static hold case. */
    private static Configuration slowArcToHorizontal(double handleLengthM, double gripMarkM) {
        SwingPattern toHorizontal = SwingPattern.ofDegrees(45.0, 45.0, 1, 1.0, SwingKind.RHYTHMIC, false);
        return new Configuration(Body.of(1.78, 80.0), m80Club(handleLengthM), gripMarkM, toHorizontal, 8.0, G);
    }

    @ParameterizedTest
    @CsvSource({"30, 1.6607", "40, 2.5984", "50, 3.5361"})
    void heaviestClubForAStaticHorizontalHold(double allowedTorqueNm, double printedMassKg) {
        MassLimit limit = EnvelopeCalculator.heaviestMass(slowArcToHorizontal(0.30, 0.05),
                Capacity.of(2 * allowedTorqueNm, null), LoadRules.forFraction(HALF));
        assertThat(limit.status()).isEqualTo(LimitStatus.OK);
        // S47 and §2.8: m_c,max = (τ_allow/g − m_arm·r_arm)/r_c, derived
        assertThat(limit.massKg()).isCloseTo(printedMassKg, within(0.00005));
        assertThat(limit.verdict().binding()).isEqualTo(Constraint.HOLD_TORQUE);
    }

    @ParameterizedTest
    @CsvSource({"30, 1.8277, 2.9832", "40, 1.7394, 3.5092", "50, 1.6628, 4.4703"})
    void rhythmicTempoWindowForSixtyDegrees(double allowedTorqueNm, double fastEdgeS, double slowEdgeS) {
        Configuration swing = new Configuration(Body.of(1.78, 80.0), m80Club(0.30), 0.05,
                SwingPattern.ofDegrees(0.0, 60.0, 1, 1.0, SwingKind.RHYTHMIC, false), 2.0, G);
        Capacity capacity = Capacity.of(2 * allowedTorqueNm, null);
        // The tempo window compares the peak swing torque only: the controlled-stop rule (C2) is off.
        LoadRules rules = LoadRules.forFraction(HALF).withControlledStop(false);
        CycleTimeLimit fastest = EnvelopeCalculator.shortestCycleTime(swing, capacity, rules);
        assertThat(fastest.status()).isEqualTo(LimitStatus.OK);
        // S48 and §2.8 tempo window, inertia-dominated edge T = 2π/ω_max, derived
        assertThat(fastest.cycleTimeS()).isCloseTo(fastEdgeS, within(0.00005));
        // §2.8 gravity-dominated edge: permitted just inside, not just outside (to the printed precision), derived
        assertThat(Assessor.verdict(swing.withCycleTime(slowEdgeS - 0.00005), capacity, rules).permitted()).isTrue();
        assertThat(Assessor.verdict(swing.withCycleTime(slowEdgeS + 0.00005), capacity, rules).permitted())
                .isFalse();
    }

    @Test
    void gripPositionForTheSixKilogramClubHeldStaticallyAtFiftyNewtonMetres() {
        GripLimit limit = EnvelopeCalculator.furthestGrip(slowArcToHorizontal(0.55, 0.05),
                Capacity.of(100.0, null), LoadRules.forFraction(HALF));
        assertThat(limit.status()).isEqualTo(LimitStatus.OK);
        // §2.8 grip position for a given club: x_g,min = 0.496 m (hand above the balance point), derived
        assertThat(limit.gripMarkM()).isCloseTo(0.496, within(0.0005));
        assertThat(limit.momentArmM()).isCloseTo(0.68708 + 0.45 - limit.gripMarkM(), within(1e-9));
    }

    @Test
    void noLegalGripAtFortyNewtonMetresIsNotPermissibleNotClipped() {
        GripLimit limit = EnvelopeCalculator.furthestGrip(slowArcToHorizontal(0.55, 0.05),
                Capacity.of(80.0, null), LoadRules.forFraction(HALF));
        // §2.8: x_g,min = 0.666 m lies beyond the 0.60 m club: "the engine must return not permissible", derived
        assertThat(limit.status()).isEqualTo(LimitStatus.NOT_PERMISSIBLE);
        assertThat(limit.gripMarkM()).isNull();
        assertThat(limit.verdict().binding()).isEqualTo(Constraint.HOLD_TORQUE);
    }
}
