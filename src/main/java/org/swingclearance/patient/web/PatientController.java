package org.swingclearance.patient.web;

import jakarta.validation.Valid;
import java.time.Clock;
import java.time.LocalDate;
import java.util.Comparator;
import java.util.EnumSet;
import java.util.List;
import java.util.Set;
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
import org.springframework.web.bind.annotation.RequestParam;
import org.springframework.web.servlet.mvc.support.RedirectAttributes;
import org.swingclearance.identity.CurrentStaff;
import org.swingclearance.identity.StaffPrincipal;
import org.swingclearance.patient.Hand;
import org.swingclearance.patient.PatientPage;
import org.swingclearance.patient.PatientPanel;
import org.swingclearance.patient.Patients;
import org.swingclearance.patient.RedFlag;
import org.swingclearance.patient.RedFlagContext;
import org.swingclearance.patient.Region;
import org.swingclearance.patient.Sex;
import org.swingclearance.patient.Side;
import org.swingclearance.web.InvalidStateException;

/** Patient intake, search and the patient page, for clinicians of the patient's own clinic. */
@Controller
@RequestMapping("/patients")
@PreAuthorize("hasRole('CLINICIAN')")
class PatientController {

    static final String LIST = "patients/list";
    static final String FORM = "patients/form";
    static final String DETAIL = "patients/detail";
    static final String EPISODE_FORM = "patients/episode-form";

    private final Patients patients;
    private final List<PatientPanel> panels;
    private final Clock clock;

    PatientController(Patients patients, List<PatientPanel> panels, Clock clock) {
        this.patients = patients;
        this.panels = panels.stream().sorted(Comparator.comparingInt(PatientPanel::order)).toList();
        this.clock = clock;
    }

    @ModelAttribute
    void referenceData(Model model) {
        model.addAttribute("sexes", Sex.values());
        model.addAttribute("hands", Hand.values());
        model.addAttribute("regions", Region.values());
        model.addAttribute("sides", Side.values());
        model.addAttribute("redFlagOptions", RedFlag.values());
    }

    @GetMapping
    String list(@AuthenticationPrincipal StaffPrincipal me, @RequestParam(defaultValue = "") String q,
                @RequestParam(defaultValue = "0") int page, Model model) {
        model.addAttribute("q", q);
        model.addAttribute("result", patients.search(me.staff(), q, page));
        return LIST;
    }

    @GetMapping("/new")
    String newForm(Model model) {
        model.addAttribute("form", new PatientForm());
        return FORM;
    }

    @PostMapping
    String create(@AuthenticationPrincipal StaffPrincipal me, @Valid @ModelAttribute("form") PatientForm form,
                  BindingResult errors, RedirectAttributes redirect) {
        if (errors.hasErrors()) {
            return FORM;
        }
        try {
            UUID id = patients.create(me.staff(), form.toDetails());
            redirect.addFlashAttribute("flash", "patient.created");
            return "redirect:/patients/" + id;
        } catch (InvalidStateException e) {
            errors.rejectValue("code", e.messageKey());
            return FORM;
        }
    }

    @GetMapping("/{id}")
    String detail(@AuthenticationPrincipal StaffPrincipal me, @PathVariable UUID id, Model model) {
        return showDetail(me.staff(), id, model);
    }

    @GetMapping("/{id}/edit")
    String editForm(@AuthenticationPrincipal StaffPrincipal me, @PathVariable UUID id, Model model) {
        PatientPage page = patients.page(me.staff(), id);
        model.addAttribute("form", PatientForm.from(page.patient()));
        model.addAttribute("patientId", id);
        return FORM;
    }

    @PostMapping("/{id}")
    String update(@AuthenticationPrincipal StaffPrincipal me, @PathVariable UUID id,
                  @Valid @ModelAttribute("form") PatientForm form, BindingResult errors, Model model,
                  RedirectAttributes redirect) {
        model.addAttribute("patientId", id);
        if (errors.hasErrors()) {
            patients.requireOwn(me.staff(), id, "PATIENT_UPDATE");
            return FORM;
        }
        try {
            patients.update(me.staff(), id, form.getVersion(), form.toDetails());
        } catch (InvalidStateException e) {
            errors.rejectValue("code", e.messageKey());
            return FORM;
        }
        redirect.addFlashAttribute("flash", "patient.updated");
        return "redirect:/patients/" + id;
    }

    @GetMapping("/{id}/episodes/new")
    String newEpisode(@AuthenticationPrincipal StaffPrincipal me, @PathVariable UUID id, Model model) {
        model.addAttribute("patient", patients.requireOwn(me.staff(), id, "EPISODE_CREATE"));
        model.addAttribute("form", new EpisodeForm());
        return EPISODE_FORM;
    }

    @PostMapping("/{id}/episodes")
    String openEpisode(@AuthenticationPrincipal StaffPrincipal me, @PathVariable UUID id,
                       @Valid @ModelAttribute("form") EpisodeForm form, BindingResult errors, Model model,
                       RedirectAttributes redirect) {
        if (errors.hasErrors()) {
            model.addAttribute("patient", patients.requireOwn(me.staff(), id, "EPISODE_CREATE"));
            return EPISODE_FORM;
        }
        patients.openEpisode(me.staff(), id, form.toDetails());
        redirect.addFlashAttribute("flash", form.getRedFlags().isEmpty() ? "episode.created" : "episode.createdOnHold");
        return "redirect:/patients/" + id;
    }

    @PostMapping("/{id}/episodes/{episodeId}/red-flags")
    String recheckRedFlags(@AuthenticationPrincipal StaffPrincipal me, @PathVariable UUID id,
                           @PathVariable UUID episodeId, @RequestParam(required = false) Set<RedFlag> redFlags,
                           RedirectAttributes redirect) {
        Set<RedFlag> flags = redFlags == null || redFlags.isEmpty() ? EnumSet.noneOf(RedFlag.class) : EnumSet.copyOf(redFlags);
        patients.recordRedFlags(me.staff(), episodeId, RedFlagContext.RECHECK, flags);
        redirect.addFlashAttribute("flash", "redFlags.recorded");
        return "redirect:/patients/" + id;
    }

    @PostMapping("/{id}/episodes/{episodeId}/referral")
    String recordReferral(@AuthenticationPrincipal StaffPrincipal me, @PathVariable UUID id,
                          @PathVariable UUID episodeId, @Valid @ModelAttribute("referralForm") ReferralForm form,
                          BindingResult errors, Model model, RedirectAttributes redirect) {
        if (errors.hasErrors()) {
            model.addAttribute("referralEpisodeId", episodeId);
            return showDetail(me.staff(), id, model);
        }
        try {
            patients.recordReferral(me.staff(), episodeId, form.getReferredTo(), form.getNote());
        } catch (InvalidStateException e) {
            redirect.addFlashAttribute("flash", e.messageKey());
            return "redirect:/patients/" + id;
        }
        redirect.addFlashAttribute("flash", "referral.recorded");
        return "redirect:/patients/" + id;
    }

    @PostMapping("/{id}/consents")
    String recordConsent(@AuthenticationPrincipal StaffPrincipal me, @PathVariable UUID id,
                         @Valid @ModelAttribute("consentForm") ConsentForm form, BindingResult errors, Model model,
                         RedirectAttributes redirect) {
        if (errors.hasErrors()) {
            return showDetail(me.staff(), id, model);
        }
        patients.recordConsent(me.staff(), id, form.getTrainerName(), form.getTrainerEmail(), form.getConsentedOn());
        redirect.addFlashAttribute("flash", "consent.recorded");
        return "redirect:/patients/" + id;
    }

    @PostMapping("/{id}/consents/{consentId}/withdraw")
    String withdrawConsent(@AuthenticationPrincipal StaffPrincipal me, @PathVariable UUID id,
                           @PathVariable UUID consentId, RedirectAttributes redirect) {
        patients.withdrawConsent(me.staff(), id, consentId, LocalDate.now(clock));
        redirect.addFlashAttribute("flash", "consent.withdrawn");
        return "redirect:/patients/" + id;
    }

    private String showDetail(CurrentStaff staff, UUID id, Model model) {
        PatientPage page = patients.page(staff, id);
        model.addAttribute("page", page);
        model.addAttribute("today", LocalDate.now(clock));
        model.addAttribute("panels", panels.stream()
                .map(p -> new Panel(p.template(), p.data(staff, page))).toList());
        if (!model.containsAttribute("referralForm")) {
            model.addAttribute("referralForm", new ReferralForm());
        }
        if (!model.containsAttribute("consentForm")) {
            model.addAttribute("consentForm", new ConsentForm());
        }
        return DETAIL;
    }

    /** One rendered panel of another feature on the patient page. */
    public record Panel(String template, Object data) {
    }
}
