package org.swingclearance.calculation.web;

import jakarta.validation.Valid;
import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.NotNull;

/** {@code POST /api/v1/calculations/demand}: one configuration. Gravity defaults to 9.80665 m/s². */
@ConsistentConfiguration
public record DemandRequest(
        @NotNull @Valid BodyInput body,
        @NotNull @Valid ClubInput club,
        @NotNull @DecimalMin("0") Double gripMarkM,
        @NotNull @Valid PatternInput pattern,
        @NotNull @DecimalMin(value = "0", inclusive = false) @DecimalMax("60") Double cycleTimeS,
        @DecimalMin("1") @DecimalMax("30") Double gravity) implements ConfigurationInput {
}
