package org.swingclearance.plan;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import java.util.UUID;
import org.junit.jupiter.api.Test;
import org.swingclearance.engine.plan.ClubOption;
import org.swingclearance.engine.plan.Evaluation;

/**
 * The adapter from the mechanics engine to the plan search's StateEvaluator, checked on the CASE-M80 body and club of
 * biomechanics.md §0.1–0.2 (1.78 m, 80 kg; 6 kg club, 0.60 m long, balance point 0.45 m, head centre 0.50 m, grip
 * mark 0.05 m). Expected values are derived [D] from the published S-values with standard gravity 9.80665 m/s²
 * (biomechanics.md conventions: purely gravitational terms scale with g).
 */
class MechanicsStateEvaluatorTests {

    static final double G = 9.80665;
    static final UUID CLUB = UUID.fromString("00000000-0000-4000-8000-00000000c106");
    /** S18: first moment Σmr = m_arm·r_arm + m_c·r_c for CASE-M80, kg·m. */
    static final double S18_FIRST_MOMENT = 7.7753152;
    /** S5 × S6: the arm's own first moment m_arm·r_arm, kg·m. */
    static final double ARM_FIRST_MOMENT = 4.0 * 0.3132088;
    /** S10: shoulder to club centre of mass r_c, m. */
    static final double S10_MOMENT_ARM = 1.08708;

    static PlanningInputs.ClubInput caseM80Club() {
        return new PlanningInputs.ClubInput(CLUB, "CASE-M80 club", 6.0, 0.60, 0.45, 0.20, 0.50, null, null);
    }

    static PlanningInputs.PatternInput pattern(double centreDeg, double halfArcDeg, int hands, boolean hipDriven,
                                               String minimumBand) {
        return new PlanningInputs.PatternInput(UUID.randomUUID(), "test pattern", centreDeg, halfArcDeg, hands, 1.0,
                "RHYTHMIC", hipDriven, minimumBand);
    }

    static PlanningInputs inputs(double torqueNm, double fraction, Double nextFraction, Double flexionDeg,
                                 String lumbopelvic, PlanningInputs.PatternInput pattern) {
        return new PlanningInputs(1.78, 80, null, torqueNm, null, flexionDeg, lumbopelvic, "BAND_2", fraction,
                nextFraction == null ? null : "BAND_3", nextFraction, null, true, 10, "BAND_2", pattern,
                List.of(caseM80Club()), List.of(3.0));
    }

    static Evaluation evaluate(PlanningInputs in) {
        return new MechanicsStateEvaluator(in).evaluate(new ClubOption(CLUB.toString(), 6.0, 0.20), 0.05, 3.0);
    }

    /** Hold torque over a ±60° arc centred on the hanging arm: g·Σmr·sin 60° (S20 form with S18), N·m. */
    static double holdTorqueOneHand() {
        return G * S18_FIRST_MOMENT * Math.sin(Math.toRadians(60));
    }

    @Test
    void slowOneHandSwingIsBoundByTheControlledStopAndPermittedWithinTheBand() {
        // At T = 3.0 s the peak swing torque is S29 (+30.40 N·m at g = 9.81), below the hold torque: C2 binds.
        Evaluation e = evaluate(inputs(120, 0.60, null, null, "BAND_2", pattern(0, 60, 1, false, null)));
        assertThat(e.bindingConstraint()).isEqualTo("C2");
        assertThat(e.demandRatio()).isCloseTo(holdTorqueOneHand() / (0.60 * 120), within(1e-6));
        assertThat(e.permitted()).isTrue();
        assertThat(e.permittedAtNextBand()).isTrue();
    }

    @Test
    void aStateBeyondTheBandButWithinTheNextIsProvisionalWithDAgainstTheCurrentBand() {
        Evaluation e = evaluate(inputs(120, 0.40, 0.60, null, "BAND_2", pattern(0, 60, 1, false, null)));
        double d = holdTorqueOneHand() / (0.40 * 120); // 1.3757: needs 38 % more than Band 2 allows
        assertThat(e.demandRatio()).isCloseTo(d, within(1e-6));
        assertThat(e.permitted()).isFalse();
        assertThat(e.permittedAtNextBand()).isTrue(); // d · 0.40 / 0.60 = 0.917 ≤ 1
    }

    @Test
    void aStateBeyondTheNextBandIsOutsideTheEnvelope() {
        Evaluation e = evaluate(inputs(120, 0.40, 0.50, null, "BAND_2", pattern(0, 60, 1, false, null)));
        assertThat(e.permitted()).isFalse();
        assertThat(e.permittedAtNextBand()).isFalse(); // 66.03 N·m > 0.50 · 120 N·m
        assertThat(e.bindingConstraint()).isEqualTo("C2");
    }

    @Test
    void withoutANextBandNothingBeyondTheBandIsProvisional() {
        Evaluation e = evaluate(inputs(120, 0.40, null, null, "BAND_2", pattern(0, 60, 1, false, null)));
        assertThat(e.permitted()).isFalse();
        assertThat(e.permittedAtNextBand()).isFalse();
    }

    @Test
    void twoHandsCarryHalfTheClubEach() {
        // s = 1/2 (engine.md §3): S = m_arm·r_arm + ½·m_c·r_c from S5, S6 and S10.
        double firstMoment = ARM_FIRST_MOMENT + 0.5 * 6.0 * S10_MOMENT_ARM;
        Evaluation e = evaluate(inputs(120, 0.60, null, null, "BAND_2", pattern(0, 60, 2, false, null)));
        assertThat(e.demandRatio()).isCloseTo(G * firstMoment * Math.sin(Math.toRadians(60)) / 72, within(1e-6));
    }

    @Test
    void anArcAboveTheMeasuredRangeLessTheMarginIsExcludedByC4AtEveryBand() {
        // The arc reaches 60°; 65° measured − 10° margin (practice-rule default, common practice) = 55°.
        Evaluation e = evaluate(inputs(400, 0.60, 0.80, 65.0, "BAND_2", pattern(0, 60, 1, false, null)));
        assertThat(e.bindingConstraint()).isEqualTo("C4");
        assertThat(e.permitted()).isFalse();
        assertThat(e.permittedAtNextBand()).isFalse();
        assertThat(evaluate(inputs(400, 0.60, 0.80, 70.0, "BAND_2", pattern(0, 60, 1, false, null))).permitted())
                .isTrue(); // 70° − 10° = 60°: exactly the arc's top, permitted
    }

    @Test
    void hipDrivenPatternsNeedTheStricterOfTheRulesAndThePatternMinimumBand() {
        PlanningInputs.PatternInput hipDriven = pattern(0, 60, 2, true, null);
        assertThat(evaluate(inputs(400, 0.60, null, null, "BAND_1", hipDriven)).bindingConstraint()).isEqualTo("C5");
        assertThat(evaluate(inputs(400, 0.60, null, null, "BAND_2", hipDriven)).permitted()).isTrue();
        PlanningInputs.PatternInput needsBand3 = pattern(0, 60, 2, true, "BAND_3");
        Evaluation e = evaluate(inputs(400, 0.60, 0.80, null, "BAND_2", needsBand3));
        assertThat(e.bindingConstraint()).isEqualTo("C5");
        assertThat(e.permittedAtNextBand()).isFalse(); // a re-screen of the lumbopelvic band, not a plan, lifts C5
    }
}
