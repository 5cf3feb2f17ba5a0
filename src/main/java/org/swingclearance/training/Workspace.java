package org.swingclearance.training;

import java.time.LocalDate;
import java.util.List;
import java.util.UUID;

/**
 * Everything the training log page shows for an episode: the current issued plan (null when none is issued) and
 * today's step, the sessions (newest first), alerts, the trainer's advice (null when there is nothing to say),
 * the load report and the practice-rule limits the alerts use.
 */
public record Workspace(UUID episodeId, UUID patientId, String patientLabel, TrainingPlan plan,
                        TrainingStep todaysStep, LocalDate today, List<SessionView> sessions, List<AlertView> alerts,
                        Advice advice, LoadView load, AlertLimits limits, boolean clinicianView) {
}
