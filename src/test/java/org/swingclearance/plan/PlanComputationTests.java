package org.swingclearance.plan;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.time.LocalDate;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.UUID;
import org.junit.jupiter.api.Test;
import org.springframework.context.support.ResourceBundleMessageSource;
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
 * The plan feature's use of the engine: the mechanics engine judges each state through the adapter, the engine's
 * search plans, and the result comes back as stored steps with dates and an explained outcome. Body and club shape
 * of CASE-M80 (biomechanics.md §0.1); a one-hand front pendulum ±60°; shoulder capacity 120 N·m in Band 2 (40 %).
 */
class PlanComputationTests {

    static final LocalDate START = LocalDate.of(2027, 3, 1);
    static final UUID LIGHT = UUID.fromString("00000000-0000-4000-8000-0000000c0004");
    static final UUID MIDDLE = UUID.fromString("00000000-0000-4000-8000-0000000c0006");
    static final UUID HEAVY = UUID.fromString("00000000-0000-4000-8000-0000000c0008");
    static final double STEP_LIMIT = 0.10; // practice-rule default: +10 % D per step, common practice, no source

    static PlanningInputs.ClubInput club(UUID id, double massKg) {
        // CASE-M80 shape: 0.60 m long, balance point 0.45 m, head centre 0.50 m; grip marks up to 0.20 m.
        return new PlanningInputs.ClubInput(id, massKg + " kg club", massKg, 0.60, 0.45, 0.20, 0.50, null, null);
    }

    static PlanningInputs inputs(List<PlanningInputs.ClubInput> clubs, Double nextFraction) {
        return new PlanningInputs(1.78, 80, null, 120, 40.0, null, "BAND_2", "BAND_2", 0.40,
                nextFraction == null ? null : "BAND_3", nextFraction, null, true, 10, "BAND_2",
                new PlanningInputs.PatternInput(UUID.randomUUID(), "one-hand front pendulum", 0, 60, 1, 1.0,
                        "RHYTHMIC", false, null),
                clubs, PlanComputation.ladder());
    }

    static PlanSettings settings(PlanTarget target, boolean provisional) {
        return new PlanSettings(UUID.randomUUID(), target, provisional, StepUnit.SESSIONS, 3, 3, START,
                Map.of("BAND_1", new Dose(2, 10, 3), "BAND_2", new Dose(3, 10, 4), "BAND_3", new Dose(3, 12, 5),
                        "OPEN", new Dose(4, 12, 6)));
    }

    static PlanComputation.Computed compute(PlanningInputs in, PlanSettings settings, List<PlanAdjustment> adj) {
        return PlanComputation.compute(in, settings, adj, STEP_LIMIT, 5);
    }

    static final List<PlanningInputs.ClubInput> INVENTORY = List.of(club(HEAVY, 8), club(LIGHT, 4), club(MIDDLE, 6));

    @Test
    void everyStepChangesOneDialByOneNotchAndStaysWithinTheBandAndTheStepLimit() {
        PlanningInputs in = inputs(INVENTORY, null);
        PlanComputation.Computed plan = compute(in, settings(null, false), List.of());
        List<PlannedStep> steps = plan.steps();
        assertThat(steps).hasSizeGreaterThan(3);
        assertThat(plan.outcomeKey()).isEqualTo("plan.outcome.highestReached");
        for (int i = 0; i < steps.size(); i++) {
            PlannedStep s = steps.get(i);
            assertThat(s.getNumber()).isEqualTo(i + 1);
            assertThat(s.getDemandRatio()).isLessThanOrEqualTo(1.0);
            assertThat(s.isProvisional()).isFalse();
            // Independent re-evaluation with the mechanics engine: the stored D is the engine's D.
            assertThat(s.getDemandRatio()).isCloseTo(engineD(in, s), within(1e-12));
            if (i == 0) {
                assertThat(s.getChangedDial()).isNull();
                continue;
            }
            PlannedStep p = steps.get(i - 1);
            int changed = (s.getClubId().equals(p.getClubId()) ? 0 : 1)
                    + (Math.abs(s.getGripMarkCm() - p.getGripMarkCm()) < 1e-9 ? 0 : 1)
                    + (Math.abs(s.getCycleTimeS() - p.getCycleTimeS()) < 1e-9 ? 0 : 1);
            assertThat(changed).as("step %d changes exactly one dial", s.getNumber()).isEqualTo(1);
            if ("GRIP_MARK".equals(s.getChangedDial())) {
                assertThat(Math.abs(s.getGripMarkCm() - p.getGripMarkCm())).isCloseTo(2.5, within(1e-9));
            }
            if ("CYCLE_TIME".equals(s.getChangedDial())) {
                assertThat(Math.abs(s.getCycleTimeS() - p.getCycleTimeS())).isCloseTo(0.1, within(1e-9));
            }
            assertThat(s.getDemandRatio() / p.getDemandRatio() - 1).isLessThanOrEqualTo(STEP_LIMIT + 1e-9);
        }
        // Three sessions a week, three sessions a step: a step every 7 days.
        assertThat(steps.get(0).getStartsOn()).isEqualTo(START);
        assertThat(steps.get(2).getStartsOn()).isEqualTo(START.plusDays(14));
        assertThat(steps.get(0).getSets()).isEqualTo(3); // Band 2 dose
    }

    @Test
    void anInventoryOfOneClubStillProgressesByGripMarkAndCycleTime() {
        List<PlannedStep> steps = compute(inputs(List.of(club(LIGHT, 4)), null), settings(null, false), List.of())
                .steps();
        assertThat(steps).hasSizeGreaterThan(2);
        assertThat(steps).extracting(PlannedStep::getChangedDial).doesNotContain("CLUB");
        assertThat(steps).extracting(PlannedStep::getClubId).containsOnly(LIGHT);
    }

    @Test
    void aTargetOutsideTheEnvelopeIsExplainedNotClipped() {
        // The 8 kg club gripped at the knob at 50 swings a minute asks far more than 40 % of 120 N·m.
        PlanTarget target = new PlanTarget(HEAVY, 0, 1.2);
        PlanComputation.Computed plan = compute(inputs(INVENTORY, null), settings(target, false), List.of());
        assertThat(plan.outcomeKey()).isEqualTo("engine.plan.shortfall.OUTSIDE_ENVELOPE");
        PlannedStep last = plan.steps().get(plan.steps().size() - 1);
        assertThat(last.getClubId().equals(HEAVY) && last.getGripMarkCm() == 0 && last.getCycleTimeS() == 1.2)
                .isFalse();
        String text = messages().getMessage(plan.outcome(), Locale.ENGLISH);
        assertThat(text).startsWith("Cannot reach the target because it lies outside the envelope")
                .contains("(C1)").doesNotContain("{");
    }

    @Test
    void aTargetOffTheGridIsRefusedWithTheReasonNeverRounded() {
        PlanTarget offGrid = new PlanTarget(LIGHT, 3.0, 2.0);
        assertThatThrownBy(() -> compute(inputs(INVENTORY, null), settings(offGrid, false), List.of()))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("2.5 cm grid");
        PlanTarget offLadder = new PlanTarget(LIGHT, 5.0, 2.05);
        assertThatThrownBy(() -> compute(inputs(INVENTORY, null), settings(offLadder, false), List.of()))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("ladder");
    }

    @Test
    void provisionalStepsFollowOneReScreenGateWithTheNextBandsDose() {
        PlanComputation.Computed plan = compute(inputs(INVENTORY, 0.60), settings(null, true), List.of());
        List<PlannedStep> steps = plan.steps();
        List<PlannedStep> gates = steps.stream().filter(PlannedStep::isGateBefore).toList();
        assertThat(gates).hasSize(1);
        int gate = gates.get(0).getNumber();
        for (PlannedStep s : steps) {
            assertThat(s.isProvisional()).isEqualTo(s.getNumber() >= gate);
            assertThat(s.getSets() * 100 + s.getReps()).isEqualTo(s.isProvisional() ? 312 : 310);
            // D is against Band 2; provisional steps stay within Band 3: D · 0.40 / 0.60 ≤ 1.
            assertThat(s.getDemandRatio() * 0.40 / 0.60).isLessThanOrEqualTo(1.0 + 1e-9);
        }
        assertThat(steps.get(gate - 1).getDemandRatio()).isGreaterThan(1.0);
        // Going on to the 6 kg club would raise D by about 50 %: the step limit stops the plan, and it says so.
        assertThat(plan.outcomeKey()).isEqualTo("engine.plan.shortfall.UNREACHABLE");
        assertThat(messages().getMessage(plan.outcome(), Locale.ENGLISH))
                .contains("next club step would raise the demand ratio by").contains("step limit of 10 %");
    }

    @Test
    void aPinnedStateIsPassedThroughAndARemovedOneAvoided() {
        PlanningInputs in = inputs(INVENTORY, null);
        List<PlannedStep> free = compute(in, settings(null, false), List.of()).steps();
        PlannedStep middle = free.get(free.size() / 2);
        List<PlannedStep> avoiding = compute(in, settings(null, false), List.of(new PlanAdjustment(
                AdjustmentKind.REMOVE, middle.getClubId(), middle.getGripMarkCm(), middle.getCycleTimeS()))).steps();
        assertThat(avoiding).noneMatch(middle::equals).noneMatch(s -> sameState(s, middle));

        PlannedStep other = avoiding.get(1);
        List<PlannedStep> pinned = compute(in, settings(null, false), List.of(new PlanAdjustment(AdjustmentKind.PIN,
                other.getClubId(), other.getGripMarkCm(), other.getCycleTimeS()))).steps();
        assertThat(pinned).anyMatch(s -> sameState(s, other) && s.isPinned());
    }

    static boolean sameState(PlannedStep a, PlannedStep b) {
        return a.getClubId().equals(b.getClubId()) && a.getGripMarkCm() == b.getGripMarkCm()
                && a.getCycleTimeS() == b.getCycleTimeS();
    }

    /** D of a step recomputed directly with the mechanics engine's Assessor (C1–C3 against 40 % capacity). */
    static double engineD(PlanningInputs in, PlannedStep s) {
        PlanningInputs.ClubInput c = in.clubs().stream().filter(x -> x.id().equals(s.getClubId())).findFirst()
                .orElseThrow();
        Club club = Club.withBestInertia(c.massKg(), c.lengthM(), c.balancePointM(), c.handleLengthM(), null, null,
                c.headCentreM(), Gravity.STANDARD);
        Configuration conf = new Configuration(new Body(1.78, 80, null), club, s.getGripMarkCm() / 100,
                SwingPattern.ofDegrees(0, 60, 1, 1.0, SwingKind.RHYTHMIC, false), s.getCycleTimeS(), Gravity.STANDARD);
        return Assessor.demandRatio(conf, Capacity.of(120, 40.0), LoadRules.forFraction(0.40));
    }

    static ResourceBundleMessageSource messages() {
        ResourceBundleMessageSource source = new ResourceBundleMessageSource();
        source.setBasenames("messages/common", "messages/plan", "messages/engine");
        source.setDefaultEncoding("UTF-8");
        source.setFallbackToSystemLocale(false);
        return source;
    }

}
