package org.swingclearance.engine.scoring;

import java.util.Objects;

/**
 * Every raw input of the screening battery, with its unit, whether it is taken per side, and the physically
 * possible range. The web layer refuses values outside {@link #min()}–{@link #max()} with a field message before
 * they reach the engine; {@link ScreeningInput} re-checks and throws.
 */
public enum Measure {
    // context from the patient record or taken at the screening
    BODY_MASS(Kind.NUMBER, Unit.KILOGRAM, false, 20, 300),
    STATURE(Kind.NUMBER, Unit.METRE, false, 1.0, 2.5),
    AGE(Kind.NUMBER, Unit.YEAR, false, 0, 120),

    // pain, numeric rating 0–10
    PAIN_AT_REST(Kind.WHOLE_NUMBER, Unit.POINTS, false, 0, 10),
    PAIN_DURING_MOVEMENT(Kind.WHOLE_NUMBER, Unit.POINTS, false, 0, 10),
    PAIN_WORST_24H(Kind.WHOLE_NUMBER, Unit.POINTS, false, 0, 10),

    // shoulder mobility, goniometer; rotations at 90° abduction
    SHOULDER_FLEXION_ACTIVE(Kind.NUMBER, Unit.DEGREE, true, 0, 200),
    SHOULDER_ABDUCTION_ACTIVE(Kind.NUMBER, Unit.DEGREE, true, 0, 200),
    SHOULDER_EXTENSION_ACTIVE(Kind.NUMBER, Unit.DEGREE, true, 0, 100),
    SHOULDER_ER_90_ACTIVE(Kind.NUMBER, Unit.DEGREE, true, 0, 180),
    SHOULDER_IR_90_ACTIVE(Kind.NUMBER, Unit.DEGREE, true, 0, 180),
    SHOULDER_ER_90_PASSIVE(Kind.NUMBER, Unit.DEGREE, true, 0, 180),
    SHOULDER_IR_90_PASSIVE(Kind.NUMBER, Unit.DEGREE, true, 0, 180),

    // shoulder strength, hand-held dynamometer force with its lever arm
    SHOULDER_FLEXION_FORCE(Kind.NUMBER, Unit.NEWTON, true, 0, 1500),
    SHOULDER_FLEXION_LEVER_ARM(Kind.NUMBER, Unit.METRE, true, 0.05, 1.2),
    SHOULDER_ER_FORCE(Kind.NUMBER, Unit.NEWTON, true, 0, 1500),
    SHOULDER_ER_LEVER_ARM(Kind.NUMBER, Unit.METRE, true, 0.05, 1.2),
    SHOULDER_IR_FORCE(Kind.NUMBER, Unit.NEWTON, true, 0, 1500),
    SHOULDER_IR_LEVER_ARM(Kind.NUMBER, Unit.METRE, true, 0.05, 1.2),
    /** Grip strength already summarised by the clinic's protocol ({@link Grip#summarise}). */
    GRIP(Kind.NUMBER, Unit.KILOGRAM, true, 0, 150),

    // shoulder stability
    /** Touches of each maximal 15-s trial, warm-up excluded. */
    CKCUEST_TRIALS(Kind.TRIALS, Unit.TOUCHES, false, 0, 100),
    UQ_REACH_MEDIAL(Kind.NUMBER, Unit.CENTIMETRE, true, 0, 250),
    UQ_REACH_INFEROLATERAL(Kind.NUMBER, Unit.CENTIMETRE, true, 0, 250),
    UQ_REACH_SUPEROLATERAL(Kind.NUMBER, Unit.CENTIMETRE, true, 0, 250),
    UPPER_LIMB_LENGTH(Kind.NUMBER, Unit.CENTIMETRE, true, 30, 130),
    /** Shoulder joint centre to the centre of the fist, arm straight; used by the mechanics engine. */
    SHOULDER_TO_GRIP_DISTANCE(Kind.NUMBER, Unit.CENTIMETRE, true, 30, 130),

    // lumbopelvic mobility
    SCHOBER_INCREASE(Kind.NUMBER, Unit.CENTIMETRE, false, 0, 20),
    HIP_IR(Kind.NUMBER, Unit.DEGREE, true, 0, 90),
    HIP_ER(Kind.NUMBER, Unit.DEGREE, true, 0, 90),
    STRAIGHT_LEG_RAISE(Kind.NUMBER, Unit.DEGREE, true, 0, 180),

    // lumbopelvic stability and endurance
    TRUNK_FLEXOR_HOLD(Kind.NUMBER, Unit.SECOND, false, 0, 900),
    TRUNK_EXTENSOR_HOLD(Kind.NUMBER, Unit.SECOND, false, 0, 900),
    SIDE_BRIDGE_HOLD(Kind.NUMBER, Unit.SECOND, true, 0, 900),
    ASLR(Kind.WHOLE_NUMBER, Unit.POINTS, true, 0, 5),
    PIT_PAIN_POSITION_1(Kind.YES_NO, Unit.YES_NO, false, 0, 1),
    PIT_EASED_POSITION_2(Kind.YES_NO, Unit.YES_NO, false, 0, 1),
    ABERRANT_LUMBAR_FLEXION(Kind.YES_NO, Unit.YES_NO, false, 0, 1),
    SINGLE_LEG_STANCE(Kind.NUMBER, Unit.SECOND, true, 0, 300),

    // questionnaires by item responses (min–max is each item's scale)
    QUICKDASH(Kind.ITEMS, Unit.POINTS, false, 1, 5, QuickDash.ITEMS),
    QUICKDASH_WORK(Kind.ITEMS, Unit.POINTS, false, 1, 5, QuickDash.MODULE_ITEMS),
    QUICKDASH_SPORT(Kind.ITEMS, Unit.POINTS, false, 1, 5, QuickDash.MODULE_ITEMS),
    ODI(Kind.ITEMS, Unit.POINTS, false, 0, 5, Oswestry.SECTIONS),
    /** 13 items: the 5 pain items first, then the 8 disability items. */
    SPADI(Kind.ITEMS, Unit.POINTS, false, 0, 10, Spadi.PAIN_ITEMS + Spadi.DISABILITY_ITEMS),
    TSK_11(Kind.ITEMS, Unit.POINTS, false, 1, 4, Kinesiophobia.TSK11_ITEMS);

    /** How a measure is entered. */
    public enum Kind {
        /** A real number in {@link #min()}–{@link #max()}. */
        NUMBER,
        /** A whole number in {@link #min()}–{@link #max()}. */
        WHOLE_NUMBER,
        /** Yes or no. */
        YES_NO,
        /** A list of whole-number trials, each in {@link #min()}–{@link #max()}. */
        TRIALS,
        /** Questionnaire responses by item index, each in {@link #min()}–{@link #max()} or unanswered. */
        ITEMS
    }

    private final Kind kind;
    private final Unit unit;
    private final boolean sided;
    private final double min;
    private final double max;
    private final int items;

    Measure(Kind kind, Unit unit, boolean sided, double min, double max) {
        this(kind, unit, sided, min, max, 0);
    }

    Measure(Kind kind, Unit unit, boolean sided, double min, double max, int items) {
        this.kind = kind;
        this.unit = unit;
        this.sided = sided;
        this.min = min;
        this.max = max;
        this.items = items;
    }

    /** How it is entered; never null. */
    public Kind kind() {
        return kind;
    }

    /** Unit of the value (of each trial, or of each item's scale); never null. */
    public Unit unit() {
        return unit;
    }

    /** True when taken per side (left and right). */
    public boolean sided() {
        return sided;
    }

    /** Smallest possible value (of each trial or item). */
    public double min() {
        return min;
    }

    /** Largest possible value (of each trial or item). */
    public double max() {
        return max;
    }

    /** Number of items of a questionnaire; 0 for other kinds. */
    public int items() {
        return items;
    }

    /** True when {@code value} is possible for this measure (finite, in range, whole where required). */
    public boolean accepts(double value) {
        return Double.isFinite(value) && value >= min && value <= max
                && (kind != Kind.WHOLE_NUMBER && kind != Kind.TRIALS && kind != Kind.ITEMS || value == Math.rint(value));
    }

    /** Returns {@code value} or throws {@link IllegalArgumentException} naming this measure when it is impossible. */
    public double check(double value) {
        if (!accepts(value)) {
            throw new IllegalArgumentException(name() + " must be " + (kind == Kind.NUMBER ? "" : "a whole number ")
                    + "within " + min + "–" + max + " " + unit.symbol() + ", was " + value);
        }
        return value;
    }

    /** The key of this measure on a side; {@code side} must be non-null exactly when the measure is sided. */
    public MeasureKey on(Side side) {
        return new MeasureKey(this, side);
    }

    /** The key of an unsided measure. */
    public MeasureKey key() {
        return new MeasureKey(this, null);
    }

    static Measure require(Measure measure, Kind... kinds) {
        Objects.requireNonNull(measure, "measure");
        for (Kind kind : kinds) {
            if (measure.kind == kind) {
                return measure;
            }
        }
        throw new IllegalArgumentException(measure + " is entered as " + measure.kind);
    }
}
