package org.swingclearance.engine.plan;

/** What must happen before a step may be done. */
public enum StepGate {
    /** Nothing: the step lies within the current band. */
    NONE,
    /** The step is the first beyond the current band: the patient must be re-screened into the next band first. */
    RESCREEN_BEFORE;

    /** Message key of the gate's text; {@link #NONE} has nothing to show. */
    public String messageKey() {
        return "engine.plan.gate." + name();
    }
}
