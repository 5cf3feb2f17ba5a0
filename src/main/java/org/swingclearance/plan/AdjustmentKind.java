package org.swingclearance.plan;

/** What the clinician did to a state of the plan: pinned it (the plan passes through it) or removed it. */
public enum AdjustmentKind {
    PIN, REMOVE
}
