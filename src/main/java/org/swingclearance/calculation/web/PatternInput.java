package org.swingclearance.calculation.web;

import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.Digits;
import jakarta.validation.constraints.NotNull;
import java.math.BigDecimal;
import org.swingclearance.engine.mechanics.SwingKind;
import org.swingclearance.engine.mechanics.SwingPattern;

/**
 * The swing pattern in a calculation request, in degrees. The API has no hip-driven flag: the lumbopelvic gate
 * (C5) is a screening matter, so these patterns are arm-driven. Hands is a decimal so that 1.5 is refused, not
 * truncated.
 */
public record PatternInput(
        @NotNull @DecimalMin("-180") @DecimalMax("180") Double centreDeg,
        @NotNull @DecimalMin(value = "0", inclusive = false) @DecimalMax("180") Double halfArcDeg,
        @NotNull @Digits(integer = 1, fraction = 0) @DecimalMin("1") @DecimalMax("2") BigDecimal hands,
        @NotNull @DecimalMin("0.3") @DecimalMax("1.0") Double reach,
        @NotNull SwingKind kind) {

    SwingPattern toPattern() {
        return SwingPattern.ofDegrees(centreDeg, halfArcDeg, hands.intValueExact(), reach, kind, false);
    }
}
