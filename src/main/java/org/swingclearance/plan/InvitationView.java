package org.swingclearance.plan;

import java.time.Instant;
import java.util.UUID;

/** An invitation as the clinician's plan page lists it (never its token: only the hash is kept). */
public record InvitationView(UUID id, String email, String invitedName, Instant createdAt, Instant expiresAt,
                             Instant usedAt, boolean open) {

    static InvitationView of(TrainerInvitation i, Instant now) {
        return new InvitationView(i.getId(), i.getEmail(), i.getInvitedName(), i.getCreatedAt(), i.getExpiresAt(),
                i.getUsedAt(), i.isOpenAt(now));
    }
}
