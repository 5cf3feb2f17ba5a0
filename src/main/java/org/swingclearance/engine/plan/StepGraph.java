package org.swingclearance.engine.plan;

import java.util.Set;

/**
 * The plan graph for one request. A node is a state plus a phase: phase 0 = before the re-screen gate (the state
 * must be permitted in the current band), phase 1 = behind the gate (the state must be permitted at the next band).
 * An edge changes one dial by one step, leads to a state the clinician did not remove, and raises D by at most the
 * step limit; from phase 0 it enters phase 1 exactly when it leaves the current band, and phase 1 never returns to
 * phase 0 (every step after a gate stays provisional until the re-screen).
 */
final class StepGraph {

    static final int MAX_SUCCESSORS = 6;
    static final int MAX_PREDECESSORS = 12;

    /** Relative slack so that a rise of exactly the step limit (e.g. 0.50 → 0.55 at +10 %) survives rounding. */
    private static final double RISE_TOLERANCE = 1e-9;

    final PlanSpace space;
    final EvaluatedSpace states;
    private final double riseFactor;
    private final boolean[] removed;
    private final int[] neighbours = new int[MAX_SUCCESSORS];

    StepGraph(EvaluatedSpace states, double stepLimit, Set<PlanState> removedStates) {
        this.states = states;
        this.space = states.space;
        this.riseFactor = (1 + stepLimit) * (1 + RISE_TOLERANCE);
        this.removed = new boolean[space.slotCount()];
        for (PlanState state : removedStates) {
            removed[space.slotOf(state)] = true;
        }
    }

    static int node(int slot, int phase) {
        return slot * 2 + phase;
    }

    static int slot(int node) {
        return node >> 1;
    }

    static int phase(int node) {
        return node & 1;
    }

    int nodeCount() {
        return space.slotCount() * 2;
    }

    boolean isRemoved(int slot) {
        return removed[slot];
    }

    /** The state exists, was not removed, and is permitted in the node's phase. */
    boolean holds(int node) {
        int slot = slot(node);
        if (!space.isState(slot) || removed[slot]) {
            return false;
        }
        return phase(node) == 0 ? states.permitted[slot] : states.permittedAtNextBand[slot];
    }

    double demandRatio(int slot) {
        return states.demandRatio[slot];
    }

    boolean withinStepLimit(int fromSlot, int toSlot) {
        return states.demandRatio[toSlot] <= states.demandRatio[fromSlot] * riseFactor;
    }

    /** Relative change of D; +∞ for any rise from D = 0. */
    double rise(int fromSlot, int toSlot) {
        double from = states.demandRatio[fromSlot];
        double to = states.demandRatio[toSlot];
        if (from == 0) {
            return to == 0 ? 0 : Double.POSITIVE_INFINITY;
        }
        return to / from - 1;
    }

    /**
     * Phase of the node reached by stepping from {@code (fromSlot, fromPhase)} to the adjacent state {@code toSlot},
     * or −1 when the step is not allowed.
     */
    int stepPhase(int fromSlot, int fromPhase, int toSlot, boolean mayCrossGate) {
        if (removed[toSlot] || !withinStepLimit(fromSlot, toSlot)) {
            return -1;
        }
        if (fromPhase == 0) {
            if (states.permitted[toSlot]) {
                return 0;
            }
            return mayCrossGate && states.permittedAtNextBand[toSlot] ? 1 : -1;
        }
        return states.permittedAtNextBand[toSlot] ? 1 : -1;
    }

    /** Writes the successors of {@code node} into {@code out}; returns how many. */
    int successors(int node, boolean mayCrossGate, int[] out) {
        int slot = slot(node);
        int phase = phase(node);
        int count = space.neighbourSlots(slot, neighbours);
        int n = 0;
        for (int i = 0; i < count; i++) {
            int next = neighbours[i];
            int nextPhase = stepPhase(slot, phase, next, mayCrossGate);
            if (nextPhase >= 0) {
                out[n++] = node(next, nextPhase);
            }
        }
        return n;
    }

    /** Writes the predecessors of {@code node} into {@code out}; returns how many. */
    int predecessors(int node, boolean mayCrossGate, int[] out) {
        int slot = slot(node);
        int phase = phase(node);
        int count = space.neighbourSlots(slot, neighbours);
        int n = 0;
        for (int i = 0; i < count; i++) {
            int previous = neighbours[i];
            for (int previousPhase = 0; previousPhase <= 1; previousPhase++) {
                if (holds(node(previous, previousPhase))
                        && stepPhase(previous, previousPhase, slot, mayCrossGate) == phase) {
                    out[n++] = node(previous, previousPhase);
                }
            }
        }
        return n;
    }
}
