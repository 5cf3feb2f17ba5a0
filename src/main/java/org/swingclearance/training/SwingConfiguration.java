package org.swingclearance.training;

import java.util.UUID;

/**
 * What was swung in a session, or what a plan step prescribes: club (id and name when it is one of the clinic's
 * clubs), its mass, the grip mark (cm from the knob), the cycle time and the volume.
 */
public record SwingConfiguration(UUID clubId, String clubName, double clubMassKg, double gripMarkCm, double cycleTimeS,
                                 int sets, int reps) {

    /** Total swings of the session: sets × reps. */
    public int swings() {
        return sets * reps;
    }

    /** Same club, grip mark and cycle time (volume aside): the dials that set the demand ratio of a swing. */
    public boolean sameDials(SwingConfiguration other) {
        return java.util.Objects.equals(clubId, other.clubId)
                && Double.compare(clubMassKg, other.clubMassKg) == 0
                && Double.compare(gripMarkCm, other.gripMarkCm) == 0
                && Double.compare(cycleTimeS, other.cycleTimeS) == 0;
    }
}
