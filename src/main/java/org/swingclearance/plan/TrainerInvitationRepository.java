package org.swingclearance.plan;

import jakarta.persistence.LockModeType;
import java.util.List;
import java.util.Optional;
import java.util.UUID;
import org.springframework.data.jpa.repository.JpaRepository;
import org.springframework.data.jpa.repository.Lock;

/** Invitations, found by the hash of their token (the only way in) or listed for a plan of the caller's clinic. */
interface TrainerInvitationRepository extends JpaRepository<TrainerInvitation, UUID> {

    Optional<TrainerInvitation> findByTokenSha256(String tokenSha256);

    /** Locks the row, so that two simultaneous uses of one link cannot both succeed. */
    @Lock(LockModeType.PESSIMISTIC_WRITE)
    Optional<TrainerInvitation> findLockedByTokenSha256(String tokenSha256);

    List<TrainerInvitation> findByClinicIdAndPlanIdOrderByCreatedAtDesc(UUID clinicId, UUID planId);
}
