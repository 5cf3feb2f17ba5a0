package org.swingclearance.patient;

import java.util.List;
import java.util.Optional;
import java.util.UUID;
import org.springframework.data.jpa.repository.JpaRepository;

/** Referrals, newest first. */
public interface ReferralRepository extends JpaRepository<Referral, UUID> {

    Optional<Referral> findFirstByClinicIdAndEpisodeIdOrderByRecordedAtDesc(UUID clinicId, UUID episodeId);

    List<Referral> findByClinicIdAndEpisodeIdOrderByRecordedAtDesc(UUID clinicId, UUID episodeId);
}
