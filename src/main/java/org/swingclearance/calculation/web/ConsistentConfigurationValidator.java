package org.swingclearance.calculation.web;

import jakarta.validation.ConstraintValidator;
import jakarta.validation.ConstraintValidatorContext;

/**
 * Cross-field checks of a calculation request, each reported on the field to correct. Checks run only when the
 * fields they need are present; a missing or out-of-range field is reported by its own annotation.
 */
class ConsistentConfigurationValidator implements ConstraintValidator<ConsistentConfiguration, ConfigurationInput> {

    @Override
    public boolean isValid(ConfigurationInput input, ConstraintValidatorContext context) {
        if (input == null) {
            return true;
        }
        context.disableDefaultConstraintViolation();
        boolean valid = true;
        ClubInput club = input.club();
        Double grip = input.gripMarkM();
        if (club != null && grip != null && club.handleLengthM() != null && grip > club.handleLengthM()) {
            valid = ClubGeometryValidator.reject(context, "gripMarkM",
                    "must not lie beyond the handle (at most club.handleLengthM)");
        }
        PatternInput pattern = input.pattern();
        if (pattern != null && pattern.centreDeg() != null && pattern.halfArcDeg() != null
                && Math.abs(pattern.centreDeg()) + pattern.halfArcDeg() > 180.0) {
            context.buildConstraintViolationWithTemplate("with the centre, the arc must stay within -180 to 180"
                    + " degrees").addPropertyNode("pattern").addPropertyNode("halfArcDeg").addConstraintViolation();
            valid = false;
        }
        if (club != null && club.pendulum() != null && club.inertiaAboutBalancePointKgM2() == null
                && !pendulumGivesPositiveInertia(club, input.gravityOrStandard())) {
            context.buildConstraintViolationWithTemplate("gives a non-positive inertia about the balance point:"
                    + " re-time the swings and re-measure the pivot distance")
                    .addPropertyNode("club").addPropertyNode("pendulum").addConstraintViolation();
            valid = false;
        }
        if (valid && momentArmIsNotPositive(input)) {
            valid = ClubGeometryValidator.reject(context, "gripMarkM",
                    "puts the club's centre of mass behind the shoulder: grip nearer the knob");
        }
        return valid;
    }

    private static boolean pendulumGivesPositiveInertia(ClubInput club, double gravity) {
        try {
            return club.pendulum().toTiming().givesPositiveInertia(club.massKg(), gravity);
        } catch (IllegalArgumentException | NullPointerException | ArithmeticException notCheckable) {
            return true; // a missing or out-of-range field, reported by its own annotation
        }
    }

    private static boolean momentArmIsNotPositive(ConfigurationInput input) {
        try {
            double reach = input.pattern().reach() * input.body().toBody().shoulderToGripM();
            return reach + input.club().balancePointM() - input.gripMarkM() <= 0.0;
        } catch (IllegalArgumentException | NullPointerException notCheckable) {
            return false; // a missing or out-of-range field, reported by its own annotation
        }
    }
}
