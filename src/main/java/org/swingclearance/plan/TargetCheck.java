package org.swingclearance.plan;

import java.util.Locale;

/**
 * Checks the clinician's target against the plan's grid before the search: the club must be in service, the grip
 * mark on the 2.5 cm grid and on the club's handle, the cycle time on the ladder. A target off the grid is refused
 * with the nearest allowed values named, never rounded to them.
 */
final class TargetCheck {

    private static final double GRID_CM = 2.5;
    private static final double TOLERANCE = 1e-9;

    private TargetCheck() {
    }

    static void check(PlanTarget target, PlanningInputs inputs) {
        if (target == null) {
            return;
        }
        PlanningInputs.ClubInput club = inputs.clubs().stream().filter(c -> c.id().equals(target.clubId()))
                .findFirst().orElseThrow(() -> new PlanSettingsRejected("targetClubId",
                        "plan.settings.error.targetClub"));
        double marks = target.gripMarkCm() / GRID_CM;
        if (target.gripMarkCm() < 0 || Math.abs(marks - Math.rint(marks)) > TOLERANCE) {
            double below = Math.max(0, Math.floor(marks) * GRID_CM);
            throw new PlanSettingsRejected("targetGripMarkCm", "plan.settings.error.gripGrid",
                    cm(target.gripMarkCm()), cm(below), cm(below + GRID_CM));
        }
        double handleCm = club.handleLengthM() * 100;
        if (target.gripMarkCm() > handleCm + TOLERANCE) {
            throw new PlanSettingsRejected("targetGripMarkCm", "plan.settings.error.gripBeyondHandle",
                    cm(handleCm), cm(target.gripMarkCm()));
        }
        boolean onLadder = inputs.cycleLadderS().stream().anyMatch(t -> Math.abs(t - target.cycleTimeS()) < TOLERANCE);
        if (!onLadder) {
            throw new PlanSettingsRejected("targetCycleTimeS", "plan.settings.error.cycleLadder",
                    String.format(Locale.ROOT, "%.2f", target.cycleTimeS()));
        }
    }

    private static String cm(double value) {
        return String.format(Locale.ROOT, "%.1f", value);
    }
}
