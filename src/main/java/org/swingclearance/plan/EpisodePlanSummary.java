package org.swingclearance.plan;

import java.time.Instant;
import java.util.UUID;
import org.swingclearance.patient.EpisodeSummary;

/** One episode's plan at a glance, for the patient page: issued version, open draft, active shares. */
public record EpisodePlanSummary(EpisodeSummary episode, UUID planId, Integer issuedVersion, Instant issuedAt,
                                 Integer draftVersion, long activeShares) {
}
