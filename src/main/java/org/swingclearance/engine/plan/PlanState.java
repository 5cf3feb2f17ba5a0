package org.swingclearance.engine.plan;

/**
 * One configuration of the plan space, by index: the club in mass order (0 = lightest), the grip mark on the 2.5 cm
 * grid (0 = at the knob end, the longest moment arm; higher = choked up toward the head) and the cycle-time rung
 * (0 = slowest). Indices are only meaningful with the {@link PlanSpace} that made them.
 */
public record PlanState(int club, int gripMark, int cycleRung) {

    public PlanState {
        if (club < 0 || gripMark < 0 || cycleRung < 0) {
            throw new IllegalArgumentException("State indices must not be negative: " + club + "/" + gripMark + "/" + cycleRung);
        }
    }

    /** Dial steps between two states: a lower bound on the number of plan steps from one to the other. */
    public int dialDistance(PlanState other) {
        return Math.abs(club - other.club) + Math.abs(gripMark - other.gripMark) + Math.abs(cycleRung - other.cycleRung);
    }
}
