package org.swingclearance.plan.web;

import java.time.Clock;
import java.time.LocalDate;
import java.util.Locale;
import java.util.UUID;
import org.springframework.http.CacheControl;
import org.springframework.http.ContentDisposition;
import org.springframework.http.HttpHeaders;
import org.springframework.http.MediaType;
import org.springframework.http.ResponseEntity;
import org.springframework.security.access.prepost.PreAuthorize;
import org.springframework.security.core.annotation.AuthenticationPrincipal;
import org.springframework.stereotype.Controller;
import org.springframework.ui.Model;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PathVariable;
import org.swingclearance.identity.StaffPrincipal;
import org.swingclearance.identity.StaffRole;
import org.swingclearance.plan.Handout;
import org.swingclearance.plan.IssuedPlanView;
import org.swingclearance.plan.Plans;

/**
 * What a trainer sees: the plans shared with them, one plan with this week's step, and the PDF handout (which the
 * clinician may download too). A plan not shared with the trainer is a 404, audited by the service.
 */
@Controller
class TrainerPlanController {

    static final String LIST = "plan/trainer-list";
    static final String PLAN = "plan/trainer-plan";

    private final Plans plans;
    private final Clock clock;

    TrainerPlanController(Plans plans, Clock clock) {
        this.plans = plans;
        this.clock = clock;
    }

    @GetMapping("/plans")
    @PreAuthorize("hasRole('TRAINER')")
    String list(@AuthenticationPrincipal StaffPrincipal me, Model model) {
        model.addAttribute("plans", plans.sharedWith(me.staff()));
        return LIST;
    }

    /** A trainer's view of a shared plan; a clinician is taken to the episode's plan page. */
    @GetMapping("/plans/{planId}")
    @PreAuthorize("hasAnyRole('TRAINER', 'CLINICIAN')")
    String plan(@AuthenticationPrincipal StaffPrincipal me, @PathVariable UUID planId, Model model) {
        if (me.staff().is(StaffRole.CLINICIAN)) {
            return "redirect:/episodes/" + plans.episodeOf(me.staff(), planId) + "/plan";
        }
        IssuedPlanView plan = plans.issuedPlan(me.staff(), planId);
        LocalDate today = LocalDate.now(clock);
        model.addAttribute("plan", plan);
        model.addAttribute("today", today);
        model.addAttribute("thisWeek", plan.stepFor(today).orElse(null));
        model.addAttribute("rescreenDue", plan.rescreenDue(today));
        model.addAttribute("chart", PlanChart.of(plan.steps(), plan.gateStep()));
        return PLAN;
    }

    @GetMapping("/plans/{planId}/handout.pdf")
    @PreAuthorize("hasAnyRole('TRAINER', 'CLINICIAN')")
    ResponseEntity<byte[]> handout(@AuthenticationPrincipal StaffPrincipal me, @PathVariable UUID planId,
                                   Locale locale) {
        Handout handout = plans.handout(me.staff(), planId, locale);
        return ResponseEntity.ok()
                .contentType(MediaType.APPLICATION_PDF)
                .cacheControl(CacheControl.noStore())
                .header(HttpHeaders.CONTENT_DISPOSITION,
                        ContentDisposition.inline().filename(handout.fileName()).build().toString())
                .body(handout.pdf());
    }
}
