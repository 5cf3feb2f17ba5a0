package org.swingclearance.screening;

import java.time.Instant;
import java.util.UUID;

/** A draft screening waiting to be completed and signed, for the clinician's home page. */
public record DraftSummary(UUID screeningId, int versionNo, UUID patientId, String patientLabel, String region,
                           Instant updatedAt, String createdBy, boolean amendment) {
}
