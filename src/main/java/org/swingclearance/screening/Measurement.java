package org.swingclearance.screening;

import static org.swingclearance.screening.ScreeningSection.LUMBOPELVIC_MOBILITY;
import static org.swingclearance.screening.ScreeningSection.LUMBOPELVIC_STABILITY;
import static org.swingclearance.screening.ScreeningSection.MECHANICS;
import static org.swingclearance.screening.ScreeningSection.PAIN;
import static org.swingclearance.screening.ScreeningSection.SHOULDER_MOBILITY;
import static org.swingclearance.screening.ScreeningSection.SHOULDER_STRENGTH;

/**
 * One measurement of the screening form (questionnaires aside), with the range a real value can have. The bounds
 * refuse what is physically impossible or a typing slip (flexion above 200°, a negative time, a lever arm of 0); they
 * are not clinical norms, and they lie within the engine's {@link org.swingclearance.engine.scoring.Measurement} ranges.
 * Names equal the engine's measure names, except the grip and CKCUEST trials, which the form records one by one
 * (grip: best of three; CKCUEST: the maximal trials). Sided measurements are entered for the left and the right side.
 */
public enum Measurement {
    PAIN_AT_REST(PAIN, MeasureUnit.NPRS_POINTS, 0, 10, Kind.WHOLE, false),
    PAIN_DURING_MOVEMENT(PAIN, MeasureUnit.NPRS_POINTS, 0, 10, Kind.WHOLE, false),
    PAIN_WORST_24H(PAIN, MeasureUnit.NPRS_POINTS, 0, 10, Kind.WHOLE, false),

    SHOULDER_FLEXION_ACTIVE(SHOULDER_MOBILITY, MeasureUnit.DEGREE, 0, 200, Kind.DECIMAL, true),
    SHOULDER_ABDUCTION_ACTIVE(SHOULDER_MOBILITY, MeasureUnit.DEGREE, 0, 200, Kind.DECIMAL, true),
    SHOULDER_EXTENSION_ACTIVE(SHOULDER_MOBILITY, MeasureUnit.DEGREE, 0, 100, Kind.DECIMAL, true),
    SHOULDER_ER_90_ACTIVE(SHOULDER_MOBILITY, MeasureUnit.DEGREE, 0, 180, Kind.DECIMAL, true),
    SHOULDER_IR_90_ACTIVE(SHOULDER_MOBILITY, MeasureUnit.DEGREE, 0, 150, Kind.DECIMAL, true),
    SHOULDER_ER_90_PASSIVE(SHOULDER_MOBILITY, MeasureUnit.DEGREE, 0, 180, Kind.DECIMAL, true),
    SHOULDER_IR_90_PASSIVE(SHOULDER_MOBILITY, MeasureUnit.DEGREE, 0, 150, Kind.DECIMAL, true),

    SHOULDER_FLEXION_FORCE(SHOULDER_STRENGTH, MeasureUnit.NEWTON, 0, 1500, Kind.DECIMAL, true),
    SHOULDER_FLEXION_LEVER_ARM(SHOULDER_STRENGTH, MeasureUnit.METRE, 0.05, 1.2, Kind.POSITIVE, true),
    SHOULDER_ER_FORCE(SHOULDER_STRENGTH, MeasureUnit.NEWTON, 0, 1500, Kind.DECIMAL, true),
    SHOULDER_ER_LEVER_ARM(SHOULDER_STRENGTH, MeasureUnit.METRE, 0.05, 1.2, Kind.POSITIVE, true),
    SHOULDER_IR_FORCE(SHOULDER_STRENGTH, MeasureUnit.NEWTON, 0, 1500, Kind.DECIMAL, true),
    SHOULDER_IR_LEVER_ARM(SHOULDER_STRENGTH, MeasureUnit.METRE, 0.05, 1.2, Kind.POSITIVE, true),
    GRIP_TRIAL_1(SHOULDER_STRENGTH, MeasureUnit.KILOGRAM, 0, 150, Kind.DECIMAL, true),
    GRIP_TRIAL_2(SHOULDER_STRENGTH, MeasureUnit.KILOGRAM, 0, 150, Kind.DECIMAL, true),
    GRIP_TRIAL_3(SHOULDER_STRENGTH, MeasureUnit.KILOGRAM, 0, 150, Kind.DECIMAL, true),
    CKCUEST_TRIAL_1(SHOULDER_STRENGTH, MeasureUnit.TOUCHES, 0, 100, Kind.WHOLE, false),
    CKCUEST_TRIAL_2(SHOULDER_STRENGTH, MeasureUnit.TOUCHES, 0, 100, Kind.WHOLE, false),
    CKCUEST_TRIAL_3(SHOULDER_STRENGTH, MeasureUnit.TOUCHES, 0, 100, Kind.WHOLE, false),
    CKCUEST_TRIAL_4(SHOULDER_STRENGTH, MeasureUnit.TOUCHES, 0, 100, Kind.WHOLE, false),

    SCHOBER_INCREASE(LUMBOPELVIC_MOBILITY, MeasureUnit.CENTIMETRE, 0, 20, Kind.DECIMAL, false),
    HIP_IR(LUMBOPELVIC_MOBILITY, MeasureUnit.DEGREE, 0, 90, Kind.DECIMAL, true),
    HIP_ER(LUMBOPELVIC_MOBILITY, MeasureUnit.DEGREE, 0, 90, Kind.DECIMAL, true),
    STRAIGHT_LEG_RAISE(LUMBOPELVIC_MOBILITY, MeasureUnit.DEGREE, 0, 180, Kind.DECIMAL, true),

    TRUNK_FLEXOR_HOLD(LUMBOPELVIC_STABILITY, MeasureUnit.SECOND, 0, 900, Kind.DECIMAL, false),
    TRUNK_EXTENSOR_HOLD(LUMBOPELVIC_STABILITY, MeasureUnit.SECOND, 0, 900, Kind.DECIMAL, false),
    SIDE_BRIDGE_HOLD(LUMBOPELVIC_STABILITY, MeasureUnit.SECOND, 0, 900, Kind.DECIMAL, true),
    ASLR(LUMBOPELVIC_STABILITY, MeasureUnit.ASLR_POINTS, 0, 5, Kind.WHOLE, true),
    PIT_PAIN_POSITION_1(LUMBOPELVIC_STABILITY, MeasureUnit.YES_NO, 0, 1, Kind.YES_NO, false),
    PIT_EASED_POSITION_2(LUMBOPELVIC_STABILITY, MeasureUnit.YES_NO, 0, 1, Kind.YES_NO, false),
    ABERRANT_LUMBAR_FLEXION(LUMBOPELVIC_STABILITY, MeasureUnit.YES_NO, 0, 1, Kind.YES_NO, false),
    SINGLE_LEG_STANCE(LUMBOPELVIC_STABILITY, MeasureUnit.SECOND, 0, 300, Kind.DECIMAL, true),

    SHOULDER_TO_GRIP_DISTANCE(MECHANICS, MeasureUnit.CENTIMETRE, 30, 130, Kind.DECIMAL, true);

    /** How a value is entered and checked. */
    public enum Kind {
        /** Any number in [min, max]. */
        DECIMAL,
        /** A number in [min, max] with min &gt; 0: zero or less is refused (a lever arm of 0 gives no torque). */
        POSITIVE,
        /** A whole number in [min, max]. */
        WHOLE,
        /** 1 = yes, 0 = no. */
        YES_NO
    }

    private final ScreeningSection section;
    private final MeasureUnit unit;
    private final double min;
    private final double max;
    private final Kind kind;
    private final boolean sided;

    Measurement(ScreeningSection section, MeasureUnit unit, double min, double max, Kind kind, boolean sided) {
        this.section = section;
        this.unit = unit;
        this.min = min;
        this.max = max;
        this.kind = kind;
        this.sided = sided;
    }

    /** The engine measure this value feeds: the same name, except the trials (GRIP, CKCUEST_TRIALS). */
    public String engineName() {
        return switch (this) {
            case GRIP_TRIAL_1, GRIP_TRIAL_2, GRIP_TRIAL_3 -> "GRIP";
            case CKCUEST_TRIAL_1, CKCUEST_TRIAL_2, CKCUEST_TRIAL_3, CKCUEST_TRIAL_4 -> "CKCUEST_TRIALS";
            default -> name();
        };
    }

    public ScreeningSection section() { return section; }
    public MeasureUnit unit() { return unit; }
    public double min() { return min; }
    public double max() { return max; }
    public Kind kind() { return kind; }
    public boolean sided() { return sided; }
}
