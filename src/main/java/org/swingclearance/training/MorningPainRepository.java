package org.swingclearance.training;

import java.util.List;
import java.util.Optional;
import java.util.UUID;
import org.springframework.data.jpa.repository.JpaRepository;
import org.springframework.data.jpa.repository.Query;

/** Next-morning pain entries, always read within the caller's clinic. */
interface MorningPainRepository extends JpaRepository<MorningPain, UUID> {

    Optional<MorningPain> findFirstByClinicIdAndSessionLogIdOrderByVersionDesc(UUID clinicId, UUID sessionLogId);

    List<MorningPain> findByClinicIdAndSessionLogIdOrderByVersionDesc(UUID clinicId, UUID sessionLogId);

    @Query("""
            select m from MorningPain m, SessionLog l
            where l.id = m.sessionLogId and l.clinicId = :clinicId and m.clinicId = :clinicId and l.episodeId = :episodeId
            order by m.version""")
    List<MorningPain> findAllOfEpisode(UUID clinicId, UUID episodeId);
}
