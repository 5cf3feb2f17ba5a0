package org.swingclearance.envelope;

import java.time.Instant;
import java.util.List;
import java.util.UUID;

/**
 * A stored envelope as other features see it (Contract E): the rows of every club × pattern, computed from one
 * signed screening version at one usual cycle time, with the engine and practice-rules versions used.
 */
public record EnvelopeSnapshotView(UUID id, UUID episodeId, UUID patientId, UUID screeningId, int screeningVersion,
                                   double cycleTimeS, String engineVersion, int rulesVersion, Instant computedAt,
                                   List<EnvelopeRow> rows, List<String> noteKeys, List<String> modelStatements,
                                   EnvelopeInputs inputs) {

    /** The row of a club and a pattern, if both were part of this envelope. */
    public java.util.Optional<EnvelopeRow> row(UUID clubId, UUID patternId) {
        return rows.stream().filter(r -> r.clubId().equals(clubId) && r.patternId().equals(patternId)).findFirst();
    }
}
