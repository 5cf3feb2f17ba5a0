package org.swingclearance.engine.plan;

import java.util.Optional;

/**
 * One step the plan cannot take, and why.
 *
 * @param from       a state the plan can reach
 * @param position   the state the step would lead to (for {@link BlockReason#NO_SUCH_GRIP_MARK} a grid position
 *                   that is not a state of the space)
 * @param evaluation the evaluation of that state; empty for {@link BlockReason#NO_SUCH_GRIP_MARK}
 * @param rise       relative rise of D the step would bring (0.15 = +15 %); NaN when there is no evaluation
 */
public record Blocker(PlanState from, Dial dial, PlanState position, BlockReason reason, Optional<Evaluation> evaluation,
                      double rise) {

    /** Message key; see engine.properties for its arguments. */
    public String messageKey() {
        return "engine.plan.blocker." + reason.name();
    }

    /** The constraint that excludes the next state, when a constraint (not the step limit or the clinician) does. */
    public Optional<String> bindingConstraint() {
        return reason == BlockReason.OUTSIDE_ENVELOPE || reason == BlockReason.NEEDS_RESCREEN
                ? evaluation.map(Evaluation::bindingConstraint)
                : Optional.empty();
    }
}
