package org.swingclearance.plan;

import java.time.Instant;
import java.util.UUID;

/**
 * A plan shared with the signed-in trainer, for the trainer's home and plan list (Contract P): whose plan, its
 * issued version, this week's step and whether a re-screen is due before the next one.
 */
public record SharedPlanView(UUID planId, int version, UUID episodeId, UUID patientId, String patientLabel,
                             PlanStepView thisWeek, PlanStepView next, boolean rescreenDue, int stepCount,
                             Instant sharedAt) {
}
