package org.swingclearance.patient;

import java.time.LocalDate;
import java.util.List;
import java.util.UUID;

/**
 * An episode as other features see it, with its red-flag state: {@code onHold} while any flag of the latest
 * checklist has no referral recorded after it. A held episode gets no plan.
 */
public record EpisodeSummary(UUID id, UUID patientId, Region region, Side shoulderSide, LocalDate injuryDate,
                             boolean surgery, String goal, EpisodeStatus status, List<RedFlag> openRedFlags,
                             boolean onHold) {
}
