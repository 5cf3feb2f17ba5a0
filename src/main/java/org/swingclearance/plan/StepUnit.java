package org.swingclearance.plan;

/** How the length of a plan step is counted: a number of sessions or a number of days. */
public enum StepUnit {
    SESSIONS, DAYS
}
