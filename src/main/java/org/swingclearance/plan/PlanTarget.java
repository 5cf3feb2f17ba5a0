package org.swingclearance.plan;

import java.util.UUID;

/** The configuration the clinician wants the plan to reach: a club held at a grip mark, swung at a cycle time. */
public record PlanTarget(UUID clubId, double gripMarkCm, double cycleTimeS) {
}
