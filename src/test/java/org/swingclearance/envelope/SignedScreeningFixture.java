package org.swingclearance.envelope;

import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Set;
import java.util.UUID;
import org.swingclearance.identity.CurrentStaff;
import org.swingclearance.screening.Decision;
import org.swingclearance.screening.MeasurementReading;
import org.swingclearance.screening.Measurements;
import org.swingclearance.screening.Screenings;

/**
 * Signs a complete screening of a right shoulder through the screening service, built from the worked examples of
 * clinical.md (the same battery as the screening feature's own fixture): right (involved) shoulder flexion torque
 * 150 N × 0.28 m = 42.0 N·m (clinical.md §2.3), left 160 N × 0.28 m = 44.8 N·m, best grip 40 kg right and 43 kg
 * left, active flexion 150° right, measured shoulder-to-grip distance 63 cm right. The shoulder band is set to
 * Band 2 (0.40 by default) with a reason; the lumbopelvic band is confirmed.
 */
final class SignedScreeningFixture {

    private SignedScreeningFixture() {
    }

    static UUID sign(Screenings screenings, CurrentStaff clinician, UUID episodeId) {
        return sign(screenings, clinician, episodeId, typed());
    }

    static UUID sign(Screenings screenings, CurrentStaff clinician, UUID episodeId, Map<String, String> typed) {
        UUID id = screenings.start(clinician, episodeId);
        MeasurementReading reading = MeasurementReading.of(typed, Set.of());
        if (!reading.valid()) {
            throw new IllegalStateException("fixture does not parse: " + reading.problems());
        }
        Measurements measurements = reading.measurements();
        screenings.saveDraft(clinician, id, lock(screenings, clinician, id), measurements);
        screenings.sign(clinician, id, lock(screenings, clinician, id),
                new Decision("BAND_2", "Tolerated loaded carries last week", null, null));
        return id;
    }

    private static long lock(Screenings screenings, CurrentStaff clinician, UUID id) {
        return screenings.page(clinician, id).shown().lockVersion();
    }

    /** Every form field by key, as a clinician would type it. */
    static Map<String, String> typed() {
        Map<String, String> v = new LinkedHashMap<>();
        v.put("PAIN_AT_REST", "2");
        v.put("PAIN_DURING_MOVEMENT", "4");
        v.put("PAIN_WORST_24H", "5");
        sides(v, "SHOULDER_FLEXION_ACTIVE", "170", "150");
        sides(v, "SHOULDER_ABDUCTION_ACTIVE", "175", "165");
        sides(v, "SHOULDER_EXTENSION_ACTIVE", "55", "50");
        sides(v, "SHOULDER_ER_90_ACTIVE", "95", "110");
        sides(v, "SHOULDER_IR_90_ACTIVE", "70", "45");
        sides(v, "SHOULDER_ER_90_PASSIVE", "100", "112");
        sides(v, "SHOULDER_IR_90_PASSIVE", "72", "48");
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
