package org.swingclearance.screening;

import static org.swingclearance.screening.ScreeningSection.LUMBOPELVIC_MOBILITY;
import static org.swingclearance.screening.ScreeningSection.LUMBOPELVIC_STABILITY;
import static org.swingclearance.screening.ScreeningSection.MECHANICS;
import static org.swingclearance.screening.ScreeningSection.PAIN;
import static org.swingclearance.screening.ScreeningSection.SHOULDER_MOBILITY;
import static org.swingclearance.screening.ScreeningSection.SHOULDER_STRENGTH;

/**
 * One measurement of the battery (questionnaires aside), with the range a real value can have. The bounds refuse
 * what is physically impossible or a typing slip (flexion above 200°, a negative time, a lever arm of 0); they are
 * not clinical norms. Sided measurements are entered for the left and the right side.
 */
public enum Measure {
    PAIN_AT_REST(PAIN, MeasureUnit.NPRS_POINTS, 0, 10, Kind.WHOLE, false),
    PAIN_DURING(PAIN, MeasureUnit.NPRS_POINTS, 0, 10, Kind.WHOLE, false),
    PAIN_WORST_24H(PAIN, MeasureUnit.NPRS_POINTS, 0, 10, Kind.WHOLE, false),

    ACTIVE_FLEXION(SHOULDER_MOBILITY, MeasureUnit.DEGREE, 0, 200, Kind.DECIMAL, true),
    ACTIVE_ABDUCTION(SHOULDER_MOBILITY, MeasureUnit.DEGREE, 0, 200, Kind.DECIMAL, true),
    ACTIVE_EXTENSION(SHOULDER_MOBILITY, MeasureUnit.DEGREE, 0, 120, Kind.DECIMAL, true),
    ACTIVE_ER90(SHOULDER_MOBILITY, MeasureUnit.DEGREE, 0, 180, Kind.DECIMAL, true),
    ACTIVE_IR90(SHOULDER_MOBILITY, MeasureUnit.DEGREE, 0, 150, Kind.DECIMAL, true),
    PASSIVE_ER90(SHOULDER_MOBILITY, MeasureUnit.DEGREE, 0, 180, Kind.DECIMAL, true),
    PASSIVE_IR90(SHOULDER_MOBILITY, MeasureUnit.DEGREE, 0, 150, Kind.DECIMAL, true),

    FLEXION90_FORCE(SHOULDER_STRENGTH, MeasureUnit.NEWTON, 0, 1500, Kind.DECIMAL, true),
    FLEXION90_LEVER(SHOULDER_STRENGTH, MeasureUnit.METRE, 0, 1.5, Kind.POSITIVE, true),
    ER_FORCE(SHOULDER_STRENGTH, MeasureUnit.NEWTON, 0, 1500, Kind.DECIMAL, true),
    ER_LEVER(SHOULDER_STRENGTH, MeasureUnit.METRE, 0, 1.5, Kind.POSITIVE, true),
    IR_FORCE(SHOULDER_STRENGTH, MeasureUnit.NEWTON, 0, 1500, Kind.DECIMAL, true),
    IR_LEVER(SHOULDER_STRENGTH, MeasureUnit.METRE, 0, 1.5, Kind.POSITIVE, true),
    GRIP_TRIAL_1(SHOULDER_STRENGTH, MeasureUnit.KILOGRAM, 0, 150, Kind.DECIMAL, true),
    GRIP_TRIAL_2(SHOULDER_STRENGTH, MeasureUnit.KILOGRAM, 0, 150, Kind.DECIMAL, true),
    GRIP_TRIAL_3(SHOULDER_STRENGTH, MeasureUnit.KILOGRAM, 0, 150, Kind.DECIMAL, true),
    CKCUEST_TRIAL_1(SHOULDER_STRENGTH, MeasureUnit.TOUCHES, 0, 100, Kind.WHOLE, false),
    CKCUEST_TRIAL_2(SHOULDER_STRENGTH, MeasureUnit.TOUCHES, 0, 100, Kind.WHOLE, false),
    CKCUEST_TRIAL_3(SHOULDER_STRENGTH, MeasureUnit.TOUCHES, 0, 100, Kind.WHOLE, false),
    CKCUEST_TRIAL_4(SHOULDER_STRENGTH, MeasureUnit.TOUCHES, 0, 100, Kind.WHOLE, false),

    MODIFIED_SCHOBER(LUMBOPELVIC_MOBILITY, MeasureUnit.CENTIMETRE, 0, 15, Kind.DECIMAL, false),
    HIP_IR(LUMBOPELVIC_MOBILITY, MeasureUnit.DEGREE, 0, 90, Kind.DECIMAL, true),
    HIP_ER(LUMBOPELVIC_MOBILITY, MeasureUnit.DEGREE, 0, 90, Kind.DECIMAL, true),
    STRAIGHT_LEG_RAISE(LUMBOPELVIC_MOBILITY, MeasureUnit.DEGREE, 0, 130, Kind.DECIMAL, true),

    TRUNK_FLEXOR_HOLD(LUMBOPELVIC_STABILITY, MeasureUnit.SECOND, 0, 1200, Kind.DECIMAL, false),
    TRUNK_EXTENSOR_HOLD(LUMBOPELVIC_STABILITY, MeasureUnit.SECOND, 0, 1200, Kind.DECIMAL, false),
    SIDE_BRIDGE_HOLD(LUMBOPELVIC_STABILITY, MeasureUnit.SECOND, 0, 1200, Kind.DECIMAL, true),
    ASLR(LUMBOPELVIC_STABILITY, MeasureUnit.ASLR_POINTS, 0, 5, Kind.WHOLE, true),
    PIT_PAIN_POSITION_1(LUMBOPELVIC_STABILITY, MeasureUnit.YES_NO, 0, 1, Kind.YES_NO, false),
    PIT_EASED_POSITION_2(LUMBOPELVIC_STABILITY, MeasureUnit.YES_NO, 0, 1, Kind.YES_NO, false),
    SINGLE_LEG_STANCE(LUMBOPELVIC_STABILITY, MeasureUnit.SECOND, 0, 300, Kind.DECIMAL, true),

    SHOULDER_TO_GRIP(MECHANICS, MeasureUnit.CENTIMETRE, 30, 120, Kind.DECIMAL, false);

    /** How a value is entered and checked. */
    public enum Kind {
        /** Any number in [min, max]. */
        DECIMAL,
        /** A number in (min, max]: zero is refused (a lever arm of 0 gives no torque). */
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

    Measure(ScreeningSection section, MeasureUnit unit, double min, double max, Kind kind, boolean sided) {
        this.section = section;
        this.unit = unit;
        this.min = min;
        this.max = max;
        this.kind = kind;
        this.sided = sided;
    }

    public ScreeningSection section() { return section; }
    public MeasureUnit unit() { return unit; }
    public double min() { return min; }
    public double max() { return max; }
    public Kind kind() { return kind; }
    public boolean sided() { return sided; }
}
