package org.swingclearance.envelope;

import java.util.List;
import java.util.UUID;
import org.swingclearance.equipment.ClubView;
import org.swingclearance.equipment.SwingPatternView;

/**
 * Everything an envelope is computed from, kept whole in its snapshot: the digest of this record decides whether
 * a stored snapshot can be reused. SI units; angles in degrees.
 *
 * @param cycleTimeS the patient's usual cycle time the table is computed at, s
 */
public record EnvelopeInputs(UUID screeningId, int screeningVersion, BodyInput body, CapacityInput capacity,
                             RulesInput rules, double cycleTimeS, List<ClubView> clubs,
                             List<SwingPatternView> patterns, String engineVersion) {

    public EnvelopeInputs {
        clubs = List.copyOf(clubs);
        patterns = List.copyOf(patterns);
    }

    /** The patient's body: stature, body mass, and the measured shoulder-to-grip distance when there is one. */
    public record BodyInput(double statureM, double bodyMassKg, Double shoulderToGripMeasuredM) {
    }

    /**
     * What the signed screening measured and decided: bands (LoadBand names) with the shoulder band's fraction,
     * shoulder flexion torque and grip strength of the involved and the weaker side, active shoulder flexion.
     */
    public record CapacityInput(String shoulderBand, double shoulderBandFraction, String lumbopelvicBand,
                                Double torqueInvolvedNm, Double torqueWeakerNm, Double gripInvolvedKg,
                                Double gripWeakerKg, Double activeFlexionDeg) {
    }

    /**
     * The practice-rules settings the constraints use, from the rules version the screening was signed under.
     *
     * @param gripFraction f_grip for C3, or null when the band's own fraction applies
     */
    public record RulesInput(int version, Double gripFraction, boolean controlledStop, double rangeMarginDeg,
                             String hipDrivenMinimumBand) {
    }
}
