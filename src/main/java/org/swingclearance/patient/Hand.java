package org.swingclearance.patient;

/** The patient's dominant hand. */
public enum Hand { LEFT, RIGHT, EITHER }
