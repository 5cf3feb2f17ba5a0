package org.swingclearance.patient;

import java.time.LocalDate;
import java.util.Set;

/** What a clinician enters to open an episode, with the intake red-flag checklist. */
public record EpisodeDetails(Region region, Side shoulderSide, LocalDate injuryDate, boolean surgery, String goal,
                             Set<RedFlag> redFlags) {
}
