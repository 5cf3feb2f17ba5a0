package org.swingclearance.training;

import jakarta.persistence.Entity;
import jakarta.persistence.Id;
import jakarta.persistence.Table;
import java.time.Instant;
import java.util.UUID;
import org.hibernate.annotations.Immutable;

/**
 * The pain rating (0–10) the morning after a session, added to the log the next day; a correction is a new
 * version with a reason. Append-only.
 */
@Entity
@Table(name = "session_morning_pain")
@Immutable
public class MorningPain {

    @Id
    private UUID id;
    private UUID clinicId;
    private UUID sessionLogId;
    private int version;
    private int pain;
    private String reason;
    private UUID recordedBy;
    private Instant recordedAt;

    protected MorningPain() {
    }

    MorningPain(UUID id, UUID clinicId, UUID sessionLogId, int version, int pain, String reason, UUID recordedBy,
                Instant recordedAt) {
        this.id = id;
        this.clinicId = clinicId;
        this.sessionLogId = sessionLogId;
        this.version = version;
        this.pain = pain;
        this.reason = reason == null ? null : reason.trim();
        this.recordedBy = recordedBy;
        this.recordedAt = recordedAt;
    }

    public UUID getId() { return id; }
    public UUID getSessionLogId() { return sessionLogId; }
    public int getVersion() { return version; }
    public int getPain() { return pain; }
    public String getReason() { return reason; }
    public UUID getRecordedBy() { return recordedBy; }
    public Instant getRecordedAt() { return recordedAt; }
}
