package org.swingclearance.training.web;

import jakarta.validation.constraints.NotBlank;
import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.Size;
import org.swingclearance.training.SessionView;

/**
 * A correction of a logged session: the whole session again, the reason for the change (mandatory), and the
 * version the corrector saw (a correction of a version that is no longer the latest is a conflict).
 */
public class CorrectionForm extends SessionLogForm {

    @NotBlank
    @Size(max = 1000)
    private String reason;
    @NotNull
    private Integer version;

    static CorrectionForm from(SessionView session) {
        CorrectionForm form = new CorrectionForm();
        form.setSessionDate(session.date());
        form.setStepNumber(session.stepNumber());
        form.setAsPlanned(session.asPlanned());
        form.setClubId(session.done().clubId());
        form.setOtherClubMassKg(session.done().clubId() == null ? session.done().clubMassKg() : null);
        form.setGripMarkCm(session.done().gripMarkCm());
        form.setCycleTimeS(session.done().cycleTimeS());
        form.setSets(session.done().sets());
        form.setReps(session.done().reps());
        form.setDurationMin(session.durationMin());
        form.setRpe(session.rpe());
        form.setPainBefore(session.painBefore());
        form.setPainDuring(session.painDuring());
        form.setNotes(session.notes());
        form.version = session.version();
        return form;
    }

    public String getReason() { return reason; }
    public void setReason(String reason) { this.reason = reason; }
    public Integer getVersion() { return version; }
    public void setVersion(Integer version) { this.version = version; }
}
