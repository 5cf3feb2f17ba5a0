package org.swingclearance.engine.mechanics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.swingclearance.engine.rules.LoadBand;

/** Input checks, inertia-source selection, the two-hand split, the constraints C1–C5 and what results carry. */
class MechanicsTests {

    @Nested
    class Inputs {

        @Test
        void refusesImplausibleBodies() {
            assertThatThrownBy(() -> Body.of(1.78, 0.0)).hasMessageContaining("body mass");
            assertThatThrownBy(() -> Body.of(1.78, 10_000.0)).hasMessageContaining("body mass");
            assertThatThrownBy(() -> Body.of(Double.NaN, 80.0)).hasMessageContaining("stature");
            assertThatThrownBy(() -> new Body(1.78, 80.0, 2.0)).hasMessageContaining("shoulder-to-grip");
        }

        @Test
        void measuredShoulderToGripWinsAndIsLabelled() {
            Body measured = new Body(1.78, 80.0, 0.65);
            assertThat(measured.shoulderToGripM()).isEqualTo(0.65);
            assertThat(measured.shoulderToGripSource().label()).isEqualTo("measured");
        }

        @Test
        void refusesClubsWhoseBalancePointOrHandleLieOffTheClub() {
            ClubInertia inertia = ClubInertia.measured(0.1);
            assertThatThrownBy(() -> new Club(6.0, 0.6, 0.7, 0.3, inertia)).hasMessageContaining("balance point");
            assertThatThrownBy(() -> new Club(6.0, 0.6, 0.45, 0.7, inertia)).hasMessageContaining("handle length");
            assertThatThrownBy(() -> new Club(0.0, 0.6, 0.45, 0.3, inertia)).hasMessageContaining("club mass");
            assertThatThrownBy(() -> new Club(10_000.0, 0.6, 0.45, 0.3, inertia)).hasMessageContaining("club mass");
        }

        @Test
        void refusesAGripBeyondTheHandleAndANonPositiveCycleTime() {
            Configuration c = CheckCases.m80(2.0);
            assertThatThrownBy(() -> c.withGripMark(0.31)).hasMessageContaining("grip mark");
            assertThatThrownBy(() -> c.withCycleTime(0.0)).hasMessageContaining("cycle time");
        }

        @Test
        void refusesPatternsOutsideTheirRanges() {
            assertThatThrownBy(() -> SwingPattern.ofDegrees(0, 181, 1, 1.0, SwingKind.RHYTHMIC, false))
                    .hasMessageContaining("half-arc");
            assertThatThrownBy(() -> SwingPattern.ofDegrees(0, 60, 3, 1.0, SwingKind.RHYTHMIC, false))
                    .hasMessageContaining("hands");
            assertThatThrownBy(() -> SwingPattern.ofDegrees(0, 60, 1, 1.2, SwingKind.RHYTHMIC, false))
                    .hasMessageContaining("reach");
        }

        @Test
        void gravityIsAParameterWithAStandardDefault() {
            assertThat(Gravity.STANDARD).isEqualTo(9.80665);
            assertThatThrownBy(() -> Gravity.checked(0.0)).hasMessageContaining("gravity");
        }
    }

    @Nested
    class InertiaSources {

        @Test
        void pendulumTimingThatGivesNoPositiveInertiaIsRefusedAsAMeasuringError() {
            // 20 swings in 20 s about a pivot 0.45 m away: shorter than a point mass at 0.45 m could swing.
            PendulumTiming tooFast = new PendulumTiming(0.45, 20, 20.0);
            assertThatThrownBy(() -> ClubInertia.fromPendulum(6.0, tooFast, Gravity.STANDARD))
                    .hasMessageContaining("non-positive inertia");
        }

        @Test
        void bestSourceIsMeasuredThenPendulumThenModelThenBound() {
            PendulumTiming timing = new PendulumTiming(0.45, 20, 28.0);
            assertThat(Club.withBestInertia(6, 0.6, 0.45, 0.3, 0.12, timing, 0.5, 9.81).inertia())
                    .isEqualTo(ClubInertia.measured(0.12));
            assertThat(Club.withBestInertia(6, 0.6, 0.45, 0.3, null, timing, 0.5, 9.81).inertia().source())
                    .isEqualTo(InertiaSource.MEASURED);
            assertThat(Club.withBestInertia(6, 0.6, 0.45, 0.3, null, null, 0.5, 9.81).inertia().source())
                    .isEqualTo(InertiaSource.MODELLED);
            assertThat(Club.withBestInertia(6, 0.6, 0.45, 0.3, null, null, null, 9.81).inertia().source())
                    .isEqualTo(InertiaSource.BOUND);
        }

        @Test
        void headCentreTheModelCannotUseFallsBackToTheBound() {
            // Balance point in the handle half: no rod-plus-head split exists (needs L/2 < x_cm < x_b ≤ L).
            Club club = Club.withBestInertia(6, 0.6, 0.25, 0.2, null, null, 0.5, 9.81);
            assertThat(club.inertia().source()).isEqualTo(InertiaSource.BOUND);
            assertThatThrownBy(() -> RodAndHeadModel.of(6, 0.6, 0.45, 0.40)).hasMessageContaining("rod-plus-head");
        }

        @Test
        void boundIsTheWholeMassSplitBetweenTheEnds() {
            // m·x_cm·(L − x_cm): masses m(L − x)/L at the knob and m·x/L at the tip (derived, parallel axis)
            assertThat(ClubInertia.bound(6, 0.6, 0.45).aboutBalancePointKgM2()).isCloseTo(0.405, within(1e-12));
        }

        @Test
        void heavierClubOfTheSameShapeScalesItsInertia() {
            Club club = CheckCases.m80Club().withMass(12.0);
            assertThat(club.inertia().aboutBalancePointKgM2()).isCloseTo(0.18, within(1e-12));
            assertThat(club.radiusOfGyrationM()).isCloseTo(CheckCases.m80Club().radiusOfGyrationM(), within(1e-12));
            assertThat(club.inertia().source()).isEqualTo(InertiaSource.MODELLED);
        }
    }

    @Nested
    class TwoHands {

        @Test
        void eachArmCarriesHalfTheClub() {
            Configuration one = CheckCases.m80(2.0);
            Configuration two = one.withPattern(SwingPattern.ofDegrees(0, 60, 2, 1.0, SwingKind.RHYTHMIC, false));
            double arm = one.body().armInertiaAboutShoulderKgM2();
            assertThat(two.systemInertiaKgM2() - arm)
                    .isCloseTo((one.systemInertiaKgM2() - arm) / 2, within(1e-12));
            assertThat(DemandCalculator.peakGripPullN(two))
                    .isCloseTo(DemandCalculator.peakGripPullN(one) / 2, within(1e-9));
            assertThat(DemandCalculator.calculate(two).assumptions()).contains(Assumptions.TWO_HANDS);
        }
    }

    @Nested
    class Constraints {

        private final Configuration swing = CheckCases.m80(2.0);

        @Test
        void bindingConstraintIsTheLargestRatio() {
            // Hold torque at ±60° is 66.06 N·m, the swing peak 14.16 N·m: holding still decides.
            Verdict verdict = Assessor.verdict(swing, Capacity.of(200, 45.0), LoadRules.forFraction(0.5));
            assertThat(verdict.binding()).isEqualTo(Constraint.HOLD_TORQUE);
            assertThat(verdict.demandRatio())
                    .isCloseTo(DemandCalculator.holdTorqueNm(swing) / 100.0, within(1e-12));
            assertThat(verdict.permitted()).isTrue();
        }

        @Test
        void withoutTheControlledStopRuleTheSwingPeakOrGripDecides() {
            LoadRules rules = LoadRules.forFraction(0.5).withControlledStop(false);
            Verdict verdict = Assessor.verdict(swing, Capacity.of(200, 45.0), rules);
            // grip 129.45 N against 0.5·45·9.81 = 220.7 N (ratio 0.59) beats the torque 14.16/100
            assertThat(verdict.binding()).isEqualTo(Constraint.GRIP_PULL);
        }

        @Test
        void holdBandPermitsNothing() {
            Verdict verdict = Assessor.verdict(swing, Capacity.of(200, 45.0), LoadRules.forBand(LoadBand.HOLD));
            assertThat(verdict.permitted()).isFalse();
            assertThat(verdict.demandRatio()).isInfinite();
        }

        @Test
        void rangeOfMotionExcludesThePatternAndReportsTheLargestHalfArc() {
            Capacity capacity = Capacity.of(200, 45.0).withShoulderFlexionRangeDeg(50.0);
            Assessment assessment = Assessor.assess(swing, capacity, LoadRules.forFraction(0.5));
            assertThat(assessment.permitted()).isFalse();
            assertThat(assessment.binding()).isEqualTo(Constraint.RANGE_OF_MOTION);
            // 50° measured − 10° margin − 0° centre
            assertThat(Math.toDegrees(assessment.maxHalfArcRad())).isCloseTo(40.0, within(1e-9));
            assertThat(assessment.demandRatio()).isLessThan(1.0); // the loads alone would be permitted
        }

        @Test
        void hipDrivenPatternsNeedTheLumbopelvicBandTheRulesName() {
            Configuration hips = swing.withPattern(SwingPattern.ofDegrees(0, 60, 2, 1.0, SwingKind.RHYTHMIC, true));
            LoadRules rules = LoadRules.forFraction(0.5);
            Capacity capacity = Capacity.of(200, 45.0);
            assertThat(Assessor.verdict(hips, capacity, rules).binding()).isEqualTo(Constraint.HIP_DRIVE);
            assertThat(Assessor.verdict(hips, capacity.withLumbopelvicBand(LoadBand.BAND_1), rules).permitted())
                    .isFalse();
            assertThat(Assessor.verdict(hips, capacity.withLumbopelvicBand(LoadBand.BAND_2), rules).permitted())
                    .isTrue();
        }

        @Test
        void unmeasuredGripAndRangeAreSaidNotSilentlyPassed() {
            Assessment assessment = Assessor.assess(swing, Capacity.of(200, null), LoadRules.forFraction(0.5));
            assertThat(assessment.gripPullRatio()).isNull();
            assertThat(assessment.notes()).contains(Assessor.GRIP_NOT_MEASURED, Assessor.RANGE_NOT_MEASURED);
        }

        @Test
        void fastVerdictAgreesWithTheFullAssessment() {
            Capacity capacity = Capacity.of(90, 40.0);
            LoadRules rules = LoadRules.forFraction(0.4);
            Configuration standard = new Configuration(CheckCases.m80Body(), CheckCases.m80Club(), 0.05,
                    CheckCases.rhythmic60(), 1.4, Gravity.STANDARD);
            Assessment full = Assessor.assess(standard, capacity, rules);
            assertThat(Assessor.verdict(CheckCases.m80Body(), capacity, rules, CheckCases.m80Club(), 0.05,
                    CheckCases.rhythmic60(), 1.4)).isEqualTo(full.verdict());
            assertThat(Assessor.demandRatio(standard, capacity, rules)).isEqualTo(full.demandRatio());
        }
    }

    @Nested
    class Results {

        @Test
        void demandCarriesInputsProvenanceAssumptionsAndVersion() {
            Configuration swing = CheckCases.m80(2.0);
            Demand demand = DemandCalculator.calculate(swing);
            assertThat(demand.configuration()).isEqualTo(swing);
            assertThat(demand.engineVersion()).isEqualTo(EngineVersion.ENGINE_VERSION);
            assertThat(demand.clubInertiaSource()).isEqualTo(InertiaSource.MODELLED);
            assertThat(demand.provenance()).extracting(Provenance::quantity)
                    .contains("shoulder-to-grip distance", "club inertia about the balance point");
            assertThat(demand.assumptions()).contains(Assumptions.FIXED_HINGE, Assumptions.ESTIMATED_REACH,
                    Assumptions.INERTIA_MODELLED, Assumptions.NON_STANDARD_GRAVITY);
            assertThat(demand.assumptions()).allSatisfy(sentence -> assertThat(sentence).endsWith("."));
        }
    }
}
