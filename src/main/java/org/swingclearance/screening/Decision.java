package org.swingclearance.screening;

/**
 * The clinician's band decision at signing: for each region either nothing (the suggested band is confirmed) or
 * a chosen band; choosing a band other than the suggestion needs a reason.
 *
 * @param shoulderBand             chosen shoulder band name, null = confirm the suggestion
 * @param shoulderOverrideReason   why, when the chosen band differs from the suggestion
 * @param lumbopelvicBand          chosen lumbopelvic band name, null = confirm the suggestion
 * @param lumbopelvicOverrideReason why, when the chosen band differs from the suggestion
 */
public record Decision(String shoulderBand, String shoulderOverrideReason, String lumbopelvicBand,
                       String lumbopelvicOverrideReason) {

    public static Decision confirmAll() {
        return new Decision(null, null, null, null);
    }
}
