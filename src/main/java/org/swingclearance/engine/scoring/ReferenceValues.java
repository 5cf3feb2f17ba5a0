package org.swingclearance.engine.scoring;

import java.util.Objects;
import java.util.Optional;
import org.swingclearance.engine.evidence.Citation;
import org.swingclearance.engine.evidence.Citations;

/**
 * Published reference values used for context next to a measurement (clinical.md §1.2, §3.7). Comparison order
 * stays: contralateral side, own baseline, age/sex reference, then these.
 */
public final class ReferenceValues {

    /** Shoulder motions of the AAOS table. */
    public enum ShoulderMotion {
        FLEXION(180),
        EXTENSION(60),
        ABDUCTION(180),
        INTERNAL_ROTATION(70),
        EXTERNAL_ROTATION(90);

        private final double aaosDegrees;

        ShoulderMotion(double aaosDegrees) {
            this.aaosDegrees = aaosDegrees;
        }
    }

    /**
     * One reference value.
     *
     * @param label    what it is, e.g. "AAOS flexion" or "60–69 y mean"
     * @param value    the value
     * @param unit     its unit
     * @param citation its source
     */
    public record ReferenceValue(String label, double value, Unit unit, Citation citation) {
        public ReferenceValue {
            Objects.requireNonNull(label, "label");
            Objects.requireNonNull(unit, "unit");
            Objects.requireNonNull(citation, "citation");
        }
    }

    private ReferenceValues() {
    }

    /** AAOS mean active range of a shoulder motion in degrees (Norkin & White Table A.1). */
    public static ReferenceValue aaosShoulder(ShoulderMotion motion) {
        Objects.requireNonNull(motion, "motion");
        return new ReferenceValue("AAOS " + motion.name().toLowerCase().replace('_', ' '), motion.aaosDegrees,
                Unit.DEGREE, Citations.AAOS_SHOULDER_ROM);
    }

    /**
     * Mean single-leg stance time, eyes open, from Bohannon's 2006 meta-analysis: 60–69 y 27.0 s, 70–79 y 17.2 s,
     * 80–99 y 8.5 s.
     *
     * @param ageYears age in whole years
     * @return the mean in {@link Unit#SECOND}; empty outside 60–99 years (the meta-analysis covers only these)
     */
    public static Optional<ReferenceValue> singleLegStanceEyesOpenMean(int ageYears) {
        if (ageYears < 60 || ageYears > 99) {
            return Optional.empty();
        }
        String band = ageYears < 70 ? "60–69" : ageYears < 80 ? "70–79" : "80–99";
        double mean = ageYears < 70 ? 27.0 : ageYears < 80 ? 17.2 : 8.5;
        return Optional.of(new ReferenceValue(band + " y mean, eyes open", mean, Unit.SECOND,
                Citations.BOHANNON_2006_STANCE));
    }
}
