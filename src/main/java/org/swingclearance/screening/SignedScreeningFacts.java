package org.swingclearance.screening;

import java.time.Instant;
import java.util.UUID;

/**
 * The latest signed screening of an episode as the limits, plans and trainer features read it (Contract S).
 * Bands are the clinician's confirmed or overridden bands (LoadBand names). A region the episode does not include
 * and that was not fully assessed reports the band the clinician signed for it (Hold unless overridden with a
 * reason). Strength and range values are null when not tested. {@code redFlagsOpen} is the episode's state now (a
 * red flag recorded after signing counts; a referral recorded since releases it).
 */
public record SignedScreeningFacts(
        UUID screeningId, int version, Instant signedAt, UUID episodeId, UUID patientId,
        String shoulderBand, String lumbopelvicBand,
        double shoulderBandFraction, double lumbopelvicBandFraction,
        Double shoulderFlexionTorqueInvolvedNm,
        Double shoulderFlexionTorqueWeakerNm,
        Double gripStrengthInvolvedKg, Double gripStrengthWeakerKg,
        Double activeFlexionInvolvedDeg,
        Double shoulderToGripMeasuredM,
        int rulesVersion, boolean redFlagsOpen) {
}
