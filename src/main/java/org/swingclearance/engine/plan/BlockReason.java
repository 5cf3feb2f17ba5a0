package org.swingclearance.engine.plan;

/** Why one step from the last state of a plan cannot be taken. */
public enum BlockReason {
    /** The next state fails a constraint at the band the plan may use. */
    OUTSIDE_ENVELOPE,
    /** The next state fits only the next band and no provisional continuation was asked for. */
    NEEDS_RESCREEN,
    /** The next state would raise D by more than the step limit. */
    STEP_LIMIT,
    /** The clinician removed the next state. */
    REMOVED,
    /** The neighbouring club's handle ends before this grip mark. */
    NO_SUCH_GRIP_MARK
}
