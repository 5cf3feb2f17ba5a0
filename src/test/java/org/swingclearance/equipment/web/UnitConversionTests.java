package org.swingclearance.equipment.web;

import static org.assertj.core.api.Assertions.assertThat;

import java.math.BigDecimal;
import org.junit.jupiter.api.Test;

/**
 * Club inputs in lb and in become SI exactly: 1 lb = 0.45359237 kg and 1 in = 2.54 cm by definition
 * (international yard and pound agreement, 1959); the product is formed exactly and rounded once to double.
 */
class UnitConversionTests {

    @Test
    void poundsBecomeKilogramsByTheExactDefinition() {
        assertThat(MassUnit.LB.toKg(new BigDecimal("1"))).isEqualTo(0.45359237);
        assertThat(MassUnit.LB.toKg(new BigDecimal("10"))).isEqualTo(4.5359237);
        // 26.4554 lb is 11.99999... kg: the exact product 11.9999706... rounded once, not accumulated error.
        assertThat(MassUnit.LB.toKg(new BigDecimal("26.4554"))).isEqualTo(
                new BigDecimal("26.4554").multiply(new BigDecimal("0.45359237")).doubleValue());
        assertThat(MassUnit.KG.toKg(new BigDecimal("6.5"))).isEqualTo(6.5);
    }

    @Test
    void inchesAndCentimetresBecomeMetresByTheExactDefinition() {
        assertThat(LengthUnit.IN.toMetres(new BigDecimal("1"))).isEqualTo(0.0254);
        assertThat(LengthUnit.IN.toMetres(new BigDecimal("24"))).isEqualTo(0.6096);
        assertThat(LengthUnit.IN.toMetres(new BigDecimal("17.5"))).isEqualTo(0.4445);
        assertThat(LengthUnit.CM.toMetres(new BigDecimal("60.96"))).isEqualTo(0.6096);
        assertThat(LengthUnit.CM.toMetresOrNull(null)).isNull();
    }
}
