package org.swingclearance.patient;

import java.time.LocalDate;
import java.util.UUID;

/** A recorded consent to share a plan with a trainer, as pages and the plan feature see it. */
public record ConsentView(UUID id, String trainerName, String trainerEmail, LocalDate consentedOn,
                          LocalDate withdrawnOn) {

    public boolean active() {
        return withdrawnOn == null;
    }
}
