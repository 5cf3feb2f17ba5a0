package org.swingclearance.training;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;

/**
 * The rules of a session entry that need the plan and today's date (the ranges of single values are checked on
 * the form): no session in the future, none before the plan starts, the step must be one of the plan's, and the
 * club of a session done with another plan club must be one the plan uses.
 */
final class SessionEntryCheck {

    private SessionEntryCheck() {
    }

    static List<FieldViolation> violations(SessionEntry entry, TrainingPlan plan, LocalDate today) {
        List<FieldViolation> found = new ArrayList<>();
        if (entry.date().isAfter(today)) {
            found.add(new FieldViolation("sessionDate", "sessionLog.error.future"));
        } else if (entry.date().isBefore(plan.startsOn())) {
            found.add(new FieldViolation("sessionDate", "sessionLog.error.beforePlan"));
        }
        if (plan.step(entry.stepNumber()).isEmpty()) {
            found.add(new FieldViolation("stepNumber", "sessionLog.error.noSuchStep"));
        }
        if (!entry.asPlanned() && entry.actual().in(plan).isEmpty()) {
            found.add(new FieldViolation("clubId", "sessionLog.error.unknownClub"));
        }
        return found;
    }

    /** A next-morning rating is entered the day after the session at the earliest. */
    static List<FieldViolation> morningViolations(LocalDate sessionDate, LocalDate today) {
        return today.isAfter(sessionDate) ? List.of()
                : List.of(new FieldViolation("pain", "morningPain.error.tooEarly"));
    }
}
