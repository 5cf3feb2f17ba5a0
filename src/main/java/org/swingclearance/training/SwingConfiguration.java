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

    /**
     * Heavier than a step on any one dial (the product's definition): a heavier club, a grip mark further from the
     * head (closer to the knob, so a longer lever) or a shorter cycle time.
     */
    public boolean heavierOnAnyDialThan(SwingConfiguration step) {
        return clubMassKg > step.clubMassKg || gripMarkCm < step.gripMarkCm || cycleTimeS < step.cycleTimeS;
    }

    /** The same dials and the same sets × reps. */
    public boolean sameAs(SwingConfiguration other) {
        return sameDials(other) && sets == other.sets && reps == other.reps;
    }
}
