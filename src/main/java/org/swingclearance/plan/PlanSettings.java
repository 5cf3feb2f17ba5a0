package org.swingclearance.plan;

import java.time.LocalDate;
import java.util.Map;
import java.util.UUID;

/**
 * What the clinician decides about a plan: the swing pattern, the target (null: the highest permitted state of the
 * current band), whether to continue provisionally beyond the band behind a re-screen gate, the step length and the
 * dose per band ({@link PlanBands} names as keys).
 */
public record PlanSettings(UUID patternId, PlanTarget target, boolean continueProvisionally, StepUnit stepUnit,
                           int stepLength, int sessionsPerWeek, LocalDate startsOn, Map<String, Dose> doses) {

    public PlanSettings {
        doses = Map.copyOf(doses);
    }
}
