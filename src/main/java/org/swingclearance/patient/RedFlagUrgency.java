package org.swingclearance.patient;

/** How fast a red flag must be acted on (clinical.md §5). */
public enum RedFlagUrgency { EMERGENCY, SAME_DAY, URGENT, SOON }
