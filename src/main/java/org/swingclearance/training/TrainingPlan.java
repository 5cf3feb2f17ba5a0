package org.swingclearance.training;

import java.time.LocalDate;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.UUID;

/**
 * The episode's current issued plan as the workspace sees it (read from the plan feature): id, version, the
 * patient it is for, the date it starts, the planned sessions per week and its steps in order. Logs are keyed by
 * plan id, version and step number.
 */
public record TrainingPlan(UUID planId, int version, UUID episodeId, UUID patientId, String patientLabel,
                           LocalDate startsOn, int sessionsPerWeek, List<TrainingStep> steps) {

    public TrainingPlan {
        steps = steps.stream().sorted(Comparator.comparingInt(TrainingStep::number)).toList();
    }

    public Optional<TrainingStep> step(int number) {
        return steps.stream().filter(s -> s.number() == number).findFirst();
    }

    /**
     * The step the schedule puts on a day: the last step that has started (the first before the plan starts), never
     * a provisional one — at a re-screen gate the patient stays on the last step before it (the plan feature's rule).
     */
    public TrainingStep currentStepOn(LocalDate day) {
        TrainingStep current = steps.get(0);
        for (TrainingStep step : steps) {
            if (step.provisional()) {
                break;
            }
            if (!step.startsOn().isAfter(day)) {
                current = step;
            }
        }
        return current;
    }

    /** The distinct clubs the plan uses, by id, in step order (the choices for "done with another club"). */
    public List<TrainingStep> clubChoices() {
        Map<UUID, TrainingStep> byClub = new LinkedHashMap<>();
        steps.stream().filter(s -> s.clubId() != null).forEach(s -> byClub.putIfAbsent(s.clubId(), s));
        return List.copyOf(byClub.values());
    }

    /**
     * The demand ratio D of a configuration, when the plan contains it: the D of a step with the same club, grip
     * mark and cycle time. Null for a configuration outside the plan (its D was never computed).
     */
    public Double demandRatioOf(SwingConfiguration done) {
        return steps.stream().filter(s -> s.configuration().sameDials(done)).map(TrainingStep::demandRatio)
                .findFirst().orElse(null);
    }
}
