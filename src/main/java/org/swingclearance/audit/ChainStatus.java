package org.swingclearance.audit;

import java.time.Instant;
import java.time.LocalDate;

/**
 * The state of a clinic's chain for the manager: its head, the last verification (read back from the trail
 * itself), the last checkpoint, the retention setting, and whether checkpoints still use the development key.
 */
public record ChainStatus(long headSeq, Instant headAt, VerificationSummary lastVerification,
                          CheckpointView lastCheckpoint, int retentionYears, Instant earliestEvent,
                          boolean usesDevelopmentKey, String keyId) {

    /** The first day an event of this chain could be deleted under the retention setting; null if no events. */
    public LocalDate earliestDeletion() {
        return earliestEvent == null ? null
                : earliestEvent.atZone(java.time.ZoneOffset.UTC).toLocalDate().plusYears(retentionYears);
    }
}
