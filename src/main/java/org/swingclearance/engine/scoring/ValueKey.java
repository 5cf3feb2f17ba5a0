package org.swingclearance.engine.scoring;

import static org.swingclearance.engine.scoring.InputRef.both;
import static org.swingclearance.engine.scoring.InputRef.involved;
import static org.swingclearance.engine.scoring.InputRef.left;
import static org.swingclearance.engine.scoring.InputRef.right;
import static org.swingclearance.engine.scoring.InputRef.unsided;

import java.util.List;
import java.util.Optional;

/**
 * Every value a practice rule can test: some raw measurements and every derived value of the screening battery.
 * The constant's name is the stable key stored with rules and snapshots; never rename one.
 * "Involved" values are taken on the screening's involved side.
 */
public enum ValueKey {
    // pain, numeric rating 0–10
    PAIN_AT_REST(Unit.POINTS, Instrument.NPRS, unsided(Measure.PAIN_AT_REST)),
    PAIN_DURING_MOVEMENT(Unit.POINTS, Instrument.NPRS, unsided(Measure.PAIN_DURING_MOVEMENT)),
    PAIN_WORST_24H(Unit.POINTS, Instrument.NPRS, unsided(Measure.PAIN_WORST_24H)),

    // shoulder mobility
    FLEXION_ROM_INVOLVED(Unit.DEGREE, null, involved(Measure.SHOULDER_FLEXION_ACTIVE)),
    FLEXION_ROM_LSI(Unit.PERCENT, null, both(Measure.SHOULDER_FLEXION_ACTIVE)),
    FLEXION_ROM_DEFICIT(Unit.DEGREE, null, both(Measure.SHOULDER_FLEXION_ACTIVE)),
    ABDUCTION_ROM_LSI(Unit.PERCENT, null, both(Measure.SHOULDER_ABDUCTION_ACTIVE)),
    /**
     * Rotation values use passive rotation when both sides' passive values are recorded (as Wilk measured), else
     * active rotation; {@link DerivedValues#rotationBasis()} says which. Inputs list the active measures, which
     * every screening records.
     */
    GIRD(Unit.DEGREE, null, both(Measure.SHOULDER_IR_90_ACTIVE)),
    TRM_DEFICIT(Unit.DEGREE, null, both(Measure.SHOULDER_IR_90_ACTIVE), both(Measure.SHOULDER_ER_90_ACTIVE)),
    GIRD_PERCENT_OF_TRM(Unit.PERCENT, null, both(Measure.SHOULDER_IR_90_ACTIVE),
            both(Measure.SHOULDER_ER_90_ACTIVE)),
    ER_GAIN(Unit.DEGREE, null, both(Measure.SHOULDER_ER_90_ACTIVE)),

    // shoulder strength
    FLEXION_TORQUE_INVOLVED(Unit.NEWTON_METRE, null, involved(Measure.SHOULDER_FLEXION_FORCE),
            involved(Measure.SHOULDER_FLEXION_LEVER_ARM)),
    FLEXION_TORQUE_LSI(Unit.PERCENT, null, both(Measure.SHOULDER_FLEXION_FORCE),
            both(Measure.SHOULDER_FLEXION_LEVER_ARM)),
    FLEXION_FORCE_PER_KG_INVOLVED(Unit.NEWTON_PER_KILOGRAM, null, involved(Measure.SHOULDER_FLEXION_FORCE),
            unsided(Measure.BODY_MASS)),
    FLEXION_FORCE_PERCENT_BW_INVOLVED(Unit.PERCENT, null, involved(Measure.SHOULDER_FLEXION_FORCE),
            unsided(Measure.BODY_MASS)),
    ER_TORQUE_LSI(Unit.PERCENT, null, both(Measure.SHOULDER_ER_FORCE), both(Measure.SHOULDER_ER_LEVER_ARM)),
    IR_TORQUE_LSI(Unit.PERCENT, null, both(Measure.SHOULDER_IR_FORCE), both(Measure.SHOULDER_IR_LEVER_ARM)),
    ER_IR_RATIO_INVOLVED(Unit.RATIO, null, involved(Measure.SHOULDER_ER_FORCE), involved(Measure.SHOULDER_IR_FORCE)),
    GRIP_LSI(Unit.PERCENT, null, both(Measure.GRIP)),

    // shoulder stability
    CKCUEST_MEAN(Unit.TOUCHES, null, unsided(Measure.CKCUEST_TRIALS)),
    CKCUEST_POWER(Unit.POWER_SCORE, null, unsided(Measure.CKCUEST_TRIALS), unsided(Measure.BODY_MASS)),
    CKCUEST_PER_METRE(Unit.TOUCHES_PER_METRE, null, unsided(Measure.CKCUEST_TRIALS), unsided(Measure.STATURE)),
    UQ_REACH_COMPOSITE_INVOLVED(Unit.PERCENT, null, involved(Measure.UQ_REACH_MEDIAL),
            involved(Measure.UQ_REACH_INFEROLATERAL), involved(Measure.UQ_REACH_SUPEROLATERAL),
            involved(Measure.UPPER_LIMB_LENGTH)),
    UQ_REACH_COMPOSITE_LSI(Unit.PERCENT, null, both(Measure.UQ_REACH_MEDIAL), both(Measure.UQ_REACH_INFEROLATERAL),
            both(Measure.UQ_REACH_SUPEROLATERAL), both(Measure.UPPER_LIMB_LENGTH)),
    UQ_REACH_MEDIAL_DIFFERENCE(Unit.CENTIMETRE, null, both(Measure.UQ_REACH_MEDIAL)),
    UQ_REACH_INFEROLATERAL_DIFFERENCE(Unit.CENTIMETRE, null, both(Measure.UQ_REACH_INFEROLATERAL)),
    UQ_REACH_SUPEROLATERAL_DIFFERENCE(Unit.CENTIMETRE, null, both(Measure.UQ_REACH_SUPEROLATERAL)),

    // shoulder questionnaires
    QUICKDASH_SCORE(Unit.POINTS, Instrument.QUICKDASH, unsided(Measure.QUICKDASH)),
    QUICKDASH_WORK_SCORE(Unit.POINTS, null, unsided(Measure.QUICKDASH_WORK)),
    QUICKDASH_SPORT_SCORE(Unit.POINTS, null, unsided(Measure.QUICKDASH_SPORT)),
    SPADI_PAIN(Unit.PERCENT, null, unsided(Measure.SPADI)),
    SPADI_DISABILITY(Unit.PERCENT, null, unsided(Measure.SPADI)),
    SPADI_TOTAL(Unit.PERCENT, Instrument.SPADI, unsided(Measure.SPADI)),

    // lumbopelvic mobility
    SCHOBER_INCREASE(Unit.CENTIMETRE, null, unsided(Measure.SCHOBER_INCREASE)),
    BASMI_LUMBAR_FLEXION(Unit.POINTS, null, unsided(Measure.SCHOBER_INCREASE)),
    BASMI_LUMBAR_FLEXION_LINEAR(Unit.POINTS, null, unsided(Measure.SCHOBER_INCREASE)),
    STRAIGHT_LEG_RAISE_AVERAGE(Unit.DEGREE, null, both(Measure.STRAIGHT_LEG_RAISE)),

    // lumbopelvic stability and endurance
    TRUNK_FLEXOR_EXTENSOR_RATIO(Unit.RATIO, null, unsided(Measure.TRUNK_FLEXOR_HOLD),
            unsided(Measure.TRUNK_EXTENSOR_HOLD)),
    SIDE_BRIDGE_RIGHT_EXTENSOR_RATIO(Unit.RATIO, null, right(Measure.SIDE_BRIDGE_HOLD),
            unsided(Measure.TRUNK_EXTENSOR_HOLD)),
    SIDE_BRIDGE_LEFT_EXTENSOR_RATIO(Unit.RATIO, null, left(Measure.SIDE_BRIDGE_HOLD),
            unsided(Measure.TRUNK_EXTENSOR_HOLD)),
    SIDE_BRIDGE_RIGHT_LEFT_RATIO(Unit.RATIO, null, both(Measure.SIDE_BRIDGE_HOLD)),
    /** |1 − right ÷ left| side-bridge time. */
    SIDE_BRIDGE_IMBALANCE(Unit.RATIO, null, both(Measure.SIDE_BRIDGE_HOLD)),
    ASLR_TOTAL(Unit.POINTS, null, both(Measure.ASLR)),
    ASLR_POSITIVE(Unit.YES_NO, null, both(Measure.ASLR)),
    PRONE_INSTABILITY_POSITIVE(Unit.YES_NO, null, unsided(Measure.PIT_PAIN_POSITION_1),
            unsided(Measure.PIT_EASED_POSITION_2)),
    STABILISATION_PREDICTORS(Unit.COUNT, null, unsided(Measure.AGE), both(Measure.STRAIGHT_LEG_RAISE),
            unsided(Measure.ABERRANT_LUMBAR_FLEXION), unsided(Measure.PIT_PAIN_POSITION_1),
            unsided(Measure.PIT_EASED_POSITION_2)),
    STABILISATION_RULE_POSITIVE(Unit.YES_NO, null, unsided(Measure.AGE), both(Measure.STRAIGHT_LEG_RAISE),
            unsided(Measure.ABERRANT_LUMBAR_FLEXION), unsided(Measure.PIT_PAIN_POSITION_1),
            unsided(Measure.PIT_EASED_POSITION_2)),

    // lumbopelvic and general questionnaires
    ODI_SCORE(Unit.PERCENT, Instrument.ODI, unsided(Measure.ODI)),
    TSK11_SCORE(Unit.POINTS, Instrument.TSK_11, unsided(Measure.TSK_11));

    private final Unit unit;
    private final Instrument instrument;
    private final List<InputRef> inputs;

    ValueKey(Unit unit, Instrument instrument, InputRef... inputs) {
        this.unit = unit;
        this.instrument = instrument;
        this.inputs = List.of(inputs);
    }

    /** Unit of the value; never null. */
    public Unit unit() {
        return unit;
    }

    /** The outcome instrument whose MCID applies to changes of this value, if any. */
    public Optional<Instrument> instrument() {
        return Optional.ofNullable(instrument);
    }

    /** The raw measures this value needs; never empty. */
    public List<InputRef> inputs() {
        return inputs;
    }
}
