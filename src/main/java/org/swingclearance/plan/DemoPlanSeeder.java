package org.swingclearance.plan;

import java.time.Clock;
import java.time.LocalDate;
import java.util.UUID;
import org.springframework.boot.ApplicationArguments;
import org.springframework.boot.ApplicationRunner;
import org.springframework.context.annotation.Profile;
import org.springframework.core.annotation.Order;
import org.springframework.stereotype.Component;
import org.swingclearance.demo.DemoIds;
import org.swingclearance.identity.CurrentStaff;
import org.swingclearance.identity.StaffRole;
import org.swingclearance.identity.UnitSystem;

/**
 * Seeds the demo shoulder patient's graded plan through the plan service, once: generated from the demo screening
 * with the low two-hand front pendulum, started a week ago, issued by the demo clinician and shared with the demo
 * trainer the patient's consent names, so the trainer's home shows this week's step. A second start finds the plan
 * and does nothing.
 */
@Component
@Profile("demo")
@Order(DemoIds.ORDER_CLINICS + 50)
class DemoPlanSeeder implements ApplicationRunner {

    /** Built-in "two-hand front pendulum, low" (V31). */
    private static final UUID PATTERN = UUID.fromString("00000000-0000-4000-8000-00000000a002");
    private static final CurrentStaff CLINICIAN = new CurrentStaff(DemoIds.CLINICIAN, DemoIds.CLINIC,
            StaffRole.CLINICIAN, "clinician@demo.local", "Robin Vale (physiotherapist)", UnitSystem.METRIC);

    private final Plans plans;
    private final PlanDrafting drafting;
    private final Clock clock;

    DemoPlanSeeder(Plans plans, PlanDrafting drafting, Clock clock) {
        this.plans = plans;
        this.drafting = drafting;
        this.clock = clock;
    }

    @Override
    public void run(ApplicationArguments args) {
        if (plans.page(CLINICIAN, DemoIds.EPISODE_SHOULDER).hasPlan()) {
            return;
        }
        PlanSettings settings = drafting.defaults(CLINICIAN, PATTERN, LocalDate.now(clock).minusDays(7));
        UUID planId = plans.generate(CLINICIAN, DemoIds.EPISODE_SHOULDER, settings);
        PlanVersionView draft = plans.page(CLINICIAN, DemoIds.EPISODE_SHOULDER).draft();
        if (draft.steps().isEmpty()) {
            return; // the clinician sees the draft and why it has no step
        }
        plans.issue(CLINICIAN, planId, draft.lockVersion());
        plans.share(CLINICIAN, planId, DemoIds.TRAINER);
    }
}
