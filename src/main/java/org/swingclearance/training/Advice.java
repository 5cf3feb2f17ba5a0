package org.swingclearance.training;

import java.time.Instant;
import java.time.LocalDate;

/**
 * What the trainer is told on the training log: go back to step N after an open alert, or that the clinician has
 * reviewed the latest alert. {@code step} is the most conservative step among the open alerts.
 */
public record Advice(AlertKind kind, int step, LocalDate sessionDate, Instant reviewedAt) {

    public boolean reviewed() {
        return reviewedAt != null;
    }
}
