package org.swingclearance.plan.web;

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
import org.springframework.web.bind.annotation.RequestParam;
import org.springframework.web.servlet.mvc.support.RedirectAttributes;
import org.swingclearance.identity.CurrentStaff;
import org.swingclearance.identity.StaffPrincipal;
import org.swingclearance.plan.AdjustmentKind;
import org.swingclearance.plan.PlanSettingsRejected;
import org.swingclearance.plan.Plans;
import org.swingclearance.web.InvalidStateException;

/**
 * The clinician's plan page of an episode: generate from the latest signed screening, adjust the draft (settings,
 * pins, removals), issue it, start a new version. Bad settings are shown beside their field and nothing is saved.
 */
@Controller
@PreAuthorize("hasRole('CLINICIAN')")
class PlanController {

    private final Plans plans;
    private final PlanPageModel pageModel;

    PlanController(Plans plans, PlanPageModel pageModel) {
        this.plans = plans;
        this.pageModel = pageModel;
    }

    @GetMapping("/episodes/{episodeId}/plan")
    String page(@AuthenticationPrincipal StaffPrincipal me, @PathVariable UUID episodeId, Model model) {
        return show(me.staff(), episodeId, model, null);
    }

    @PostMapping("/episodes/{episodeId}/plan")
    String generate(@AuthenticationPrincipal StaffPrincipal me, @PathVariable UUID episodeId,
                    @Valid @ModelAttribute("settingsForm") PlanSettingsForm form, BindingResult errors, Model model,
                    RedirectAttributes redirect) {
        if (errors.hasErrors()) {
            return show(me.staff(), episodeId, model, form);
        }
        try {
            plans.generate(me.staff(), episodeId, form.toSettings());
        } catch (PlanSettingsRejected rejected) {
            errors.rejectValue(rejected.field(), rejected.messageKey(), rejected.args(), null);
            return show(me.staff(), episodeId, model, form);
        } catch (InvalidStateException refused) {
            return notice(redirect, refused, episodeId);
        }
        redirect.addFlashAttribute("flash", "plan.generated.flash");
        return "redirect:/episodes/" + episodeId + "/plan";
    }

    @PostMapping("/plans/{planId}/settings")
    String update(@AuthenticationPrincipal StaffPrincipal me, @PathVariable UUID planId,
                  @Valid @ModelAttribute("settingsForm") PlanSettingsForm form, BindingResult errors, Model model,
                  RedirectAttributes redirect) {
        UUID episodeId = plans.episodeOf(me.staff(), planId);
        if (errors.hasErrors()) {
            return show(me.staff(), episodeId, model, form);
        }
        try {
            plans.updateSettings(me.staff(), planId, form.getLockVersion(), form.toSettings());
        } catch (PlanSettingsRejected rejected) {
            errors.rejectValue(rejected.field(), rejected.messageKey(), rejected.args(), null);
            return show(me.staff(), episodeId, model, form);
        } catch (InvalidStateException refused) {
            return notice(redirect, refused, episodeId);
        }
        redirect.addFlashAttribute("flash", "plan.updated.flash");
        return "redirect:/episodes/" + episodeId + "/plan";
    }

    @PostMapping("/plans/{planId}/steps/{number}/pin")
    String pin(@AuthenticationPrincipal StaffPrincipal me, @PathVariable UUID planId, @PathVariable int number,
               @RequestParam long lockVersion, RedirectAttributes redirect) {
        return adjust(me.staff(), planId, lockVersion, number, AdjustmentKind.PIN, redirect);
    }

    @PostMapping("/plans/{planId}/steps/{number}/remove")
    String remove(@AuthenticationPrincipal StaffPrincipal me, @PathVariable UUID planId, @PathVariable int number,
                  @RequestParam long lockVersion, RedirectAttributes redirect) {
        return adjust(me.staff(), planId, lockVersion, number, AdjustmentKind.REMOVE, redirect);
    }

    @PostMapping("/plans/{planId}/adjustments/clear")
    String clearAdjustments(@AuthenticationPrincipal StaffPrincipal me, @PathVariable UUID planId,
                            @RequestParam long lockVersion, RedirectAttributes redirect) {
        return onPlan(me.staff(), planId, "plan.adjusted.flash", redirect,
                () -> plans.clearAdjustments(me.staff(), planId, lockVersion));
    }

    @PostMapping("/plans/{planId}/issue")
    String issue(@AuthenticationPrincipal StaffPrincipal me, @PathVariable UUID planId,
                 @RequestParam long lockVersion, RedirectAttributes redirect) {
        return onPlan(me.staff(), planId, "plan.issued.flash", redirect,
                () -> plans.issue(me.staff(), planId, lockVersion));
    }

    @PostMapping("/plans/{planId}/revise")
    String revise(@AuthenticationPrincipal StaffPrincipal me, @PathVariable UUID planId,
                  RedirectAttributes redirect) {
        return onPlan(me.staff(), planId, "plan.generated.flash", redirect,
                () -> plans.revise(me.staff(), planId));
    }

    @PostMapping("/plans/{planId}/discard")
    String discard(@AuthenticationPrincipal StaffPrincipal me, @PathVariable UUID planId,
                   @RequestParam long lockVersion, RedirectAttributes redirect) {
        return onPlan(me.staff(), planId, "plan.discarded.flash", redirect,
                () -> plans.discardDraft(me.staff(), planId, lockVersion));
    }

    private String adjust(CurrentStaff staff, UUID planId, long lockVersion, int number, AdjustmentKind kind,
                          RedirectAttributes redirect) {
        return onPlan(staff, planId, "plan.adjusted.flash", redirect,
                () -> plans.adjust(staff, planId, lockVersion, number, kind));
    }

    /**
     * Runs one change of a plan and goes back to its page: with the flash message when done, with the reason when
     * the change was refused (nothing was changed then).
     */
    private String onPlan(CurrentStaff staff, UUID planId, String flashKey, RedirectAttributes redirect,
                          Runnable change) {
        UUID episodeId = plans.episodeOf(staff, planId);
        try {
            change.run();
            redirect.addFlashAttribute("flash", flashKey);
        } catch (InvalidStateException refused) {
            return notice(redirect, refused, episodeId);
        } catch (PlanSettingsRejected rejected) {
            return notice(redirect, new InvalidStateException(rejected.messageKey(), rejected.args()), episodeId);
        }
        return "redirect:/episodes/" + episodeId + "/plan";
    }

    /** Back to the plan page with the reason the request was refused (nothing was changed). */
    static String notice(RedirectAttributes redirect, InvalidStateException refused, UUID episodeId) {
        redirect.addFlashAttribute("planNotice", new PlanNotice(refused.messageKey(), refused.args()));
        return "redirect:/episodes/" + episodeId + "/plan";
    }

    private String show(CurrentStaff staff, UUID episodeId, Model model, PlanSettingsForm submitted) {
        return pageModel.render(staff, episodeId, model, submitted);
    }
}
