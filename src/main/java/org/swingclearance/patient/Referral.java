package org.swingclearance.patient;

import jakarta.persistence.Entity;
import jakarta.persistence.Id;
import jakarta.persistence.Table;
import java.time.Instant;
import java.util.UUID;

/** The referral a clinician recorded after a red flag; append-only. */
@Entity
@Table(name = "referral")
public class Referral {

    @Id
    private UUID id;
    private UUID clinicId;
    private UUID episodeId;
    private String referredTo;
    private String note;
    private Instant recordedAt;
    private UUID recordedBy;

    protected Referral() {
    }

    public Referral(UUID id, UUID clinicId, UUID episodeId, String referredTo, String note, Instant recordedAt,
                    UUID recordedBy) {
        this.id = id;
        this.clinicId = clinicId;
        this.episodeId = episodeId;
        this.referredTo = referredTo.trim();
        this.note = note == null || note.isBlank() ? null : note.trim();
        this.recordedAt = recordedAt;
        this.recordedBy = recordedBy;
    }

    public UUID getEpisodeId() { return episodeId; }
    public String getReferredTo() { return referredTo; }
    public String getNote() { return note; }
    public Instant getRecordedAt() { return recordedAt; }
}
