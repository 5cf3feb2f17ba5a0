package org.swingclearance.training;

import java.util.List;
import java.util.Optional;
import java.util.UUID;
import org.springframework.data.jpa.repository.JpaRepository;

/** Alerts, always read within the caller's clinic, newest first. */
interface TrainingAlertRepository extends JpaRepository<TrainingAlert, UUID> {

    Optional<TrainingAlert> findByIdAndClinicId(UUID id, UUID clinicId);

    List<TrainingAlert> findByClinicIdAndAcknowledgedAtIsNullOrderByRaisedAtDesc(UUID clinicId);

    List<TrainingAlert> findByClinicIdAndEpisodeIdOrderByRaisedAtDesc(UUID clinicId, UUID episodeId);

    List<TrainingAlert> findByClinicIdAndPatientIdOrderByRaisedAtDesc(UUID clinicId, UUID patientId);

    boolean existsBySourceIdAndKind(UUID sourceId, AlertKind kind);

    boolean existsBySessionLogIdAndKindAndAcknowledgedAtIsNull(UUID sessionLogId, AlertKind kind);
}
