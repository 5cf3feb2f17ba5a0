package org.swingclearance.equipment;

import java.util.List;
import java.util.Optional;
import java.util.UUID;
import org.springframework.data.jpa.repository.JpaRepository;

/** Clubs, always looked up within one clinic. */
interface ClubRepository extends JpaRepository<Club, UUID> {

    Optional<Club> findByIdAndClinicId(UUID id, UUID clinicId);

    List<Club> findByClinicIdAndRetiredAtIsNullOrderByMassKgAscNameAsc(UUID clinicId);

    List<Club> findByClinicIdAndRetiredAtIsNotNullOrderByRetiredAtDesc(UUID clinicId);

    boolean existsByClinicIdAndNameIgnoreCaseAndRetiredAtIsNull(UUID clinicId, String name);

    boolean existsByClinicIdAndNameIgnoreCaseAndRetiredAtIsNullAndIdNot(UUID clinicId, String name, UUID id);
}
