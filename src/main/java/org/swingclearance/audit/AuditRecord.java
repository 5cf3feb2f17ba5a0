package org.swingclearance.audit;

import java.time.Instant;
import java.util.UUID;

/**
 * One audit event exactly as it is hashed and stored. Holds identifiers only, never clinical values.
 * The timestamp is kept to microseconds, the precision PostgreSQL stores, so a re-read row hashes the same.
 */
public record AuditRecord(UUID chainId, long seq, UUID eventId, Instant occurredAt, UUID clinicId, UUID actorId,
                          String actorName, String actorRole, String action, String objectType, String objectId,
                          UUID patientId, AuditOutcome outcome, String clientAddress, String requestId,
                          String detail, byte[] prevHash) {
}
