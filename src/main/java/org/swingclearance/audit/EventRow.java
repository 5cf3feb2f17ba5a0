package org.swingclearance.audit;

import java.time.Instant;
import java.util.UUID;

/**
 * One audit event as the manager sees it: the recorded fields plus the current display name of the actor and
 * code of the patient (looked up in the own clinic only), and the row's hashes for the detail page and exports.
 */
public record EventRow(long seq, UUID eventId, Instant occurredAt, UUID actorId, String actorName, String actorDisplay,
                       String actorRole, String action, String objectType, String objectId, UUID patientId,
                       String patientCode, AuditOutcome outcome, String clientAddress, String requestId, String detail,
                       String prevHash, String rowHash) {

    public LogCursor cursor() {
        return new LogCursor(occurredAt, seq);
    }

    /** The actor as shown: the account's current name, else the name recorded at the time; null for the system. */
    public String actorLabel() {
        return actorDisplay != null ? actorDisplay : actorName;
    }
}
