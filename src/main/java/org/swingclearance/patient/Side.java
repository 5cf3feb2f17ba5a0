package org.swingclearance.patient;

/** Left or right body side. */
public enum Side { LEFT, RIGHT }
