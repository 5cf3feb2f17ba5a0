package org.swingclearance.screening;

import java.time.Instant;
import java.util.List;
import java.util.UUID;

/**
 * The patient page's screening panel: each episode's screenings with their latest version, the current bands,
 * and the trend of key values over the signed screenings.
 */
public record PatientScreenings(UUID patientId, List<EpisodeScreenings> episodes, List<TrendPoint> trend) {

    /** The screenings of one episode, newest first. */
    public record EpisodeScreenings(UUID episodeId, String region, String shoulderSide, List<Entry> screenings,
                                    Entry currentSigned, UUID openDraftScreeningId) {
    }

    /** One screening's latest version. */
    public record Entry(UUID screeningId, int versionNo, ScreeningStatus status, Instant createdAt, String createdBy,
                        Instant signedAt, String signedBy, String shoulderBand, String lumbopelvicBand,
                        boolean overridden, String changeReason) {
    }

    /**
     * The values of one signed screening for the trend charts: derived values by value key and recorded
     * measurements by form key; absent = not tested.
     */
    public record TrendPoint(Instant signedAt, UUID episodeId, java.util.Map<String, Double> derived,
                             java.util.Map<String, Double> measured) {
    }
}
