package org.swingclearance.engine.plan;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;

import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;

/**
 * Worked examples of the graded-plan search, small enough to check by hand. The demand ratios are hand-written
 * tables (or, in the last example, the {@link LeverTestModel} worked through by hand); the step limit is the default
 * +10 % (common practice, no source). Notation: (grip mark cm from the knob, cycle time s).
 */
class PlanSearchWorkedExamplesTests {

    private static final Dosage WITHIN_BAND = new Dosage(3, 10, 4);
    private static final Dosage PROVISIONAL = new Dosage(2, 8, 3);
    private static final PlanRules RULES = PlanRules.withDefaults(WITHIN_BAND, PROVISIONAL);

    /** One 4 kg club with grip marks 0, 2.5 and 5 cm; cycle times 3.0 and 2.5 s. */
    private static PlanSearch oneClubSixStates(double[][] dByGripThenTempo) {
        PlanSpace space = new PlanSpace(List.of(new ClubOption("A", 4, 0.05)), CycleTimeLadder.of(3.0, 2.5));
        TableEvaluator table = new TableEvaluator();
        double[] grips = {5, 2.5, 0};
        double[] tempos = {3.0, 2.5};
        for (int g = 0; g < 3; g++) {
            for (int t = 0; t < 2; t++) {
                table.put("A", grips[g], tempos[t], dByGripThenTempo[g][t]);
            }
        }
        return new PlanSearch(space, table);
    }

    private static PlanState at(PlanSearch search, String club, double gripCm, double cycleTimeS) {
        return search.space().stateAt(club, gripCm / 100, cycleTimeS);
    }

    @Nested
    class TieBreaks {

        /*
         * D table             T = 3.0 s   T = 2.5 s
         *   grip 5 cm           0.50        0.54
         *   grip 2.5 cm         0.53        0.58
         *   grip 0 cm           0.57        0.62
         * Start = lowest D = (5, 3.0); goal = highest D = (0, 2.5); every path needs 2 grip steps (G) + 1 tempo step
         * (T), so 3 steps. The three orders:
         *   T G G: 0.50→0.54→0.58→0.62, rises 8.00 %, 7.41 %, 6.90 %  → largest 8.00 %, total 2.24
         *   G T G: 0.50→0.53→0.58→0.62, rises 6.00 %, 9.43 %, 6.90 %  → largest 9.43 %, total 2.23
         *   G G T: 0.50→0.53→0.57→0.62, rises 6.00 %, 7.55 %, 8.77 %  → largest 8.77 %, total 2.22
         * The smallest largest rise decides before the total: T G G, although its total is the highest.
         */
        private final double[][] table = {{0.50, 0.54}, {0.53, 0.58}, {0.57, 0.62}};

        @Test
        void smallestLargestRiseWinsOverLowerTotalDemand() {
            PlanSearch search = oneClubSixStates(table);

            Plan plan = search.plan(RULES, PlanRequest.toHighestPermitted());

            assertThat(plan.states()).containsExactly(at(search, "A", 5, 3.0), at(search, "A", 5, 2.5),
                    at(search, "A", 2.5, 2.5), at(search, "A", 0, 2.5));
            assertThat(plan.steps()).extracting(PlanStep::changedDial).containsExactly(Optional.empty(),
                    Optional.of(Dial.CYCLE_TIME), Optional.of(Dial.GRIP_MARK), Optional.of(Dial.GRIP_MARK));
            assertThat(plan.steps().get(1).rise()).isCloseTo(0.08, within(1e-12));
            assertThat(plan.reachedGoal()).isTrue();
            assertThat(plan.goal()).contains(at(search, "A", 0, 2.5));
        }

        /*
         * D table             T = 3.0 s   T = 2.5 s
         *   grip 5 cm           0.50        0.52
         *   grip 2.5 cm         0.51        0.55
         *   grip 0 cm           0.53        0.60
         *   T G G: rises 4.00 %, 5.77 %, 9.09 %  → largest 9.09 %, total 0.50+0.52+0.55+0.60 = 2.17
         *   G T G: rises 2.00 %, 7.84 %, 9.09 %  → largest 9.09 %, total 0.50+0.51+0.55+0.60 = 2.16
         *   G G T: rises 2.00 %, 3.92 %, 13.2 %  → not allowed (> 10 %)
         * T G G and G T G tie on the largest rise (the same last step); the lower total picks G T G.
         */
        @Test
        void lowerTotalDemandBreaksATieOnTheLargestRise() {
            PlanSearch search = oneClubSixStates(new double[][] {{0.50, 0.52}, {0.51, 0.55}, {0.53, 0.60}});

            Plan plan = search.plan(RULES, PlanRequest.toHighestPermitted());

            assertThat(plan.states()).containsExactly(at(search, "A", 5, 3.0), at(search, "A", 2.5, 3.0),
                    at(search, "A", 2.5, 2.5), at(search, "A", 0, 2.5));
            assertThat(plan.steps().stream().mapToDouble(PlanStep::demandRatio).sum()).isCloseTo(2.16, within(1e-12));
        }

        /*
         * Same table as the first example. Pinning (2.5, 3.0): start → pin is one grip step; pin → goal is either
         * T then G (0.53→0.58→0.62: 9.43 %, 6.90 %) or G then T (0.53→0.57→0.62: 7.55 %, 8.77 %); the smaller largest
         * rise (8.77 %) takes G then T.
         */
        @Test
        void pinnedStepIsPassedThroughAndTheRestReplanned() {
            PlanSearch search = oneClubSixStates(table);
            PlanState pin = at(search, "A", 2.5, 3.0);

            Plan plan = search.plan(RULES, PlanRequest.toHighestPermitted().pinning(pin));

            assertThat(plan.states()).containsExactly(at(search, "A", 5, 3.0), pin, at(search, "A", 0, 3.0),
                    at(search, "A", 0, 2.5));
            assertThat(plan.steps()).extracting(PlanStep::pinned).containsExactly(false, true, false, false);
        }

        /*
         * Same table. Removing (5, 2.5) rules out T G G; of the rest, G G T (largest 8.77 %) beats G T G (9.43 %).
         */
        @Test
        void removedStepIsAvoided() {
            PlanSearch search = oneClubSixStates(table);

            Plan plan = search.plan(RULES, PlanRequest.toHighestPermitted().removing(at(search, "A", 5, 2.5)));

            assertThat(plan.states()).containsExactly(at(search, "A", 5, 3.0), at(search, "A", 2.5, 3.0),
                    at(search, "A", 0, 3.0), at(search, "A", 0, 2.5));
        }

        @Test
        void removingAPinnedStepUnpinsIt() {
            PlanSearch search = oneClubSixStates(table);
            PlanState state = at(search, "A", 5, 2.5);

            PlanRequest request = PlanRequest.toHighestPermitted().pinning(state).removing(state);

            assertThat(request.pinned()).isEmpty();
            assertThat(request.removed()).containsExactly(state);
        }
    }

    @Nested
    class StepLimit {

        /*
         * Clubs A 4 kg and B 5 kg, grip marks 0 and 2.5 cm, one cycle time (2.0 s).
         *   D: A@0 = 0.53, A@2.5 = 0.50, B@2.5 = 0.55, B@0 = 0.60.
         * From A@0 to B@0 directly: 0.60 / 0.53 = +13.2 % > 10 %, not allowed. The detour chokes up first:
         *   A@0 → A@2.5 (−5.66 %) → B@2.5 (+10.0 %, exactly the limit, allowed) → B@0 (+9.09 %): 3 steps.
         */
        @Test
        void planDetoursThroughAnEasierGripWhenTheDirectClubChangeRisesTooMuch() {
            PlanSpace space = new PlanSpace(List.of(new ClubOption("B", 5, 0.025), new ClubOption("A", 4, 0.025)),
                    CycleTimeLadder.of(2.0));
            PlanSearch search = new PlanSearch(space, new TableEvaluator()
                    .put("A", 0, 2.0, 0.53).put("A", 2.5, 2.0, 0.50).put("B", 2.5, 2.0, 0.55).put("B", 0, 2.0, 0.60));
            PlanState from = at(search, "A", 0, 2.0);

            Plan plan = search.plan(RULES, PlanRequest.toTarget(at(search, "B", 0, 2.0)).from(from));

            assertThat(plan.states()).containsExactly(from, at(search, "A", 2.5, 2.0), at(search, "B", 2.5, 2.0),
                    at(search, "B", 0, 2.0));
            assertThat(plan.steps()).extracting(PlanStep::changedDial).containsExactly(Optional.empty(),
                    Optional.of(Dial.GRIP_MARK), Optional.of(Dial.CLUB), Optional.of(Dial.GRIP_MARK));
            assertThat(plan.steps().get(2).rise()).isCloseTo(0.10, within(1e-12));
        }

        /*
         * Clubs 4 kg (D 0.40) and 8 kg (D 0.80), one grip mark, one cycle time: the only step doubles D (+100 %).
         */
        @Test
        void targetBeyondTheStepLimitIsExplainedAndThePlanEndsAtTheBestReachableState() {
            PlanSpace space = new PlanSpace(List.of(new ClubOption("light", 4, 0), new ClubOption("heavy", 8, 0)),
                    CycleTimeLadder.of(2.0));
            PlanSearch search = new PlanSearch(space,
                    new TableEvaluator().put("light", 0, 2.0, 0.40).put("heavy", 0, 2.0, 0.80));
            PlanState heavy = at(search, "heavy", 0, 2.0);

            Plan plan = search.plan(RULES, PlanRequest.toTarget(heavy));

            assertThat(plan.states()).containsExactly(at(search, "light", 0, 2.0));
            Shortfall shortfall = plan.shortfall().orElseThrow();
            assertThat(shortfall.waypoint()).isEqualTo(WaypointKind.TARGET);
            assertThat(shortfall.reason()).isEqualTo(ShortfallReason.UNREACHABLE);
            assertThat(shortfall.messageKey()).isEqualTo("engine.plan.shortfall.UNREACHABLE");
            Blocker blocker = shortfall.primaryBlocker().orElseThrow();
            assertThat(blocker.reason()).isEqualTo(BlockReason.STEP_LIMIT);
            assertThat(blocker.dial()).isEqualTo(Dial.CLUB);
            assertThat(blocker.position()).isEqualTo(heavy);
            assertThat(blocker.rise()).isCloseTo(1.0, within(1e-12));
            assertThat(shortfall.bindingConstraint()).as("the step limit is a rule, not a constraint").isEmpty();
        }

        @Test
        void withoutTargetTheUnreachableHighestStateIsExplainedToo() {
            PlanSpace space = new PlanSpace(List.of(new ClubOption("light", 4, 0), new ClubOption("heavy", 8, 0)),
                    CycleTimeLadder.of(2.0));
            PlanSearch search = new PlanSearch(space,
                    new TableEvaluator().put("light", 0, 2.0, 0.40).put("heavy", 0, 2.0, 0.80));

            Plan plan = search.plan(RULES, PlanRequest.toHighestPermitted());

            assertThat(plan.shortfall()).hasValueSatisfying(s -> {
                assertThat(s.waypoint()).isEqualTo(WaypointKind.HIGHEST_PERMITTED);
                assertThat(s.wanted()).isEqualTo(at(search, "heavy", 0, 2.0));
                assertThat(s.primaryBlocker().orElseThrow().reason()).isEqualTo(BlockReason.STEP_LIMIT);
            });
            assertThat(plan.ceiling()).extracting(Blocker::reason).containsExactly(BlockReason.STEP_LIMIT);
        }
    }

    @Nested
    class Envelope {

        /*
         * One club, grip marks 0, 2.5, 5 cm, one cycle time. D: 5 cm 0.80, 2.5 cm 0.88, 0 cm 1.30 — and 0 cm fails
         * C2 (hold torque) even at the next band. The clinician's target (0 cm) is outside the envelope: the plan
         * says so, names C2, and ends at the closest reachable state (2.5 cm) instead of clipping the target.
         */
        @Test
        void targetOutsideTheEnvelopeIsExplainedNotClipped() {
            PlanSpace space = new PlanSpace(List.of(new ClubOption("A", 6, 0.05)), CycleTimeLadder.of(2.0));
            PlanSearch search = new PlanSearch(space, new TableEvaluator().put("A", 5, 2.0, 0.80)
                    .put("A", 2.5, 2.0, 0.88).put("A", 0, 2.0, Evaluation.outsideEnvelope(1.30, "C2")));
            PlanState target = at(search, "A", 0, 2.0);

            Plan plan = search.plan(RULES, PlanRequest.toTarget(target));

            assertThat(plan.states()).containsExactly(at(search, "A", 5, 2.0), at(search, "A", 2.5, 2.0));
            assertThat(plan.goal()).contains(target);
            Shortfall shortfall = plan.shortfall().orElseThrow();
            assertThat(shortfall.reason()).isEqualTo(ShortfallReason.OUTSIDE_ENVELOPE);
            assertThat(shortfall.bindingConstraint()).contains("C2");
            assertThat(shortfall.wantedEvaluation().demandRatio()).isEqualTo(1.30);
            assertThat(shortfall.primaryBlocker().orElseThrow().position()).isEqualTo(target);
        }

        @Test
        void noPermittedStateGivesNoStepsAndSaysWhy() {
            PlanSpace space = new PlanSpace(List.of(new ClubOption("A", 12, 0)), CycleTimeLadder.of(2.0, 1.5));
            PlanSearch search = new PlanSearch(space, new TableEvaluator()
                    .put("A", 0, 2.0, Evaluation.outsideEnvelope(2.4, "C1"))
                    .put("A", 0, 1.5, Evaluation.outsideEnvelope(3.1, "C3")));

            Plan plan = search.plan(RULES, PlanRequest.toHighestPermitted());

            assertThat(plan.steps()).isEmpty();
            assertThat(plan.shortfall()).hasValueSatisfying(s -> {
                assertThat(s.waypoint()).isEqualTo(WaypointKind.START);
                assertThat(s.wanted()).as("the easiest state").isEqualTo(at(search, "A", 0, 2.0));
                assertThat(s.bindingConstraint()).contains("C1");
            });
        }
    }

    @Nested
    class ProvisionalSteps {

        /*
         * One club, one grip mark, cycle times 3.0, 2.8, 2.6, 2.4, 2.2 s with D 0.80, 0.88, 0.96, 1.05, 1.60.
         * Current band: D ≤ 1. Next band: D ≤ 1.5 (e.g. Band 2 → Band 3 with fractions 0.40 → 0.60).
         * Rises: +10.0 % (exactly the limit), +9.09 %, +9.38 %, +52.4 %.
         */
        private PlanSearch search() {
            PlanSpace space = new PlanSpace(List.of(new ClubOption("A", 8, 0)),
                    CycleTimeLadder.evenlySpaced(3.0, 2.2, 0.2));
            return new PlanSearch(space, new TableEvaluator().put("A", 0, 3.0, 0.80, 1.5).put("A", 0, 2.8, 0.88, 1.5)
                    .put("A", 0, 2.6, 0.96, 1.5).put("A", 0, 2.4, 1.05, 1.5).put("A", 0, 2.2, 1.60, 1.5));
        }

        @Test
        void withinTheBandThePlanStopsAtTheBandAndTheCeilingNeedsARescreen() {
            PlanSearch search = search();

            Plan plan = search.plan(RULES, PlanRequest.toHighestPermitted());

            assertThat(plan.steps()).extracting(PlanStep::cycleTimeS).containsExactly(3.0, 2.8, 2.6);
            assertThat(plan.steps()).noneMatch(PlanStep::provisional);
            assertThat(plan.gateStep()).isEmpty();
            assertThat(plan.ceiling()).singleElement().satisfies(b -> {
                assertThat(b.reason()).isEqualTo(BlockReason.NEEDS_RESCREEN);
                assertThat(b.bindingConstraint()).contains("C1");
            });
        }

        @Test
        void provisionalContinuationGoesBeyondTheBandBehindAReScreenGate() {
            PlanSearch search = search();

            Plan plan = search.plan(RULES, PlanRequest.toHighestPermitted().withProvisionalContinuation());

            assertThat(plan.steps()).extracting(PlanStep::cycleTimeS).containsExactly(3.0, 2.8, 2.6, 2.4);
            assertThat(plan.steps()).extracting(PlanStep::provisional).containsExactly(false, false, false, true);
            assertThat(plan.steps()).extracting(PlanStep::gate)
                    .containsExactly(StepGate.NONE, StepGate.NONE, StepGate.NONE, StepGate.RESCREEN_BEFORE);
            assertThat(plan.gateStep()).hasValue(4);
            assertThat(plan.steps().get(3).dosage()).isEqualTo(PROVISIONAL);
            assertThat(plan.steps().get(2).dosage()).isEqualTo(WITHIN_BAND);
            assertThat(plan.steps().get(3).demandRatio()).as("D stays relative to the current band").isEqualTo(1.05);
            assertThat(plan.goal()).contains(at(search, "A", 0, 2.4));
            assertThat(plan.reachedGoal()).isTrue();
            assertThat(plan.ceiling()).singleElement()
                    .satisfies(b -> assertThat(b.reason()).isEqualTo(BlockReason.OUTSIDE_ENVELOPE));
        }

        @Test
        void targetInTheNextBandWithoutProvisionalStepsAsksForARescreen() {
            PlanSearch search = search();

            Plan plan = search.plan(RULES, PlanRequest.toTarget(at(search, "A", 0, 2.4)));

            assertThat(plan.steps()).extracting(PlanStep::cycleTimeS).containsExactly(3.0, 2.8, 2.6);
            assertThat(plan.shortfall()).hasValueSatisfying(s -> {
                assertThat(s.reason()).isEqualTo(ShortfallReason.NEEDS_RESCREEN);
                assertThat(s.primaryBlocker().orElseThrow().reason()).isEqualTo(BlockReason.NEEDS_RESCREEN);
            });
        }
    }

    @Nested
    class StepContents {

        @Test
        void eachStepCarriesDosePainRuleTempoAndGripInClinicalUnits() {
            PlanSearch search = oneClubSixStates(new double[][] {{0.50, 0.54}, {0.53, 0.58}, {0.57, 0.62}});

            Plan plan = search.plan(RULES, PlanRequest.toHighestPermitted());

            PlanStep first = plan.steps().get(0);
            PlanStep second = plan.steps().get(1);
            assertThat(first.gripMarkCm()).isCloseTo(5.0, within(1e-12));
            assertThat(first.swingsPerMinute()).isCloseTo(20.0, within(1e-12));       // 60 / 3.0 s
            assertThat(second.swingsPerMinute()).isCloseTo(24.0, within(1e-12));      // 60 / 2.5 s
            assertThat(first.dosage()).isEqualTo(WITHIN_BAND);
            assertThat(first.painRule().painDuringLimit()).isEqualTo(5);               // Silbernagel et al. 2007
            assertThat(first.painRuleKey()).isEqualTo("engine.plan.painRule.first");
            assertThat(first.regressToStep()).isEmpty();
            assertThat(second.painRuleKey()).isEqualTo("engine.plan.painRule");
            assertThat(second.regressToStep()).hasValue(1);
            assertThat(first.bindingConstraint()).isEqualTo("C1");
            assertThat(first.club().id()).isEqualTo("A");
        }
    }

    /*
     * Hand-worked with the test lever model (LeverTestModel; NOT the product's mechanics): one 4 kg club, balance
     * point 0.50 m, shoulder-to-grip reach R = 0.63 m, half-arc 60°, torque allowance 68 N·m (pull never binds).
     *   g·sin 60° = 9.80665 × 0.866025 = 8.49281;  A = π/3 = 1.047198;  ω² = (2π/T)² = 4.38649, 5.03551, 5.84000
     *   for T = 3.0, 2.8, 2.6 s.  Moment arm r = R + x_cm − x_g = 1.080 m at 5 cm, 1.105 m at 2.5 cm, 1.130 m at 0 cm.
     *   τ = m·r·(g·sin A + r·A·ω²):
     *     5 cm:   4·1.080·(8.49281 + 1.080·1.047198·ω²) = 58.1205, 61.2915, 65.2220 N·m → D 0.85471, 0.90135, 0.95915
     *     2.5 cm: 4·1.105·(8.49281 + 1.105·1.047198·ω²) = 59.9734, 63.2929, 67.4076 N·m → D 0.88196, 0.93078, 0.99129
     *     0 cm:   → τ at 2.6 s = 69.6237 N·m, D 1.02388 > 1 (beyond the band)
     * Start (5, 3.0); goal = highest permitted = (2.5, 2.6), D 0.99129; three steps, one grip (G), two tempo (T):
     *   G T T: rises 3.19 %, 5.53 %, 6.50 %      T G T: 5.46 %, 3.27 %, 6.50 %      T T G: 5.46 %, 6.41 %, 3.35 %
     * T T G has the smallest largest rise: a faster tempo costs less on the shorter arm (the r·A·ω² term scales
     * with r), so the plan speeds up first and lengthens the arm last.
     */
    @Test
    void oneClubLeverModelSpeedsUpBeforeLengtheningTheArm() {
        ClubOption club = new ClubOption("A", 4, 0.05);
        PlanSpace space = new PlanSpace(List.of(club), CycleTimeLadder.of(3.0, 2.8, 2.6));
        LeverTestModel model = new LeverTestModel(0.63, Map.of("A", 0.50), Math.PI / 3, 68, 1e9, 1.5, Set.of());
        PlanSearch search = new PlanSearch(space, model);

        assertThat(search.evaluation(at(search, "A", 5, 3.0)).demandRatio()).isCloseTo(0.85471, within(1e-5));
        assertThat(search.evaluation(at(search, "A", 2.5, 2.6)).demandRatio()).isCloseTo(0.99129, within(1e-5));
        assertThat(search.evaluation(at(search, "A", 0, 2.6)).permitted()).isFalse();

        Plan plan = search.plan(RULES, PlanRequest.toHighestPermitted());

        assertThat(plan.states()).containsExactly(at(search, "A", 5, 3.0), at(search, "A", 5, 2.8),
                at(search, "A", 5, 2.6), at(search, "A", 2.5, 2.6));
        assertThat(plan.steps().get(2).rise()).as("2.8 → 2.6 s at 5 cm").isCloseTo(0.0641, within(1e-4));
        assertThat(plan.steps()).noneMatch(s -> s.changedDial().equals(Optional.of(Dial.CLUB)));
        assertThat(plan.ceiling()).singleElement().satisfies(b -> {
            assertThat(b.reason()).isEqualTo(BlockReason.NEEDS_RESCREEN);
            assertThat(b.position()).isEqualTo(at(search, "A", 0, 2.6));
        });
    }
}
