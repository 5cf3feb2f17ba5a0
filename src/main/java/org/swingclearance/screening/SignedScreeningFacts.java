package org.swingclearance.screening;

import java.time.Instant;
import java.util.UUID;

/**
 * The latest signed screening of an episode as the limits, plans and trainer features read it (Contract S).
 * Bands are the clinician's confirmed or overridden bands (LoadBand names). A region the episode does not include
 * and that was not fully assessed reports the band the clinician signed for it (Hold unless overridden with a
 * reason). "Involved" is the episode's shoulder, for a lumbopelvic-only episode the dominant hand (either hand: right).
 * Strength and range values are null when not tested; the weaker-side values need both sides tested (otherwise the
 * weaker side is unknown and they are null). Fractions are those of the rules version the screening was banded with.
 * {@code redFlagsOpen} is the episode's state now (a red flag recorded after signing counts; a referral recorded
 * since releases it).
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
