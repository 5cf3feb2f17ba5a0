package org.swingclearance.plan;

import java.time.LocalDate;
import java.util.UUID;

/**
 * One step of an issued plan as pages, the handout and the trainer workspace see it (Contract P): club, grip mark
 * (cm from the knob end), cycle time, sets × reps, effort cap (CR-10), the demand ratio D with its binding
 * constraint, whether it is provisional (beyond the current band, behind a re-screen gate) and the day it starts.
 */
public record PlanStepView(int number, UUID clubId, String clubName, double clubMassKg, double gripMarkCm,
                           double cycleTimeS, int sets, int reps, int effortCap, double demandRatio, String binding,
                           boolean provisional, LocalDate startsOn) {

    static PlanStepView of(PlannedStep s) {
        return new PlanStepView(s.getNumber(), s.getClubId(), s.getClubName(), s.getClubMassKg(), s.getGripMarkCm(),
                s.getCycleTimeS(), s.getSets(), s.getReps(), s.getEffortCap(), s.getDemandRatio(),
                s.getBindingConstraint(), s.isProvisional(), s.getStartsOn());
    }

    public double swingsPerMinute() {
        return 60 / cycleTimeS;
    }

    /** Which dial this step changed from {@code previous}: CLUB, GRIP_MARK or CYCLE_TIME (null for the first step). */
    public String changeFrom(PlanStepView previous) {
        if (previous == null) {
            return null;
        }
        if (!clubId.equals(previous.clubId)) {
            return "CLUB";
        }
        return Math.abs(gripMarkCm - previous.gripMarkCm) > 1e-9 ? "GRIP_MARK" : "CYCLE_TIME";
    }
}
