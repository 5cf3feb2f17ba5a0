package org.swingclearance.patient;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Arrays;
import org.junit.jupiter.api.Test;

/** The red-flag checklist carries the urgency its published sources give each flag. */
class RedFlagTests {

    @Test
    void caudaEquinaIsAnEmergency() {
        // Finucane et al. 2020 (IFOMPT framework) / clinical.md §0 row 5 and §5.2: CES flag -> EMERGENCY, same day
        assertThat(RedFlag.LUMBAR_CAUDA_EQUINA.urgency()).isEqualTo(RedFlagUrgency.EMERGENCY);
    }

    @Test
    void shoulderFlagsFollowThePathwayUrgencies() {
        // BESS/BOA pathways via Rees et al. 2021 / clinical.md §5.1: septic arthritis, unreduced dislocation and
        // sudden neurological loss are same-day emergencies; an acute cuff tear needs urgent specialist review
        assertThat(RedFlag.SHOULDER_HOT_SWOLLEN_FEVER.urgency()).isEqualTo(RedFlagUrgency.EMERGENCY);
        assertThat(RedFlag.SHOULDER_TRAUMA_LOST_ROTATION.urgency()).isEqualTo(RedFlagUrgency.EMERGENCY);
        assertThat(RedFlag.SHOULDER_SUDDEN_NEURO_LOSS.urgency()).isEqualTo(RedFlagUrgency.EMERGENCY);
        assertThat(RedFlag.SHOULDER_TRAUMA_WEAKNESS.urgency()).isEqualTo(RedFlagUrgency.URGENT);
    }

    @Test
    void everyFlagBelongsToOneRegionOfTheChecklist() {
        assertThat(Arrays.stream(RedFlag.values()).filter(f -> f.region() == Region.SHOULDER)).hasSize(7);
        assertThat(Arrays.stream(RedFlag.values()).filter(f -> f.region() == Region.LUMBOPELVIC)).hasSize(4);
    }
}
