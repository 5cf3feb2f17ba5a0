package org.swingclearance.audit.web;

import jakarta.validation.constraints.Pattern;
import jakarta.validation.constraints.Size;
import java.time.LocalDate;
import java.time.ZoneOffset;
import java.util.UUID;
import org.springframework.format.annotation.DateTimeFormat;
import org.swingclearance.audit.AuditFilter;
import org.swingclearance.audit.AuditOutcome;

/** The audit log's filter as typed: patient id or code, account, action, outcome, and a period in UTC days. */
public class LogFilterForm {

    @Size(max = 80)
    private String patient;
    private UUID actor;
    @Size(max = 40)
    @Pattern(regexp = "[A-Z0-9_]*")
    private String action;
    private AuditOutcome outcome;
    @DateTimeFormat(iso = DateTimeFormat.ISO.DATE)
    private LocalDate from;
    @DateTimeFormat(iso = DateTimeFormat.ISO.DATE)
    private LocalDate to;
    @Size(max = 60)
    private String after;

    /** The filter for the service, with the patient already resolved to an id of the own clinic. */
    AuditFilter toFilter(UUID patientId) {
        return new AuditFilter(patientId, actor, blankToNull(action), outcome,
                from == null ? null : from.atStartOfDay(ZoneOffset.UTC).toInstant(),
                to == null ? null : to.plusDays(1).atStartOfDay(ZoneOffset.UTC).toInstant());
    }

    boolean hasPatient() {
        return patient != null && !patient.isBlank();
    }

    private static String blankToNull(String text) {
        return text == null || text.isBlank() ? null : text.trim();
    }

    public String getPatient() { return patient; }
    public void setPatient(String patient) { this.patient = patient; }
    public UUID getActor() { return actor; }
    public void setActor(UUID actor) { this.actor = actor; }
    public String getAction() { return action; }
    public void setAction(String action) { this.action = action; }
    public AuditOutcome getOutcome() { return outcome; }
    public void setOutcome(AuditOutcome outcome) { this.outcome = outcome; }
    public LocalDate getFrom() { return from; }
    public void setFrom(LocalDate from) { this.from = from; }
    public LocalDate getTo() { return to; }
    public void setTo(LocalDate to) { this.to = to; }
    public String getAfter() { return after; }
    public void setAfter(String after) { this.after = after; }
}
