package org.swingclearance.plan;

import jakarta.persistence.Entity;
import jakarta.persistence.Id;
import jakarta.persistence.Table;
import jakarta.persistence.Version;
import java.time.Instant;
import java.util.UUID;

/** The graded plan of one episode; its content lives in numbered {@link PlanVersion}s. */
@Entity
@Table(name = "plan")
public class GradedPlan {

    @Id
    private UUID id;
    private UUID clinicId;
    private UUID episodeId;
    private UUID patientId;
    private Instant createdAt;
    private UUID createdBy;
    @Version
    private long version;

    protected GradedPlan() {
    }

    GradedPlan(UUID id, UUID clinicId, UUID episodeId, UUID patientId, Instant createdAt, UUID createdBy) {
        this.id = id;
        this.clinicId = clinicId;
        this.episodeId = episodeId;
        this.patientId = patientId;
        this.createdAt = createdAt;
        this.createdBy = createdBy;
    }

    public UUID getId() { return id; }
    public UUID getClinicId() { return clinicId; }
    public UUID getEpisodeId() { return episodeId; }
    public UUID getPatientId() { return patientId; }
    public Instant getCreatedAt() { return createdAt; }
}
