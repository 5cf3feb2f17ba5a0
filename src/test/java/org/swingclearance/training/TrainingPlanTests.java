package org.swingclearance.training;

import static org.assertj.core.api.Assertions.assertThat;

import java.time.LocalDate;
import java.util.List;
import java.util.UUID;
import org.junit.jupiter.api.Test;

/** Which step the schedule puts on a day, the clubs a trainer may choose, and the D of a logged configuration. */
class TrainingPlanTests {

    static final UUID LIGHT = UUID.randomUUID();
    static final UUID HEAVY = UUID.randomUUID();
    static final LocalDate START = LocalDate.of(2026, 3, 2);

    /** Three steps a week apart, the third behind a re-screen gate (invented data). */
    static TrainingPlan plan() {
        return new TrainingPlan(UUID.randomUUID(), 1, UUID.randomUUID(), UUID.randomUUID(), "P-1", START, 3, List.of(
                new TrainingStep(2, LIGHT, "Light", 4, 15, 2.0, 3, 10, 4, 0.22, false, START.plusDays(7)),
                new TrainingStep(1, LIGHT, "Light", 4, 20, 2.5, 3, 10, 4, 0.18, false, START),
                new TrainingStep(3, HEAVY, "Heavy", 6, 20, 2.5, 3, 10, 5, 0.31, true, START.plusDays(14))));
    }

    @Test
    void stepsAreOrderedByNumber() {
        assertThat(plan().steps()).extracting(TrainingStep::number).containsExactly(1, 2, 3);
    }

    @Test
    void theCurrentStepIsTheLastStartedOneButNeverBeyondTheGate() {
        TrainingPlan plan = plan();
        assertThat(plan.currentStepOn(START.minusDays(3)).number()).isEqualTo(1);
        assertThat(plan.currentStepOn(START.plusDays(6)).number()).isEqualTo(1);
        assertThat(plan.currentStepOn(START.plusDays(7)).number()).isEqualTo(2);
        // Step 3 is provisional: the patient stays on step 2 until a re-screen, however late it is.
        assertThat(plan.currentStepOn(START.plusDays(60)).number()).isEqualTo(2);
    }

    @Test
    void clubChoicesAreTheDistinctClubsOfThePlan() {
        assertThat(plan().clubChoices()).extracting(TrainingStep::clubId).containsExactly(LIGHT, HEAVY);
    }

    @Test
    void aLoggedConfigurationHasADOnlyWhenThePlanContainsIt() {
        TrainingPlan plan = plan();
        assertThat(plan.demandRatioOf(new SwingConfiguration(LIGHT, "Light", 4, 15, 2.0, 2, 8))).isEqualTo(0.22);
        assertThat(plan.demandRatioOf(new SwingConfiguration(LIGHT, "Light", 4, 12.5, 2.0, 3, 10))).isNull();
        assertThat(plan.demandRatioOf(new SwingConfiguration(null, null, 8, 20, 2.5, 3, 10))).isNull();
    }
}
