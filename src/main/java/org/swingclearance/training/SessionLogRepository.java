package org.swingclearance.training;

import java.util.List;
import java.util.Optional;
import java.util.UUID;
import org.springframework.data.jpa.repository.JpaRepository;

/** Session log identities, always read within the caller's clinic. */
interface SessionLogRepository extends JpaRepository<SessionLog, UUID> {

    Optional<SessionLog> findByIdAndClinicId(UUID id, UUID clinicId);

    List<SessionLog> findByClinicIdAndEpisodeId(UUID clinicId, UUID episodeId);
}
