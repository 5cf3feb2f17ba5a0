package org.swingclearance.training;

import java.util.List;
import java.util.Optional;
import java.util.UUID;
import org.springframework.data.jpa.repository.JpaRepository;
import org.springframework.data.jpa.repository.Query;

/** Versions of session logs, always read within the caller's clinic. */
interface SessionLogVersionRepository extends JpaRepository<SessionLogVersion, UUID> {

    Optional<SessionLogVersion> findFirstByClinicIdAndSessionLogIdOrderByVersionDesc(UUID clinicId, UUID sessionLogId);

    List<SessionLogVersion> findByClinicIdAndSessionLogIdOrderByVersionDesc(UUID clinicId, UUID sessionLogId);

    /** Every version of every log of an episode, oldest first (the page keeps the latest of each log). */
    @Query("""
            select v from SessionLogVersion v, SessionLog l
            where l.id = v.sessionLogId and l.clinicId = :clinicId and v.clinicId = :clinicId and l.episodeId = :episodeId
            order by v.sessionDate, l.createdAt, v.version""")
    List<SessionLogVersion> findAllOfEpisode(UUID clinicId, UUID episodeId);
}
