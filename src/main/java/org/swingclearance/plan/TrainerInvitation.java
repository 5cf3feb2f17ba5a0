package org.swingclearance.plan;

import jakarta.persistence.Column;
import jakarta.persistence.Entity;
import jakarta.persistence.Id;
import jakarta.persistence.Table;
import jakarta.persistence.Version;
import java.time.Instant;
import java.util.UUID;

/**
 * A one-time invitation for a trainer without an account to see one plan: only the SHA-256 of the link's token is
 * kept; the link expires, and once used it can never be used again (the database keeps a used row read-only).
 */
@Entity
@Table(name = "trainer_invitation")
public class TrainerInvitation {

    @Id
    private UUID id;
    private UUID clinicId;
    private UUID planId;
    private UUID patientId;
    private UUID consentId;
    private String email;
    private String invitedName;
    @Column(name = "token_sha256")
    private String tokenSha256;
    private Instant createdAt;
    private UUID createdBy;
    private Instant expiresAt;
    private Instant usedAt;
    private UUID accountId;
    @Version
    private long version;

    protected TrainerInvitation() {
    }

    TrainerInvitation(UUID id, UUID clinicId, UUID planId, UUID patientId, UUID consentId, String email,
                      String invitedName, String tokenSha256, Instant createdAt, UUID createdBy, Instant expiresAt) {
        this.id = id;
        this.clinicId = clinicId;
        this.planId = planId;
        this.patientId = patientId;
        this.consentId = consentId;
        this.email = email;
        this.invitedName = invitedName;
        this.tokenSha256 = tokenSha256;
        this.createdAt = createdAt;
        this.createdBy = createdBy;
        this.expiresAt = expiresAt;
    }

    /** Open: not used and not yet expired at {@code now}. */
    public boolean isOpenAt(Instant now) {
        return usedAt == null && now.isBefore(expiresAt);
    }

    void markUsed(UUID newAccountId, Instant at) {
        if (usedAt != null) {
            throw new IllegalStateException("invitation " + id + " already used");
        }
        this.usedAt = at;
        this.accountId = newAccountId;
    }

    public UUID getId() { return id; }
    public UUID getClinicId() { return clinicId; }
    public UUID getPlanId() { return planId; }
    public UUID getPatientId() { return patientId; }
    public UUID getConsentId() { return consentId; }
    public String getEmail() { return email; }
    public String getInvitedName() { return invitedName; }
    public Instant getCreatedAt() { return createdAt; }
    public UUID getCreatedBy() { return createdBy; }
    public Instant getExpiresAt() { return expiresAt; }
    public Instant getUsedAt() { return usedAt; }
    public UUID getAccountId() { return accountId; }
}
