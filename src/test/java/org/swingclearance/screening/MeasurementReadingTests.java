package org.swingclearance.screening;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.HashMap;
import java.util.Map;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** Reading the typed screening form: blank is "not tested", 0 is a value, impossible values name their rule. */
class MeasurementReadingTests {

    private static MeasurementReading read(String key, String typed) {
        Map<String, String> form = new HashMap<>();
        form.put(key, typed);
        return MeasurementReading.of(form, Set.of());
    }

    @Test
    void blankIsNotTestedAndZeroIsAValue() {
        MeasurementReading reading = MeasurementReading.of(Map.of("PAIN_AT_REST", "0", "PAIN_WORST_24H", "  "), Set.of());
        assertThat(reading.valid()).isTrue();
        assertThat(reading.measurements().get(Measurement.PAIN_AT_REST)).isZero();
        assertThat(reading.measurements().get(Measurement.PAIN_WORST_24H)).isNull();
        assertThat(reading.measurements().values()).containsOnlyKeys("PAIN_AT_REST");
    }

    @ParameterizedTest(name = "{0} = \"{1}\" → {2}")
    @CsvSource({
            "SHOULDER_FLEXION_ACTIVE_LEFT, 200.5, screening.value.aboveMax",  // issue 3: flexion > 200° refused
            "SHOULDER_FLEXION_ACTIVE_LEFT, -1, screening.value.negative",
            "TRUNK_EXTENSOR_HOLD, -0.5, screening.value.negative",           // negative times refused
            "SHOULDER_FLEXION_LEVER_ARM_RIGHT, 0, screening.value.notPositive", // a lever arm of 0 gives no torque
            "SHOULDER_ER_LEVER_ARM_LEFT, -0.2, screening.value.notPositive",
            "SHOULDER_IR_LEVER_ARM_LEFT, 0.01, screening.value.belowMin",
            "QUICKDASH_1, 0, screening.value.scale",                         // QuickDASH items are 1–5
            "QUICKDASH_11, 6, screening.value.scale",
            "ODI_10, 6, screening.value.scale",                              // Oswestry sections are 0–5
            "TSK_11_3, 5, screening.value.scale",                            // TSK-11 items are 1–4
            "SPADI_13, 11, screening.value.scale",                           // SPADI items are 0–10
            "ASLR_LEFT, 2.5, screening.value.notWhole",
            "PIT_PAIN_POSITION_1, 2, screening.value.aboveMax",
            "PAIN_DURING_MOVEMENT, 11, screening.value.aboveMax",
            "PAIN_AT_REST, NaN, screening.value.notNumber",
            "PAIN_AT_REST, 1e1, screening.value.notNumber",
            "PAIN_AT_REST, 0x5, screening.value.notNumber",
            "PAIN_AT_REST, '3,5', screening.value.notNumber",
            "SHOULDER_TO_GRIP_DISTANCE_LEFT, 20, screening.value.belowMin"})
    void impossibleValuesAreRefusedWithTheRuleTheyBreak(String key, String typed, String code) {
        MeasurementReading reading = read(key, typed);
        assertThat(reading.valid()).isFalse();
        assertThat(reading.measurements()).isNull();
        assertThat(reading.problems()).containsOnlyKeys(key);
        assertThat(reading.problems().get(key).code()).isEqualTo(code);
    }

    @ParameterizedTest(name = "{0} = \"{1}\"")
    @CsvSource({"SHOULDER_FLEXION_ACTIVE_LEFT, 200", "SHOULDER_FLEXION_LEVER_ARM_LEFT, 0.05", "QUICKDASH_1, 1",
            "ODI_1, 0", "TSK_11_11, 4", "SPADI_1, 0", "PAIN_AT_REST, 10", "SCHOBER_INCREASE, .5"})
    void boundaryValuesAreAccepted(String key, String typed) {
        assertThat(read(key, typed).valid()).isTrue();
    }
}
