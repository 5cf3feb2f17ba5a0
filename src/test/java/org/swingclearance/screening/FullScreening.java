package org.swingclearance.screening;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * A complete screening of a right shoulder built from the worked examples of clinical.md, so the expected results
 * are the reference's check values: flexion 150° vs 170° (LSI 88.24 %, §1.3), passive IR 45/70 and ER 110/95 (GIRD 25°,
 * TRM deficit 10°, §1.4; the engine takes passive rotation when both sides have it), flexion 150 N × 0.28 m = 42.0 N·m (§2.3), ER 150 N / IR 190 N (0.789, §2.2), CKCUEST 22/24/23
 * (mean 23.0, §2.1), trunk 120/150/80/90 s (§3.1), ASLR 2 + 1 (§3.3), Schober 4.0 cm (§3.5), QuickDASH Σ29 (40.91,
 * §4.1), ODI Σ15 (30 %, §4.2), SPADI 25/26 (39.23 %, §4.3), TSK-11 Σ24 (§4.5). The right side is involved.
 */
public final class FullScreening {

    private FullScreening() {
    }

    /** Every form field by key, as a clinician would type it. */
    public static Map<String, String> typed() {
        Map<String, String> v = new LinkedHashMap<>();
        v.put("PAIN_AT_REST", "2");
        v.put("PAIN_DURING_MOVEMENT", "4");
        v.put("PAIN_WORST_24H", "5");
        sides(v, "SHOULDER_FLEXION_ACTIVE", "170", "150");
        sides(v, "SHOULDER_ABDUCTION_ACTIVE", "175", "165");
        sides(v, "SHOULDER_EXTENSION_ACTIVE", "55", "50");
        sides(v, "SHOULDER_ER_90_ACTIVE", "92", "105");
        sides(v, "SHOULDER_IR_90_ACTIVE", "66", "42");
        sides(v, "SHOULDER_ER_90_PASSIVE", "95", "110");
        sides(v, "SHOULDER_IR_90_PASSIVE", "70", "45");
        sides(v, "SHOULDER_FLEXION_FORCE", "160", "150");
        sides(v, "SHOULDER_FLEXION_LEVER_ARM", "0.28", "0.28");
        sides(v, "SHOULDER_ER_FORCE", "155", "150");
        sides(v, "SHOULDER_ER_LEVER_ARM", "0.25", "0.25");
        sides(v, "SHOULDER_IR_FORCE", "195", "190");
        sides(v, "SHOULDER_IR_LEVER_ARM", "0.25", "0.25");
        sides(v, "GRIP_TRIAL_1", "42", "38");
        sides(v, "GRIP_TRIAL_2", "44", "40");
        sides(v, "GRIP_TRIAL_3", "43", "39");
        v.put("CKCUEST_TRIAL_1", "22");
        v.put("CKCUEST_TRIAL_2", "24");
        v.put("CKCUEST_TRIAL_3", "23");
        v.put("SCHOBER_INCREASE", "4.0");
        sides(v, "HIP_IR", "35", "33");
        sides(v, "HIP_ER", "40", "42");
        sides(v, "STRAIGHT_LEG_RAISE", "80", "85");
        v.put("TRUNK_FLEXOR_HOLD", "120");
        v.put("TRUNK_EXTENSOR_HOLD", "150");
        sides(v, "SIDE_BRIDGE_HOLD", "90", "80");
        sides(v, "ASLR", "2", "1");
        v.put("PIT_PAIN_POSITION_1", "1");
        v.put("PIT_EASED_POSITION_2", "0");
        v.put("ABERRANT_LUMBAR_FLEXION", "0");
        sides(v, "SINGLE_LEG_STANCE", "30", "28");
        sides(v, "SHOULDER_TO_GRIP_DISTANCE", "62", "63");
        items(v, "QUICKDASH", 3, 3, 3, 2, 3, 2, 3, 3, 2, 3, 2);
        items(v, "ODI", 2, 1, 3, 2, 1, 2, 1, 0, 1, 2);
        items(v, "SPADI", 6, 4, 5, 3, 7, 3, 4, 2, 5, 3, 6, 2, 1);
        items(v, "TSK_11", 2, 3, 2, 2, 3, 2, 1, 2, 3, 2, 2);
        return v;
    }

    static Measurements measurements() {
        MeasurementReading reading = MeasurementReading.of(typed(), Set.of());
        if (!reading.valid()) {
            throw new IllegalStateException("full screening does not parse: " + reading.problems());
        }
        return reading.measurements();
    }

    /** The full screening without the named fields. */
    static Measurements without(String... keys) {
        Map<String, String> v = typed();
        List.of(keys).forEach(v::remove);
        return MeasurementReading.of(v, Set.of()).measurements();
    }

    private static void sides(Map<String, String> v, String measurement, String left, String right) {
        v.put(measurement + "_LEFT", left);
        v.put(measurement + "_RIGHT", right);
    }

    private static void items(Map<String, String> v, String questionnaire, int... responses) {
        for (int i = 0; i < responses.length; i++) {
            v.put(questionnaire + "_" + (i + 1), String.valueOf(responses[i]));
        }
    }
}
