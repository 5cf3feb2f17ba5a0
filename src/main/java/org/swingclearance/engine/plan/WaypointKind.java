package org.swingclearance.engine.plan;

/** What a leg of the plan was heading for. */
public enum WaypointKind {
    /** The first state of the plan. */
    START,
    /** A state the clinician pinned. */
    PIN,
    /** The clinician's target configuration. */
    TARGET,
    /** Without a target: the permitted state with the highest D in the current band. */
    HIGHEST_PERMITTED,
    /** Without a target, continuing provisionally: the state with the highest D permitted at the next band. */
    HIGHEST_NEXT_BAND;

    public String messageKey() {
        return "engine.plan.waypoint." + name();
    }
}
