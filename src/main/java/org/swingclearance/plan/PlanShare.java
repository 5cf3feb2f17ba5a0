package org.swingclearance.plan;

import jakarta.persistence.Entity;
import jakarta.persistence.Id;
import jakarta.persistence.Table;
import jakarta.persistence.Version;
import java.time.Instant;
import java.util.UUID;

/**
 * A plan shared with one trainer on one recorded consent. Ending it (unsharing) keeps the row as history; a share
 * also stops counting the moment its consent is withdrawn.
 */
@Entity
@Table(name = "plan_share")
public class PlanShare {

    @Id
    private UUID id;
    private UUID clinicId;
    private UUID planId;
    private UUID patientId;
    private UUID trainerId;
    private UUID consentId;
    private Instant sharedAt;
    private UUID sharedBy;
    private Instant unsharedAt;
    private UUID unsharedBy;
    @Version
    private long version;

    protected PlanShare() {
    }

    PlanShare(UUID id, UUID clinicId, UUID planId, UUID patientId, UUID trainerId, UUID consentId, Instant sharedAt,
              UUID sharedBy) {
        this.id = id;
        this.clinicId = clinicId;
        this.planId = planId;
        this.patientId = patientId;
        this.trainerId = trainerId;
        this.consentId = consentId;
        this.sharedAt = sharedAt;
        this.sharedBy = sharedBy;
    }

    void end(UUID by, Instant at) {
        if (unsharedAt != null) {
            throw new IllegalStateException("share " + id + " already ended");
        }
        this.unsharedBy = by;
        this.unsharedAt = at;
    }

    public boolean isActive() {
        return unsharedAt == null;
    }

    public UUID getId() { return id; }
    public UUID getClinicId() { return clinicId; }
    public UUID getPlanId() { return planId; }
    public UUID getPatientId() { return patientId; }
    public UUID getTrainerId() { return trainerId; }
    public UUID getConsentId() { return consentId; }
    public Instant getSharedAt() { return sharedAt; }
    public UUID getSharedBy() { return sharedBy; }
    public Instant getUnsharedAt() { return unsharedAt; }
    public UUID getUnsharedBy() { return unsharedBy; }
}
