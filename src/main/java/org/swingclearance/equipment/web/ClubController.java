package org.swingclearance.equipment.web;

import jakarta.validation.Valid;
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
import org.swingclearance.equipment.Clubs;
import org.swingclearance.equipment.InertiaMethod;
import org.swingclearance.equipment.MeasurementRejected;
import org.swingclearance.identity.StaffPrincipal;
import org.swingclearance.web.InvalidStateException;

/**
 * The club inventory: list, add (with the guided pendulum measurement and a "compute" step that saves nothing),
 * edit and retire, for clinicians, managers and administrators of the clinic. Trainers reach only the read-only
 * club page ({@link ClubPageController}); every page here answers them 403.
 */
@Controller
@RequestMapping("/clubs")
@PreAuthorize("hasAnyRole('CLINICIAN', 'MANAGER', 'ADMIN')")
class ClubController {

    static final String LIST = "equipment/clubs";
    static final String FORM = "equipment/club-form";

    private final Clubs clubs;

    ClubController(Clubs clubs) {
        this.clubs = clubs;
    }

    @ModelAttribute
    void referenceData(Model model) {
        model.addAttribute("massUnits", MassUnit.values());
        model.addAttribute("lengthUnits", LengthUnit.values());
        model.addAttribute("inertiaMethods", InertiaMethod.values());
    }

    @GetMapping
    String list(@AuthenticationPrincipal StaffPrincipal me, Model model) {
        model.addAttribute("clubs", clubs.active(me.staff()));
        model.addAttribute("retiredClubs", clubs.retired(me.staff()));
        return LIST;
    }

    @GetMapping("/new")
    String newForm(Model model) {
        model.addAttribute("form", new ClubForm());
        return FORM;
    }

    /** Saves a new club; with {@code compute} only shows the inertia the measurements give. */
    @PostMapping
    String create(@AuthenticationPrincipal StaffPrincipal me, @Valid @ModelAttribute("form") ClubForm form,
                  BindingResult errors, @RequestParam(required = false) String compute, Model model,
                  RedirectAttributes redirect) {
        form.checkMethodFields(errors);
        if (errors.hasErrors()) {
            return FORM;
        }
        try {
            if (compute != null) {
                model.addAttribute("estimate", clubs.preview(form.toDetails()));
                return FORM;
            }
            UUID id = clubs.create(me.staff(), form.toDetails());
            redirect.addFlashAttribute("flash", "club.created");
            return "redirect:/clubs/" + id;
        } catch (MeasurementRejected e) {
            errors.rejectValue(e.field(), e.messageKey(), e.args(), null);
            return FORM;
        }
    }

    @GetMapping("/{id}/edit")
    String editForm(@AuthenticationPrincipal StaffPrincipal me, @PathVariable UUID id, Model model) {
        model.addAttribute("form", ClubForm.from(clubs.page(me.staff(), id)));
        model.addAttribute("clubId", id);
        return FORM;
    }

    @PostMapping("/{id}")
    String update(@AuthenticationPrincipal StaffPrincipal me, @PathVariable UUID id,
                  @Valid @ModelAttribute("form") ClubForm form, BindingResult errors,
                  @RequestParam(required = false) String compute, Model model, RedirectAttributes redirect) {
        model.addAttribute("clubId", id);
        clubs.requireOwn(me.staff(), id, "CLUB_UPDATE");
        form.checkMethodFields(errors);
        if (errors.hasErrors()) {
            return FORM;
        }
        try {
            if (compute != null) {
                model.addAttribute("estimate", clubs.preview(form.toDetails()));
                return FORM;
            }
            clubs.update(me.staff(), id, form.getVersion(), form.toDetails());
        } catch (MeasurementRejected e) {
            errors.rejectValue(e.field(), e.messageKey(), e.args(), null);
            return FORM;
        } catch (InvalidStateException e) {
            errors.reject(e.messageKey());
            return FORM;
        }
        redirect.addFlashAttribute("flash", "club.updated");
        return "redirect:/clubs/" + id;
    }

    /** "Delete" of a club: it is retired, kept for the plans that used it, and hidden from new ones. */
    @PostMapping("/{id}/retire")
    String retire(@AuthenticationPrincipal StaffPrincipal me, @PathVariable UUID id, @RequestParam long version,
                  RedirectAttributes redirect) {
        clubs.retire(me.staff(), id, version);
        redirect.addFlashAttribute("flash", "club.retired");
        return "redirect:/clubs";
    }
}
