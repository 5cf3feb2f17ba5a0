package org.swingclearance.screening;

/** The sections of the screening form, in the order a clinician works through them. */
public enum ScreeningSection {
    PAIN, SHOULDER_MOBILITY, SHOULDER_STRENGTH, LUMBOPELVIC_MOBILITY, LUMBOPELVIC_STABILITY, QUESTIONNAIRES, MECHANICS
}
