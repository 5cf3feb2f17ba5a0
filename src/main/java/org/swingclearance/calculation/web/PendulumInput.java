package org.swingclearance.calculation.web;

import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.Digits;
import jakarta.validation.constraints.Max;
import jakarta.validation.constraints.Min;
import jakarta.validation.constraints.NotNull;
import java.math.BigDecimal;
import org.swingclearance.engine.mechanics.PendulumTiming;

/**
 * "N full swings in S seconds about a pivot d from the balance point". Swings is a decimal so that a fraction such
 * as 20.5 is refused rather than silently truncated.
 */
public record PendulumInput(
        @NotNull @DecimalMin(value = "0", inclusive = false) @DecimalMax("2.0") Double pivotFromBalancePointM,
        @NotNull @Digits(integer = 4, fraction = 0) @Min(1) @Max(1000) BigDecimal swings,
        @NotNull @DecimalMin(value = "0", inclusive = false) @DecimalMax("3600") Double seconds) {

    PendulumTiming toTiming() {
        return new PendulumTiming(pivotFromBalancePointM, swings.intValueExact(), seconds);
    }
}
