package org.swingclearance.engine.rules;

/** Body region a rule belongs to and a band is given for. */
public enum Region {
    SHOULDER,
    LUMBOPELVIC
}
