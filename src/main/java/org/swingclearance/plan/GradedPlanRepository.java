package org.swingclearance.plan;

import java.util.Optional;
import java.util.UUID;
import org.springframework.data.jpa.repository.JpaRepository;

/** Plans, always found within the caller's clinic. */
interface GradedPlanRepository extends JpaRepository<GradedPlan, UUID> {

    Optional<GradedPlan> findByIdAndClinicId(UUID id, UUID clinicId);

    Optional<GradedPlan> findByClinicIdAndEpisodeId(UUID clinicId, UUID episodeId);
}
