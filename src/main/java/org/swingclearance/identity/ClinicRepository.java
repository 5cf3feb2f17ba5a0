package org.swingclearance.identity;

import java.util.UUID;
import org.springframework.data.jpa.repository.JpaRepository;

/** Clinics by id. */
public interface ClinicRepository extends JpaRepository<Clinic, UUID> {
}
