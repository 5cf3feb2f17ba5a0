package org.swingclearance.equipment.web;

import java.math.BigDecimal;

/** Units a club's mass may be entered in; conversion is exact by definition (1 lb = 0.45359237 kg). */
public enum MassUnit {
    KG(BigDecimal.ONE), LB(new BigDecimal("0.45359237"));

    private final BigDecimal kilograms;

    MassUnit(BigDecimal kilograms) {
        this.kilograms = kilograms;
    }

    /** The entered value in kilograms, multiplied exactly before the one rounding to double. */
    double toKg(BigDecimal value) {
        return value.multiply(kilograms).doubleValue();
    }
}
