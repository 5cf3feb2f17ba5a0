package org.swingclearance.plan;

import java.time.Instant;
import java.time.LocalDate;
import java.util.List;
import java.util.Optional;
import java.util.UUID;

/**
 * An issued (signed, read-only) plan version as a trainer or the handout sees it (Contract P): the steps and what the
 * trainer needs to follow them, and nothing clinical beyond the plan (no screening values, no diagnosis, no pain).
 *
 * @param gateStep number of the first provisional step, before which a re-screen is due; null without a gate
 */
public record IssuedPlanView(UUID planId, int version, UUID episodeId, UUID patientId,
                             String patientLabel, List<PlanStepView> steps, Integer gateStep, String patternName,
                             String band, StepUnit stepUnit, int stepLength, int sessionsPerWeek, LocalDate startsOn,
                             int painDuringLimit, double stepLimit, Instant issuedAt, String issuedByName,
                             String fingerprint) {

    public IssuedPlanView {
        steps = List.copyOf(steps);
    }

    /**
     * The step to do in the week of {@code day}: the last step that has started (the first step before the plan
     * starts), but never a provisional one — at the gate the patient stays on the last step before it until a
     * re-screen (see {@link #rescreenDue}).
     */
    public Optional<PlanStepView> stepFor(LocalDate day) {
        PlanStepView current = null;
        for (PlanStepView step : steps) {
            if (step.provisional()) {
                break;
            }
            if (current == null || !step.startsOn().isAfter(day)) {
                current = step;
            }
        }
        return Optional.ofNullable(current);
    }

    /** Whether the day has reached the gate: the next step needs a re-screen first. */
    public boolean rescreenDue(LocalDate day) {
        return gateStep != null && steps.stream().filter(s -> s.number() == gateStep)
                .anyMatch(s -> !s.startsOn().isAfter(day));
    }

    /** The step after {@code step}, if any. */
    public Optional<PlanStepView> after(PlanStepView step) {
        return steps.stream().filter(s -> s.number() == step.number() + 1).findFirst();
    }

    /** Days one step lasts (its length in days, or its sessions at the planned sessions per week). */
    public int daysPerStep() {
        return StepSchedule.daysFor(stepUnit, stepLength, sessionsPerWeek);
    }

    /** Message key of the sentence that says how long a step lasts. */
    public String stepLengthKey() {
        return "plan.rules.stepLength." + stepUnit.name();
    }

    public boolean gateBefore(PlanStepView step) {
        return gateStep != null && gateStep == step.number();
    }

    public PlanStepView previous(PlanStepView step) {
        return steps.stream().filter(s -> s.number() == step.number() - 1).findFirst().orElse(null);
    }
}
