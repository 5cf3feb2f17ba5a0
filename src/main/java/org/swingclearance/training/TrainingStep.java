package org.swingclearance.training;

import java.time.LocalDate;
import java.util.UUID;

/**
 * One step of an issued plan as the workspace needs it: the prescribed configuration, the effort cap (RPE), the
 * demand-to-capacity ratio D of the step, whether it lies behind a re-screen gate, and the date it starts.
 */
public record TrainingStep(int number, UUID clubId, String clubName, double clubMassKg, double gripMarkCm,
                           double cycleTimeS, int sets, int reps, int effortCap, double demandRatio,
                           boolean provisional, LocalDate startsOn) {

    public SwingConfiguration configuration() {
        return new SwingConfiguration(clubId, clubName, clubMassKg, gripMarkCm, cycleTimeS, sets, reps);
    }
}
