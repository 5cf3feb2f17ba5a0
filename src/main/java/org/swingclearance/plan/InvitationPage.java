package org.swingclearance.plan;

import java.time.Instant;

/** What the invitation page shows the invited person before they set a name and password. */
public record InvitationPage(String clinicName, String email, String invitedName, Instant expiresAt) {
}
