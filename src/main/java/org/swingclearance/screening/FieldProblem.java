package org.swingclearance.screening;

import java.util.List;

/** Why a typed value was refused: a message code of the screening bundle and its arguments. */
public record FieldProblem(String code, List<String> args) {

    public FieldProblem(String code, String... args) {
        this(code, List.of(args));
    }
}
