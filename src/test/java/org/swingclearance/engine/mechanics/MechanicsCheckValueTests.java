package org.swingclearance.engine.mechanics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;
import static org.swingclearance.engine.mechanics.CheckCases.G;

import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;

/**
 * Every check value of biomechanics.md §0.2 (CASE-M80) and §0.3 (CASE-F62) that the engine's model computes,
 * to the precision printed there (half a unit in the last printed digit), with g = 9.81 m/s².
 *
 * <p>Not reproduced because the engine does not model them: S7b–S7d (alternative arm-inertia routes; see
 * {@link ArmInertiaRouteTests}), S31 (shoulder traction), S35 (ballistic drop), S36 (quasi-static raise work),
 * S42 (bifilar suspension), S43 (large-amplitude period factor), S44–S45 (equivalent dumbbells). S47 and S48 are
 * envelope inversions, checked in {@code EnvelopeCheckValueTests}.
 */
class MechanicsCheckValueTests {

    /** Asserts {@code actual} rounds to {@code printed} at the number of decimals printed in the reference. */
    private static void assertPrinted(double printed, int decimals, double actual) {
        assertThat(actual).isCloseTo(printed, within(0.5 * Math.pow(10, -decimals) + 1e-12));
    }

    @Nested
    class CaseM80 {

        private final Configuration swing = CheckCases.m80(2.0);
        private final Body body = swing.body();
        private final Club club = swing.club();

        @Test
        void segmentLengthsAreStatureFractions() {
            assertPrinted(0.33108, 5, body.upperArmLengthM()); // S1, Drillis & Contini via Winter Fig. 4.1
            assertPrinted(0.25988, 5, body.forearmLengthM()); // S2, Drillis & Contini via Winter Fig. 4.1
            assertPrinted(0.19224, 5, body.handLengthM()); // S3, Drillis & Contini via Winter Fig. 4.1
            assertPrinted(0.59096, 5, body.armLengthM()); // S4, derived: L_ua + L_fa (Winter Table 4.1 endpoints)
        }

        @Test
        void armMassCentreAndInertiaFollowTheDempsterTotalArmRow() {
            assertPrinted(4.0000, 4, body.armMassKg()); // S5, Winter Table 4.1 (total arm mass 0.050)
            assertPrinted(0.3132088, 7, body.armComFromShoulderM()); // S6, Winter Table 4.1 (COM 0.530)
            assertPrinted(0.5811598, 7, body.armInertiaAboutShoulderKgM2()); // S7, Winter Table 4.1 (ρ prox 0.645)
        }

        @Test
        void shoulderToGripIsEstimatedFromStatureAndLabelledSo() {
            assertPrinted(0.68708, 5, body.shoulderToGripM()); // S8, derived: L_ua + L_fa + ½L_h (Winter Fig. 4.1)
            assertThat(body.shoulderToGripSource()).isEqualTo(ShoulderToGripSource.ESTIMATED_FROM_STATURE);
            assertThat(body.shoulderToGripSource().label()).isEqualTo("estimated from stature");
        }

        @Test
        void momentArmGeometry() {
            assertPrinted(0.40, 2, swing.comBeyondGripM()); // S9, derived: x_cm − x_g
            assertPrinted(1.08708, 5, swing.momentArmM()); // S10, derived: R_g + d
        }

        @Test
        void rodPlusHeadModelOfTheClub() {
            RodAndHeadModel model = RodAndHeadModel.of(6.0, 0.60, 0.45, 0.50);
            assertPrinted(4.5, 1, model.headMassKg()); // S11, derived (biomechanics.md §2.3 rod + point split)
            assertPrinted(1.5, 1, model.rodMassKg()); // S11, derived
            assertPrinted(0.0900000, 7, club.inertia().aboutBalancePointKgM2()); // S12, derived (parallel axis)
            assertThat(club.inertia().source()).isEqualTo(InertiaSource.MODELLED);
            assertPrinted(0.1224745, 7, club.radiusOfGyrationM()); // S13, derived: √(I_cm/m_c)
            assertPrinted(1.3050000, 7, club.inertiaAboutKgM2(0.0)); // S14, derived: parallel-axis theorem
        }

        @Test
        void inertiaAndFirstMomentAboutTheShoulder() {
            double r = swing.momentArmM();
            assertPrinted(7.0904576, 7, club.massKg() * r * r); // S15, derived: point-mass club m_c·r_c²
            assertPrinted(7.1804576, 7, swing.clubInertiaAboutShoulderKgM2()); // S16, derived: parallel axis
            assertPrinted(7.7616174, 7, swing.systemInertiaKgM2()); // S17, derived: I_arm + I_club,GH
            assertPrinted(7.7753152, 7, swing.firstMomentKgM()); // S18, derived: m_arm·r_arm + m_c·r_c
        }

        @Test
        void staticTorquesAndWristMoment() {
            double horizontal = Math.PI / 2.0;
            assertPrinted(76.2758, 4, swing.staticShoulderTorqueNm(horizontal)); // S19, derived: g·Σmr·sin θ
            assertPrinted(63.9855, 4, G * swing.clubFirstMomentKgM()); // S19 club share, derived
            assertPrinted(12.2903, 4, G * body.armFirstMomentKgM()); // S19 arm share, derived
            assertPrinted(53.9352, 4, swing.staticShoulderTorqueNm(Math.PI / 4.0)); // S20, derived
            assertPrinted(23.544, 3, swing.staticWristMomentNm(horizontal)); // S21, derived: m_c·g·d
        }

        @Test
        void holdTorqueOfAnArcThroughTheHorizontalIsTheHorizontalStaticTorque() {
            Configuration toHorizontal = swing.withPattern(
                    SwingPattern.ofDegrees(45.0, 45.0, 1, 1.0, SwingKind.RHYTHMIC, false));
            assertPrinted(76.2758, 4, DemandCalculator.holdTorqueNm(toHorizontal)); // S19, derived
        }

        @Test
        void naturalPeriodAndEquivalentLength() {
            assertPrinted(2.004299, 6, swing.naturalPeriodS()); // S22, physical pendulum relation (Halliday et al.)
            assertPrinted(0.998238, 6, swing.equivalentPendulumLengthM()); // S23, derived: I_tot/Σmr
        }

        @Test
        void rhythmicSwingAtTwoSecondsSixtyDegrees() {
            Demand demand = DemandCalculator.calculate(swing);
            assertPrinted(3.289868, 6, demand.peakAngularVelocityRadS()); // S24, derived: SHM ω_pk = 2πA/T
            assertPrinted(10.335426, 6, demand.peakAngularAccelerationRadS2()); // S25, derived: (2π/T)²A
            assertPrinted(80.2196, 4, demand.systemInertiaKgM2() * demand.peakAngularAccelerationRadS2()); // S26
            assertPrinted(14.1628, 4, demand.peakShoulderTorqueNm()); // S27 (|−14.1628| at the ends), derived
            assertPrinted(129.454, 3, demand.peakGripPullN()); // S30, derived: m_c(ω_pk²·r_c + g) at the bottom
            assertPrinted(42.0029, 4, 0.5 * demand.systemInertiaKgM2()
                    * demand.peakAngularVelocityRadS() * demand.peakAngularVelocityRadS()); // S32, derived
            assertPrinted(7.730, 3, demand.positiveWorkPerCycleJ()); // S33 at T = 2.0 s, derived (numeric)
            assertPrinted(3.5763, 4, demand.peakAngularVelocityRadS() * demand.momentArmM()); // S49, derived
            assertPrinted(7.5055, 4, demand.peakWristMomentNm()); // §2.4 wrist moment at the swing ends, derived
            assertPrinted(2.004299, 6, demand.naturalPeriodS()); // S22
        }

        @Test
        void fasterAndSlowerRhythmicSwings() {
            Demand fast = DemandCalculator.calculate(swing.withCycleTime(1.5));
            assertPrinted(76.5558, 4, fast.peakShoulderTorqueNm()); // S28, derived: |−I·α_pk + g·Σmr·sin A|
            assertPrinted(73.068, 3, fast.positiveWorkPerCycleJ()); // S33 at T = 1.5 s, derived (numeric)
            assertPrinted(4.386491, 6, fast.peakAngularVelocityRadS()); // §4.2 T = 1.5 s, derived
            assertPrinted(18.374090, 6, fast.peakAngularAccelerationRadS2()); // §4.2 T = 1.5 s, derived
            Demand slow = DemandCalculator.calculate(swing.withCycleTime(3.0));
            assertPrinted(30.4037, 4, slow.peakShoulderTorqueNm()); // S29, derived
            assertPrinted(2.193245, 6, slow.peakAngularVelocityRadS()); // §4.2 T = 3.0 s, derived
            assertPrinted(4.593522, 6, slow.peakAngularAccelerationRadS2()); // §4.2 T = 3.0 s, derived
        }

        @Test
        void interiorPeakOfASlowWideSwing() {
            Configuration wide = swing.withCycleTime(3.0)
                    .withPattern(SwingPattern.ofDegrees(0.0, 90.0, 1, 1.0, SwingKind.RHYTHMIC, false));
            // §2.8 "where the SHM peak torque occurs": interior peak 30.529 N·m, not the 22.796 N·m end value
            assertPrinted(30.529, 3, DemandCalculator.peakShoulderTorqueNm(wide)); // derived
        }

        @Test
        void singleArcFollowsTheMinimumJerkProfile() {
            Configuration arc = swing.withPattern(
                    SwingPattern.ofDegrees(0.0, 60.0, 1, 1.0, SwingKind.SINGLE_ARC, false));
            Demand demand = DemandCalculator.calculate(arc); // 120° in D = T/2 = 1.0 s
            assertPrinted(3.926991, 6, demand.peakAngularVelocityRadS()); // S34, Flash & Hogan 1985: 1.875·Δθ/D
            assertPrinted(12.091996, 6, demand.peakAngularAccelerationRadS2()); // S34, Flash & Hogan: (10/√3)Δθ/D²
        }

        @Test
        void chokingUpFiveCentimetres() {
            Configuration chokedUp = swing.withGripMark(0.10);
            assertPrinted(61.0425, 4, G * chokedUp.clubFirstMomentKgM()); // S46, derived
            assertPrinted(-2.943, 3, G * (chokedUp.clubFirstMomentKgM() - swing.clubFirstMomentKgM())); // S46
            assertPrinted(6.5432, 4, chokedUp.clubInertiaAboutShoulderKgM2()); // S46, derived
        }

        @Test
        void clubAsACompoundPendulumAboutTheKnob() {
            double period = club.pendulumPeriodS(0.45, G);
            // S37: T = 2π√(I_pivot/(m g d)), physical pendulum relation as in ASTM F2398 and physics textbooks
            assertPrinted(1.394661, 6, period);
            PendulumTiming timing = new PendulumTiming(0.45, 1, period);
            assertPrinted(1.305000, 6, timing.inertiaAboutPivotKgM2(6.0, G)); // S38, ASTM F2398 relation, inverted
            assertPrinted(0.483333, 6, timing.equivalentLengthM(G)); // S39, ASTM F2398 centre of percussion
            assertPrinted(0.090000, 6, timing.inertiaAboutBalancePointKgM2(6.0, G)); // S40, parallel-axis theorem
        }

        @Test
        void measuredCaseTwentySwingsInTwentyEightSeconds() {
            PendulumTiming timing = new PendulumTiming(0.45, 20, 28.0);
            assertPrinted(1.400, 3, timing.periodS()); // S41
            assertPrinted(1.315010, 6, timing.inertiaAboutPivotKgM2(6.0, G)); // S41, physical pendulum relation
            assertPrinted(0.100010, 6, timing.inertiaAboutBalancePointKgM2(6.0, G)); // S41, parallel-axis theorem
            Club measured = Club.withBestInertia(6.0, 0.60, 0.45, 0.30, null, timing, 0.50, G);
            assertThat(measured.inertia().source()).isEqualTo(InertiaSource.MEASURED);
            Configuration withMeasured = new Configuration(body, measured, 0.05, CheckCases.rhythmic60(), 2.0, G);
            assertPrinted(7.190468, 6, withMeasured.clubInertiaAboutShoulderKgM2()); // S41, derived
        }
    }

    @Nested
    class CaseF62 {

        private final Configuration swing = CheckCases.f62(2.0);
        private final Body body = swing.body();

        @Test
        void segmentsOfTheSmallerBody() {
            assertPrinted(0.3069, 4, body.upperArmLengthM()); // F1, Drillis & Contini via Winter Fig. 4.1
            assertPrinted(0.2409, 4, body.forearmLengthM()); // F1, Drillis & Contini via Winter Fig. 4.1
            assertPrinted(0.1782, 4, body.handLengthM()); // F1, Drillis & Contini via Winter Fig. 4.1
            assertPrinted(0.5478, 4, body.armLengthM()); // F2, derived
            assertPrinted(3.1, 1, body.armMassKg()); // F2, Winter Table 4.1
            assertPrinted(0.290334, 6, body.armComFromShoulderM()); // F2, Winter Table 4.1
            assertPrinted(0.3870127, 7, body.armInertiaAboutShoulderKgM2()); // F3, Winter Table 4.1 (Dempster)
        }

        @Test
        void clubAndSystem() {
            assertPrinted(0.6369, 4, body.shoulderToGripM()); // F4, derived (Winter Fig. 4.1 fractions)
            assertPrinted(1.0369, 4, swing.momentArmM()); // F4, derived
            RodAndHeadModel model = RodAndHeadModel.of(4.0, 0.60, 0.45, 0.50);
            assertPrinted(1.0, 1, model.rodMassKg()); // F5, derived
            assertPrinted(3.0, 1, model.headMassKg()); // F5, derived
            assertPrinted(0.060000, 6, swing.club().inertia().aboutBalancePointKgM2()); // F5, derived
            assertPrinted(0.870000, 6, swing.club().inertiaAboutKgM2(0.0)); // F5, derived
            assertPrinted(4.3606464, 7, swing.clubInertiaAboutShoulderKgM2()); // F6, derived
            assertPrinted(4.7476591, 7, swing.systemInertiaKgM2()); // F6, derived
            assertPrinted(5.0476354, 7, swing.firstMomentKgM()); // F7, derived
            assertPrinted(49.5173, 4, swing.staticShoulderTorqueNm(Math.PI / 2.0)); // F7, derived
            assertPrinted(40.6880, 4, G * swing.clubFirstMomentKgM()); // F7 club only, derived
            assertPrinted(1.945544, 6, swing.naturalPeriodS()); // F8, physical pendulum relation
        }

        @Test
        void rhythmicSwingAtTwoSeconds() {
            Demand demand = DemandCalculator.calculate(swing);
            assertPrinted(49.0691, 4, demand.systemInertiaKgM2() * demand.peakAngularAccelerationRadS2()); // F9
            assertPrinted(6.1858, 4, demand.peakShoulderTorqueNm()); // F9 (|−6.1858| at the ends), derived
            assertPrinted(84.130, 3, demand.peakGripPullN()); // F10, derived
        }

        @Test
        void pendulumPeriodDependsOnShapeNotMass() {
            // F11: same period as the 6 kg club (physical pendulum relation: mass cancels)
            assertPrinted(1.394661, 6, swing.club().pendulumPeriodS(0.45, G));
        }
    }
}
