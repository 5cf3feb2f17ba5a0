package org.swingclearance.patient;

import java.util.List;
import java.util.Optional;
import java.util.UUID;
import org.springframework.data.jpa.repository.JpaRepository;

/** Red-flag checklists, newest first. */
public interface RedFlagCheckRepository extends JpaRepository<RedFlagCheck, UUID> {

    Optional<RedFlagCheck> findFirstByClinicIdAndEpisodeIdOrderByCheckedAtDesc(UUID clinicId, UUID episodeId);

    List<RedFlagCheck> findByClinicIdAndEpisodeIdOrderByCheckedAtDesc(UUID clinicId, UUID episodeId);
}
