package org.swingclearance.engine.plan;

/** Why the plan stops short of a waypoint. */
public enum ShortfallReason {
    /** The waypoint fails a constraint even at the band the plan may use. */
    OUTSIDE_ENVELOPE,
    /** The waypoint fits only the next band and no provisional continuation was asked for. */
    NEEDS_RESCREEN,
    /** The clinician removed the waypoint from the plan. */
    REMOVED,
    /** The waypoint is permitted, but every way to it is blocked (see the blockers). */
    UNREACHABLE
}
