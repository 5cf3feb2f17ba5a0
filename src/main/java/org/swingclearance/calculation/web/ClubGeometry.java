package org.swingclearance.calculation.web;

import jakarta.validation.Constraint;
import jakarta.validation.Payload;
import java.lang.annotation.ElementType;
import java.lang.annotation.Retention;
import java.lang.annotation.RetentionPolicy;
import java.lang.annotation.Target;

/** The club's positions lie on the club: balance point before the end, handle and head centre within it. */
@Target(ElementType.TYPE)
@Retention(RetentionPolicy.RUNTIME)
@Constraint(validatedBy = ClubGeometryValidator.class)
@interface ClubGeometry {

    String message() default "club geometry is inconsistent";

    Class<?>[] groups() default {};

    Class<? extends Payload>[] payload() default {};
}
