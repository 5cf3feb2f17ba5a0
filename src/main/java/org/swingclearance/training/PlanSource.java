package org.swingclearance.training;

import java.util.List;
import java.util.Optional;
import java.util.UUID;
import org.swingclearance.identity.CurrentStaff;

/**
 * Where the workspace reads issued plans from (the plan feature's Contract P), so the access rule lives in one
 * place: a clinician reaches the plans of their clinic, a trainer only the plans shared with them.
 */
interface PlanSource {

    /** The episode's current issued plan, if the caller may work with it; never audits (the caller does). */
    Optional<TrainingPlan> currentFor(CurrentStaff staff, UUID episodeId);

    /** The issued plans shared with a trainer (one per episode), for the trainer's home panel. */
    List<TrainingPlan> sharedWith(CurrentStaff trainer);
}
