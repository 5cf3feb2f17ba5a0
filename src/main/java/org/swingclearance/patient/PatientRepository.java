package org.swingclearance.patient;

import java.util.Optional;
import java.util.UUID;
import org.springframework.data.domain.Page;
import org.springframework.data.domain.Pageable;
import org.springframework.data.jpa.repository.JpaRepository;
import org.springframework.data.jpa.repository.Query;

/** Patients, always scoped by clinic. */
public interface PatientRepository extends JpaRepository<Patient, UUID> {

    Optional<Patient> findByIdAndClinicId(UUID id, UUID clinicId);

    boolean existsByClinicIdAndCodeIgnoreCase(UUID clinicId, String code);

    @Query("""
            select p from Patient p where p.clinicId = :clinicId and (:q = ''
              or lower(p.code) like concat('%', lower(:q), '%')
              or lower(coalesce(p.fullName, '')) like concat('%', lower(:q), '%'))
            order by p.code""")
    Page<Patient> search(UUID clinicId, String q, Pageable page);
}
