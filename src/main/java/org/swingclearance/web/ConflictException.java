package org.swingclearance.web;

/** Someone else saved the record first (optimistic locking); the user must reload before saving again. */
public class ConflictException extends RuntimeException {

    public ConflictException(String what) {
        super(what + " was changed by someone else");
    }
}
