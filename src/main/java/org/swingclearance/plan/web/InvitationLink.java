package org.swingclearance.plan.web;

import java.io.Serializable;
import java.time.Instant;

/** A just-created invitation link, carried once to the plan page (flash attribute) and never stored. */
public record InvitationLink(String url, String email, Instant expiresAt) implements Serializable {
}
