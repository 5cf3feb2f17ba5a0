package org.swingclearance.training;

import jakarta.persistence.Column;
import jakarta.persistence.Entity;
import jakarta.persistence.Id;
import jakarta.persistence.Table;
import java.time.Instant;
import java.time.LocalDate;
import java.util.UUID;
import org.hibernate.annotations.Immutable;

/**
 * One version of a session log: the first entry or a correction (with its reason). Carries a snapshot of the
 * plan step it was logged against, so adherence and dose never change when the plan does. Append-only.
 */
@Entity
@Table(name = "session_log_version")
@Immutable
public class SessionLogVersion {

    @Id
    private UUID id;
    private UUID clinicId;
    private UUID sessionLogId;
    private int version;
    private UUID planId;
    private int planVersion;
    private int stepNumber;
    private LocalDate sessionDate;
    private boolean asPlanned;
    private UUID clubId;
    private String clubName;
    private double clubMassKg;
    private double gripMarkCm;
    @Column(name = "cycle_time_s")
    private double cycleTimeS;
    private int sets;
    private int reps;
    private Double demandRatio;
    private UUID plannedClubId;
    private double plannedClubMassKg;
    private double plannedGripMarkCm;
    @Column(name = "planned_cycle_time_s")
    private double plannedCycleTimeS;
    private int plannedSets;
    private int plannedReps;
    private double plannedDemandRatio;
    private int durationMin;
    private int rpe;
    private int painBefore;
    private int painDuring;
    private String notes;
    private String reason;
    private UUID recordedBy;
    private Instant recordedAt;

    protected SessionLogVersion() {
    }

    SessionLogVersion(UUID id, UUID clinicId, UUID sessionLogId, int version, TrainingPlan plan, TrainingStep step,
                      SessionEntry entry, SwingConfiguration done, Double demandRatio, String reason, UUID recordedBy,
                      Instant recordedAt) {
        this.id = id;
        this.clinicId = clinicId;
        this.sessionLogId = sessionLogId;
        this.version = version;
        this.planId = plan.planId();
        this.planVersion = plan.version();
        this.stepNumber = step.number();
        this.sessionDate = entry.date();
        this.asPlanned = entry.asPlanned();
        this.clubId = done.clubId();
        this.clubName = done.clubName();
        this.clubMassKg = done.clubMassKg();
        this.gripMarkCm = done.gripMarkCm();
        this.cycleTimeS = done.cycleTimeS();
        this.sets = done.sets();
        this.reps = done.reps();
        this.demandRatio = demandRatio;
        this.plannedClubId = step.clubId();
        this.plannedClubMassKg = step.clubMassKg();
        this.plannedGripMarkCm = step.gripMarkCm();
        this.plannedCycleTimeS = step.cycleTimeS();
        this.plannedSets = step.sets();
        this.plannedReps = step.reps();
        this.plannedDemandRatio = step.demandRatio();
        this.durationMin = entry.durationMin();
        this.rpe = entry.rpe();
        this.painBefore = entry.painBefore();
        this.painDuring = entry.painDuring();
        this.notes = entry.notes();
        this.reason = reason == null ? null : reason.trim();
        this.recordedBy = recordedBy;
        this.recordedAt = recordedAt;
    }

    /** What was swung. */
    public SwingConfiguration done() {
        return new SwingConfiguration(clubId, clubName, clubMassKg, gripMarkCm, cycleTimeS, sets, reps);
    }

    /** What the step prescribed when the session was logged. */
    public SwingConfiguration planned() {
        return new SwingConfiguration(plannedClubId, null, plannedClubMassKg, plannedGripMarkCm, plannedCycleTimeS,
                plannedSets, plannedReps);
    }

    public UUID getId() { return id; }
    public UUID getSessionLogId() { return sessionLogId; }
    public int getVersion() { return version; }
    public UUID getPlanId() { return planId; }
    public int getPlanVersion() { return planVersion; }
    public int getStepNumber() { return stepNumber; }
    public LocalDate getSessionDate() { return sessionDate; }
    public boolean isAsPlanned() { return asPlanned; }
    public Double getDemandRatio() { return demandRatio; }
    public double getPlannedDemandRatio() { return plannedDemandRatio; }
    public int getDurationMin() { return durationMin; }
    public int getRpe() { return rpe; }
    public int getPainBefore() { return painBefore; }
    public int getPainDuring() { return painDuring; }
    public String getNotes() { return notes; }
    public String getReason() { return reason; }
    public UUID getRecordedBy() { return recordedBy; }
    public Instant getRecordedAt() { return recordedAt; }
}
