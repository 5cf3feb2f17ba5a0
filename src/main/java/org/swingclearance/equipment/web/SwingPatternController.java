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
import org.swingclearance.equipment.SwingPatterns;
import org.swingclearance.identity.CurrentStaff;
import org.swingclearance.identity.StaffPrincipal;
import org.swingclearance.web.InvalidStateException;

/** The swing pattern library: the built-ins, the clinic's own, adding and retiring the clinic's own. */
@Controller
@RequestMapping("/patterns")
@PreAuthorize("hasAnyRole('CLINICIAN', 'MANAGER', 'ADMIN')")
class SwingPatternController {

    static final String LIBRARY = "equipment/patterns";

    private final SwingPatterns patterns;

    SwingPatternController(SwingPatterns patterns) {
        this.patterns = patterns;
    }

    @GetMapping
    String library(@AuthenticationPrincipal StaffPrincipal me, Model model) {
        model.addAttribute("form", new SwingPatternForm());
        return show(me.staff(), model);
    }

    @PostMapping
    String create(@AuthenticationPrincipal StaffPrincipal me, @Valid @ModelAttribute("form") SwingPatternForm form,
                  BindingResult errors, Model model, RedirectAttributes redirect) {
        if (errors.hasErrors()) {
            return show(me.staff(), model);
        }
        try {
            patterns.create(me.staff(), form.toDetails());
        } catch (InvalidStateException e) {
            errors.rejectValue(e.messageKey().equals("pattern.error.nameTaken") ? "name" : "kind", e.messageKey());
            return show(me.staff(), model);
        }
        redirect.addFlashAttribute("flash", "pattern.created");
        return "redirect:/patterns";
    }

    @PostMapping("/{id}/retire")
    String retire(@AuthenticationPrincipal StaffPrincipal me, @PathVariable UUID id, @RequestParam long version,
                  RedirectAttributes redirect) {
        patterns.retire(me.staff(), id, version);
        redirect.addFlashAttribute("flash", "pattern.retired");
        return "redirect:/patterns";
    }

    private String show(CurrentStaff staff, Model model) {
        model.addAttribute("library", patterns.library(staff));
        model.addAttribute("kinds", SwingPatterns.KINDS);
        model.addAttribute("bands", SwingPatterns.BANDS);
        return LIBRARY;
    }
}
