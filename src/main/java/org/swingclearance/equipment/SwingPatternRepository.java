package org.swingclearance.equipment;

import java.util.List;
import java.util.Optional;
import java.util.UUID;
import org.springframework.data.jpa.repository.JpaRepository;
import org.springframework.data.jpa.repository.Query;
import org.springframework.data.repository.query.Param;

/** Swing patterns: the built-in library (no clinic) and one clinic's own. */
interface SwingPatternRepository extends JpaRepository<SwingPattern, UUID> {

    /** Built-ins and the clinic's patterns in use, built-ins first in library order. */
    @Query("""
            select p from SwingPattern p
            where (p.clinicId is null or p.clinicId = :clinicId) and p.retiredAt is null
            order by p.sortOrder, p.name""")
    List<SwingPattern> usable(@Param("clinicId") UUID clinicId);

    List<SwingPattern> findByClinicIdAndRetiredAtIsNotNullOrderByRetiredAtDesc(UUID clinicId);

    /** A built-in, or one of the clinic's own. */
    @Query("select p from SwingPattern p where p.id = :id and (p.clinicId is null or p.clinicId = :clinicId)")
    Optional<SwingPattern> visible(@Param("id") UUID id, @Param("clinicId") UUID clinicId);

    boolean existsByClinicIdAndNameIgnoreCaseAndRetiredAtIsNull(UUID clinicId, String name);
}
