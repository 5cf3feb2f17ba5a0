package org.swingclearance.audit.web;

import jakarta.servlet.http.HttpServletResponse;
import jakarta.validation.Valid;
import java.io.IOException;
import java.time.Clock;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.springframework.security.access.prepost.PreAuthorize;
import org.springframework.security.core.annotation.AuthenticationPrincipal;
import org.springframework.stereotype.Controller;
import org.springframework.ui.Model;
import org.springframework.validation.BindingResult;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.ModelAttribute;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestMapping;
import org.springframework.web.bind.annotation.RequestParam;
import org.springframework.web.servlet.mvc.support.RedirectAttributes;
import org.swingclearance.audit.AuditOversight;
import org.swingclearance.audit.ExportFormat;
import org.swingclearance.audit.MonthlyActivity;
import org.swingclearance.audit.Overview;
import org.swingclearance.audit.VerificationReport;
import org.swingclearance.identity.CurrentStaff;
import org.swingclearance.identity.StaffPrincipal;

/** The manager's audit start page: chain status, "verify now", checkpoints, activity and retention. */
@Controller
@RequestMapping("/audit")
@PreAuthorize("hasRole('MANAGER')")
class AuditController {

    static final String OVERVIEW = "audit/overview";

    private final AuditOversight oversight;
    private final Clock clock;

    AuditController(AuditOversight oversight, Clock clock) {
        this.oversight = oversight;
        this.clock = clock;
    }

    @GetMapping
    String overview(@AuthenticationPrincipal StaffPrincipal me, Model model) {
        RetentionForm form = new RetentionForm();
        form.setVersion(oversight.clinicVersion(me.staff()));
        return showOverview(me.staff(), form, model);
    }

    @PostMapping("/verify")
    String verify(@AuthenticationPrincipal StaffPrincipal me, RedirectAttributes redirect) {
        VerificationReport report = oversight.verify(me.staff());
        redirect.addFlashAttribute("flash", report.intact() ? "audit.verify.intact" : "audit.verify.broken");
        return "redirect:/audit";
    }

    @PostMapping("/checkpoints")
    String checkpoint(@AuthenticationPrincipal StaffPrincipal me, RedirectAttributes redirect) {
        boolean created = oversight.checkpointNow(me.staff()).isPresent();
        redirect.addFlashAttribute("flash", created ? "audit.checkpoint.created" : "audit.checkpoint.unchanged");
        return "redirect:/audit";
    }

    @PostMapping("/checkpoints/export")
    void exportCheckpoints(@AuthenticationPrincipal StaffPrincipal me,
                           @RequestParam(defaultValue = "CSV") ExportFormat format, HttpServletResponse response)
            throws IOException {
        if (format == ExportFormat.JSON) {
            Downloads.attachment(response, "audit-checkpoints", "json", "application/json", clock);
        } else {
            Downloads.attachment(response, "audit-checkpoints", "csv", "text/csv;charset=UTF-8", clock);
        }
        oversight.exportCheckpoints(me.staff(), format, response.getOutputStream());
    }

    @PostMapping("/retention")
    String retention(@AuthenticationPrincipal StaffPrincipal me, @Valid @ModelAttribute("retentionForm") RetentionForm form,
                     BindingResult errors, Model model, RedirectAttributes redirect) {
        if (errors.hasErrors()) {
            return showOverview(me.staff(), form, model);
        }
        oversight.setRetention(me.staff(), form.getYears(), form.getVersion());
        redirect.addFlashAttribute("flash", "audit.retention.saved");
        return "redirect:/audit";
    }

    private String showOverview(CurrentStaff staff, RetentionForm form, Model model) {
        Overview overview = oversight.overview(staff);
        if (form.getYears() == null) {
            form.setYears(overview.status().retentionYears());
        }
        model.addAttribute("overview", overview);
        model.addAttribute("retentionForm", form);
        model.addAttribute("activity", chartData(overview.activity()));
        return OVERVIEW;
    }

    /** The chart's numbers, serialised into a JSON script block by Thymeleaf's JavaScript inlining. */
    static Map<String, Object> chartData(List<MonthlyActivity> months) {
        Map<String, Object> data = new LinkedHashMap<>();
        data.put("months", months.stream().map(MonthlyActivity::month).toList());
        data.put("events", months.stream().map(MonthlyActivity::events).toList());
        data.put("aboutPatients", months.stream().map(MonthlyActivity::aboutPatients).toList());
        data.put("denied", months.stream().map(MonthlyActivity::denied).toList());
        return data;
    }
}
