package org.swingclearance.web;

import org.springframework.http.HttpStatus;
import org.springframework.orm.ObjectOptimisticLockingFailureException;
import org.springframework.web.bind.annotation.ControllerAdvice;
import org.springframework.web.bind.annotation.ExceptionHandler;
import org.springframework.web.bind.annotation.ResponseStatus;

/** Maps "not found" (including foreign and unshared records) to 404 and lost updates to the 409 page. */
@ControllerAdvice(annotations = org.springframework.stereotype.Controller.class)
class ErrorPages {

    @ExceptionHandler(NotFoundException.class)
    @ResponseStatus(HttpStatus.NOT_FOUND)
    String notFound() {
        return "error/404";
    }

    /** A malformed record id in the path names no record: answer as for a missing one. */
    @ExceptionHandler(org.springframework.web.method.annotation.MethodArgumentTypeMismatchException.class)
    @ResponseStatus(HttpStatus.NOT_FOUND)
    String malformedId() {
        return "error/404";
    }

    @ExceptionHandler({ConflictException.class, ObjectOptimisticLockingFailureException.class})
    @ResponseStatus(HttpStatus.CONFLICT)
    String conflict() {
        return "error/409";
    }
}
