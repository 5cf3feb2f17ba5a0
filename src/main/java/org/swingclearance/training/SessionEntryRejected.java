package org.swingclearance.training;

import java.util.List;

/** A session entry that breaks a rule only the plan and today's date can check; nothing was saved. */
public class SessionEntryRejected extends RuntimeException {

    private final transient List<FieldViolation> violations;

    public SessionEntryRejected(List<FieldViolation> violations) {
        super("session entry refused: " + violations);
        this.violations = List.copyOf(violations);
    }

    public List<FieldViolation> violations() {
        return violations;
    }
}
