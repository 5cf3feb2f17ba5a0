package org.swingclearance.patient;

/** The body region(s) an episode is about. */
public enum Region {
    SHOULDER, LUMBOPELVIC, BOTH;

    public boolean includesShoulder() {
        return this != LUMBOPELVIC;
    }

    public boolean includesLumbopelvic() {
        return this != SHOULDER;
    }
}
