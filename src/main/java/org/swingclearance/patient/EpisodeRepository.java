package org.swingclearance.patient;

import java.util.List;
import java.util.Optional;
import java.util.UUID;
import org.springframework.data.jpa.repository.JpaRepository;

/** Episodes, always scoped by clinic. */
public interface EpisodeRepository extends JpaRepository<Episode, UUID> {

    Optional<Episode> findByIdAndClinicId(UUID id, UUID clinicId);

    List<Episode> findByClinicIdAndPatientIdOrderByCreatedAtDesc(UUID clinicId, UUID patientId);
}
