package org.swingclearance.patient;

import jakarta.persistence.Entity;
import jakarta.persistence.EnumType;
import jakarta.persistence.Enumerated;
import jakarta.persistence.Id;
import jakarta.persistence.Table;
import jakarta.persistence.Version;
import java.time.Instant;
import java.time.LocalDate;
import java.util.UUID;

/** One return-to-training case of a patient: region(s), side, injury or surgery date and goal. */
@Entity
@Table(name = "episode")
public class Episode {

    @Id
    private UUID id;
    private UUID clinicId;
    private UUID patientId;
    @Enumerated(EnumType.STRING)
    private Region region;
    @Enumerated(EnumType.STRING)
    private Side shoulderSide;
    private LocalDate injuryDate;
    private boolean surgery;
    private String goal;
    @Enumerated(EnumType.STRING)
    private EpisodeStatus status;
    private Instant createdAt;
    private UUID createdBy;
    @Version
    private long version;

    protected Episode() {
    }

    public Episode(UUID id, UUID clinicId, UUID patientId, Region region, Side shoulderSide, LocalDate injuryDate,
                   boolean surgery, String goal, Instant createdAt, UUID createdBy) {
        this.id = id;
        this.clinicId = clinicId;
        this.patientId = patientId;
        this.region = region;
        this.shoulderSide = region.includesShoulder() ? shoulderSide : null;
        this.injuryDate = injuryDate;
        this.surgery = surgery;
        this.goal = goal.trim();
        this.status = EpisodeStatus.ACTIVE;
        this.createdAt = createdAt;
        this.createdBy = createdBy;
    }

    public UUID getId() { return id; }
    public UUID getClinicId() { return clinicId; }
    public UUID getPatientId() { return patientId; }
    public Region getRegion() { return region; }
    public Side getShoulderSide() { return shoulderSide; }
    public LocalDate getInjuryDate() { return injuryDate; }
    public boolean isSurgery() { return surgery; }
    public String getGoal() { return goal; }
    public EpisodeStatus getStatus() { return status; }
    public Instant getCreatedAt() { return createdAt; }
}
