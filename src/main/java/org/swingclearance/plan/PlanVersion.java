package org.swingclearance.plan;

import jakarta.persistence.Column;
import jakarta.persistence.CollectionTable;
import jakarta.persistence.ElementCollection;
import jakarta.persistence.Entity;
import jakarta.persistence.EnumType;
import jakarta.persistence.Enumerated;
import jakarta.persistence.Id;
import jakarta.persistence.JoinColumn;
import jakarta.persistence.OrderBy;
import jakarta.persistence.OrderColumn;
import jakarta.persistence.Table;
import jakarta.persistence.Version;
import java.time.Instant;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.UUID;

/**
 * One numbered version of a graded plan: the snapshot of what it was computed from, the clinician's settings, the
 * pins and removals, and the computed steps. A draft changes (optimistic locking on {@code lockVersion}); once
 * issued it is signed and read-only, which the database enforces with triggers.
 */
@Entity
@Table(name = "plan_version")
public class PlanVersion {

    @Id
    private UUID id;
    private UUID clinicId;
    private UUID planId;
    private int number;
    @Enumerated(EnumType.STRING)
    private PlanStatus status;
    private UUID sourceScreeningId;
    private int sourceScreeningVersion;
    private int rulesVersion;
    private UUID envelopeSnapshotId;
    private String engineVersion;
    private String band;
    private UUID patternId;
    private String patternName;
    private UUID targetClubId;
    private Double targetGripMarkCm;
    @Column(name = "target_cycle_time_s") // the naming strategy would drop the underscore before a final capital
    private Double targetCycleTimeS;
    private boolean continueProvisionally;
    @Enumerated(EnumType.STRING)
    private StepUnit stepUnit;
    private int stepLength;
    private int sessionsPerWeek;
    private LocalDate startsOn;
    private double stepLimit;
    private int painDuringLimit;
    private String inputs;
    private String outcomeKey;
    private String outcomeArgs;
    private String contentSha256;
    private Instant createdAt;
    private UUID createdBy;
    private Instant issuedAt;
    private UUID issuedBy;
    @Version
    private long lockVersion;

    @ElementCollection
    @CollectionTable(name = "plan_band_dose", joinColumns = @JoinColumn(name = "plan_version_id"))
    private List<BandDose> doses = new ArrayList<>();

    @ElementCollection
    @CollectionTable(name = "plan_adjustment", joinColumns = @JoinColumn(name = "plan_version_id"))
    @OrderColumn(name = "position")
    private List<PlanAdjustment> adjustments = new ArrayList<>();

    @ElementCollection
    @CollectionTable(name = "plan_step", joinColumns = @JoinColumn(name = "plan_version_id"))
    @OrderBy("number")
    private List<PlannedStep> steps = new ArrayList<>();

    protected PlanVersion() {
    }

    PlanVersion(UUID id, UUID clinicId, UUID planId, int number, Instant createdAt, UUID createdBy) {
        this.id = id;
        this.clinicId = clinicId;
        this.planId = planId;
        this.number = number;
        this.status = PlanStatus.DRAFT;
        this.createdAt = createdAt;
        this.createdBy = createdBy;
    }

    /** The clinician's settings; the caller has checked them (pattern of the clinic, target on the grid). */
    void applySettings(PlanSettings settings, String patternName) {
        requireDraft();
        this.patternId = settings.patternId();
        this.patternName = patternName;
        PlanTarget target = settings.target();
        this.targetClubId = target == null ? null : target.clubId();
        this.targetGripMarkCm = target == null ? null : target.gripMarkCm();
        this.targetCycleTimeS = target == null ? null : target.cycleTimeS();
        this.continueProvisionally = settings.continueProvisionally();
        this.stepUnit = settings.stepUnit();
        this.stepLength = settings.stepLength();
        this.sessionsPerWeek = settings.sessionsPerWeek();
        this.startsOn = settings.startsOn();
        doses.clear();
        settings.doses().entrySet().stream().sorted(Map.Entry.comparingByKey())
                .forEach(e -> doses.add(new BandDose(e.getKey(), e.getValue().sets(), e.getValue().reps(),
                        e.getValue().effortCap())));
    }

    /** What the plan was computed from: screening, practice rules, band and the engine's inputs snapshot. */
    void recordSources(UUID screeningId, int screeningVersion, int rulesVersion, String band, double stepLimit,
                       int painDuringLimit) {
        requireDraft();
        this.sourceScreeningId = screeningId;
        this.sourceScreeningVersion = screeningVersion;
        this.rulesVersion = rulesVersion;
        this.band = band;
        this.stepLimit = stepLimit;
        this.painDuringLimit = painDuringLimit;
    }

    /** The computed steps replace the previous ones, with the outcome message and the engine's inputs. */
    void recordComputation(String engineVersion, String inputs, UUID envelopeSnapshotId, List<PlannedStep> computed,
                           String outcomeKey, String outcomeArgs) {
        requireDraft();
        this.engineVersion = engineVersion;
        this.envelopeSnapshotId = envelopeSnapshotId;
        this.inputs = inputs;
        this.steps.clear();
        this.steps.addAll(computed);
        this.outcomeKey = outcomeKey;
        this.outcomeArgs = outcomeArgs;
    }

    void adjust(PlanAdjustment adjustment) {
        requireDraft();
        adjustments.removeIf(a -> a.getClubId().equals(adjustment.getClubId())
                && Math.abs(a.getGripMarkCm() - adjustment.getGripMarkCm()) < 1e-6
                && Math.abs(a.getCycleTimeS() - adjustment.getCycleTimeS()) < 1e-6);
        adjustments.add(adjustment);
    }

    void clearAdjustments() {
        requireDraft();
        adjustments.clear();
    }

    /** Signs the version: from now on the database refuses any change to it. */
    void issue(UUID clinicianId, Instant at, String contentSha256) {
        requireDraft();
        this.status = PlanStatus.ISSUED;
        this.issuedBy = clinicianId;
        this.issuedAt = at;
        this.contentSha256 = contentSha256;
    }

    /** A new draft that starts from this version's settings, sources and adjustments. */
    PlanVersion nextDraft(UUID newId, Instant at, UUID by) {
        PlanVersion next = new PlanVersion(newId, clinicId, planId, number + 1, at, by);
        next.applySettings(settings(), patternName);
        next.recordSources(sourceScreeningId, sourceScreeningVersion, rulesVersion, band, stepLimit, painDuringLimit);
        next.adjustments.addAll(adjustments.stream()
                .map(a -> new PlanAdjustment(a.getKind(), a.getClubId(), a.getGripMarkCm(), a.getCycleTimeS()))
                .toList());
        return next;
    }

    public PlanSettings settings() {
        Map<String, Dose> byBand = new LinkedHashMap<>();
        doses.forEach(d -> byBand.put(d.getBand(), new Dose(d.getSets(), d.getReps(), d.getEffortCap())));
        PlanTarget target = targetClubId == null ? null
                : new PlanTarget(targetClubId, targetGripMarkCm, targetCycleTimeS);
        return new PlanSettings(patternId, target, continueProvisionally, stepUnit, stepLength, sessionsPerWeek,
                startsOn, byBand);
    }

    private void requireDraft() {
        if (status != PlanStatus.DRAFT) {
            throw new IllegalStateException("plan version " + id + " is issued and read-only");
        }
    }

    public UUID getId() { return id; }
    public UUID getClinicId() { return clinicId; }
    public UUID getPlanId() { return planId; }
    public int getNumber() { return number; }
    public PlanStatus getStatus() { return status; }
    public UUID getSourceScreeningId() { return sourceScreeningId; }
    public int getSourceScreeningVersion() { return sourceScreeningVersion; }
    public int getRulesVersion() { return rulesVersion; }
    public String getEngineVersion() { return engineVersion; }
    public UUID getEnvelopeSnapshotId() { return envelopeSnapshotId; }
    public String getBand() { return band; }
    public UUID getPatternId() { return patternId; }
    public String getPatternName() { return patternName; }
    public StepUnit getStepUnit() { return stepUnit; }
    public int getStepLength() { return stepLength; }
    public int getSessionsPerWeek() { return sessionsPerWeek; }
    public LocalDate getStartsOn() { return startsOn; }
    public double getStepLimit() { return stepLimit; }
    public int getPainDuringLimit() { return painDuringLimit; }
    public String getInputs() { return inputs; }
    public String getOutcomeKey() { return outcomeKey; }
    public String getOutcomeArgs() { return outcomeArgs; }
    public String getContentSha256() { return contentSha256; }
    public Instant getCreatedAt() { return createdAt; }
    public UUID getCreatedBy() { return createdBy; }
    public Instant getIssuedAt() { return issuedAt; }
    public UUID getIssuedBy() { return issuedBy; }
    public long getLockVersion() { return lockVersion; }
    public List<BandDose> getDoses() { return List.copyOf(doses); }
    public List<PlanAdjustment> getAdjustments() { return List.copyOf(adjustments); }
    public List<PlannedStep> getSteps() { return List.copyOf(steps); }
}
