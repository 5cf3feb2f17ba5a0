package org.swingclearance.audit.web;

import jakarta.servlet.http.HttpServletResponse;
import jakarta.validation.Valid;
import java.io.IOException;
import java.time.Clock;
import java.util.List;
import java.util.Optional;
import java.util.UUID;
import org.springframework.security.access.prepost.PreAuthorize;
import org.springframework.security.core.annotation.AuthenticationPrincipal;
import org.springframework.stereotype.Controller;
import org.springframework.ui.Model;
import org.springframework.validation.BindingResult;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.ModelAttribute;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestMapping;
import org.swingclearance.audit.AuditFilter;
import org.swingclearance.audit.AuditOutcome;
import org.swingclearance.audit.AuditOversight;
import org.swingclearance.audit.LogCursor;
import org.swingclearance.audit.SafeCsv;
import org.swingclearance.identity.CurrentStaff;
import org.swingclearance.identity.StaffPrincipal;

/** The filtered audit log with keyset paging and CSV export, one event's detail, and a patient's access log. */
@Controller
@RequestMapping("/audit")
@PreAuthorize("hasRole('MANAGER')")
class AuditLogController {

    static final String LOG = "audit/log";
    static final String EVENT = "audit/event";
    static final String PATIENT = "audit/patient";

    /** The exported columns: every hashed field as recorded, the patient's code, and the row's two hashes. */
    static final List<String> CSV_HEADER = List.of("occurred_at_utc", "seq", "event_id", "actor_id", "actor_name",
            "actor_role", "action", "object_type", "object_id", "patient_id", "patient_code", "outcome",
            "client_address", "request_id", "detail", "prev_hash", "row_hash");

    private final AuditOversight oversight;
    private final Clock clock;

    AuditLogController(AuditOversight oversight, Clock clock) {
        this.oversight = oversight;
        this.clock = clock;
    }

    @GetMapping("/log")
    String log(@AuthenticationPrincipal StaffPrincipal me, @Valid @ModelAttribute("filter") LogFilterForm form,
               BindingResult errors, Model model) {
        Optional<AuditFilter> filter = resolve(me.staff(), form, errors);
        LogCursor after = null;
        if (form.getAfter() != null && !form.getAfter().isBlank()) {
            after = LogCursor.parse(form.getAfter()).orElse(null);
            if (after == null) {
                errors.reject("audit.filter.badCursor");
            }
        }
        referenceData(me.staff(), model);
        if (filter.isPresent()) {
            model.addAttribute("page", oversight.browse(me.staff(), filter.get(), after));
        }
        return LOG;
    }

    @PostMapping("/log/export")
    String export(@AuthenticationPrincipal StaffPrincipal me, @Valid @ModelAttribute("filter") LogFilterForm form,
                  BindingResult errors, Model model, HttpServletResponse response) throws IOException {
        Optional<AuditFilter> filter = resolve(me.staff(), form, errors);
        if (filter.isEmpty()) {
            referenceData(me.staff(), model);
            return LOG;
        }
        Downloads.attachment(response, "audit-log", "csv", "text/csv;charset=UTF-8", clock);
        try (SafeCsv csv = new SafeCsv(response.getOutputStream())) {
            csv.row(CSV_HEADER);
            oversight.exportLog(me.staff(), filter.get(), e -> csv.row(java.util.Arrays.asList(
                    e.occurredAt(), e.seq(), e.eventId(), e.actorId(), e.actorName(), e.actorRole(), e.action(),
                    e.objectType(), e.objectId(), e.patientId(), e.patientCode(), e.outcome(), e.clientAddress(),
                    e.requestId(), e.detail(), e.prevHash(), e.rowHash())));
        }
        return null;
    }

    @GetMapping("/events/{eventId}")
    String event(@AuthenticationPrincipal StaffPrincipal me, @PathVariable UUID eventId, Model model) {
        model.addAttribute("detail", oversight.event(me.staff(), eventId));
        return EVENT;
    }

    @GetMapping("/patients/{patientId}")
    String patient(@AuthenticationPrincipal StaffPrincipal me, @PathVariable UUID patientId, Model model) {
        model.addAttribute("log", oversight.patientLog(me.staff(), patientId));
        return PATIENT;
    }

    /**
     * The filter for the service, or empty with field messages: a start after the end, a patient who is not of
     * this clinic. Values that did not even convert (a date like 2026-02-30) already carry their message.
     */
    private Optional<AuditFilter> resolve(CurrentStaff staff, LogFilterForm form, BindingResult errors) {
        if (form.getFrom() != null && form.getTo() != null && form.getTo().isBefore(form.getFrom())) {
            errors.rejectValue("to", "audit.filter.toBeforeFrom");
        }
        UUID patientId = null;
        if (form.hasPatient() && !errors.hasFieldErrors("patient")) {
            patientId = oversight.findPatient(staff, form.getPatient()).orElse(null);
            if (patientId == null) {
                errors.rejectValue("patient", "audit.filter.noSuchPatient");
            }
        }
        if (errors.hasFieldErrors()) {
            return Optional.empty();
        }
        return Optional.of(form.toFilter(patientId));
    }

    private void referenceData(CurrentStaff staff, Model model) {
        model.addAttribute("staff", oversight.staff(staff));
        model.addAttribute("actions", oversight.actions(staff));
        model.addAttribute("outcomes", AuditOutcome.values());
    }
}
