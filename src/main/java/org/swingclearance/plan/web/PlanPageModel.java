package org.swingclearance.plan.web;

import java.util.UUID;
import org.springframework.stereotype.Component;
import org.springframework.ui.Model;
import org.swingclearance.identity.CurrentStaff;
import org.swingclearance.plan.PlanPage;
import org.swingclearance.plan.PlanVersionView;
import org.swingclearance.plan.Plans;
import org.swingclearance.plan.StepDetail;

/** Fills the model of the clinician's plan page, for the controllers that show it again with field errors. */
@Component
class PlanPageModel {

    static final String VIEW = "plan/page";

    private final Plans plans;

    PlanPageModel(Plans plans) {
        this.plans = plans;
    }

    /** The page; {@code submitted} is a settings form that failed validation (shown with its errors), or null. */
    String render(CurrentStaff staff, UUID episodeId, Model model, PlanSettingsForm submitted) {
        PlanPage page = plans.page(staff, episodeId);
        model.addAttribute("page", page);
        if (submitted != null) {
            model.addAttribute("settingsForm", submitted);
        } else if (!model.containsAttribute("settingsForm")) {
            model.addAttribute("settingsForm", page.draft() != null
                    ? PlanSettingsForm.from(page.draft().settings(), page.draft().lockVersion())
                    : PlanSettingsForm.from(page.defaults(), 0));
        }
        PlanVersionView shown = page.shown();
        if (shown != null) {
            model.addAttribute("chart", PlanChart.of(shown.steps().stream().map(StepDetail::step).toList(),
                    shown.gateStep()));
        }
        if (!model.containsAttribute("shareForm")) {
            model.addAttribute("shareForm", new ShareForm());
        }
        if (!model.containsAttribute("invitationForm")) {
            model.addAttribute("invitationForm", new InvitationForm());
        }
        return VIEW;
    }
}
