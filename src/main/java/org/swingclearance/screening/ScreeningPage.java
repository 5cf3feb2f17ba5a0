package org.swingclearance.screening;

import java.time.Instant;
import java.util.List;
import java.util.UUID;
import org.swingclearance.patient.EpisodeSummary;
import org.swingclearance.patient.PatientSummary;

/**
 * A screening as its page shows it: one version in full, and the list of all versions.
 *
 * @param screeningId the screening
 * @param patient     whose
 * @param episode     which episode
 * @param shown       the version shown
 * @param versions    every version, oldest first
 */
public record ScreeningPage(UUID screeningId, PatientSummary patient, EpisodeSummary episode, VersionDetail shown,
                            List<VersionSummary> versions) {

    /** True when the shown version is the screening's latest. */
    public boolean latest() {
        return shown.versionNo() == versions.get(versions.size() - 1).versionNo();
    }

    /** True when the shown version can still be edited (the latest, a draft). */
    public boolean editable() {
        return latest() && shown.status() == ScreeningStatus.DRAFT;
    }

    /** True when a correction can be started from here (the latest version is signed). */
    public boolean amendable() {
        return latest() && shown.status().signed();
    }

    /** One version in full. */
    public record VersionDetail(UUID id, int versionNo, ScreeningStatus status, long lockVersion,
                                Measurements measurements, ScreeningSnapshot snapshot, Integer supersedesVersionNo,
                                String changeReason, String shoulderBand, String shoulderOverrideReason,
                                String lumbopelvicBand, String lumbopelvicOverrideReason, String createdBy,
                                Instant createdAt, String signedBy, Instant signedAt, String contentHash,
                                Boolean hashVerifies) {
    }

    /** One line of the version list. */
    public record VersionSummary(int versionNo, ScreeningStatus status, String changeReason, String createdBy,
                                 Instant createdAt, String signedBy, Instant signedAt, String shoulderBand,
                                 String lumbopelvicBand) {
    }
}
