package org.swingclearance.calculation.web;

import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.NotNull;
import org.swingclearance.engine.mechanics.Body;

/** The patient's body in a calculation request: stature and mass, optionally a measured shoulder-to-grip distance. */
public record BodyInput(
        @NotNull @DecimalMin("1.0") @DecimalMax("2.5") Double statureM,
        @NotNull @DecimalMin("20") @DecimalMax("300") Double massKg,
        @DecimalMin("0.3") @DecimalMax("1.2") Double shoulderToGripM) {

    Body toBody() {
        return new Body(statureM, massKg, shoulderToGripM);
    }
}
