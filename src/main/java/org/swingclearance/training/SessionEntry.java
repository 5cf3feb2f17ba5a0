package org.swingclearance.training;

import java.time.LocalDate;

/**
 * One session as the trainer reports it: the date, the plan step it belongs to, whether it was done as the step
 * prescribes (else {@code actual} says what was done), duration, session RPE (CR-10), pain during (0–10), notes.
 */
public record SessionEntry(LocalDate date, int stepNumber, boolean asPlanned, SwingConfiguration actual,
                           int durationMin, int rpe, int painDuring, String notes) {

    public SessionEntry {
        if (!asPlanned && actual == null) {
            throw new IllegalArgumentException("a session not done as planned needs its actual configuration");
        }
        notes = notes == null || notes.isBlank() ? null : notes.trim();
    }
}
