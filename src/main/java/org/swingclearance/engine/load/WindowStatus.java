package org.swingclearance.engine.load;

/** Whether a window of days can be summarised. */
public enum WindowStatus {
    /** Every day of the window is in the range and known (trained or rest). */
    COMPLETE,
    /** The window reaches before the first day of the range. */
    INSUFFICIENT_HISTORY,
    /** A day of the window is marked missing. */
    MISSING_DAYS
}
