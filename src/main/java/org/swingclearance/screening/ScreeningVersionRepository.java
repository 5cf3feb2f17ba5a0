package org.swingclearance.screening;

import java.util.Collection;
import java.util.List;
import java.util.Optional;
import java.util.UUID;
import org.springframework.data.jpa.repository.JpaRepository;

/** Screening versions, always scoped by clinic. */
interface ScreeningVersionRepository extends JpaRepository<ScreeningVersion, UUID> {

    List<ScreeningVersion> findByClinicIdAndScreeningIdOrderByVersionNoAsc(UUID clinicId, UUID screeningId);

    List<ScreeningVersion> findByClinicIdAndScreeningIdInOrderByVersionNoAsc(UUID clinicId, Collection<UUID> screeningIds);

    Optional<ScreeningVersion> findByClinicIdAndScreeningIdAndVersionNo(UUID clinicId, UUID screeningId, int versionNo);

    List<ScreeningVersion> findByClinicIdAndStatusOrderByUpdatedAtDesc(UUID clinicId, ScreeningStatus status);
}
