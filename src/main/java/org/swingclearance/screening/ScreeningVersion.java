package org.swingclearance.screening;

import jakarta.persistence.Column;
import jakarta.persistence.Entity;
import jakarta.persistence.EnumType;
import jakarta.persistence.Enumerated;
import jakarta.persistence.Id;
import jakarta.persistence.Table;
import jakarta.persistence.Version;
import java.time.Instant;
import java.util.UUID;
import java.util.function.Function;
import org.hibernate.annotations.JdbcTypeCode;
import org.hibernate.type.SqlTypes;

/**
 * One version of a screening. While a draft it takes new measurements and a recomputed snapshot; signing freezes
 * it, and from then on the database refuses any change (trigger {@code screening_version_guard}).
 */
@Entity
@Table(name = "screening_version")
class ScreeningVersion {

    @Id
    private UUID id;
    private UUID screeningId;
    private UUID clinicId;
    private int versionNo;
    @Enumerated(EnumType.STRING)
    private ScreeningStatus status;
    private UUID supersedesVersionId;
    private String changeReason;
    @JdbcTypeCode(SqlTypes.JSON)
    private String measurements;
    @JdbcTypeCode(SqlTypes.JSON)
    private String snapshot;
    private UUID ruleSetId;
    private int rulesVersion;
    private String engineVersion;
    private String suggestedShoulderBand;
    private String suggestedLumbopelvicBand;
    private String shoulderBand;
    private String lumbopelvicBand;
    private String shoulderOverrideReason;
    private String lumbopelvicOverrideReason;
    private boolean redFlagsOpen;
    private UUID createdBy;
    private Instant createdAt;
    private Instant updatedAt;
    private UUID signedBy;
    private Instant signedAt;
    @Column(name = "content_hash")
    private byte[] contentHash;
    @Version
    private long lockVersion;

    protected ScreeningVersion() {
    }

    /** A new draft: version 1 of a screening, or an amendment superseding a signed version with a reason. */
    ScreeningVersion(UUID id, UUID screeningId, UUID clinicId, int versionNo, UUID supersedesVersionId,
                     String changeReason, UUID createdBy, Instant now, StoredContent content) {
        this.id = id;
        this.screeningId = screeningId;
        this.clinicId = clinicId;
        this.versionNo = versionNo;
        this.status = ScreeningStatus.DRAFT;
        this.supersedesVersionId = supersedesVersionId;
        this.changeReason = changeReason;
        this.createdBy = createdBy;
        this.createdAt = now;
        apply(content, now);
    }

    /** Replaces the draft's measurements and recomputed snapshot. */
    void update(StoredContent content, Instant now) {
        requireDraft();
        apply(content, now);
    }

    /**
     * Freezes the draft with the decided bands and seals it with the hash of its final content; from the flush on,
     * the database refuses any change to this row.
     */
    void sign(String shoulderBand, String shoulderReason, String lumbopelvicBand, String lumbopelvicReason,
              UUID signer, Instant at, Function<ScreeningVersion, byte[]> contentHash) {
        requireDraft();
        this.shoulderBand = shoulderBand;
        this.shoulderOverrideReason = shoulderReason;
        this.lumbopelvicBand = lumbopelvicBand;
        this.lumbopelvicOverrideReason = lumbopelvicReason;
        this.signedBy = signer;
        this.signedAt = at;
        this.updatedAt = at;
        this.status = versionNo == 1 ? ScreeningStatus.SIGNED : ScreeningStatus.AMENDED;
        this.contentHash = contentHash.apply(this);
    }

    private void apply(StoredContent content, Instant now) {
        this.measurements = content.measurementsJson();
        this.snapshot = content.snapshotJson();
        this.ruleSetId = content.ruleSetId();
        this.rulesVersion = content.rulesVersion();
        this.engineVersion = content.engineVersion();
        this.suggestedShoulderBand = content.suggestedShoulderBand();
        this.suggestedLumbopelvicBand = content.suggestedLumbopelvicBand();
        this.redFlagsOpen = content.redFlagsOpen();
        this.updatedAt = now;
    }

    private void requireDraft() {
        if (status != ScreeningStatus.DRAFT) {
            throw new IllegalStateException("screening version " + id + " is signed and read-only");
        }
    }

    UUID getId() { return id; }
    UUID getScreeningId() { return screeningId; }
    UUID getClinicId() { return clinicId; }
    int getVersionNo() { return versionNo; }
    ScreeningStatus getStatus() { return status; }
    UUID getSupersedesVersionId() { return supersedesVersionId; }
    String getChangeReason() { return changeReason; }
    String getMeasurements() { return measurements; }
    String getSnapshot() { return snapshot; }
    UUID getRuleSetId() { return ruleSetId; }
    int getRulesVersion() { return rulesVersion; }
    String getEngineVersion() { return engineVersion; }
    String getSuggestedShoulderBand() { return suggestedShoulderBand; }
    String getSuggestedLumbopelvicBand() { return suggestedLumbopelvicBand; }
    String getShoulderBand() { return shoulderBand; }
    String getLumbopelvicBand() { return lumbopelvicBand; }
    String getShoulderOverrideReason() { return shoulderOverrideReason; }
    String getLumbopelvicOverrideReason() { return lumbopelvicOverrideReason; }
    boolean isRedFlagsOpen() { return redFlagsOpen; }
    UUID getCreatedBy() { return createdBy; }
    Instant getCreatedAt() { return createdAt; }
    Instant getUpdatedAt() { return updatedAt; }
    UUID getSignedBy() { return signedBy; }
    Instant getSignedAt() { return signedAt; }
    byte[] getContentHash() { return contentHash; }
    long getLockVersion() { return lockVersion; }

    /** The computed part of a version as stored: JSON documents plus the columns queries need. */
    record StoredContent(String measurementsJson, String snapshotJson, UUID ruleSetId, int rulesVersion,
                         String engineVersion, String suggestedShoulderBand, String suggestedLumbopelvicBand,
                         boolean redFlagsOpen) {
    }
}
