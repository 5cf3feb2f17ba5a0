package org.swingclearance.plan.web;

import jakarta.servlet.http.HttpServletRequest;
import jakarta.validation.Valid;
import java.util.UUID;
import org.springframework.security.access.prepost.PreAuthorize;
import org.springframework.security.core.annotation.AuthenticationPrincipal;
import org.springframework.stereotype.Controller;
import org.springframework.ui.Model;
import org.springframework.validation.BindingResult;
import org.springframework.web.bind.annotation.ModelAttribute;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.servlet.mvc.support.RedirectAttributes;
import org.springframework.web.servlet.support.ServletUriComponentsBuilder;
import org.swingclearance.identity.StaffPrincipal;
import org.swingclearance.plan.NewInvitation;
import org.swingclearance.plan.Plans;
import org.swingclearance.web.InvalidStateException;

/** Sharing an issued plan with a trainer (on the patient's consent), ending a share, and inviting a trainer. */
@Controller
@PreAuthorize("hasRole('CLINICIAN')")
class PlanShareController {

    private final Plans plans;
    private final PlanPageModel pageModel;

    PlanShareController(Plans plans, PlanPageModel pageModel) {
        this.plans = plans;
        this.pageModel = pageModel;
    }

    @PostMapping("/plans/{planId}/shares")
    String share(@AuthenticationPrincipal StaffPrincipal me, @PathVariable UUID planId,
                 @Valid @ModelAttribute("shareForm") ShareForm form, BindingResult errors,
                 RedirectAttributes redirect) {
        UUID episodeId = plans.episodeOf(me.staff(), planId);
        if (errors.hasErrors()) {
            return PlanController.notice(redirect, new InvalidStateException("plan.share.trainer"), episodeId);
        }
        try {
            plans.share(me.staff(), planId, form.getTrainerId());
            redirect.addFlashAttribute("flash", "plan.share.flash");
        } catch (InvalidStateException refused) {
            return PlanController.notice(redirect, refused, episodeId);
        }
        return "redirect:/episodes/" + episodeId + "/plan";
    }

    @PostMapping("/plans/{planId}/shares/{shareId}/end")
    String unshare(@AuthenticationPrincipal StaffPrincipal me, @PathVariable UUID planId,
                   @PathVariable UUID shareId, RedirectAttributes redirect) {
        UUID episodeId = plans.episodeOf(me.staff(), planId);
        try {
            plans.unshare(me.staff(), planId, shareId);
            redirect.addFlashAttribute("flash", "plan.unshare.flash");
        } catch (InvalidStateException refused) {
            return PlanController.notice(redirect, refused, episodeId);
        }
        return "redirect:/episodes/" + episodeId + "/plan";
    }

    @PostMapping("/plans/{planId}/invitations")
    String invite(@AuthenticationPrincipal StaffPrincipal me, @PathVariable UUID planId,
                  @Valid @ModelAttribute("invitationForm") InvitationForm form, BindingResult errors,
                  Model model, HttpServletRequest request, RedirectAttributes redirect) {
        UUID episodeId = plans.episodeOf(me.staff(), planId);
        if (errors.hasErrors()) {
            return pageModel.render(me.staff(), episodeId, model, null);
        }
        try {
            NewInvitation invitation = plans.invite(me.staff(), planId, form.getEmail(), form.getName());
            String url = ServletUriComponentsBuilder.fromContextPath(request).path("/invitations/{token}")
                    .buildAndExpand(invitation.token()).toUriString();
            redirect.addFlashAttribute("invitationLink",
                    new InvitationLink(url, invitation.email(), invitation.expiresAt()));
        } catch (InvalidStateException refused) {
            return PlanController.notice(redirect, refused, episodeId);
        }
        return "redirect:/episodes/" + episodeId + "/plan";
    }
}
