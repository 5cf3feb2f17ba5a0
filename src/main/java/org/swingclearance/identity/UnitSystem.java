package org.swingclearance.identity;

/** How a staff member prefers numbers shown; values are always stored in SI units. */
public enum UnitSystem {
    METRIC, IMPERIAL
}
