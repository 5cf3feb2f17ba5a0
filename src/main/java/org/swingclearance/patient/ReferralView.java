package org.swingclearance.patient;

import java.time.Instant;
import java.util.UUID;

/** A recorded referral, for the patient page. */
public record ReferralView(UUID episodeId, String referredTo, String note, Instant recordedAt) {
}
