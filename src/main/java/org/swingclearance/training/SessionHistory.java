package org.swingclearance.training;

import java.time.Instant;
import java.time.LocalDate;
import java.util.List;
import java.util.UUID;

/**
 * One session with every version of it and of its next-morning rating, newest first, for the correction and
 * next-morning forms; with the current plan (null when none is issued) and the patient label the viewer may see.
 */
public record SessionHistory(UUID episodeId, SessionView latest, List<VersionLine> versions, List<MorningLine> morning,
                             TrainingPlan plan, String patientLabel) {

    /** One version of the session as it was recorded. */
    public record VersionLine(int version, LocalDate date, int stepNumber, boolean asPlanned, int durationMin,
                              int rpe, int painBefore, int painDuring, String reason, Instant recordedAt) {

        static VersionLine of(SessionLogVersion v) {
            return new VersionLine(v.getVersion(), v.getSessionDate(), v.getStepNumber(), v.isAsPlanned(),
                    v.getDurationMin(), v.getRpe(), v.getPainBefore(), v.getPainDuring(), v.getReason(),
                    v.getRecordedAt());
        }
    }

    /** One version of the next-morning rating. */
    public record MorningLine(int version, int pain, String reason, Instant recordedAt) {

        static MorningLine of(MorningPain m) {
            return new MorningLine(m.getVersion(), m.getPain(), m.getReason(), m.getRecordedAt());
        }
    }
}
