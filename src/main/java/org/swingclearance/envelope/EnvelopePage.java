package org.swingclearance.envelope;

import java.util.List;
import org.swingclearance.equipment.ClubView;
import org.swingclearance.equipment.SwingPatternView;
import org.swingclearance.patient.EpisodeSummary;
import org.swingclearance.patient.PatientSummary;

/**
 * The envelope page of an episode: either the reasons it cannot be computed yet, or the snapshot with the clubs
 * and patterns the what-if panel offers.
 *
 * @param blocks          why there is no envelope (empty when there is one)
 * @param signedScreening true when a signed screening exists (even if the envelope is blocked for another reason)
 * @param snapshot        null when blocked
 */
public record EnvelopePage(PatientSummary patient, EpisodeSummary episode, List<EnvelopeBlock> blocks,
                           boolean signedScreening, EnvelopeSnapshotView snapshot, List<ClubView> clubs,
                           List<SwingPatternView> patterns) {

    public boolean blocked() {
        return snapshot == null;
    }
}
