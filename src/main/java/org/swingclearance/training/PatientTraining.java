package org.swingclearance.training;

import java.time.LocalDate;
import java.util.List;
import java.util.UUID;

/** The training section of the patient page: episodes with a plan or logged sessions, and the patient's alerts. */
public record PatientTraining(UUID patientId, List<EpisodeLog> episodes, List<AlertView> alerts) {

    /** An episode's training log entry point: how many sessions it holds and whether a plan is issued. */
    public record EpisodeLog(UUID episodeId, LocalDate injuryDate, int sessions, boolean planIssued) {
    }
}
