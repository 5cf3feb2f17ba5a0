package org.swingclearance.plan.web;

import jakarta.validation.Valid;
import jakarta.validation.constraints.AssertTrue;
import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.Max;
import jakarta.validation.constraints.Min;
import jakarta.validation.constraints.NotNull;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.UUID;
import org.springframework.format.annotation.DateTimeFormat;
import org.swingclearance.plan.Dose;
import org.swingclearance.plan.PlanBands;
import org.swingclearance.plan.PlanSettings;
import org.swingclearance.plan.PlanTarget;
import org.swingclearance.plan.StepUnit;

/** The clinician's plan settings: pattern, optional target, step length, start date and the dose per band. */
public class PlanSettingsForm {

    @NotNull
    private UUID patternId;
    private UUID targetClubId;
    @DecimalMin("0")
    @DecimalMax("200")
    private Double targetGripMarkCm;
    @DecimalMin("0.1")
    @DecimalMax("10")
    private Double targetCycleTimeS;
    private boolean continueProvisionally;
    @NotNull
    private StepUnit stepUnit = StepUnit.SESSIONS;
    @NotNull
    @Min(1)
    @Max(60)
    private Integer stepLength;
    @NotNull
    @Min(1)
    @Max(14)
    private Integer sessionsPerWeek;
    @NotNull
    @DateTimeFormat(iso = DateTimeFormat.ISO.DATE)
    private LocalDate startsOn;
    @Valid
    private List<DoseForm> doses = new ArrayList<>();
    private long lockVersion;

    static PlanSettingsForm from(PlanSettings s, long lockVersion) {
        PlanSettingsForm form = new PlanSettingsForm();
        form.patternId = s.patternId();
        if (s.target() != null) {
            form.targetClubId = s.target().clubId();
            form.targetGripMarkCm = s.target().gripMarkCm();
            form.targetCycleTimeS = s.target().cycleTimeS();
        }
        form.continueProvisionally = s.continueProvisionally();
        form.stepUnit = s.stepUnit();
        form.stepLength = s.stepLength();
        form.sessionsPerWeek = s.sessionsPerWeek();
        form.startsOn = s.startsOn();
        for (String band : PlanBands.PLANNABLE) {
            Dose d = s.doses().get(band);
            if (d != null) {
                form.doses.add(new DoseForm(band, d.sets(), d.reps(), d.effortCap()));
            }
        }
        form.lockVersion = lockVersion;
        return form;
    }

    /** A target is all three of club, grip mark and cycle time, or none of them. */
    @AssertTrue(message = "{plan.settings.error.targetIncomplete}")
    public boolean isTargetWhole() {
        int given = (targetClubId == null ? 0 : 1) + (targetGripMarkCm == null ? 0 : 1)
                + (targetCycleTimeS == null ? 0 : 1);
        return given == 0 || given == 3;
    }

    PlanSettings toSettings() {
        Map<String, Dose> byBand = new LinkedHashMap<>();
        for (DoseForm d : doses) {
            if (PlanBands.plannable(d.getBand())) {
                byBand.put(d.getBand(), new Dose(d.getSets(), d.getReps(), d.getEffortCap()));
            }
        }
        PlanTarget target = targetClubId == null ? null
                : new PlanTarget(targetClubId, targetGripMarkCm, targetCycleTimeS);
        return new PlanSettings(patternId, target, continueProvisionally, stepUnit, stepLength, sessionsPerWeek,
                startsOn, byBand);
    }

    public UUID getPatternId() { return patternId; }
    public void setPatternId(UUID patternId) { this.patternId = patternId; }
    public UUID getTargetClubId() { return targetClubId; }
    public void setTargetClubId(UUID targetClubId) { this.targetClubId = targetClubId; }
    public Double getTargetGripMarkCm() { return targetGripMarkCm; }
    public void setTargetGripMarkCm(Double targetGripMarkCm) { this.targetGripMarkCm = targetGripMarkCm; }
    public Double getTargetCycleTimeS() { return targetCycleTimeS; }
    public void setTargetCycleTimeS(Double targetCycleTimeS) { this.targetCycleTimeS = targetCycleTimeS; }
    public boolean isContinueProvisionally() { return continueProvisionally; }
    public void setContinueProvisionally(boolean continueProvisionally) { this.continueProvisionally = continueProvisionally; }
    public StepUnit getStepUnit() { return stepUnit; }
    public void setStepUnit(StepUnit stepUnit) { this.stepUnit = stepUnit; }
    public Integer getStepLength() { return stepLength; }
    public void setStepLength(Integer stepLength) { this.stepLength = stepLength; }
    public Integer getSessionsPerWeek() { return sessionsPerWeek; }
    public void setSessionsPerWeek(Integer sessionsPerWeek) { this.sessionsPerWeek = sessionsPerWeek; }
    public LocalDate getStartsOn() { return startsOn; }
    public void setStartsOn(LocalDate startsOn) { this.startsOn = startsOn; }
    public List<DoseForm> getDoses() { return doses; }
    public void setDoses(List<DoseForm> doses) { this.doses = doses; }
    public long getLockVersion() { return lockVersion; }
    public void setLockVersion(long lockVersion) { this.lockVersion = lockVersion; }
}
