package org.swingclearance.training;

import java.time.Instant;
import java.time.LocalDate;
import java.util.UUID;

/**
 * An alert as the clinician's lists and the trainer's page show it: what was observed against which limit, the
 * step the trainer is told to go back to, whether the session was corrected after the alert, and its state.
 */
public record AlertView(UUID id, UUID patientId, String patientLabel, UUID episodeId, AlertKind kind,
                        LocalDate sessionDate, int stepNumber, int regressToStep, Double observed, Double threshold,
                        int rulesVersion, Instant raisedAt, boolean open, Instant acknowledgedAt, String ackNote,
                        long version, boolean sourceSuperseded) {

    /** Decimals to show the observed value and limit with: pain ratings are whole numbers, ratios are not. */
    public int decimals() {
        return kind == AlertKind.PAIN_DURING || kind == AlertKind.PAIN_NOT_SETTLED ? 0 : 2;
    }
}
