package org.swingclearance.training;

import jakarta.persistence.Entity;
import jakarta.persistence.Id;
import jakarta.persistence.Table;
import java.time.Instant;
import java.util.UUID;
import org.hibernate.annotations.Immutable;

/** The identity of one logged session: whose, for which episode, who first logged it; append-only. */
@Entity
@Table(name = "session_log")
@Immutable
public class SessionLog {

    @Id
    private UUID id;
    private UUID clinicId;
    private UUID patientId;
    private UUID episodeId;
    private UUID createdBy;
    private Instant createdAt;

    protected SessionLog() {
    }

    SessionLog(UUID id, UUID clinicId, UUID patientId, UUID episodeId, UUID createdBy, Instant createdAt) {
        this.id = id;
        this.clinicId = clinicId;
        this.patientId = patientId;
        this.episodeId = episodeId;
        this.createdBy = createdBy;
        this.createdAt = createdAt;
    }

    public UUID getId() { return id; }
    public UUID getPatientId() { return patientId; }
    public UUID getEpisodeId() { return episodeId; }
    public UUID getCreatedBy() { return createdBy; }
    public Instant getCreatedAt() { return createdAt; }
}
