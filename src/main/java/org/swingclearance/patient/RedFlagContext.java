package org.swingclearance.patient;

/** When a red-flag checklist was filled in. */
public enum RedFlagContext { INTAKE, SCREENING, RECHECK }
