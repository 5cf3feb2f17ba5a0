package org.swingclearance.calculation.web;

import jakarta.validation.ConstraintValidator;
import jakarta.validation.ConstraintValidatorContext;

/**
 * Checks the club's positions against its length, reporting each on its own field. Messages are constants: a
 * constraint message template must never contain request data (it would be interpolated).
 */
class ClubGeometryValidator implements ConstraintValidator<ClubGeometry, ClubInput> {

    @Override
    public boolean isValid(ClubInput club, ConstraintValidatorContext context) {
        if (club == null || club.lengthM() == null) {
            return true;
        }
        context.disableDefaultConstraintViolation();
        double length = club.lengthM();
        boolean valid = true;
        if (club.balancePointM() != null && club.balancePointM() >= length) {
            valid = reject(context, "balancePointM", "must lie before the end of the club (less than lengthM)");
        }
        if (club.handleLengthM() != null && club.handleLengthM() > length) {
            valid = reject(context, "handleLengthM", "must not exceed the club's length (lengthM)");
        }
        if (club.headCentreM() != null) {
            if (club.headCentreM() > length) {
                valid = reject(context, "headCentreM", "must not exceed the club's length (lengthM)");
            } else if (club.balancePointM() != null && club.headCentreM() <= club.balancePointM()) {
                valid = reject(context, "headCentreM", "must lie beyond the balance point (balancePointM)");
            }
        }
        return valid;
    }

    static boolean reject(ConstraintValidatorContext context, String field, String message) {
        context.buildConstraintViolationWithTemplate(message).addPropertyNode(field).addConstraintViolation();
        return false;
    }
}
