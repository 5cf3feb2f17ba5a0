package org.swingclearance.audit;

import java.time.Instant;
import java.util.UUID;

/**
 * What the manager narrowed the audit log to; every part is optional. {@code from} is inclusive, {@code until}
 * exclusive (the day after the last day asked for, in UTC).
 */
public record AuditFilter(UUID patientId, UUID actorId, String action, AuditOutcome outcome, Instant from,
                          Instant until) {

    public static AuditFilter none() {
        return new AuditFilter(null, null, null, null, null, null);
    }

    /** The filter as an audit detail: which criteria were used, never what the rows contain. */
    String describe() {
        return AuditDetail.of("actor", actorId, "action", action, "outcome", outcome, "from", from, "until", until);
    }
}
