package org.swingclearance.envelope;

import java.util.Map;
import java.util.Set;
import java.util.UUID;
import org.swingclearance.identity.CurrentStaff;
import org.swingclearance.screening.Decision;
import org.swingclearance.screening.FullScreening;
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

    /** Every form field by key, as a clinician would type it: the screening feature's worked-example battery. */
    static Map<String, String> typed() {
        return FullScreening.typed();
    }
}
