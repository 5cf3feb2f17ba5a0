package org.swingclearance.identity.web;

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
import org.swingclearance.identity.StaffAccounts;
import org.swingclearance.identity.StaffPrincipal;
import org.swingclearance.identity.StaffRole;
import org.swingclearance.web.InvalidStateException;
import org.swingclearance.web.NotFoundException;

/** A clinic administrator manages the clinic's staff accounts. */
@Controller
@RequestMapping("/staff")
@PreAuthorize("hasRole('ADMIN')")
class StaffController {

    static final String LIST = "identity/staff-list";
    static final String FORM = "identity/staff-form";

    private final StaffAccounts staff;

    StaffController(StaffAccounts staff) {
        this.staff = staff;
    }

    @ModelAttribute("roles")
    StaffRole[] roles() {
        return StaffRole.values();
    }

    @GetMapping
    String list(@AuthenticationPrincipal StaffPrincipal me, Model model) {
        model.addAttribute("accounts", staff.list(me.staff()));
        return LIST;
    }

    @GetMapping("/new")
    String newForm(Model model) {
        model.addAttribute("form", new StaffForm());
        model.addAttribute("creating", true);
        return FORM;
    }

    @PostMapping
    String create(@AuthenticationPrincipal StaffPrincipal me, @Valid @ModelAttribute("form") StaffForm form,
                  BindingResult errors, Model model, RedirectAttributes redirect) {
        model.addAttribute("creating", true);
        if (errors.hasErrors()) {
            return FORM;
        }
        try {
            staff.create(me.staff(), form.getEmail(), form.getDisplayName(), form.getRole(), form.getPassword());
        } catch (InvalidStateException e) {
            errors.rejectValue(e.messageKey().startsWith("password") ? "password" : "email", e.messageKey());
            return FORM;
        }
        redirect.addFlashAttribute("flash", "staff.created");
        return "redirect:/staff";
    }

    @GetMapping("/{id}")
    String editForm(@AuthenticationPrincipal StaffPrincipal me, @PathVariable UUID id, Model model) {
        model.addAttribute("form", StaffForm.from(staff.find(me.staff(), id)
                .orElseThrow(() -> new NotFoundException("staff account"))));
        model.addAttribute("accountId", id);
        model.addAttribute("creating", false);
        return FORM;
    }

    @PostMapping("/{id}")
    String update(@AuthenticationPrincipal StaffPrincipal me, @PathVariable UUID id,
                  @Valid @ModelAttribute("form") StaffForm form, BindingResult errors, Model model,
                  RedirectAttributes redirect) {
        model.addAttribute("accountId", id);
        model.addAttribute("creating", false);
        if (errors.hasErrors()) {
            return FORM;
        }
        try {
            staff.update(me.staff(), id, form.getVersion(), form.getDisplayName(), form.getRole(), form.isEnabled());
        } catch (InvalidStateException e) {
            errors.reject(e.messageKey());
            return FORM;
        }
        redirect.addFlashAttribute("flash", "staff.updated");
        return "redirect:/staff";
    }

    @PostMapping("/{id}/password")
    String resetPassword(@AuthenticationPrincipal StaffPrincipal me, @PathVariable UUID id,
                         @RequestParam String password, RedirectAttributes redirect) {
        try {
            staff.resetPassword(me.staff(), id, password);
            redirect.addFlashAttribute("flash", "staff.passwordReset");
        } catch (InvalidStateException e) {
            redirect.addFlashAttribute("flash", e.messageKey());
        }
        return "redirect:/staff/" + id;
    }
}
