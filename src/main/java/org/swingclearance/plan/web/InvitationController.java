package org.swingclearance.plan.web;

import jakarta.servlet.http.HttpServletResponse;
import jakarta.validation.Valid;
import org.springframework.http.HttpStatus;
import org.springframework.stereotype.Controller;
import org.springframework.ui.Model;
import org.springframework.validation.BindingResult;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.ModelAttribute;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.PostMapping;
import org.swingclearance.plan.InvitationPage;
import org.swingclearance.plan.Plans;
import org.swingclearance.web.InvalidStateException;

/**
 * The one-time invitation link (open to anyone holding it): shows who invites, lets the person set a name and a
 * password, and opens a trainer account with the plan shared. A used or expired link is explained (410 Gone), an
 * unknown one is a 404.
 */
@Controller
class InvitationController {

    static final String VIEW = "plan/invitation";

    private final Plans plans;

    InvitationController(Plans plans) {
        this.plans = plans;
    }

    @GetMapping("/invitations/{token}")
    String show(@PathVariable String token, Model model, HttpServletResponse response) {
        InvitationPage invitation;
        try {
            invitation = plans.invitation(token);
        } catch (InvalidStateException closed) {
            return closed(closed, model, response);
        }
        model.addAttribute("invitation", invitation);
        model.addAttribute("token", token);
        AcceptInvitationForm form = new AcceptInvitationForm();
        form.setDisplayName(invitation.invitedName());
        model.addAttribute("form", form);
        return VIEW;
    }

    @PostMapping("/invitations/{token}")
    String accept(@PathVariable String token, @Valid @ModelAttribute("form") AcceptInvitationForm form,
                  BindingResult errors, Model model, HttpServletResponse response) {
        try {
            model.addAttribute("invitation", plans.invitation(token));
        } catch (InvalidStateException closed) {
            return closed(closed, model, response);
        }
        model.addAttribute("token", token);
        if (errors.hasErrors()) {
            return VIEW;
        }
        try {
            plans.acceptInvitation(token, form.getDisplayName(), form.getPassword());
        } catch (InvalidStateException refused) {
            if (refused.messageKey().startsWith("password.")) {
                errors.rejectValue("password", refused.messageKey(), refused.args(), null);
            } else if (refused.messageKey().equals("invitation.error.nameDiffers")) {
                errors.rejectValue("displayName", refused.messageKey(), refused.args(), null);
            } else {
                errors.reject(refused.messageKey(), refused.args(), null);
            }
            return VIEW;
        }
        // Rendered, not redirected: the link is used now, so a reload can only show that it was used.
        model.addAttribute("done", true);
        return VIEW;
    }

    /** A used or expired link: 410 Gone with the reason. */
    private static String closed(InvalidStateException closed, Model model, HttpServletResponse response) {
        response.setStatus(HttpStatus.GONE.value());
        model.addAttribute("closedKey", closed.messageKey());
        return VIEW;
    }
}
