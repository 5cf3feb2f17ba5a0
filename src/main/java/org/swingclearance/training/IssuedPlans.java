package org.swingclearance.training;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.UUID;
import org.springframework.stereotype.Component;
import org.swingclearance.identity.CurrentStaff;
import org.swingclearance.plan.IssuedPlanView;
import org.swingclearance.plan.PlanStepView;
import org.swingclearance.plan.Plans;
import org.swingclearance.plan.SharedPlanView;
import org.swingclearance.web.NotFoundException;

/**
 * Reads issued plans through the plan feature's Contract P. The plan feature decides who may read a plan (and
 * audits its own reads and refusals); a refusal here becomes "no plan", so the workspace can refuse with its own
 * audited action.
 */
@Component
class IssuedPlans implements PlanSource {

    private final Plans plans;

    IssuedPlans(Plans plans) {
        this.plans = plans;
    }

    @Override
    public Optional<TrainingPlan> currentFor(CurrentStaff staff, UUID episodeId) {
        try {
            return plans.currentIssued(staff, episodeId).map(IssuedPlans::toTrainingPlan);
        } catch (NotFoundException notShared) {
            return Optional.empty();
        }
    }

    @Override
    public List<TrainingPlan> sharedWith(CurrentStaff trainer) {
        List<TrainingPlan> result = new ArrayList<>();
        for (SharedPlanView shared : plans.sharedWith(trainer)) {
            currentFor(trainer, shared.episodeId()).ifPresent(result::add);
        }
        return result;
    }

    static TrainingPlan toTrainingPlan(IssuedPlanView view) {
        return new TrainingPlan(view.planId(), view.version(), view.episodeId(), view.patientId(), view.patientLabel(),
                view.startsOn(), view.sessionsPerWeek(), view.steps().stream().map(IssuedPlans::toStep).toList());
    }

    private static TrainingStep toStep(PlanStepView s) {
        return new TrainingStep(s.number(), s.clubId(), s.clubName(), s.clubMassKg(), s.gripMarkCm(), s.cycleTimeS(),
                s.sets(), s.reps(), s.effortCap(), s.demandRatio(), s.provisional(), s.startsOn());
    }
}
