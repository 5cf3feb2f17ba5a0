package org.swingclearance.calculation.web;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.springframework.core.Ordered;
import org.springframework.core.annotation.Order;
import org.springframework.http.HttpHeaders;
import org.springframework.http.HttpStatus;
import org.springframework.http.HttpStatusCode;
import org.springframework.http.ProblemDetail;
import org.springframework.http.ResponseEntity;
import org.springframework.http.converter.HttpMessageNotReadableException;
import org.springframework.validation.FieldError;
import org.springframework.validation.ObjectError;
import org.springframework.web.bind.MethodArgumentNotValidException;
import org.springframework.web.bind.annotation.ExceptionHandler;
import org.springframework.web.bind.annotation.RestControllerAdvice;
import org.springframework.web.context.request.WebRequest;
import org.springframework.web.servlet.mvc.method.annotation.ResponseEntityExceptionHandler;
import tools.jackson.core.JacksonException;
import tools.jackson.databind.exc.MismatchedInputException;

/**
 * Turns every failure of the calculations API into an RFC 9457 problem document (application/problem+json):
 * invalid fields list each field and its message under {@code errors}; unreadable JSON and refused values are 400;
 * the standard Spring MVC failures (wrong method, media type) keep their 4xx status. Nothing here answers 500.
 */
@Order(Ordered.HIGHEST_PRECEDENCE)
@RestControllerAdvice(assignableTypes = CalculationController.class)
class CalculationProblems extends ResponseEntityExceptionHandler {

    static final String INVALID_TITLE = "Invalid calculation request";

    /** One bad field: its JSON path (dots between nested names) and what is wrong with it. */
    record FieldProblem(String field, String message) {
    }

    @Override
    protected ResponseEntity<Object> handleMethodArgumentNotValid(MethodArgumentNotValidException ex,
            HttpHeaders headers, HttpStatusCode status, WebRequest request) {
        List<FieldProblem> errors = new ArrayList<>();
        for (FieldError error : ex.getBindingResult().getFieldErrors()) {
            errors.add(new FieldProblem(error.getField(), error.getDefaultMessage()));
        }
        for (ObjectError error : ex.getBindingResult().getGlobalErrors()) {
            errors.add(new FieldProblem(error.getObjectName(), error.getDefaultMessage()));
        }
        return problem(errors.size() == 1 ? "1 field is invalid." : errors.size() + " fields are invalid.", errors);
    }

    @Override
    protected ResponseEntity<Object> handleHttpMessageNotReadable(HttpMessageNotReadableException ex,
            HttpHeaders headers, HttpStatusCode status, WebRequest request) {
        if (ex.getMostSpecificCause() instanceof MismatchedInputException mismatch && !mismatch.getPath().isEmpty()) {
            return problem("1 field is invalid.", List.of(new FieldProblem(path(mismatch),
                    "has the wrong type or an unknown value")));
        }
        return problem("The request body is missing or is not valid JSON.", List.of());
    }

    /** A value the engine refused that no annotation caught: still the caller's input, so 400, never 500. */
    @ExceptionHandler(IllegalArgumentException.class)
    ResponseEntity<Object> refused(IllegalArgumentException ex) {
        return problem("The engine refused an input.", List.of(new FieldProblem("request", ex.getMessage())));
    }

    private static ResponseEntity<Object> problem(String detail, List<FieldProblem> errors) {
        ProblemDetail problem = ProblemDetail.forStatusAndDetail(HttpStatus.BAD_REQUEST, detail);
        problem.setTitle(INVALID_TITLE);
        problem.setProperties(Map.of("errors", errors));
        return ResponseEntity.badRequest().body(problem);
    }

    private static String path(JacksonException ex) {
        StringBuilder path = new StringBuilder();
        for (JacksonException.Reference reference : ex.getPath()) {
            if (reference.getPropertyName() != null) {
                if (!path.isEmpty()) {
                    path.append('.');
                }
                path.append(reference.getPropertyName());
            } else if (reference.getIndex() >= 0) {
                path.append('[').append(reference.getIndex()).append(']');
            }
        }
        return path.toString();
    }
}
