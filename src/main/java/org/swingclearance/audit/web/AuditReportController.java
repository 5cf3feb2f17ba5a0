package org.swingclearance.audit.web;

import jakarta.servlet.http.HttpServletResponse;
import jakarta.validation.Valid;
import java.io.IOException;
import java.time.Clock;
import java.time.LocalDate;
import java.util.List;
import org.springframework.context.MessageSource;
import org.springframework.context.i18n.LocaleContextHolder;
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
import org.swingclearance.audit.AuditOversight;
import org.swingclearance.audit.Report;
import org.swingclearance.audit.ReportKind;
import org.swingclearance.audit.SafeCsv;
import org.swingclearance.identity.StaffPrincipal;
import org.swingclearance.web.NotFoundException;

/** The manager's reports, computed from the audit trail, each as a page and as a CSV export. */
@Controller
@RequestMapping("/audit/reports")
@PreAuthorize("hasRole('MANAGER')")
class AuditReportController {

    static final String INDEX = "audit/reports";
    static final String REPORT = "audit/report";

    private final AuditOversight oversight;
    private final MessageSource messages;
    private final Clock clock;

    AuditReportController(AuditOversight oversight, MessageSource messages, Clock clock) {
        this.oversight = oversight;
        this.messages = messages;
        this.clock = clock;
    }

    @GetMapping
    String index(Model model) {
        model.addAttribute("kinds", ReportKind.values());
        return INDEX;
    }

    @GetMapping("/{slug}")
    String report(@AuthenticationPrincipal StaffPrincipal me, @PathVariable String slug,
                  @Valid @ModelAttribute("form") ReportForm form, BindingResult errors, Model model) {
        ReportKind kind = kind(slug);
        model.addAttribute("kind", kind);
        if (validate(form, errors)) {
            model.addAttribute("report", oversight.report(me.staff(), kind, form.toParams(LocalDate.now(clock))));
        }
        return REPORT;
    }

    @PostMapping("/{slug}/export")
    String export(@AuthenticationPrincipal StaffPrincipal me, @PathVariable String slug,
                  @Valid @ModelAttribute("form") ReportForm form, BindingResult errors, Model model,
                  HttpServletResponse response) throws IOException {
        ReportKind kind = kind(slug);
        if (!validate(form, errors)) {
            model.addAttribute("kind", kind);
            return REPORT;
        }
        Report report = oversight.exportReport(me.staff(), kind, form.toParams(LocalDate.now(clock)));
        Downloads.attachment(response, "audit-report-" + kind.slug(), "csv", "text/csv;charset=UTF-8", clock);
        try (SafeCsv csv = new SafeCsv(response.getOutputStream())) {
            csv.row(report.columnKeys().stream()
                    .map(key -> messages.getMessage(key, null, key, LocaleContextHolder.getLocale())).toList());
            for (List<String> row : report.rows()) {
                csv.row(row);
            }
        }
        return null;
    }

    private static ReportKind kind(String slug) {
        return ReportKind.ofSlug(slug).orElseThrow(() -> new NotFoundException("report"));
    }

    private static boolean validate(ReportForm form, BindingResult errors) {
        if (form.getFrom() != null && form.getTo() != null && form.getTo().isBefore(form.getFrom())) {
            errors.rejectValue("to", "audit.filter.toBeforeFrom");
        }
        return !errors.hasErrors();
    }
}
