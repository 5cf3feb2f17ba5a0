package org.swingclearance.engine.load;

/** Whether a day's acute:chronic ratio is shown, and if not, why. */
public enum RatioStatus {
    /** The ratio is shown. */
    SHOWN,
    /** Within the warm-up after the first known day: computed but not shown. */
    WARM_UP,
    /** The day itself is missing: averages carried over, no ratio for that day. */
    MISSING_DAY,
    /** No known day yet (every earlier day missing). */
    NO_DATA,
    /** The chronic average is 0, so the ratio is undefined. */
    ZERO_CHRONIC,
    /** The rolling window has a missing day or reaches before the range. */
    INCOMPLETE_WINDOW
}
