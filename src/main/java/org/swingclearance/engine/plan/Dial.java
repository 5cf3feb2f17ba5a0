package org.swingclearance.engine.plan;

/** The three things a plan step may change, one at a time. */
public enum Dial {
    CLUB,
    GRIP_MARK,
    CYCLE_TIME
}
