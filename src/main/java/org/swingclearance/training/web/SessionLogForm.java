package org.swingclearance.training.web;

import jakarta.validation.constraints.AssertTrue;
import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.Max;
import jakarta.validation.constraints.Min;
import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.Size;
import java.time.LocalDate;
import java.util.UUID;
import org.springframework.format.annotation.DateTimeFormat;
import org.swingclearance.training.SessionEntry;
import org.swingclearance.training.TrainingStep;

/**
 * A session as the trainer enters it. Ranges: session RPE on the CR-10 scale (0–10, Foster 2001), pain on the
 * 0–10 numeric rating scale (before and during the session), duration 1–600 min. When the session was not done as the step prescribes, the
 * actual club (a plan club, or another club's mass), grip mark, cycle time and sets × reps are required.
 */
public class SessionLogForm {

    @NotNull
    @DateTimeFormat(iso = DateTimeFormat.ISO.DATE)
    private LocalDate sessionDate;
    @NotNull
    @Min(1)
    private Integer stepNumber;
    private boolean asPlanned = true;
    private UUID clubId;
    @DecimalMin("0.1")
    @DecimalMax("50")
    private Double otherClubMassKg;
    @DecimalMin("0")
    @DecimalMax("150")
    private Double gripMarkCm;
    @DecimalMin("0.3")
    @DecimalMax("20")
    private Double cycleTimeS;
    @Min(1)
    @Max(50)
    private Integer sets;
    @Min(1)
    @Max(500)
    private Integer reps;
    @NotNull
    @Min(1)
    @Max(600)
    private Integer durationMin;
    @NotNull
    @Min(0)
    @Max(10)
    private Integer rpe;
    @NotNull
    @Min(0)
    @Max(10)
    private Integer painBefore;
    @NotNull
    @Min(0)
    @Max(10)
    private Integer painDuring;
    @Size(max = 2000)
    private String notes;

    /** A session not done as planned names a plan club or another club's mass (not both). */
    @AssertTrue
    public boolean isClubGivenWhenDifferent() {
        return asPlanned || (clubId == null) != (otherClubMassKg == null);
    }

    @AssertTrue
    public boolean isGripMarkGivenWhenDifferent() {
        return asPlanned || gripMarkCm != null;
    }

    @AssertTrue
    public boolean isCycleTimeGivenWhenDifferent() {
        return asPlanned || cycleTimeS != null;
    }

    @AssertTrue
    public boolean isVolumeGivenWhenDifferent() {
        return asPlanned || (sets != null && reps != null);
    }

    /** A blank form for a day, preset to the step the plan schedules for it. */
    static SessionLogForm forDay(LocalDate day, TrainingStep step) {
        SessionLogForm form = new SessionLogForm();
        form.sessionDate = day;
        form.stepNumber = step.number();
        form.prefillActual(step);
        return form;
    }

    /** Fills the "if different" fields with a step's values, so the trainer changes only what differed. */
    void prefillActual(TrainingStep step) {
        clubId = step.clubId();
        gripMarkCm = step.gripMarkCm();
        cycleTimeS = step.cycleTimeS();
        sets = step.sets();
        reps = step.reps();
    }

    /** The entry for the service, which resolves a plan club's name and mass from the plan. */
    SessionEntry toEntry() {
        SessionEntry.Actual actual = asPlanned ? null
                : new SessionEntry.Actual(clubId, clubId == null ? otherClubMassKg : null, gripMarkCm, cycleTimeS, sets,
                        reps);
        return new SessionEntry(sessionDate, stepNumber, asPlanned, actual, durationMin, rpe, painBefore, painDuring,
                notes);
    }

    public LocalDate getSessionDate() { return sessionDate; }
    public void setSessionDate(LocalDate sessionDate) { this.sessionDate = sessionDate; }
    public Integer getStepNumber() { return stepNumber; }
    public void setStepNumber(Integer stepNumber) { this.stepNumber = stepNumber; }
    public boolean isAsPlanned() { return asPlanned; }
    public void setAsPlanned(boolean asPlanned) { this.asPlanned = asPlanned; }
    public UUID getClubId() { return clubId; }
    public void setClubId(UUID clubId) { this.clubId = clubId; }
    public Double getOtherClubMassKg() { return otherClubMassKg; }
    public void setOtherClubMassKg(Double otherClubMassKg) { this.otherClubMassKg = otherClubMassKg; }
    public Double getGripMarkCm() { return gripMarkCm; }
    public void setGripMarkCm(Double gripMarkCm) { this.gripMarkCm = gripMarkCm; }
    public Double getCycleTimeS() { return cycleTimeS; }
    public void setCycleTimeS(Double cycleTimeS) { this.cycleTimeS = cycleTimeS; }
    public Integer getSets() { return sets; }
    public void setSets(Integer sets) { this.sets = sets; }
    public Integer getReps() { return reps; }
    public void setReps(Integer reps) { this.reps = reps; }
    public Integer getDurationMin() { return durationMin; }
    public void setDurationMin(Integer durationMin) { this.durationMin = durationMin; }
    public Integer getRpe() { return rpe; }
    public void setRpe(Integer rpe) { this.rpe = rpe; }
    public Integer getPainBefore() { return painBefore; }
    public void setPainBefore(Integer painBefore) { this.painBefore = painBefore; }
    public Integer getPainDuring() { return painDuring; }
    public void setPainDuring(Integer painDuring) { this.painDuring = painDuring; }
    public String getNotes() { return notes; }
    public void setNotes(String notes) { this.notes = notes; }
}
