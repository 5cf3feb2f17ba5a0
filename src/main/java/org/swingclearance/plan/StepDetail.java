package org.swingclearance.plan;

/**
 * A step as the clinician's plan page shows it: the shared step view plus what changed, the rise of D from the
 * previous step, whether the clinician pinned it and whether a re-screen gate stands before it.
 */
public record StepDetail(PlanStepView step, String changedDial, double rise, boolean pinned, boolean gateBefore) {

    static StepDetail of(PlannedStep s) {
        return new StepDetail(PlanStepView.of(s), s.getChangedDial(), s.getRise(), s.isPinned(), s.isGateBefore());
    }
}
