package org.swingclearance.training.web;

import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.Size;

/** The clinician's acknowledgement of an alert: the version they saw and an optional note. */
public class AcknowledgeForm {

    @NotNull
    private Long version;
    @Size(max = 1000)
    private String note;

    public Long getVersion() { return version; }
    public void setVersion(Long version) { this.version = version; }
    public String getNote() { return note; }
    public void setNote(String note) { this.note = note; }
}
