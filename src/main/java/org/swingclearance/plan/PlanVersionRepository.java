package org.swingclearance.plan;

import java.util.List;
import java.util.Optional;
import java.util.UUID;
import org.springframework.data.jpa.repository.JpaRepository;

/** Versions of plans, within the caller's clinic, newest first. */
interface PlanVersionRepository extends JpaRepository<PlanVersion, UUID> {

    List<PlanVersion> findByClinicIdAndPlanIdOrderByNumberDesc(UUID clinicId, UUID planId);

    Optional<PlanVersion> findFirstByClinicIdAndPlanIdAndStatusOrderByNumberDesc(UUID clinicId, UUID planId,
                                                                                PlanStatus status);

    Optional<PlanVersion> findFirstByClinicIdAndPlanIdOrderByNumberDesc(UUID clinicId, UUID planId);
}
