package org.swingclearance.engine.plan;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Optional;

/**
 * The graded-plan search (engine.md §7). Built once per plan space and evaluator (every state is evaluated exactly
 * once); {@link #plan} may then be called for any number of requests, e.g. while the clinician pins and removes
 * steps. Immutable after construction, so {@link #plan} may run concurrently.
 *
 * <p>A plan is a chain of legs: start → each pinned state in order → goal. Without a target the goal is the
 * permitted state with the highest D in the current band; with a provisional continuation the plan then goes on to
 * the state with the highest D permitted at the next band, and its steps beyond the current band are marked
 * provisional behind a re-screen gate. With a target, the plan heads straight for it (through the gate when the
 * target lies in the next band and provisional steps were asked for). Each leg is the best path by
 * {@link LegFinder}. When a waypoint cannot be reached, the plan ends at the best reachable state — the one with the
 * highest D for the "highest" goals, else the one closest to the waypoint in dial steps — and says why; the one
 * exception is the highest permitted state on the way to a provisional continuation, which is only a way station:
 * the continuation then sets out from the highest state the current band reaches.
 */
public final class PlanSearch {

    private final PlanSpace space;
    private final EvaluatedSpace states;

    public PlanSearch(PlanSpace space, StateEvaluator evaluator) {
        this.space = space;
        this.states = new EvaluatedSpace(space, evaluator);
    }

    public PlanSpace space() {
        return space;
    }

    public Evaluation evaluation(PlanState state) {
        requireInSpace(state);
        return states.evaluation(space.slotOf(state));
    }

    public Plan plan(PlanRules rules, PlanRequest request) {
        request.start().ifPresent(this::requireInSpace);
        request.target().ifPresent(this::requireInSpace);
        request.pinned().forEach(this::requireInSpace);
        request.removed().forEach(this::requireInSpace);
        StepGraph graph = new StepGraph(states, rules.stepLimit(), request.removed());

        Optional<Shortfall> cannotStart = startProblem(graph, request);
        if (cannotStart.isPresent()) {
            return new Plan(List.of(), Optional.empty(), cannotStart, List.of());
        }
        int startSlot = request.start().map(space::slotOf).orElseGet(() -> extremeSlot(graph, false, false));

        List<Waypoint> waypoints = waypoints(graph, request);
        List<Integer> path = new ArrayList<>(List.of(StepGraph.node(startSlot, 0)));
        List<Integer> pinnedIndices = new ArrayList<>();
        Shortfall shortfall = null;
        int goalSlot = waypoints.get(waypoints.size() - 1).slot();
        boolean mayCrossGate = request.provisionalContinuation();
        for (Waypoint waypoint : waypoints) {
            int current = path.get(path.size() - 1);
            if (waypoint.kind() == WaypointKind.HIGHEST_PERMITTED && StepGraph.phase(current) == 1) {
                continue; // a pinned state already led behind the gate; the in-band goal lies behind us
            }
            mayCrossGate = waypoint.mayCrossGate();
            LegFinder leg = new LegFinder(graph, current, mayCrossGate);
            int wanted = StepGraph.node(waypoint.slot(), 0);
            if (leg.reached(wanted) || leg.reached(wanted + 1)) {
                append(path, leg.bestPathTo(wanted, wanted + 1));
                if (waypoint.kind() == WaypointKind.PIN) {
                    pinnedIndices.add(path.size() - 1);
                }
                continue;
            }
            boolean towardHighest = waypoint.kind() == WaypointKind.HIGHEST_PERMITTED
                    || waypoint.kind() == WaypointKind.HIGHEST_NEXT_BAND;
            int fallback = towardHighest ? highestReached(leg, graph) : closestReached(leg, graph, waypoint.slot());
            append(path, leg.bestPathTo(fallback));
            if (towardHighest && graph.demandRatio(StepGraph.slot(fallback)) >= graph.demandRatio(waypoint.slot())) {
                if (waypoint.slot() == goalSlot) {
                    goalSlot = StepGraph.slot(fallback);
                }
                continue; // another state with the same highest D was reached: the goal is met
            }
            if (waypoint.kind() == WaypointKind.HIGHEST_PERMITTED && request.provisionalContinuation()) {
                continue; // only a way station: the continuation sets out from the highest state the band reaches
            }
            shortfall = shortfall(graph, waypoint, leg);
            break;
        }
        int last = path.get(path.size() - 1);
        List<Blocker> ceiling = ceiling(graph, last, mayCrossGate);
        return new Plan(steps(graph, rules, path, pinnedIndices), Optional.of(space.stateOfSlot(goalSlot)),
                Optional.ofNullable(shortfall), ceiling);
    }

    /** One leg's destination: which kind, which state, and whether the leg may pass the re-screen gate. */
    private record Waypoint(WaypointKind kind, int slot, boolean mayCrossGate) {
    }

    private Optional<Shortfall> startProblem(StepGraph graph, PlanRequest request) {
        if (request.start().isPresent()) {
            PlanState start = request.start().get();
            int slot = space.slotOf(start);
            ShortfallReason reason = graph.isRemoved(slot) ? ShortfallReason.REMOVED
                    : states.permitted[slot] ? null
                    : states.permittedAtNextBand[slot] ? ShortfallReason.NEEDS_RESCREEN
                    : ShortfallReason.OUTSIDE_ENVELOPE;
            return Optional.ofNullable(reason)
                    .map(r -> new Shortfall(WaypointKind.START, start, r, states.evaluation(slot), List.of()));
        }
        if (extremeSlot(graph, false, false) >= 0) {
            return Optional.empty();
        }
        int easiest = lowestDemandUsableSlot(graph);
        if (easiest < 0) { // the clinician removed every state
            PlanState first = space.states().get(0);
            return Optional.of(new Shortfall(WaypointKind.START, first, ShortfallReason.REMOVED,
                    states.evaluation(space.slotOf(first)), List.of()));
        }
        return Optional.of(new Shortfall(WaypointKind.START, space.stateOfSlot(easiest),
                ShortfallReason.OUTSIDE_ENVELOPE, states.evaluation(easiest), List.of()));
    }

    private List<Waypoint> waypoints(StepGraph graph, PlanRequest request) {
        boolean provisional = request.provisionalContinuation();
        List<Waypoint> waypoints = new ArrayList<>();
        for (PlanState pin : request.pinned()) {
            waypoints.add(new Waypoint(WaypointKind.PIN, space.slotOf(pin), provisional));
        }
        if (request.target().isPresent()) {
            waypoints.add(new Waypoint(WaypointKind.TARGET, space.slotOf(request.target().get()), provisional));
            return waypoints;
        }
        waypoints.add(new Waypoint(WaypointKind.HIGHEST_PERMITTED, extremeSlot(graph, true, false), false));
        if (provisional) {
            waypoints.add(new Waypoint(WaypointKind.HIGHEST_NEXT_BAND, extremeSlot(graph, true, true), true));
        }
        return waypoints;
    }

    /**
     * The usable state with the lowest ({@code highest} false) or highest D among those permitted in the current
     * band (or at the next band); the first in slot order on ties; −1 when there is none.
     */
    private int extremeSlot(StepGraph graph, boolean highest, boolean nextBand) {
        int best = -1;
        for (int slot = 0; slot < space.slotCount(); slot++) {
            int node = StepGraph.node(slot, nextBand ? 1 : 0);
            if (!graph.holds(node)) {
                continue;
            }
            double d = graph.demandRatio(slot);
            if (best < 0 || (highest ? d > graph.demandRatio(best) : d < graph.demandRatio(best))) {
                best = slot;
            }
        }
        return best;
    }

    private int lowestDemandUsableSlot(StepGraph graph) {
        int best = -1;
        for (int slot = 0; slot < space.slotCount(); slot++) {
            if (space.isState(slot) && !graph.isRemoved(slot)
                    && (best < 0 || graph.demandRatio(slot) < graph.demandRatio(best))) {
                best = slot;
            }
        }
        return best;
    }

    /** Reached node with the highest D; ties to fewer steps, then the lower node number. */
    private static int highestReached(LegFinder leg, StepGraph graph) {
        int best = leg.reachedNode(0);
        for (int i = 1; i < leg.reachedCount(); i++) {
            int node = leg.reachedNode(i);
            double d = graph.demandRatio(StepGraph.slot(node));
            double bestD = graph.demandRatio(StepGraph.slot(best));
            if (d > bestD || d == bestD && leg.distance(node) == leg.distance(best) && node < best) {
                best = node;
            }
        }
        return best;
    }

    /**
     * Reached node closest to the wanted state: fewest dial steps away, then D nearest the wanted D, then fewer plan
     * steps, then the lower node number.
     */
    private int closestReached(LegFinder leg, StepGraph graph, int wantedSlot) {
        PlanState wanted = space.stateOfSlot(wantedSlot);
        double wantedD = graph.demandRatio(wantedSlot);
        Comparator<Integer> closeness = Comparator
                .<Integer>comparingInt(node -> space.stateOfSlot(StepGraph.slot(node)).dialDistance(wanted))
                .thenComparingDouble(node -> demandGap(graph.demandRatio(StepGraph.slot(node)), wantedD))
                .thenComparingInt(leg::distance)
                .thenComparingInt(node -> node);
        int best = leg.reachedNode(0);
        for (int i = 1; i < leg.reachedCount(); i++) {
            int node = leg.reachedNode(i);
            if (closeness.compare(node, best) < 0) {
                best = node;
            }
        }
        return best;
    }

    /** Distance in D; toward an infinite wanted D (nothing permitted), higher D counts as closer. */
    private static double demandGap(double d, double wantedD) {
        return Double.isInfinite(wantedD) ? -d : Math.abs(d - wantedD);
    }

    private Shortfall shortfall(StepGraph graph, Waypoint waypoint, LegFinder leg) {
        int slot = waypoint.slot();
        ShortfallReason reason;
        if (graph.isRemoved(slot)) {
            reason = ShortfallReason.REMOVED;
        } else if (!states.permittedAtNextBand[slot]) {
            reason = ShortfallReason.OUTSIDE_ENVELOPE;
        } else if (!states.permitted[slot] && !waypoint.mayCrossGate()) {
            reason = ShortfallReason.NEEDS_RESCREEN;
        } else {
            reason = ShortfallReason.UNREACHABLE;
        }
        PlanState wanted = space.stateOfSlot(slot);
        return new Shortfall(waypoint.kind(), wanted, reason, states.evaluation(slot),
                frontier(graph, leg, wanted, waypoint.mayCrossGate()));
    }

    /**
     * The blocked steps toward {@code wanted}: from a reached state to an unreached adjacent position nearer the
     * wanted state than every reached state. Non-empty whenever the wanted state is unreached, because the first step
     * of a dial-by-dial route from the nearest reached state is one of them.
     */
    private List<Blocker> frontier(StepGraph graph, LegFinder leg, PlanState wanted, boolean mayCrossGate) {
        int nearest = Integer.MAX_VALUE;
        for (int i = 0; i < leg.reachedCount(); i++) {
            nearest = Math.min(nearest, space.stateOfSlot(StepGraph.slot(leg.reachedNode(i))).dialDistance(wanted));
        }
        boolean[] seen = new boolean[space.slotCount()];
        List<Blocker> blockers = new ArrayList<>();
        for (int i = 0; i < leg.reachedCount(); i++) {
            int node = leg.reachedNode(i);
            if (seen[StepGraph.slot(node)]) {
                continue; // the same state behind the gate adds nothing new
            }
            seen[StepGraph.slot(node)] = true;
            for (PlanState position : space.adjacentPositions(space.stateOfSlot(StepGraph.slot(node)))) {
                boolean reached = space.contains(position) && (leg.reached(StepGraph.node(space.slotOf(position), 0))
                        || leg.reached(StepGraph.node(space.slotOf(position), 1)));
                if (!reached && position.dialDistance(wanted) < nearest) {
                    blocker(graph, node, position, mayCrossGate).ifPresent(blockers::add);
                }
            }
        }
        blockers.sort(Comparator.<Blocker>comparingInt(b -> b.position().dialDistance(wanted))
                .thenComparing(Blocker::reason)); // stable: reached order, then dial order, within ties
        return blockers;
    }

    /** The ceiling: the neighbours of the last node with a higher D that cannot be stepped to, with why. */
    private List<Blocker> ceiling(StepGraph graph, int lastNode, boolean mayCrossGate) {
        PlanState at = space.stateOfSlot(StepGraph.slot(lastNode));
        double d = graph.demandRatio(StepGraph.slot(lastNode));
        List<Blocker> blockers = new ArrayList<>();
        for (PlanState position : space.adjacentPositions(at)) {
            if (space.contains(position) && graph.demandRatio(space.slotOf(position)) > d) {
                blocker(graph, lastNode, position, mayCrossGate).ifPresent(blockers::add);
            }
        }
        blockers.sort(Comparator.comparing(Blocker::reason)); // stable: dial order within a reason
        return blockers;
    }

    private Optional<Blocker> blocker(StepGraph graph, int fromNode, PlanState position, boolean mayCrossGate) {
        PlanState from = space.stateOfSlot(StepGraph.slot(fromNode));
        Dial dial = PlanSpace.changedDial(from, position);
        if (!space.contains(position)) {
            return Optional.of(new Blocker(from, dial, position, BlockReason.NO_SUCH_GRIP_MARK, Optional.empty(),
                    Double.NaN));
        }
        int slot = space.slotOf(position);
        double rise = graph.rise(StepGraph.slot(fromNode), slot);
        BlockReason reason;
        if (graph.isRemoved(slot)) {
            reason = BlockReason.REMOVED;
        } else if (!states.permittedAtNextBand[slot]) {
            reason = BlockReason.OUTSIDE_ENVELOPE;
        } else if (!states.permitted[slot] && StepGraph.phase(fromNode) == 0 && !mayCrossGate) {
            reason = BlockReason.NEEDS_RESCREEN;
        } else if (!graph.withinStepLimit(StepGraph.slot(fromNode), slot)) {
            reason = BlockReason.STEP_LIMIT;
        } else {
            return Optional.empty();
        }
        return Optional.of(new Blocker(from, dial, position, reason, Optional.of(states.evaluation(slot)), rise));
    }

    private List<PlanStep> steps(StepGraph graph, PlanRules rules, List<Integer> path, List<Integer> pinnedIndices) {
        List<PlanStep> steps = new ArrayList<>(path.size());
        for (int i = 0; i < path.size(); i++) {
            int node = path.get(i);
            int slot = StepGraph.slot(node);
            PlanState state = space.stateOfSlot(slot);
            Evaluation evaluation = states.evaluation(slot);
            boolean provisional = StepGraph.phase(node) == 1;
            boolean firstBeyondBand = provisional && StepGraph.phase(path.get(i - 1)) == 0;
            Optional<Dial> changed = i == 0 ? Optional.empty()
                    : Optional.of(PlanSpace.changedDial(space.stateOfSlot(StepGraph.slot(path.get(i - 1))), state));
            double rise = i == 0 ? 0 : graph.rise(StepGraph.slot(path.get(i - 1)), slot);
            steps.add(new PlanStep(i + 1, state, space.club(state.club()), space.gripMarkM(state.gripMark()),
                    space.cycleTimeS(state.cycleRung()), changed, evaluation.demandRatio(), rise,
                    evaluation.bindingConstraint(), provisional,
                    firstBeyondBand ? StepGate.RESCREEN_BEFORE : StepGate.NONE, pinnedIndices.contains(i),
                    provisional ? rules.provisional() : rules.withinBand(), rules.painRule()));
        }
        return steps;
    }

    /** Appends a leg whose first node is the current last node of the path. */
    private static void append(List<Integer> path, int[] leg) {
        for (int i = 1; i < leg.length; i++) {
            path.add(leg[i]);
        }
    }

    private void requireInSpace(PlanState state) {
        if (!space.contains(state)) {
            throw new IllegalArgumentException("State " + state + " is not in the plan space.");
        }
    }
}
