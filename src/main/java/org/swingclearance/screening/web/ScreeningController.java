package org.swingclearance.screening.web;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.UUID;
import org.springframework.context.MessageSource;
import org.springframework.context.i18n.LocaleContextHolder;
import org.springframework.http.MediaType;
import org.springframework.security.access.prepost.PreAuthorize;
import org.springframework.security.core.annotation.AuthenticationPrincipal;
import org.springframework.stereotype.Controller;
import org.springframework.ui.Model;
import org.springframework.validation.BindingResult;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.ModelAttribute;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestParam;
import org.springframework.web.bind.annotation.ResponseBody;
import org.springframework.web.servlet.mvc.support.RedirectAttributes;
import org.swingclearance.engine.rules.LoadBand;
import org.swingclearance.identity.CurrentStaff;
import org.swingclearance.identity.StaffPrincipal;
import org.swingclearance.identity.StaffRole;
import org.swingclearance.patient.RedFlag;
import org.swingclearance.screening.FieldProblem;
import org.swingclearance.screening.MeasurementReading;
import org.swingclearance.screening.Measurements;
import org.swingclearance.screening.ScreeningPage;
import org.swingclearance.screening.ScreeningRefused;
import org.swingclearance.screening.ScreeningSnapshot;
import org.swingclearance.screening.Screenings;
import org.swingclearance.web.InvalidStateException;

/**
 * Screening pages for clinicians (managers may read them): start a screening for an episode, fill the sectioned
 * form, see derived values and findings (live through {@code /preview}, or with the "Calculate" button without
 * JavaScript), save a draft, decide the bands and sign, and start an amendment of a signed screening.
 */
@Controller
class ScreeningController {

    static final String FORM = "screening/form";
    static final String VIEW = "screening/view";

    private final Screenings screenings;
    private final MessageSource messages;

    ScreeningController(Screenings screenings, MessageSource messages) {
        this.screenings = screenings;
        this.messages = messages;
    }

    @ModelAttribute
    void referenceData(Model model) {
        model.addAttribute("layout", FormLayout.SECTIONS);
        model.addAttribute("bands", LoadBand.values());
        model.addAttribute("redFlagOptions", RedFlag.values());
    }

    @PostMapping("/episodes/{episodeId}/screenings")
    @PreAuthorize("hasRole('CLINICIAN')")
    String start(@AuthenticationPrincipal StaffPrincipal me, @PathVariable UUID episodeId,
                 RedirectAttributes redirect) {
        try {
            return "redirect:/screenings/" + screenings.start(me.staff(), episodeId);
        } catch (InvalidStateException e) {
            redirect.addFlashAttribute("flash", e.messageKey());
            return "redirect:/";
        }
    }

    @GetMapping("/screenings/{id}")
    @PreAuthorize("hasAnyRole('CLINICIAN', 'MANAGER')")
    String show(@AuthenticationPrincipal StaffPrincipal me, @PathVariable UUID id, Model model) {
        ScreeningPage page = screenings.page(me.staff(), id);
        if (page.editable() && me.staff().is(StaffRole.CLINICIAN)) {
            ScreeningForm form = ScreeningForm.of(page.shown().measurements(), page.shown().lockVersion());
            return renderForm(page, form, page.shown().snapshot(), page.shown().measurements(), model);
        }
        return renderView(page, model);
    }

    @GetMapping("/screenings/{id}/versions/{versionNo}")
    @PreAuthorize("hasAnyRole('CLINICIAN', 'MANAGER')")
    String version(@AuthenticationPrincipal StaffPrincipal me, @PathVariable UUID id, @PathVariable int versionNo,
                   Model model) {
        return renderView(screenings.page(me.staff(), id, versionNo), model);
    }

    /**
     * The form's buttons: "calculate" (show results, save nothing), "save" (draft) or "sign". A form sent for a
     * version that was signed meanwhile (a second click, another tab) changes nothing and says so.
     */
    @PostMapping("/screenings/{id}")
    @PreAuthorize("hasRole('CLINICIAN')")
    String submit(@AuthenticationPrincipal StaffPrincipal me, @PathVariable UUID id,
                  @ModelAttribute("form") ScreeningForm form, BindingResult errors,
                  @RequestParam(defaultValue = "save") String action, Model model, RedirectAttributes redirect) {
        try {
            return handle(me.staff(), id, form, errors, action, model, redirect);
        } catch (InvalidStateException e) {
            redirect.addFlashAttribute("flash", e.messageKey());
            return "redirect:/screenings/" + id;
        }
    }

    private String handle(CurrentStaff staff, UUID id, ScreeningForm form, BindingResult errors, String action,
                          Model model, RedirectAttributes redirect) {
        MeasurementReading reading = MeasurementReading.of(form.getValues(), form.redFlagSet());
        if (!reading.valid()) {
            reading.problems().forEach((key, p) -> errors.rejectValue(ScreeningForm.path(key), p.code(),
                    p.args().toArray(), null));
            errors.reject("screening.error.fix");
            ScreeningPage page = screenings.page(staff, id);
            return renderForm(page, form, page.shown().snapshot(), page.shown().measurements(), model);
        }
        switch (action) {
            case "calculate" -> {
                ScreeningPage page = screenings.page(staff, id);
                return renderForm(page, form, screenings.preview(staff, id, reading.measurements()),
                        reading.measurements(), model);
            }
            case "sign" -> {
                long lock = screenings.saveDraft(staff, id, form.getLockVersion(), reading.measurements());
                try {
                    screenings.sign(staff, id, lock, form.decision());
                } catch (ScreeningRefused refused) {
                    form.setLockVersion(lock);
                    refused.problems().forEach(p -> {
                        if (p.field() == null) {
                            errors.reject(p.code(), args(p), null);
                        } else {
                            errors.rejectValue(p.field(), p.code(), args(p), null);
                        }
                    });
                    ScreeningPage page = screenings.page(staff, id);
                    return renderForm(page, form, page.shown().snapshot(), page.shown().measurements(), model);
                }
                redirect.addFlashAttribute("flash", "screening.signed");
                return "redirect:/screenings/" + id;
            }
            default -> {
                screenings.saveDraft(staff, id, form.getLockVersion(), reading.measurements());
                redirect.addFlashAttribute("flash", "screening.saved");
                return "redirect:/screenings/" + id;
            }
        }
    }

    /** The live preview: the typed form in, the findings panel (or field problems) out; nothing is saved. */
    @PostMapping(value = "/screenings/{id}/preview", produces = MediaType.APPLICATION_JSON_VALUE)
    @PreAuthorize("hasRole('CLINICIAN')")
    @ResponseBody
    FindingsPanel preview(@AuthenticationPrincipal StaffPrincipal me, @PathVariable UUID id,
                          @ModelAttribute("form") ScreeningForm form) {
        MeasurementReading reading = MeasurementReading.of(form.getValues(), form.redFlagSet());
        Locale locale = LocaleContextHolder.getLocale();
        if (!reading.valid()) {
            Map<String, String> fieldErrors = new LinkedHashMap<>();
            reading.problems().forEach((key, p) -> fieldErrors.put(key, message(p, locale)));
            return FindingsPanel.problems(fieldErrors);
        }
        ScreeningSnapshot snapshot = screenings.preview(me.staff(), id, reading.measurements());
        return FindingsPanel.of(snapshot, reading.measurements().recordedEngineMeasures(), messages, locale, Map.of());
    }

    @PostMapping("/screenings/{id}/amendments")
    @PreAuthorize("hasRole('CLINICIAN')")
    String amend(@AuthenticationPrincipal StaffPrincipal me, @PathVariable UUID id,
                 @RequestParam(required = false) String reason, Model model, RedirectAttributes redirect) {
        try {
            screenings.amend(me.staff(), id, reason);
        } catch (ScreeningRefused refused) {
            model.addAttribute("amendError", refused.problems().get(0).code());
            model.addAttribute("amendReason", reason);
            return renderView(screenings.page(me.staff(), id), model);
        } catch (InvalidStateException e) {
            redirect.addFlashAttribute("flash", e.messageKey());
            return "redirect:/screenings/" + id;
        }
        redirect.addFlashAttribute("flash", "screening.amendmentStarted");
        return "redirect:/screenings/" + id;
    }

    private String renderForm(ScreeningPage page, ScreeningForm form, ScreeningSnapshot snapshot,
                              Measurements measured, Model model) {
        model.addAttribute("page", page);
        model.addAttribute("form", form);
        model.addAttribute("panel", FindingsPanel.of(snapshot, measured.recordedEngineMeasures(), messages,
                LocaleContextHolder.getLocale(), Map.of()));
        return FORM;
    }

    private String renderView(ScreeningPage page, Model model) {
        model.addAttribute("page", page);
        model.addAttribute("shownValues", ScreeningForm.of(page.shown().measurements(), 0).getValues());
        model.addAttribute("panel", FindingsPanel.of(page.shown().snapshot(),
                page.shown().measurements().recordedEngineMeasures(), messages, LocaleContextHolder.getLocale(),
                Map.of()));
        return VIEW;
    }

    private String message(FieldProblem p, Locale locale) {
        return messages.getMessage(p.code(), p.args().toArray(), p.code(), locale);
    }

    /** Message arguments of a refusal; value keys (what signing needs) become their labels. */
    private Object[] args(ScreeningRefused.Problem p) {
        if ("screening.sign.missing".equals(p.code())) {
            Locale locale = LocaleContextHolder.getLocale();
            List<String> labels = java.util.Arrays.stream(p.args().get(0).split(","))
                    .map(k -> messages.getMessage("ValueKey." + k, null, k, locale)).toList();
            return new Object[] {String.join(", ", labels)};
        }
        return p.args().toArray();
    }
}
