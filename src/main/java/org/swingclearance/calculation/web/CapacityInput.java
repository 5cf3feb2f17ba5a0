package org.swingclearance.calculation.web;

import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.NotNull;

/** The patient's measured capacity: shoulder flexion torque (required for limits) and grip strength. */
public record CapacityInput(
        @NotNull @DecimalMin(value = "0", inclusive = false) @DecimalMax("500") Double shoulderFlexionTorqueNm,
        @DecimalMin(value = "0", inclusive = false) @DecimalMax("150") Double gripStrengthKg) {
}
