package org.swingclearance.equipment.web;

import java.math.BigDecimal;

/** Units a club's lengths may be entered in; conversion is exact by definition (1 in = 2.54 cm). */
public enum LengthUnit {
    CM(new BigDecimal("0.01")), IN(new BigDecimal("0.0254"));

    private final BigDecimal metres;

    LengthUnit(BigDecimal metres) {
        this.metres = metres;
    }

    /** The entered value in metres, multiplied exactly before the one rounding to double. */
    double toMetres(BigDecimal value) {
        return value.multiply(metres).doubleValue();
    }

    /** Null stays null (an optional length left empty). */
    Double toMetresOrNull(BigDecimal value) {
        return value == null ? null : toMetres(value);
    }
}
