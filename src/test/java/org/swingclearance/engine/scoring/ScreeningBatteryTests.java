package org.swingclearance.engine.scoring;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.Arrays;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

/**
 * The battery wires each raw measurement to the right formula and side. Inputs are the worked examples of
 * clinical.md placed on a right involved side, so each derived value must equal the published check value.
 */
class ScreeningBatteryTests {

    private static final double TOLERANCE = 0.01;

    static ScreeningInput workedExample() {
        return ScreeningInput.builder(Side.RIGHT)
                .number(Measure.BODY_MASS, 80.0)
                .number(Measure.STATURE, 1.80)
                .number(Measure.AGE, 32.0)
                .number(Measure.PAIN_AT_REST, 2.0)
                .number(Measure.PAIN_DURING_MOVEMENT, 6.0)
                .number(Measure.PAIN_WORST_24H, 7.0)
                .sides(Measure.SHOULDER_FLEXION_ACTIVE, 170.0, 150.0)
                .sides(Measure.SHOULDER_ABDUCTION_ACTIVE, 175.0, 170.0)
                .sides(Measure.SHOULDER_IR_90_ACTIVE, 70.0, 45.0)
                .sides(Measure.SHOULDER_ER_90_ACTIVE, 95.0, 110.0)
                .sides(Measure.SHOULDER_FLEXION_FORCE, 160.0, 150.0)
                .sides(Measure.SHOULDER_FLEXION_LEVER_ARM, 0.28, 0.28)
                .number(Measure.SHOULDER_ER_FORCE, Side.RIGHT, 150.0)
                .number(Measure.SHOULDER_IR_FORCE, Side.RIGHT, 190.0)
                .sides(Measure.GRIP, 44.0, 40.0)
                .series(Measure.CKCUEST_TRIALS, List.of(22, 24, 23))
                .sides(Measure.UQ_REACH_MEDIAL, 95.0, 90.0)
                .sides(Measure.UQ_REACH_INFEROLATERAL, 85.0, 80.0)
                .sides(Measure.UQ_REACH_SUPEROLATERAL, 70.0, 68.0)
                .sides(Measure.UPPER_LIMB_LENGTH, 90.0, 90.0)
                .series(Measure.QUICKDASH, List.of(3, 3, 3, 2, 3, 2, 3, 3, 2, 3, 2))
                .series(Measure.SPADI, List.of(6, 4, 5, 3, 7, 3, 4, 2, 5, 3, 6, 2, 1))
                .series(Measure.TSK_11, List.of(2, 3, 2, 2, 3, 2, 1, 2, 3, 2, 2))
                .number(Measure.SCHOBER_INCREASE, 4.5)
                .sides(Measure.STRAIGHT_LEG_RAISE, 94.0, 96.0)
                .number(Measure.TRUNK_FLEXOR_HOLD, 120.0)
                .number(Measure.TRUNK_EXTENSOR_HOLD, 150.0)
                .sides(Measure.SIDE_BRIDGE_HOLD, 90.0, 80.0)
                .sides(Measure.ASLR, 2.0, 1.0)
                .answer(Measure.PIT_PAIN_POSITION_1, false)
                .answer(Measure.ABERRANT_LUMBAR_FLEXION, true)
                .series(Measure.ODI, List.of(2, 1, 3, 2, 1, 2, 1, 0, 1, 2))
                .build();
    }

    @Test
    void derivesEveryWorkedCheckValueThroughTheBattery() {
        DerivedValues derived = ScreeningBattery.derive(workedExample());
        // clinical.md §1.3 [C,M]: 150 vs 170 -> 88.24 %, deficit 20°
        assertThat(value(derived, ValueKey.FLEXION_ROM_LSI)).isCloseTo(88.24, within(TOLERANCE));
        assertThat(value(derived, ValueKey.FLEXION_ROM_DEFICIT)).isEqualTo(20.0);
        assertThat(value(derived, ValueKey.FLEXION_ROM_INVOLVED)).isEqualTo(150.0);
        // Wilk 2011 / clinical.md §1.4: GIRD 25°, TRM deficit 10°, 15.15 %, ER gain 15°
        assertThat(value(derived, ValueKey.GIRD)).isEqualTo(25.0);
        assertThat(value(derived, ValueKey.TRM_DEFICIT)).isEqualTo(10.0);
        assertThat(value(derived, ValueKey.GIRD_PERCENT_OF_TRM)).isCloseTo(15.15, within(TOLERANCE));
        assertThat(value(derived, ValueKey.ER_GAIN)).isEqualTo(15.0);
        assertThat(derived.rotationBasis()).isEqualTo(RotationBasis.ACTIVE);
        // physics / clinical.md §2.3: 150 N × 0.28 m = 42.0 N·m; 1.875 N/kg; 19.12 % BW
        assertThat(value(derived, ValueKey.FLEXION_TORQUE_INVOLVED)).isCloseTo(42.0, within(TOLERANCE));
        assertThat(value(derived, ValueKey.FLEXION_FORCE_PER_KG_INVOLVED)).isCloseTo(1.875, within(0.001));
        assertThat(value(derived, ValueKey.FLEXION_FORCE_PERCENT_BW_INVOLVED)).isCloseTo(19.12, within(TOLERANCE));
        assertThat(value(derived, ValueKey.FLEXION_TORQUE_LSI)).isCloseTo(150.0 / 160 * 100, within(1e-9));
        // Riemann 2010 / clinical.md §2.2: 150/190 -> 0.789
        assertThat(value(derived, ValueKey.ER_IR_RATIO_INVOLVED)).isCloseTo(0.789, within(0.001));
        assertThat(value(derived, ValueKey.GRIP_LSI)).isCloseTo(40.0 / 44 * 100, within(1e-9));
        // Tucci 2014; Roush via secondary / clinical.md §2.1: 23.0, 83.41, 12.778/m
        assertThat(value(derived, ValueKey.CKCUEST_MEAN)).isCloseTo(23.0, within(TOLERANCE));
        assertThat(value(derived, ValueKey.CKCUEST_POWER)).isCloseTo(83.41, within(TOLERANCE));
        assertThat(value(derived, ValueKey.CKCUEST_PER_METRE)).isCloseTo(12.778, within(0.001));
        // Gorman 2012 method / clinical.md §2.5: 88.15 % involved, LSI 95.2 %, MED 5, IL 5, SL 2 cm
        assertThat(value(derived, ValueKey.UQ_REACH_COMPOSITE_INVOLVED)).isCloseTo(88.15, within(TOLERANCE));
        assertThat(value(derived, ValueKey.UQ_REACH_COMPOSITE_LSI)).isCloseTo(95.2, within(0.05));
        assertThat(value(derived, ValueKey.UQ_REACH_MEDIAL_DIFFERENCE)).isEqualTo(5.0);
        assertThat(value(derived, ValueKey.UQ_REACH_INFEROLATERAL_DIFFERENCE)).isEqualTo(5.0);
        assertThat(value(derived, ValueKey.UQ_REACH_SUPEROLATERAL_DIFFERENCE)).isEqualTo(2.0);
        // IWH / clinical.md §4.1: 40.91; Roach 1991 / §4.3: 50.00, 32.50, 39.23; TSK-11 / §4.5: 24
        assertThat(value(derived, ValueKey.QUICKDASH_SCORE)).isCloseTo(40.91, within(TOLERANCE));
        assertThat(value(derived, ValueKey.SPADI_PAIN)).isCloseTo(50.00, within(TOLERANCE));
        assertThat(value(derived, ValueKey.SPADI_DISABILITY)).isCloseTo(32.50, within(TOLERANCE));
        assertThat(value(derived, ValueKey.SPADI_TOTAL)).isCloseTo(39.23, within(TOLERANCE));
        assertThat(value(derived, ValueKey.TSK11_SCORE)).isEqualTo(24.0);
        // Jenkinson 1994 / clinical.md §3.5: 4.5 cm -> 0 and 4.143
        assertThat(value(derived, ValueKey.BASMI_LUMBAR_FLEXION)).isEqualTo(0.0);
        assertThat(value(derived, ValueKey.BASMI_LUMBAR_FLEXION_LINEAR)).isCloseTo(4.143, within(0.001));
        // McGill [S,M] / clinical.md §3.1: 0.80, R/L 0.889, imbalance 0.111, 0.533, 0.600
        assertThat(value(derived, ValueKey.TRUNK_FLEXOR_EXTENSOR_RATIO)).isCloseTo(0.80, within(TOLERANCE));
        assertThat(value(derived, ValueKey.SIDE_BRIDGE_RIGHT_LEFT_RATIO)).isCloseTo(0.889, within(0.001));
        assertThat(value(derived, ValueKey.SIDE_BRIDGE_IMBALANCE)).isCloseTo(0.111, within(0.001));
        assertThat(value(derived, ValueKey.SIDE_BRIDGE_RIGHT_EXTENSOR_RATIO)).isCloseTo(0.533, within(0.001));
        assertThat(value(derived, ValueKey.SIDE_BRIDGE_LEFT_EXTENSOR_RATIO)).isCloseTo(0.600, within(0.001));
        // Mens 2001 / clinical.md §3.3: 2 + 1 = 3 -> positive
        assertThat(value(derived, ValueKey.ASLR_TOTAL)).isEqualTo(3.0);
        assertThat(derived.score(ValueKey.ASLR_POSITIVE).isYes()).isTrue();
        // Hicks 2005 / clinical.md §3.4: age 32, SLR 95°, aberrant yes, PIT negative -> 3/4 -> positive
        assertThat(value(derived, ValueKey.STRAIGHT_LEG_RAISE_AVERAGE)).isEqualTo(95.0);
        assertThat(derived.score(ValueKey.PRONE_INSTABILITY_POSITIVE).isYes()).isFalse();
        assertThat(value(derived, ValueKey.STABILISATION_PREDICTORS)).isEqualTo(3.0);
        assertThat(derived.score(ValueKey.STABILISATION_RULE_POSITIVE).isYes()).isTrue();
        // Fairbank 2000 / clinical.md §4.2: 30.00 %, moderate
        assertThat(value(derived, ValueKey.ODI_SCORE)).isCloseTo(30.0, within(TOLERANCE));
        assertThat(derived.odiBand()).contains(OdiBand.MODERATE);
    }

    @Test
    void passiveRotationIsPreferredWhenBothSidesAreRecorded() {
        // Wilk 2012 passive group means / clinical.md §1.4: GIRD 11°, TRM deficit 6°
        ScreeningInput input = ScreeningInput.builder(Side.RIGHT)
                .sides(Measure.SHOULDER_IR_90_ACTIVE, 70.0, 45.0)
                .sides(Measure.SHOULDER_ER_90_ACTIVE, 95.0, 110.0)
                .sides(Measure.SHOULDER_IR_90_PASSIVE, 63.0, 52.0)
                .sides(Measure.SHOULDER_ER_90_PASSIVE, 127.0, 132.0)
                .build();
        DerivedValues derived = ScreeningBattery.derive(input);
        assertThat(derived.rotationBasis()).isEqualTo(RotationBasis.PASSIVE);
        assertThat(value(derived, ValueKey.GIRD)).isEqualTo(11.0);
        assertThat(value(derived, ValueKey.TRM_DEFICIT)).isEqualTo(6.0);
    }

    @Test
    void involvedSideSelectsWhichSideIsCompared() {
        ScreeningInput left = ScreeningInput.builder(Side.LEFT).sides(Measure.SHOULDER_FLEXION_ACTIVE, 150.0, 170.0)
                .build();
        assertThat(value(ScreeningBattery.derive(left), ValueKey.FLEXION_ROM_LSI)).isCloseTo(88.24, within(TOLERANCE));
    }

    @Test
    void withoutAnInvolvedSideComparisonsAreNotScorableButBilateralValuesAre() {
        ScreeningInput input = ScreeningInput.builder(null).sides(Measure.SHOULDER_FLEXION_ACTIVE, 150.0, 170.0)
                .sides(Measure.SIDE_BRIDGE_HOLD, 90.0, 80.0).sides(Measure.ASLR, 0.0, 0.0).build();
        DerivedValues derived = ScreeningBattery.derive(input);
        assertThat(derived.score(ValueKey.FLEXION_ROM_LSI).notScorable().orElseThrow().reason())
                .isEqualTo(NotScorable.Reason.NO_INVOLVED_SIDE);
        assertThat(derived.missingMeasures(ValueKey.FLEXION_ROM_LSI)).isEmpty();
        assertThat(value(derived, ValueKey.SIDE_BRIDGE_RIGHT_LEFT_RATIO)).isCloseTo(0.889, within(0.001));
        assertThat(derived.score(ValueKey.ASLR_POSITIVE).isYes()).isFalse();
    }

    @Test
    void notTestedIsNotZeroAndNamesTheMissingSlots() {
        ScreeningInput input = ScreeningInput.builder(Side.RIGHT)
                .number(Measure.SHOULDER_IR_90_ACTIVE, Side.RIGHT, 45.0)
                .number(Measure.PAIN_DURING_MOVEMENT, 0.0)
                .series(Measure.QUICKDASH, Arrays.asList(3, 3, 3, 2, 3, 2, 3, 3, 2, null, null))
                .build();
        DerivedValues derived = ScreeningBattery.derive(input);
        assertThat(value(derived, ValueKey.PAIN_DURING_MOVEMENT)).isEqualTo(0.0);
        assertThat(derived.score(ValueKey.PAIN_AT_REST).scorable()).isFalse();
        assertThat(derived.missingMeasures(ValueKey.GIRD))
                .containsExactly(Measure.SHOULDER_IR_90_ACTIVE.on(Side.LEFT));
        assertThat(derived.missingMeasures(ValueKey.TRM_DEFICIT)).containsExactly(
                Measure.SHOULDER_IR_90_ACTIVE.on(Side.LEFT), Measure.SHOULDER_ER_90_ACTIVE.on(Side.LEFT),
                Measure.SHOULDER_ER_90_ACTIVE.on(Side.RIGHT));
        // QuickDASH with 9 answered: not scorable, the rule says why, no slot is "missing"
        assertThat(derived.score(ValueKey.QUICKDASH_SCORE).notScorable().orElseThrow().reason())
                .isEqualTo(NotScorable.Reason.INCOMPLETE);
        assertThat(derived.missingMeasures(ValueKey.QUICKDASH_SCORE)).isEmpty();
        assertThat(derived.missingMeasures(ValueKey.ODI_SCORE)).containsExactly(Measure.ODI.key());
        assertThat(derived.values()).containsOnlyKeys(ValueKey.PAIN_DURING_MOVEMENT);
    }

    @Test
    void changeSinceThePreviousScreeningUsesEachInstrumentsMcid() {
        DerivedValues derived = ScreeningBattery.derive(workedExample());
        // previous ODI 40, now 30: 10 points -> met (Ostelo 2008); QuickDASH 45 -> 40.91: 4.09 < 8 (Mintken 2009)
        Map<ValueKey, ImportantChange> changes = derived.changesSince(Map.of(ValueKey.ODI_SCORE, 40.0,
                ValueKey.QUICKDASH_SCORE, 45.0, ValueKey.PAIN_DURING_MOVEMENT, 8.0));
        assertThat(changes.get(ValueKey.ODI_SCORE).importantImprovement().isYes()).isTrue();
        assertThat(changes.get(ValueKey.QUICKDASH_SCORE).importantImprovement().isYes()).isFalse();
        // Farrar 2001 / clinical.md §4.4: 8 -> 6 = 2 points -> met
        assertThat(changes.get(ValueKey.PAIN_DURING_MOVEMENT).importantImprovement().isYes()).isTrue();
        assertThat(changes.get(ValueKey.SPADI_TOTAL).improvement().scorable()).isFalse(); // no previous value
        assertThat(changes).doesNotContainKey(ValueKey.GIRD);
    }

    @Test
    void impossibleValuesAreRefusedWithTheMeasureNamed() {
        ScreeningInput.Builder builder = ScreeningInput.builder(Side.RIGHT);
        // issue 3: flexion > 200°, negative times, responses off the scale, a lever arm of 0 are refused
        assertThatThrownBy(() -> builder.number(Measure.SHOULDER_FLEXION_ACTIVE, Side.LEFT, 201.0))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("SHOULDER_FLEXION_ACTIVE");
        assertThatThrownBy(() -> builder.number(Measure.TRUNK_FLEXOR_HOLD, -1.0))
                .isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> builder.number(Measure.SHOULDER_FLEXION_LEVER_ARM, Side.LEFT, 0.0))
                .isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> builder.series(Measure.QUICKDASH, List.of(6, 3, 3, 2, 3, 2, 3, 3, 2, 3, 2)))
                .isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> builder.number(Measure.ASLR, Side.LEFT, 2.5))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("whole number");
        assertThatThrownBy(() -> builder.number(Measure.SHOULDER_FLEXION_ACTIVE, 150.0))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("needs a side");
        assertThat(Measure.SHOULDER_FLEXION_ACTIVE.accepts(200)).isTrue();
    }

    private static double value(DerivedValues derived, ValueKey key) {
        Score score = derived.score(key);
        assertThat(score.notScorable()).as(key.name()).isEmpty();
        return score.orElseThrow();
    }
}
