package org.swingclearance.plan;

import java.time.Instant;
import java.util.Map;
import java.util.UUID;

/**
 * What a plan version is computed from, gathered for one episode and pattern: the signed screening it rests on, the
 * practice-rules version with its step limit, pain limit and default doses, and the engine's plain-value inputs.
 */
record PlanSources(UUID screeningId, int screeningVersion, Instant screeningSignedAt, int rulesVersion,
                   double stepLimit, int painDuringLimit, Map<String, Dose> defaultDoses, PlanningInputs inputs) {
}
