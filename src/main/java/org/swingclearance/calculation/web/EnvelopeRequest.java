package org.swingclearance.calculation.web;

import jakarta.validation.Valid;
import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.NotNull;
import org.swingclearance.engine.mechanics.Capacity;
import org.swingclearance.engine.mechanics.LoadRules;
import org.swingclearance.engine.rules.LoadBand;

/**
 * {@code POST /api/v1/calculations/envelope}: the demand request's fields plus the capacity and the rules.
 * {@code controlledStop} defaults to true, {@code rangeMarginDeg} to 10°, {@code gripFraction} to the band
 * fraction; without {@code shoulderFlexionRangeDeg} the arc is not checked against the range of motion.
 */
@ConsistentConfiguration
public record EnvelopeRequest(
        @NotNull @Valid BodyInput body,
        @NotNull @Valid ClubInput club,
        @NotNull @DecimalMin("0") Double gripMarkM,
        @NotNull @Valid PatternInput pattern,
        @NotNull @DecimalMin(value = "0", inclusive = false) @DecimalMax("60") Double cycleTimeS,
        @DecimalMin("1") @DecimalMax("30") Double gravity,
        @NotNull @Valid CapacityInput capacity,
        @NotNull @DecimalMin("0") @DecimalMax("1") Double bandFraction,
        @DecimalMin("0") @DecimalMax("1") Double gripFraction,
        Boolean controlledStop,
        @DecimalMin("0") @DecimalMax("180") Double shoulderFlexionRangeDeg,
        @DecimalMin("0") @DecimalMax("90") Double rangeMarginDeg) implements ConfigurationInput {

    Capacity toCapacity() {
        Capacity measured = Capacity.of(capacity.shoulderFlexionTorqueNm(), capacity.gripStrengthKg());
        return shoulderFlexionRangeDeg == null ? measured : measured.withShoulderFlexionRangeDeg(shoulderFlexionRangeDeg);
    }

    LoadRules toRules() {
        double margin = rangeMarginDeg != null ? rangeMarginDeg : LoadRules.DEFAULT_RANGE_MARGIN_DEG;
        return new LoadRules(bandFraction, gripFraction, controlledStop == null || controlledStop,
                Math.toRadians(margin), LoadBand.BAND_2);
    }
}
