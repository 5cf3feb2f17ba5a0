package org.swingclearance.patient;

import jakarta.persistence.Entity;
import jakarta.persistence.Id;
import jakarta.persistence.Table;
import jakarta.persistence.Version;
import java.time.Instant;
import java.time.LocalDate;
import java.util.UUID;

/** The patient's consent, with its date, to share their plan with a named trainer; withdrawal keeps the row. */
@Entity
@Table(name = "share_consent")
public class ShareConsent {

    @Id
    private UUID id;
    private UUID clinicId;
    private UUID patientId;
    private String trainerName;
    private String trainerEmail;
    private LocalDate consentedOn;
    private LocalDate withdrawnOn;
    private UUID recordedBy;
    private Instant recordedAt;
    @Version
    private long version;

    protected ShareConsent() {
    }

    public ShareConsent(UUID id, UUID clinicId, UUID patientId, String trainerName, String trainerEmail,
                        LocalDate consentedOn, UUID recordedBy, Instant recordedAt) {
        this.id = id;
        this.clinicId = clinicId;
        this.patientId = patientId;
        this.trainerName = trainerName.trim();
        this.trainerEmail = trainerEmail == null || trainerEmail.isBlank() ? null
                : trainerEmail.trim().toLowerCase(java.util.Locale.ROOT);
        this.consentedOn = consentedOn;
        this.recordedBy = recordedBy;
        this.recordedAt = recordedAt;
    }

    public void withdraw(LocalDate on) {
        this.withdrawnOn = on;
    }

    public boolean isActive() {
        return withdrawnOn == null;
    }

    public ConsentView view() {
        return new ConsentView(id, trainerName, trainerEmail, consentedOn, withdrawnOn);
    }

    public UUID getId() { return id; }
    public UUID getPatientId() { return patientId; }
    public String getTrainerEmail() { return trainerEmail; }
    public String getTrainerName() { return trainerName; }
}
