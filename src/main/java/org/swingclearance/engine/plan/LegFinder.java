package org.swingclearance.engine.plan;

import java.util.Arrays;

/**
 * Finds the best path of one plan leg: fewest steps, then the smallest largest rise of D, then the lowest total D.
 *
 * <p>Why not one Dijkstra over the cost vector (steps, largest rise, total D): the largest rise is a maximum, and a
 * lexicographic order mixing a maximum with a sum is not preserved when paths are extended (two paths may tie on the
 * maximum after a large common step while their order on the sum flips), so a single label per node can discard the
 * optimum. Instead each criterion is settled exactly on its own:
 * <ol>
 * <li>breadth-first search from the source gives every node's step distance; the goal distance L is the minimum
 *     over the goal nodes;</li>
 * <li>a backward sweep keeps only edges u→v with dist(v) = dist(u) + 1 that lie on some path of length L to a goal —
 *     a layered acyclic graph whose source-to-goal paths are exactly the shortest paths;</li>
 * <li>over that graph, in BFS order, B(v) = min over edges of max(B(u), rise(u,v)) is the smallest largest rise
 *     (min–max is preserved under extension, so dynamic programming over the layers is exact); M = min B(goal);</li>
 * <li>keeping only the edges with rise ≤ M, S(v) = min S(u) + D(v) is the lowest total D, and every path found has
 *     largest rise exactly M.</li>
 * </ol>
 * Remaining ties go to the goal with the lower node number (for the same state: phase 0, before the gate), then to
 * the predecessor met first in BFS order, so the result is deterministic.
 */
final class LegFinder {

    private final StepGraph graph;
    private final boolean mayCrossGate;
    private final int source;
    private final int[] distance;
    private final int[] order;
    private final int reachedCount;
    private final int[] buffer = new int[StepGraph.MAX_PREDECESSORS];

    LegFinder(StepGraph graph, int source, boolean mayCrossGate) {
        this.graph = graph;
        this.source = source;
        this.mayCrossGate = mayCrossGate;
        this.distance = new int[graph.nodeCount()];
        Arrays.fill(distance, -1);
        this.order = new int[graph.nodeCount()];
        distance[source] = 0;
        order[0] = source;
        int tail = 1;
        for (int head = 0; head < tail; head++) {
            int node = order[head];
            int count = graph.successors(node, mayCrossGate, buffer);
            for (int i = 0; i < count; i++) {
                int next = buffer[i];
                if (distance[next] < 0) {
                    distance[next] = distance[node] + 1;
                    order[tail++] = next;
                }
            }
        }
        this.reachedCount = tail;
    }

    boolean reached(int node) {
        return distance[node] >= 0;
    }

    int distance(int node) {
        return distance[node];
    }

    int reachedCount() {
        return reachedCount;
    }

    /** The i-th reached node in BFS order (non-decreasing distance). */
    int reachedNode(int i) {
        return order[i];
    }

    /** The best path (source first) to the nearest of the given reached goal nodes. */
    int[] bestPathTo(int... goals) {
        int length = Integer.MAX_VALUE;
        for (int goal : goals) {
            if (reached(goal)) {
                length = Math.min(length, distance[goal]);
            }
        }
        if (length == Integer.MAX_VALUE) {
            throw new IllegalArgumentException("No goal node was reached.");
        }
        int nodes = graph.nodeCount();
        boolean[] onShortestPath = markShortestPaths(goals, length, nodes);
        double[] largestRise = smallestLargestRise(onShortestPath, length, nodes);
        double bound = Double.POSITIVE_INFINITY;
        for (int goal : goals) {
            if (reached(goal) && distance[goal] == length) {
                bound = Math.min(bound, largestRise[goal]);
            }
        }
        int[] predecessor = new int[nodes];
        double[] totalDemand = lowestTotalDemand(onShortestPath, length, bound, predecessor, nodes);
        int best = -1;
        for (int goal : goals) {
            if (!reached(goal) || distance[goal] != length || totalDemand[goal] == Double.POSITIVE_INFINITY) {
                continue;
            }
            if (best < 0 || totalDemand[goal] < totalDemand[best]
                    || totalDemand[goal] == totalDemand[best] && goal < best) {
                best = goal;
            }
        }
        int[] path = new int[length + 1];
        for (int i = length, node = best; i >= 0; i--, node = predecessor[node]) {
            path[i] = node;
        }
        return path;
    }

    private boolean[] markShortestPaths(int[] goals, int length, int nodes) {
        boolean[] on = new boolean[nodes];
        for (int goal : goals) {
            if (reached(goal) && distance[goal] == length) {
                on[goal] = true;
            }
        }
        int[] predecessors = new int[StepGraph.MAX_PREDECESSORS];
        for (int i = lastIndexWithin(length); i > 0; i--) {
            int node = order[i];
            if (!on[node]) {
                continue;
            }
            int count = graph.predecessors(node, mayCrossGate, predecessors);
            for (int p = 0; p < count; p++) {
                int previous = predecessors[p];
                if (distance[previous] == distance[node] - 1) {
                    on[previous] = true;
                }
            }
        }
        return on;
    }

    private double[] smallestLargestRise(boolean[] on, int length, int nodes) {
        double[] best = new double[nodes];
        Arrays.fill(best, Double.POSITIVE_INFINITY);
        best[source] = Double.NEGATIVE_INFINITY;
        int last = lastIndexWithin(length);
        int[] successors = new int[StepGraph.MAX_SUCCESSORS];
        for (int i = 0; i <= last; i++) {
            int node = order[i];
            if (!on[node] || best[node] == Double.POSITIVE_INFINITY) {
                continue;
            }
            int count = graph.successors(node, mayCrossGate, successors);
            for (int s = 0; s < count; s++) {
                int next = successors[s];
                if (!on[next] || distance[next] != distance[node] + 1) {
                    continue;
                }
                double candidate = Math.max(best[node], graph.rise(StepGraph.slot(node), StepGraph.slot(next)));
                if (candidate < best[next]) {
                    best[next] = candidate;
                }
            }
        }
        return best;
    }

    private double[] lowestTotalDemand(boolean[] on, int length, double riseBound, int[] predecessor, int nodes) {
        double[] best = new double[nodes];
        Arrays.fill(best, Double.POSITIVE_INFINITY);
        best[source] = graph.demandRatio(StepGraph.slot(source));
        predecessor[source] = -1;
        int last = lastIndexWithin(length);
        int[] successors = new int[StepGraph.MAX_SUCCESSORS];
        for (int i = 0; i <= last; i++) {
            int node = order[i];
            if (!on[node] || best[node] == Double.POSITIVE_INFINITY) {
                continue;
            }
            int count = graph.successors(node, mayCrossGate, successors);
            for (int s = 0; s < count; s++) {
                int next = successors[s];
                if (!on[next] || distance[next] != distance[node] + 1
                        || graph.rise(StepGraph.slot(node), StepGraph.slot(next)) > riseBound) {
                    continue;
                }
                double candidate = best[node] + graph.demandRatio(StepGraph.slot(next));
                if (candidate < best[next]) {
                    best[next] = candidate;
                    predecessor[next] = node;
                }
            }
        }
        return best;
    }

    /** Index in BFS order of the last node at most {@code length} steps from the source. */
    private int lastIndexWithin(int length) {
        int i = reachedCount - 1;
        while (i > 0 && distance[order[i]] > length) {
            i--;
        }
        return i;
    }
}
