package org.swingclearance.screening;

import java.util.List;

/**
 * Signing (or amending) was refused; nothing was signed. Each problem names the form field it belongs to (null for
 * the whole screening) and a message of the screening bundle.
 */
public class ScreeningRefused extends RuntimeException {

    private final transient List<Problem> problems;

    public ScreeningRefused(List<Problem> problems) {
        super("screening refused: " + problems);
        this.problems = List.copyOf(problems);
    }

    public List<Problem> problems() {
        return problems;
    }

    /** One reason: the field (null = the screening as a whole), the message code and its arguments. */
    public record Problem(String field, String code, List<String> args) {
    }
}
