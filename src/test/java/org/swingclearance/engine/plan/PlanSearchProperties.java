package org.swingclearance.engine.plan;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.Optional;

import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.statistics.Statistics;

import org.swingclearance.engine.plan.ExhaustivePlanner.LegCost;
import org.swingclearance.engine.plan.ExhaustivePlanner.Node;

/**
 * Properties of the graded-plan search (issue 5, engine.md §7) over random, physically shaped problems
 * ({@link PlanScenario}, {@link LeverTestModel}): each step changes one dial by one step, stays in the band unless
 * provisional, never rises by more than the step limit; and every leg is the best one an exhaustive search finds.
 */
class PlanSearchProperties {

    private static final double RISE_SLACK = 1e-9;

    @Property(tries = 300)
    void everyStepChangesExactlyOneDialByOneStep(@ForAll("smallScenarios") PlanScenario scenario) {
        Plan plan = plan(scenario);
        List<PlanStep> steps = plan.steps();
        for (int i = 1; i < steps.size(); i++) {
            PlanState from = steps.get(i - 1).state();
            PlanState to = steps.get(i).state();
            assertThat(from.dialDistance(to)).as("step %d", i + 1).isEqualTo(1);
            assertThat(steps.get(i).changedDial()).contains(PlanSpace.changedDial(from, to));
        }
        assertThat(steps).allSatisfy(s -> assertThat(scenario.space().contains(s.state())).isTrue());
    }

    @Property(tries = 300)
    void stepsBeforeTheGateStayWithinTheBandAndProvisionalStepsWithinTheNextBand(
            @ForAll("smallScenarios") PlanScenario scenario) {
        LeverTestModel evaluator = scenario.evaluator();
        Plan plan = plan(scenario);
        PlanSpace space = scenario.space();
        boolean behindGate = false;
        for (PlanStep step : plan.steps()) {
            Evaluation e = evaluator.evaluate(step.club(), step.gripMarkM(), step.cycleTimeS());
            assertThat(step.gate() == StepGate.RESCREEN_BEFORE).isEqualTo(step.provisional() && !behindGate);
            behindGate |= step.provisional();
            assertThat(step.provisional()).isEqualTo(behindGate);
            if (step.provisional()) {
                assertThat(e.permittedAtNextBand()).isTrue();
                assertThat(step.dosage()).isEqualTo(scenario.rules().provisional());
            } else {
                assertThat(e.permitted()).isTrue();
                assertThat(step.demandRatio()).isLessThanOrEqualTo(1.0);
                assertThat(step.dosage()).isEqualTo(scenario.rules().withinBand());
            }
            assertThat(space.contains(step.state())).isTrue();
        }
        if (!scenario.request().provisionalContinuation()) {
            assertThat(plan.steps()).noneMatch(PlanStep::provisional);
        }
    }

    @Property(tries = 300)
    void noStepRaisesDemandByMoreThanTheStepLimit(@ForAll("smallScenarios") PlanScenario scenario) {
        Plan plan = plan(scenario);
        List<PlanStep> steps = plan.steps();
        for (int i = 1; i < steps.size(); i++) {
            double before = steps.get(i - 1).demandRatio();
            double after = steps.get(i).demandRatio();
            assertThat(after).as("step %d", i + 1).isLessThanOrEqualTo(before * (1 + scenario.stepLimit()) * (1 + RISE_SLACK));
            assertThat(steps.get(i).rise()).isCloseTo(after / before - 1, within(1e-12));
        }
    }

    @Property(tries = 300)
    void pinnedStatesAreVisitedAndRemovedStatesAvoided(@ForAll("smallScenarios") PlanScenario scenario) {
        PlanRequest request = scenario.request();
        Plan plan = plan(scenario);
        assertThat(plan.states()).allSatisfy(s -> assertThat(request.removed()).doesNotContain(s));
        if (plan.reachedGoal() && !plan.steps().isEmpty()) {
            assertThat(plan.states()).containsAll(request.pinned());
            assertThat(plan.steps().stream().filter(PlanStep::pinned).map(PlanStep::state).toList())
                    .isEqualTo(request.pinned());
        }
    }

    /** The search agrees with the exhaustive reference on start, goals, every leg's cost, and every shortfall. */
    @Property(tries = 1000)
    void everyLegIsTheBestPathAnExhaustiveSearchFinds(@ForAll("smallScenarios") PlanScenario scenario) {
        PlanRequest request = scenario.request();
        LeverTestModel evaluator = scenario.evaluator();
        PlanSpace space = scenario.space();
        Plan plan = new PlanSearch(space, evaluator).plan(scenario.rules(), request);
        Statistics.label("outcome").collect(plan.shortfall().map(s -> s.waypoint() + " " + s.reason()).orElse("reached"));
        Statistics.label("steps").collect(plan.steps().size() <= 1 ? "0-1" : plan.steps().size() <= 4 ? "2-4" : "5+");
        Statistics.label("provisional").collect(plan.steps().stream().anyMatch(PlanStep::provisional));
        ExhaustivePlanner reference = new ExhaustivePlanner(space, evaluator, scenario.stepLimit(), request.removed());

        Optional<PlanState> start = request.start().isPresent() ? request.start() : reference.extreme(false, 0);
        if (start.isEmpty() || !reference.holds(new Node(start.get(), 0))) {
            assertThat(plan.steps()).isEmpty();
            assertThat(plan.shortfall()).hasValueSatisfying(s -> assertThat(s.waypoint()).isEqualTo(WaypointKind.START));
            return;
        }
        assertThat(plan.steps().get(0).state()).isEqualTo(start.get());

        Node current = new Node(start.get(), 0);
        int index = 0;
        for (Waypoint waypoint : waypoints(request, reference)) {
            if (waypoint.kind() == WaypointKind.HIGHEST_PERMITTED && current.phase() == 1) {
                continue;
            }
            PlanState wanted = waypoint.state();
            Optional<LegCost> best = reference.best(current, wanted, waypoint.mayCrossGate());
            if (best.isEmpty() && towardHighest(waypoint)) {
                PlanState highest = highestReachable(reference, current, waypoint.mayCrossGate());
                boolean sameHeight = reference.d(highest) >= reference.d(waypoint.state());
                boolean wayStation = waypoint.kind() == WaypointKind.HIGHEST_PERMITTED && request.provisionalContinuation();
                Statistics.label("highest state unreachable, plan goes on").collect(sameHeight || wayStation);
                if (sameHeight || wayStation) {
                    wanted = highest;
                    best = reference.best(current, wanted, waypoint.mayCrossGate());
                }
            }
            if (best.isEmpty()) {
                assertShortfallIsJustified(plan, reference, current, index, waypoint);
                return;
            }
            int end = index + best.get().steps();
            assertThat(plan.steps().size()).as("plan long enough for the leg to %s", waypoint).isGreaterThan(end);
            List<PlanStep> leg = plan.steps().subList(index, end + 1);
            assertThat(leg.get(leg.size() - 1).state()).isEqualTo(wanted);
            assertSameCost(reference.cost(leg), best.get());
            PlanStep last = leg.get(leg.size() - 1);
            current = new Node(last.state(), last.provisional() ? 1 : 0);
            index = end;
        }
        assertThat(plan.reachedGoal()).isTrue();
        assertThat(plan.steps()).hasSize(index + 1);
    }

    @Property(tries = 200)
    void oneClubInventoriesStillProgressByGripMarkAndCycleTime(@ForAll("oneClubScenarios") PlanScenario scenario) {
        Plan plan = plan(scenario);
        assertThat(plan.steps()).allSatisfy(step -> assertThat(step.changedDial()).isNotEqualTo(Optional.of(Dial.CLUB)));
        assertThat(plan.states()).allSatisfy(s -> assertThat(s.club()).isZero());
    }

    /** Larger spaces (up to 6 × 9 × 10 states): the step invariants hold where the exhaustive search would be slow. */
    @Property(tries = 100)
    void stepInvariantsHoldOnLargerSpaces(@ForAll("largeScenarios") PlanScenario scenario) {
        Plan plan = plan(scenario);
        List<PlanStep> steps = plan.steps();
        for (int i = 1; i < steps.size(); i++) {
            assertThat(steps.get(i - 1).state().dialDistance(steps.get(i).state())).isEqualTo(1);
            assertThat(steps.get(i).demandRatio())
                    .isLessThanOrEqualTo(steps.get(i - 1).demandRatio() * (1 + scenario.stepLimit()) * (1 + RISE_SLACK));
        }
        assertThat(steps).filteredOn(s -> !s.provisional()).allSatisfy(s -> assertThat(s.demandRatio()).isLessThanOrEqualTo(1));
    }

    private record Waypoint(WaypointKind kind, PlanState state, boolean mayCrossGate) {
    }

    /** engine.md §7 and the PlanSearch contract: pins in order, then the target or the highest states. */
    private static List<Waypoint> waypoints(PlanRequest request, ExhaustivePlanner reference) {
        boolean provisional = request.provisionalContinuation();
        List<Waypoint> waypoints = new ArrayList<>();
        request.pinned().forEach(pin -> waypoints.add(new Waypoint(WaypointKind.PIN, pin, provisional)));
        if (request.target().isPresent()) {
            waypoints.add(new Waypoint(WaypointKind.TARGET, request.target().get(), provisional));
            return waypoints;
        }
        waypoints.add(new Waypoint(WaypointKind.HIGHEST_PERMITTED, reference.extreme(true, 0).orElseThrow(), false));
        if (provisional) {
            waypoints.add(new Waypoint(WaypointKind.HIGHEST_NEXT_BAND, reference.extreme(true, 1).orElseThrow(), true));
        }
        return waypoints;
    }

    private static boolean towardHighest(Waypoint waypoint) {
        return waypoint.kind() == WaypointKind.HIGHEST_PERMITTED || waypoint.kind() == WaypointKind.HIGHEST_NEXT_BAND;
    }

    /**
     * Where a "highest" leg ends when its state cannot be reached: the reachable state with the highest D, nearest
     * first. (A tie between two such states at the same distance would be ambiguous; with continuous random demand
     * it does not occur.)
     */
    private static PlanState highestReachable(ExhaustivePlanner reference, Node from, boolean mayCrossGate) {
        Map<Node, Integer> reachable = reference.distances(from, mayCrossGate);
        return reachable.keySet().stream()
                .min(Comparator.<Node>comparingDouble(n -> -reference.d(n.state()))
                        .thenComparing(reachable::get))
                .orElseThrow().state();
    }

    private static void assertShortfallIsJustified(Plan plan, ExhaustivePlanner reference, Node from, int index,
                                                   Waypoint waypoint) {
        assertThat(plan.shortfall()).as("the reference cannot reach %s", waypoint).isPresent();
        Shortfall shortfall = plan.shortfall().get();
        assertThat(shortfall.waypoint()).isEqualTo(waypoint.kind());
        assertThat(shortfall.wanted()).isEqualTo(waypoint.state());
        List<PlanStep> rest = plan.steps().subList(index, plan.steps().size());
        PlanStep end = rest.get(rest.size() - 1);
        Optional<LegCost> toEnd = reference.best(from, end.state(), waypoint.mayCrossGate());
        assertThat(toEnd).isPresent();
        assertSameCost(reference.cost(rest), toEnd.get());
        Map<Node, Integer> reachable = reference.distances(from, waypoint.mayCrossGate());
        for (Node node : reachable.keySet()) {
            if (towardHighest(waypoint)) {
                assertThat(reference.d(node.state())).isLessThanOrEqualTo(end.demandRatio());
            } else {
                assertThat(node.state().dialDistance(waypoint.state()))
                        .isGreaterThanOrEqualTo(end.state().dialDistance(waypoint.state()));
            }
        }
        if (shortfall.reason() == ShortfallReason.UNREACHABLE) {
            assertThat(shortfall.blockers()).as("an unreachable goal names what blocks it").isNotEmpty();
        }
        int nearest = reachable.keySet().stream().mapToInt(n -> n.state().dialDistance(waypoint.state())).min()
                .orElseThrow();
        for (Blocker blocker : shortfall.blockers()) {
            assertThat(reachable.keySet()).anyMatch(n -> n.state().equals(blocker.from()));
            assertThat(reachable.keySet()).noneMatch(n -> n.state().equals(blocker.position()));
            assertThat(blocker.position().dialDistance(waypoint.state())).isLessThan(nearest);
            assertThat(blocker.from().dialDistance(blocker.position())).isEqualTo(1);
        }
    }

    private static void assertSameCost(LegCost actual, LegCost expected) {
        assertThat(actual.steps()).isEqualTo(expected.steps());
        if (Double.isInfinite(expected.largestRise())) {
            assertThat(actual.largestRise()).isEqualTo(expected.largestRise());
        } else {
            assertThat(actual.largestRise()).isCloseTo(expected.largestRise(), within(1e-12));
        }
        assertThat(actual.totalDemand()).isCloseTo(expected.totalDemand(), within(1e-9));
    }

    private static Plan plan(PlanScenario scenario) {
        return new PlanSearch(scenario.space(), scenario.evaluator()).plan(scenario.rules(), scenario.request());
    }

    @Provide
    Arbitrary<PlanScenario> smallScenarios() {
        return scenarios(1, 3, 3, 4);
    }

    @Provide
    Arbitrary<PlanScenario> oneClubScenarios() {
        return scenarios(1, 1, 3, 4);
    }

    @Provide
    Arbitrary<PlanScenario> largeScenarios() {
        return scenarios(2, 6, 8, 10);
    }

    /**
     * Inventories of 2–8 kg starting clubs, each next club 2–30 % heavier; evenly spaced ladders from 2–3 s in
     * 0.05–0.2 s rungs; so that the dials move D in steps comparable to the step limits drawn.
     */
    private static Arbitrary<PlanScenario> scenarios(int minClubs, int maxClubs, int maxExtraGripMarks, int maxRungs) {
        Arbitrary<double[]> club = Combinators.combine(
                Arbitraries.integers().between(2, 30).map(percent -> percent / 100.0),     // mass step to this club
                Arbitraries.integers().between(0, maxExtraGripMarks),                        // grip marks beyond 0
                Arbitraries.of(0.0, 0.010),                                                  // handle off the grid
                Arbitraries.integers().between(35, 65).map(cm -> cm / 100.0))                // balance point
                .as((massStep, marks, extra, balance) ->
                        new double[] {massStep, marks * PlanSpace.GRIP_STEP_M + extra, balance});
        Arbitrary<List<double[]>> inventory = club.list().ofMinSize(minClubs).ofMaxSize(maxClubs);
        Arbitrary<CycleTimeLadder> ladder = Combinators.combine(
                        Arbitraries.integers().between(20, 30).map(tenths -> tenths / 10.0),
                        Arbitraries.of(0.05, 0.1, 0.2),
                        Arbitraries.integers().between(1, maxRungs))
                .as((slowest, rung, count) -> CycleTimeLadder.evenlySpaced(slowest, slowest - (count - 1) * rung, rung));
        Arbitrary<Double> firstMassKg = Arbitraries.integers().between(20, 80).map(tenths -> tenths / 10.0);
        return Combinators.combine(inventory, ladder, firstMassKg,
                        Arbitraries.doubles().between(0.2, 1.0),
                        Arbitraries.doubles().between(0.5, 1.0),
                        Arbitraries.of(1.0, 1.3, 2.0),
                        Arbitraries.of(0.0, 0.1, 0.25),
                        Arbitraries.of(0.05, 0.10, 0.20, 0.40))
                .flatAs((clubs, rungs, firstMass, torqueQuantile, pullQuantile, nextBandScale, exclusionRate, stepLimit) ->
                        Arbitraries.longs().map(seed -> {
                            List<ClubOption> options = new ArrayList<>();
                            List<Double> balancePoints = new ArrayList<>();
                            double mass = firstMass;
                            for (int i = 0; i < clubs.size(); i++) {
                                mass = i == 0 ? mass : mass * (1 + clubs.get(i)[0]);
                                options.add(new ClubOption("club-" + i, Math.round(mass * 1000) / 1000.0, clubs.get(i)[1]));
                                balancePoints.add(clubs.get(i)[2]);
                            }
                            return new PlanScenario(options, balancePoints, rungs.rungsS(), torqueQuantile,
                                    pullQuantile, nextBandScale, exclusionRate, stepLimit, seed);
                        }));
    }
}
