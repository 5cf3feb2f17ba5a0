package org.swingclearance.plan;

import java.time.Instant;
import java.util.UUID;

/** A share of a plan with a trainer, for the clinician's plan page; {@code active} false once ended. */
public record ShareView(UUID id, UUID trainerId, String trainerName, String trainerEmail, Instant sharedAt,
                        Instant unsharedAt, boolean consentActive) {

    public boolean active() {
        return unsharedAt == null && consentActive;
    }
}
