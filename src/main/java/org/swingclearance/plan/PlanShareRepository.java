package org.swingclearance.plan;

import java.util.List;
import java.util.Optional;
import java.util.UUID;
import org.springframework.data.jpa.repository.JpaRepository;

/** Shares of plans with trainers, within the caller's clinic. */
interface PlanShareRepository extends JpaRepository<PlanShare, UUID> {

    Optional<PlanShare> findByIdAndClinicId(UUID id, UUID clinicId);

    List<PlanShare> findByClinicIdAndPlanIdOrderBySharedAtDesc(UUID clinicId, UUID planId);

    Optional<PlanShare> findByClinicIdAndPlanIdAndTrainerIdAndUnsharedAtIsNull(UUID clinicId, UUID planId,
                                                                              UUID trainerId);

    List<PlanShare> findByClinicIdAndConsentIdAndUnsharedAtIsNull(UUID clinicId, UUID consentId);

    List<PlanShare> findByClinicIdAndTrainerIdAndUnsharedAtIsNullOrderBySharedAtDesc(UUID clinicId, UUID trainerId);
}
