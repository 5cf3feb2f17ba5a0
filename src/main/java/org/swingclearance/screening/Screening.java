package org.swingclearance.screening;

import jakarta.persistence.Entity;
import jakarta.persistence.Id;
import jakarta.persistence.Table;
import java.time.Instant;
import java.util.UUID;

/** The identity of one screening of an episode; its content lives in {@link ScreeningVersion}s. Never changes. */
@Entity
@Table(name = "screening")
class Screening {

    @Id
    private UUID id;
    private UUID clinicId;
    private UUID patientId;
    private UUID episodeId;
    private Instant createdAt;
    private UUID createdBy;

    protected Screening() {
    }

    Screening(UUID id, UUID clinicId, UUID patientId, UUID episodeId, Instant createdAt, UUID createdBy) {
        this.id = id;
        this.clinicId = clinicId;
        this.patientId = patientId;
        this.episodeId = episodeId;
        this.createdAt = createdAt;
        this.createdBy = createdBy;
    }

    UUID getId() { return id; }
    UUID getClinicId() { return clinicId; }
    UUID getPatientId() { return patientId; }
    UUID getEpisodeId() { return episodeId; }
    Instant getCreatedAt() { return createdAt; }
    UUID getCreatedBy() { return createdBy; }
}
