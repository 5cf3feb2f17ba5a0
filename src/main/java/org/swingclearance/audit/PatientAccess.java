package org.swingclearance.audit;

import java.time.Instant;
import java.util.UUID;

/** One account's contact with a patient's records: how often, how often only to read, first and last time. */
public record PatientAccess(UUID actorId, String actorName, String actorRole, long events, long reads,
                            Instant first, Instant last) {
}
