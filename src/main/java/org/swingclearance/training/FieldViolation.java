package org.swingclearance.training;

/** A refused form value: the form field and the message code (in the training bundle) that explains it. */
public record FieldViolation(String field, String code) {
}
