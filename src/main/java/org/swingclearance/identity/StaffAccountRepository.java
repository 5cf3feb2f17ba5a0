package org.swingclearance.identity;

import java.util.List;
import java.util.Optional;
import java.util.UUID;
import org.springframework.data.jpa.repository.JpaRepository;
import org.springframework.data.jpa.repository.Query;

/** Staff accounts; every finder but the sign-in lookup is scoped by clinic. */
public interface StaffAccountRepository extends JpaRepository<StaffAccount, UUID> {

    @Query("select s from StaffAccount s where lower(s.email) = lower(?1)")
    Optional<StaffAccount> findByEmail(String email);

    Optional<StaffAccount> findByIdAndClinicId(UUID id, UUID clinicId);

    List<StaffAccount> findByClinicIdOrderByDisplayName(UUID clinicId);

    List<StaffAccount> findByClinicIdAndRoleAndEnabledTrueOrderByDisplayName(UUID clinicId, StaffRole role);
}
