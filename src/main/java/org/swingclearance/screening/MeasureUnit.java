package org.swingclearance.screening;

/** The unit a value is entered in; its symbol comes from the message {@code MeasureUnit.<name>}. */
public enum MeasureUnit {
    DEGREE, NEWTON, METRE, KILOGRAM, CENTIMETRE, SECOND, TOUCHES, NPRS_POINTS, ASLR_POINTS, ITEM_POINTS, YES_NO
}
