package org.swingclearance.engine.load;

/** Which standard deviation monotony divides by; Foster 1998 does not say (clinical.md §7.2, default [C]). */
public enum SdConvention {
    /** Sample SD, n − 1 in the denominator; the default. */
    SAMPLE,
    /** Population SD, n in the denominator. */
    POPULATION
}
