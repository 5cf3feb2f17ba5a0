package org.swingclearance.training;

import jakarta.persistence.Entity;
import jakarta.persistence.EnumType;
import jakarta.persistence.Enumerated;
import jakarta.persistence.Id;
import jakarta.persistence.Table;
import jakarta.persistence.Version;
import java.time.Instant;
import java.time.LocalDate;
import java.util.UUID;

/**
 * An alert for the clinician, raised from a session log (or its next-morning entry), with the step the trainer is
 * told to go back to. Never deleted or rewritten: the database allows only its one acknowledgement.
 */
@Entity
@Table(name = "training_alert")
public class TrainingAlert {

    @Id
    private UUID id;
    private UUID clinicId;
    private UUID patientId;
    private UUID episodeId;
    private UUID sessionLogId;
    private UUID sourceId;
    @Enumerated(EnumType.STRING)
    private AlertKind kind;
    private LocalDate sessionDate;
    private int stepNumber;
    private int regressToStep;
    private Double observed;
    private Double threshold;
    private int rulesVersion;
    private Instant raisedAt;
    private Instant acknowledgedAt;
    private UUID acknowledgedBy;
    private String ackNote;
    @Version
    private long version;

    protected TrainingAlert() {
    }

    TrainingAlert(UUID id, UUID clinicId, UUID patientId, UUID episodeId, UUID sessionLogId, UUID sourceId,
                  AlertKind kind, LocalDate sessionDate, int stepNumber, int regressToStep, Double observed,
                  Double threshold, int rulesVersion, Instant raisedAt) {
        this.id = id;
        this.clinicId = clinicId;
        this.patientId = patientId;
        this.episodeId = episodeId;
        this.sessionLogId = sessionLogId;
        this.sourceId = sourceId;
        this.kind = kind;
        this.sessionDate = sessionDate;
        this.stepNumber = stepNumber;
        this.regressToStep = regressToStep;
        this.observed = observed;
        this.threshold = threshold;
        this.rulesVersion = rulesVersion;
        this.raisedAt = raisedAt;
    }

    void acknowledge(UUID by, Instant at, String note) {
        this.acknowledgedBy = by;
        this.acknowledgedAt = at;
        this.ackNote = note == null || note.isBlank() ? null : note.trim();
    }

    public boolean isOpen() {
        return acknowledgedAt == null;
    }

    public UUID getId() { return id; }
    public UUID getPatientId() { return patientId; }
    public UUID getEpisodeId() { return episodeId; }
    public UUID getSessionLogId() { return sessionLogId; }
    public UUID getSourceId() { return sourceId; }
    public AlertKind getKind() { return kind; }
    public LocalDate getSessionDate() { return sessionDate; }
    public int getStepNumber() { return stepNumber; }
    public int getRegressToStep() { return regressToStep; }
    public Double getObserved() { return observed; }
    public Double getThreshold() { return threshold; }
    public int getRulesVersion() { return rulesVersion; }
    public Instant getRaisedAt() { return raisedAt; }
    public Instant getAcknowledgedAt() { return acknowledgedAt; }
    public UUID getAcknowledgedBy() { return acknowledgedBy; }
    public String getAckNote() { return ackNote; }
    public long getVersion() { return version; }
}
