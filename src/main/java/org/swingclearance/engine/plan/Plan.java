package org.swingclearance.engine.plan;

import java.util.List;
import java.util.Optional;
import java.util.OptionalInt;

/**
 * A graded plan: its steps in order, the goal it was heading for, why it stops short (if it does), and the ceiling —
 * the harder neighbours of the last step that cannot be taken, with reasons.
 *
 * @param goal  the state the last leg was heading for; empty when the plan could not start (see the shortfall)
 * @param steps empty when the plan could not start
 */
public record Plan(List<PlanStep> steps, Optional<PlanState> goal, Optional<Shortfall> shortfall,
                   List<Blocker> ceiling) {

    public Plan {
        steps = List.copyOf(steps);
        ceiling = List.copyOf(ceiling);
    }

    public boolean reachedGoal() {
        return shortfall.isEmpty();
    }

    /** Number of the step before which a re-screen is due; empty when every step lies within the current band. */
    public OptionalInt gateStep() {
        return steps.stream().filter(s -> s.gate() == StepGate.RESCREEN_BEFORE).mapToInt(PlanStep::number).findFirst();
    }

    public List<PlanState> states() {
        return steps.stream().map(PlanStep::state).toList();
    }
}
