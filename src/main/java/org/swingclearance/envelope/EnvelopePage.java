package org.swingclearance.envelope;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.UUID;
import java.util.stream.Collectors;
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

    /** The snapshot's rows grouped by club, in the clubs' order (the page's table, one group per club). */
    public List<ClubRows> table() {
        Map<UUID, List<EnvelopeRow>> byClub = snapshot.rows().stream().collect(
                Collectors.groupingBy(EnvelopeRow::clubId, LinkedHashMap::new, Collectors.toList()));
        return clubs.stream().map(c -> new ClubRows(c, byClub.getOrDefault(c.id(), List.of()))).toList();
    }

    /** One club and its rows, one per swing pattern. */
    public record ClubRows(ClubView club, List<EnvelopeRow> rows) {
    }
}
