package org.swingclearance.identity;

import java.util.UUID;

/** A staff account as the administrator's pages see it. */
public record StaffView(UUID id, String email, String displayName, StaffRole role, boolean enabled, long version) {

    static StaffView of(StaffAccount a) {
        return new StaffView(a.getId(), a.getEmail(), a.getDisplayName(), a.getRole(), a.isEnabled(), a.getVersion());
    }
}
