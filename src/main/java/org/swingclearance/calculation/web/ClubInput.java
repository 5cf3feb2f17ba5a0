package org.swingclearance.calculation.web;

import jakarta.validation.Valid;
import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.NotNull;
import org.swingclearance.engine.mechanics.Club;

/**
 * The club in a calculation request; its inertia comes from the best source given: a measured value, else the
 * pendulum timing, else the rod-plus-head model from the head centre, else the safe upper bound.
 */
@ClubGeometry
public record ClubInput(
        @NotNull @DecimalMin(value = "0", inclusive = false) @DecimalMax("50") Double massKg,
        @NotNull @DecimalMin(value = "0", inclusive = false) @DecimalMax("2.0") Double lengthM,
        @NotNull @DecimalMin(value = "0", inclusive = false) Double balancePointM,
        @NotNull @DecimalMin("0") Double handleLengthM,
        @DecimalMin(value = "0", inclusive = false) Double headCentreM,
        @DecimalMin(value = "0", inclusive = false) @DecimalMax(value = "1000", inclusive = false)
        Double inertiaAboutBalancePointKgM2,
        @Valid PendulumInput pendulum) {

    Club toClub(double gravity) {
        return Club.withBestInertia(massKg, lengthM, balancePointM, handleLengthM, inertiaAboutBalancePointKgM2,
                pendulum == null ? null : pendulum.toTiming(), headCentreM, gravity);
    }
}
