package org.swingclearance.rules;

import java.util.List;
import java.util.Optional;
import java.util.UUID;
import org.springframework.data.jpa.repository.JpaRepository;

/** Rule-set versions, always scoped by clinic. */
interface RuleSetRepository extends JpaRepository<RuleSetRecord, UUID> {

    Optional<RuleSetRecord> findFirstByClinicIdOrderByVersionDesc(UUID clinicId);

    Optional<RuleSetRecord> findByClinicIdAndVersion(UUID clinicId, int version);

    Optional<RuleSetRecord> findByIdAndClinicId(UUID id, UUID clinicId);

    List<RuleSetRecord> findByClinicIdOrderByVersionDesc(UUID clinicId);
}
