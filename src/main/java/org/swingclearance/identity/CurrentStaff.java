package org.swingclearance.identity;

import java.io.Serializable;
import java.util.UUID;

/** Who is acting and for which clinic; every application service takes one and scopes its work by it. */
public record CurrentStaff(UUID staffId, UUID clinicId, StaffRole role, String email, String displayName,
                           UnitSystem unitSystem) implements Serializable {

    public boolean is(StaffRole other) {
        return role == other;
    }
}
