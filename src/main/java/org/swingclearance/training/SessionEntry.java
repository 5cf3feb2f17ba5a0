package org.swingclearance.training;

import java.time.LocalDate;
import java.util.Optional;
import java.util.UUID;

/**
 * One session as the trainer reports it: the date, the plan step it belongs to, whether it was done as the step
 * prescribes (else {@code actual} says what was done), duration, session RPE (CR-10), pain at rest before the
 * session (the baseline next-morning pain is judged against) and pain during (both 0–10), notes.
 */
public record SessionEntry(LocalDate date, int stepNumber, boolean asPlanned, Actual actual, int durationMin,
                           int rpe, int painBefore, int painDuring, String notes) {

    public SessionEntry {
        if (!asPlanned && actual == null) {
            throw new IllegalArgumentException("a session not done as planned needs what was actually done");
        }
        notes = notes == null || notes.isBlank() ? null : notes.trim();
    }

    /**
     * What was done instead of the step: one of the plan's clubs (by id) or another club by its mass, and the grip
     * mark, cycle time and volume.
     */
    public record Actual(UUID planClubId, Double otherClubMassKg, double gripMarkCm, double cycleTimeS, int sets,
                         int reps) {

        public Actual {
            if ((planClubId == null) == (otherClubMassKg == null)) {
                throw new IllegalArgumentException("either a plan club or another club's mass");
            }
        }

        /** The configuration, with a plan club's name and mass from the plan; empty if the plan lacks the club. */
        Optional<SwingConfiguration> in(TrainingPlan plan) {
            if (planClubId == null) {
                return Optional.of(new SwingConfiguration(null, null, otherClubMassKg, gripMarkCm, cycleTimeS, sets,
                        reps));
            }
            return plan.clubChoices().stream().filter(s -> s.clubId().equals(planClubId)).findFirst()
                    .map(s -> new SwingConfiguration(s.clubId(), s.clubName(), s.clubMassKg(), gripMarkCm, cycleTimeS,
                            sets, reps));
        }
    }
}
