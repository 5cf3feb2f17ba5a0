package org.swingclearance.plan;

import java.time.Instant;

/** A just-created invitation: the one and only time its token is known, to be shown to the clinician as a link. */
public record NewInvitation(String token, String email, Instant expiresAt) {
}
