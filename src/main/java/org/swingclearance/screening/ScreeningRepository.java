package org.swingclearance.screening;

import java.util.List;
import java.util.Optional;
import java.util.UUID;
import org.springframework.data.jpa.repository.JpaRepository;

/** Screening identities, always scoped by clinic. */
interface ScreeningRepository extends JpaRepository<Screening, UUID> {

    Optional<Screening> findByIdAndClinicId(UUID id, UUID clinicId);

    List<Screening> findByClinicIdAndEpisodeIdOrderByCreatedAtAsc(UUID clinicId, UUID episodeId);

    List<Screening> findByClinicIdAndPatientIdOrderByCreatedAtAsc(UUID clinicId, UUID patientId);
}
