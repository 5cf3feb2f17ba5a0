package org.swingclearance.patient;

/** Sex as recorded at intake; some published reference values differ by it. */
public enum Sex { FEMALE, MALE, OTHER }
