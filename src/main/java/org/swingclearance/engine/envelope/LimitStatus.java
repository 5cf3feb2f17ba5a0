package org.swingclearance.engine.envelope;

/** Whether an inversion found a permitted value in its range. */
public enum LimitStatus {
    /** A permitted value exists; the limit is the edge of the permitted region nearest the demanding end. */
    OK,
    /** No value in the range is permitted; the limit is absent (never clipped to the end of the range). */
    NOT_PERMISSIBLE
}
