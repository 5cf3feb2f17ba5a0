package org.swingclearance.audit;

import java.util.List;
import java.util.UUID;

/** Who opened or changed one patient's records and when: per account, and the latest events. */
public record PatientAccessLog(UUID patientId, String patientCode, List<PatientAccess> byActor, EventPage latest) {
}
