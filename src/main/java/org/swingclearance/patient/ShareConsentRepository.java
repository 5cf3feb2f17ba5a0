package org.swingclearance.patient;

import java.util.List;
import java.util.Optional;
import java.util.UUID;
import org.springframework.data.jpa.repository.JpaRepository;

/** Share consents, always scoped by clinic. */
public interface ShareConsentRepository extends JpaRepository<ShareConsent, UUID> {

    Optional<ShareConsent> findByIdAndClinicId(UUID id, UUID clinicId);

    List<ShareConsent> findByClinicIdAndPatientIdOrderByConsentedOnDesc(UUID clinicId, UUID patientId);
}
