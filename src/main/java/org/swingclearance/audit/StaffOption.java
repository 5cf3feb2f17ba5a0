package org.swingclearance.audit;

import java.util.UUID;

/** An account of the clinic, as an option of the actor filter and a name in the reports. */
public record StaffOption(UUID id, String name, String role) {
}
