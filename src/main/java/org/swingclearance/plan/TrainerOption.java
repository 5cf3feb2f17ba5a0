package org.swingclearance.plan;

import java.util.UUID;

/** A trainer account of the clinic the plan could be shared with, and whether a recorded consent names them. */
public record TrainerOption(UUID id, String name, String email, boolean consented, boolean alreadyShared) {
}
