package org.swingclearance.engine.load;

/** What is known about one day's training load. */
public enum DayStatus {
    /** At least one session logged; load = Σ session loads. */
    TRAINED,
    /** No session logged and not marked missing: the athlete rested, load 0. */
    REST,
    /** Marked missing: training may have happened but was not logged; no load is assumed. */
    MISSING
}
