package org.swingclearance.rules;

import java.time.Instant;

/** One entry of a clinic's rules history. */
public record RuleSetSummary(int version, Instant createdAt, String createdByName, String changeNote, int rules) {
}
