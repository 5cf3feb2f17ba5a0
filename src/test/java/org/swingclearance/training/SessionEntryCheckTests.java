package org.swingclearance.training;

import static org.assertj.core.api.Assertions.assertThat;

import java.time.LocalDate;
import java.util.UUID;
import org.junit.jupiter.api.Test;

/** The entry rules that need the plan and today: future dates, dates before the plan, unknown steps and clubs. */
class SessionEntryCheckTests {

    final TrainingPlan plan = TrainingPlanTests.plan();
    final LocalDate today = TrainingPlanTests.START.plusDays(10);

    SessionEntry on(LocalDate day, int step) {
        return new SessionEntry(day, step, true, null, 40, 5, 1, 2, null);
    }

    @Test
    void aSessionTodayOrOnThePlansFirstDayIsAccepted() {
        assertThat(SessionEntryCheck.violations(on(today, 2), plan, today)).isEmpty();
        assertThat(SessionEntryCheck.violations(on(TrainingPlanTests.START, 1), plan, today)).isEmpty();
    }

    @Test
    void aFutureDateIsRefused() {
        assertThat(SessionEntryCheck.violations(on(today.plusDays(1), 2), plan, today))
                .containsExactly(new FieldViolation("sessionDate", "sessionLog.error.future"));
    }

    @Test
    void aDateBeforeThePlanStartsIsRefused() {
        assertThat(SessionEntryCheck.violations(on(TrainingPlanTests.START.minusDays(1), 1), plan, today))
                .containsExactly(new FieldViolation("sessionDate", "sessionLog.error.beforePlan"));
    }

    @Test
    void aStepThePlanDoesNotHaveIsRefused() {
        assertThat(SessionEntryCheck.violations(on(today, 9), plan, today))
                .containsExactly(new FieldViolation("stepNumber", "sessionLog.error.noSuchStep"));
    }

    @Test
    void aClubThePlanDoesNotUseIsRefusedButAnotherClubByMassIsFine() {
        SessionEntry foreignClub = new SessionEntry(today, 2, false,
                new SessionEntry.Actual(UUID.randomUUID(), null, 15, 2, 3, 10), 40, 5, 1, 2, null);
        assertThat(SessionEntryCheck.violations(foreignClub, plan, today))
                .containsExactly(new FieldViolation("clubId", "sessionLog.error.unknownClub"));
        SessionEntry otherClub = new SessionEntry(today, 2, false,
                new SessionEntry.Actual(null, 5.0, 15, 2, 3, 10), 40, 5, 1, 2, null);
        assertThat(SessionEntryCheck.violations(otherClub, plan, today)).isEmpty();
    }

    @Test
    void theNextMorningRatingWaitsForTheNextDay() {
        assertThat(SessionEntryCheck.morningViolations(today, today))
                .containsExactly(new FieldViolation("pain", "morningPain.error.tooEarly"));
        assertThat(SessionEntryCheck.morningViolations(today.minusDays(1), today)).isEmpty();
    }
}
