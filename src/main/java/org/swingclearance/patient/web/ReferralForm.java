package org.swingclearance.patient.web;

import jakarta.validation.constraints.NotBlank;
import jakarta.validation.constraints.Size;

/** Recording where a patient with a red flag was referred. */
public class ReferralForm {

    @NotBlank
    @Size(max = 300)
    private String referredTo;
    @Size(max = 2000)
    private String note;

    public String getReferredTo() { return referredTo; }
    public void setReferredTo(String referredTo) { this.referredTo = referredTo; }
    public String getNote() { return note; }
    public void setNote(String note) { this.note = note; }
}
