package org.swingclearance.engine.plan;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;

/**
 * Reference for the properties: the plan rules of engine.md §7 by brute force, sharing no code with the search.
 * Adjacency comes from comparing every pair of states, the step count from a plain breadth-first search, and the
 * tie-breaks (smallest largest rise, then lowest total D) from enumerating every path of the shortest length.
 * Small spaces only.
 */
final class ExhaustivePlanner {

    /** A state before (phase 0) or behind (phase 1) the re-screen gate. */
    record Node(PlanState state, int phase) {
    }

    /** Cost of a leg: its steps, the largest relative rise of D in a step, the sum of D over all its states. */
    record LegCost(int steps, double largestRise, double totalDemand) {
    }

    private final List<PlanState> states;
    private final Map<PlanState, Evaluation> evaluations = new HashMap<>();
    private final Map<PlanState, List<PlanState>> adjacent = new HashMap<>();
    private final double stepLimit;
    private final Set<PlanState> removed;

    ExhaustivePlanner(PlanSpace space, StateEvaluator evaluator, double stepLimit, Set<PlanState> removed) {
        this.states = space.states();
        this.stepLimit = stepLimit;
        this.removed = removed;
        for (PlanState s : states) {
            evaluations.put(s, evaluator.evaluate(space.club(s.club()), space.gripMarkM(s.gripMark()),
                    space.cycleTimeS(s.cycleRung())));
            List<PlanState> next = new ArrayList<>();
            for (PlanState other : states) {
                if (s.dialDistance(other) == 1) {
                    next.add(other);
                }
            }
            adjacent.put(s, next);
        }
    }

    List<PlanState> states() {
        return states;
    }

    Evaluation evaluation(PlanState state) {
        return evaluations.get(state);
    }

    double d(PlanState state) {
        return evaluations.get(state).demandRatio();
    }

    boolean usable(PlanState state) {
        return !removed.contains(state);
    }

    boolean holds(Node node) {
        Evaluation e = evaluations.get(node.state());
        return usable(node.state()) && (node.phase() == 0 ? e.permitted() : e.permittedAtNextBand());
    }

    static double rise(double from, double to) {
        if (from == 0) {
            return to == 0 ? 0 : Double.POSITIVE_INFINITY;
        }
        return to / from - 1;
    }

    /** engine.md §7: one dial, one step; D may rise by at most the step limit (a rise of exactly the limit counts). */
    List<Node> successors(Node node, boolean mayCrossGate) {
        List<Node> next = new ArrayList<>();
        for (PlanState s : adjacent.get(node.state())) {
            if (!usable(s) || d(s) > d(node.state()) * (1 + stepLimit) * (1 + 1e-9)) {
                continue;
            }
            Evaluation e = evaluations.get(s);
            if (node.phase() == 0 && e.permitted()) {
                next.add(new Node(s, 0));
            } else if (e.permittedAtNextBand() && (node.phase() == 1 || mayCrossGate)) {
                next.add(new Node(s, 1));
            }
        }
        return next;
    }

    Map<Node, Integer> distances(Node from, boolean mayCrossGate) {
        Map<Node, Integer> distance = new LinkedHashMap<>();
        distance.put(from, 0);
        ArrayDeque<Node> queue = new ArrayDeque<>(List.of(from));
        while (!queue.isEmpty()) {
            Node node = queue.poll();
            for (Node next : successors(node, mayCrossGate)) {
                if (!distance.containsKey(next)) {
                    distance.put(next, distance.get(node) + 1);
                    queue.add(next);
                }
            }
        }
        return distance;
    }

    /** The best leg to {@code to} (either phase), or empty when it cannot be reached. */
    Optional<LegCost> best(Node from, PlanState to, boolean mayCrossGate) {
        Map<Node, Integer> distance = distances(from, mayCrossGate);
        int length = Integer.MAX_VALUE;
        for (int phase = 0; phase <= 1; phase++) {
            Integer dist = distance.get(new Node(to, phase));
            if (dist != null) {
                length = Math.min(length, dist);
            }
        }
        if (length == Integer.MAX_VALUE) {
            return Optional.empty();
        }
        LegCost[] best = {null};
        Set<Node> visited = new HashSet<>(List.of(from));
        enumerate(from, to, length, 0, Double.NEGATIVE_INFINITY, d(from.state()), visited, mayCrossGate, best);
        return Optional.of(best[0]);
    }

    private void enumerate(Node node, PlanState to, int length, int depth, double largestRise, double total,
                           Set<Node> visited, boolean mayCrossGate, LegCost[] best) {
        if (depth == length) {
            if (node.state().equals(to)) {
                LegCost cost = new LegCost(length, largestRise, total);
                if (best[0] == null || isBetter(cost, best[0])) {
                    best[0] = cost;
                }
            }
            return;
        }
        for (Node next : successors(node, mayCrossGate)) {
            if (visited.contains(next) || depth + 1 + next.state().dialDistance(to) > length) {
                continue;
            }
            visited.add(next);
            enumerate(next, to, length, depth + 1,
                    Math.max(largestRise, rise(d(node.state()), d(next.state()))), total + d(next.state()),
                    visited, mayCrossGate, best);
            visited.remove(next);
        }
    }

    private static boolean isBetter(LegCost a, LegCost b) {
        if (a.largestRise() != b.largestRise()) {
            return a.largestRise() < b.largestRise();
        }
        return a.totalDemand() < b.totalDemand();
    }

    /** Cost of a stretch of plan steps, computed the same way. */
    LegCost cost(List<PlanStep> steps) {
        double largest = Double.NEGATIVE_INFINITY;
        double total = d(steps.get(0).state());
        for (int i = 1; i < steps.size(); i++) {
            largest = Math.max(largest, rise(d(steps.get(i - 1).state()), d(steps.get(i).state())));
            total += d(steps.get(i).state());
        }
        return new LegCost(steps.size() - 1, largest, total);
    }

    /** The first state (in space order) with the lowest or highest D among the usable ones that fit the phase. */
    Optional<PlanState> extreme(boolean highest, int phase) {
        PlanState best = null;
        for (PlanState s : states) {
            if (holds(new Node(s, phase)) && (best == null || (highest ? d(s) > d(best) : d(s) < d(best)))) {
                best = s;
            }
        }
        return Optional.ofNullable(best);
    }
}
