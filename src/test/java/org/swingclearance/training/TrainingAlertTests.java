package org.swingclearance.training;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.content;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.time.LocalDate;
import java.time.ZoneOffset;
import java.util.List;
import java.util.Map;
import java.util.UUID;
import org.hamcrest.Matchers;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.dao.DataAccessException;
import org.springframework.jdbc.core.JdbcTemplate;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.transaction.support.TransactionTemplate;
import org.swingclearance.identity.CurrentStaff;
import org.swingclearance.patient.Patients;
import org.swingclearance.plan.Plans;
import org.swingclearance.support.IntegrationTest;
import org.swingclearance.support.PostgresTestBase;
import org.swingclearance.support.TestData;
import org.swingclearance.support.TestData.TestClinic;
import org.swingclearance.training.TrainingFixtures.SharedPlan;

/**
 * Alerts from logged sessions on real PostgreSQL: each rule raises one alert with the step to go back to, the
 * clinician sees it on the home and patient pages and acknowledges it once (audited), the trainer sees the advice;
 * and the numbers of the training log page are the load engine's for the same logs.
 */
@IntegrationTest
class TrainingAlertTests extends PostgresTestBase {

    @Autowired
    MockMvc mvc;
    @Autowired
    TestData data;
    @Autowired
    JdbcTemplate jdbc;
    @Autowired
    Patients patients;
    @Autowired
    Plans plans;
    @Autowired
    TransactionTemplate tx;
    @Autowired
    SessionLogs sessions;

    TestClinic clinic;
    TrainingFixtures fixtures;
    LocalDate today;

    @BeforeEach
    void setUp() {
        clinic = data.clinic();
        fixtures = new TrainingFixtures(data, jdbc, patients, plans, tx);
        today = LocalDate.now(ZoneOffset.UTC);
    }

    private static SessionEntry asPlanned(LocalDate day, int step, int rpe, int minutes, int painBefore,
                                          int painDuring) {
        return new SessionEntry(day, step, true, null, minutes, rpe, painBefore, painDuring, null);
    }

    private List<Map<String, Object>> alertsOf(SharedPlan plan) {
        return jdbc.queryForList("select * from training_alert where episode_id = ? order by raised_at",
                plan.episodeId());
    }

    @Test
    void painDuringAboveTheLimitRaisesOneAlertTheClinicianAcknowledges() throws Exception {
        SharedPlan plan = fixtures.sharedPlan(clinic, clinic.trainer());
        CurrentStaff trainer = clinic.trainer();
        // The plan schedules step 3 from day 14; pain during 7/10 is above the default limit of 5/10
        // (Silbernagel et al. 2007 via clinical.md §6.4): go back one step.
        sessions.log(trainer, plan.episodeId(), asPlanned(today.minusDays(2), 3, 5, 40, 1, 3));
        sessions.log(trainer, plan.episodeId(), asPlanned(today.minusDays(1), 3, 6, 40, 1, 7));
        List<Map<String, Object>> alerts = alertsOf(plan);
        assertThat(alerts).hasSize(1);
        Map<String, Object> alert = alerts.get(0);
        assertThat(alert).containsEntry("kind", "PAIN_DURING").containsEntry("step_number", 3)
                .containsEntry("regress_to_step", 2).containsEntry("observed", 7.0).containsEntry("threshold", 5.0)
                .containsEntry("rules_version", 1);
        UUID alertId = (UUID) alert.get("id");

        // The trainer is told to go back to step 2, on the training log and the home page.
        mvc.perform(get("/training/episodes/{id}", plan.episodeId()).with(data.as(trainer)))
                .andExpect(content().string(Matchers.containsString("Go back to step 2")));
        mvc.perform(get("/").with(data.as(trainer)))
                .andExpect(content().string(Matchers.containsString("Go back to step 2")));
        // The clinician sees it on the home page and the patient page; a trainer may not acknowledge.
        mvc.perform(get("/").with(data.as(clinic.clinician())))
                .andExpect(content().string(Matchers.containsString("alert-" + alertId)));
        mvc.perform(get("/patients/{id}", plan.patientId()).with(data.as(clinic.clinician())))
                .andExpect(content().string(Matchers.containsString("alert-" + alertId)));
        mvc.perform(post("/training/alerts/{id}/acknowledge", alertId).with(csrf()).with(data.as(trainer))
                .param("version", "0")).andExpect(status().isForbidden());

        mvc.perform(post("/training/alerts/{id}/acknowledge", alertId).with(csrf())
                        .with(data.as(clinic.clinician())).param("version", "0").param("note", "Called the trainer")
                        .param("from", "home"))
                .andExpect(status().is3xxRedirection());
        Map<String, Object> acknowledged = jdbc.queryForMap("select * from training_alert where id = ?", alertId);
        assertThat(acknowledged.get("acknowledged_at")).isNotNull();
        assertThat(acknowledged).containsEntry("acknowledged_by", clinic.clinician().staffId())
                .containsEntry("ack_note", "Called the trainer");
        assertThat(jdbc.queryForObject("select count(*) from audit_event where action = 'ALERT_ACK' and object_id = ?",
                Integer.class, alertId.toString())).isEqualTo(1);
        // Acknowledged once: a second acknowledgement is a conflict, and the database allows no other change.
        mvc.perform(post("/training/alerts/{id}/acknowledge", alertId).with(csrf())
                .with(data.as(clinic.clinician())).param("version", "1")).andExpect(status().isConflict());
        assertThatThrownBy(() -> jdbc.update("update training_alert set ack_note = 'changed' where id = ?", alertId))
                .isInstanceOf(DataAccessException.class);
        assertThatThrownBy(() -> jdbc.update("delete from training_alert where id = ?", alertId))
                .isInstanceOf(DataAccessException.class);
        mvc.perform(get("/training/episodes/{id}", plan.episodeId()).with(data.as(trainer)))
                .andExpect(content().string(Matchers.containsString("The clinician reviewed the last alert")));
    }

    @Test
    void anotherClinicCannotAcknowledgeAndTheAttemptIsAudited() throws Exception {
        SharedPlan plan = fixtures.sharedPlan(clinic, clinic.trainer());
        sessions.log(clinic.trainer(), plan.episodeId(), asPlanned(today.minusDays(1), 3, 6, 40, 1, 8));
        UUID alertId = (UUID) alertsOf(plan).get(0).get("id");
        TestClinic other = data.clinic();
        mvc.perform(post("/training/alerts/{id}/acknowledge", alertId).with(csrf())
                .with(data.as(other.clinician())).param("version", "0")).andExpect(status().isNotFound());
        assertThat(jdbc.queryForObject("select acknowledged_at is null from training_alert where id = ?",
                Boolean.class, alertId)).isTrue();
        assertThat(jdbc.queryForObject("select count(*) from audit_event where clinic_id = ? and outcome = 'DENIED'"
                + " and action = 'ALERT_ACK'", Integer.class, other.id())).isEqualTo(1);
    }

    @Test
    void aConfigurationHeavierThanTheScheduledStepRaisesAnAlertToGoBackToThatStep() {
        SharedPlan plan = fixtures.sharedPlan(clinic, clinic.trainer());
        // Step 4 (the 6 kg club, behind the re-screen gate) done while the plan schedules step 3: heavier club.
        sessions.log(clinic.trainer(), plan.episodeId(), asPlanned(today.minusDays(1), 4, 5, 30, 1, 2));
        // Step 3 with the grip mark moved 5 cm toward the knob: a longer lever, heavier on one dial.
        SessionEntry longerLever = new SessionEntry(today, 3, false,
                new SessionEntry.Actual(null, 4.0, 10.0, 2.0, 3, 10), 30, 5, 1, 2, null);
        sessions.log(clinic.trainer(), plan.episodeId(), longerLever);
        List<Map<String, Object>> alerts = alertsOf(plan);
        assertThat(alerts).extracting(a -> a.get("kind")).containsExactly("HEAVIER_THAN_STEP", "HEAVIER_THAN_STEP");
        assertThat(alerts).extracting(a -> a.get("regress_to_step")).containsExactly(3, 3);
        assertThat(alerts.get(0)).containsEntry("observed", 0.24).containsEntry("threshold", 0.22);
        assertThat(alerts.get(1).get("observed")).isNull(); // a configuration outside the plan has no known D
    }

    @Test
    void nextMorningPainAboveThePainBeforeTheSessionRaisesAnAlert() {
        SharedPlan plan = fixtures.sharedPlan(clinic, clinic.trainer());
        UUID log = sessions.log(clinic.trainer(), plan.episodeId(), asPlanned(today.minusDays(1), 3, 5, 40, 1, 3));
        assertThat(alertsOf(plan)).isEmpty();
        // Pain after activity should settle by the next morning (Silbernagel et al. 2007): 4/10 against 1/10 before.
        sessions.recordMorningPain(clinic.trainer(), plan.episodeId(), log, 0, 4, null);
        List<Map<String, Object>> alerts = alertsOf(plan);
        assertThat(alerts).hasSize(1);
        assertThat(alerts.get(0)).containsEntry("kind", "PAIN_NOT_SETTLED").containsEntry("regress_to_step", 2)
                .containsEntry("observed", 4.0).containsEntry("threshold", 1.0);
        // A corrected rating that is still unsettled does not raise the same open alert twice.
        sessions.recordMorningPain(clinic.trainer(), plan.episodeId(), log, 1, 5, "Misheard the rating");
        assertThat(alertsOf(plan)).hasSize(1);
    }

    @Test
    void aLoadSpikeAfterTheWarmUpRaisesARatioAlert() {
        SharedPlan plan = fixtures.sharedPlan(clinic, 40, clinic.trainer());
        // 35 days at 60 AU (RPE 2 × 30 min), then 720 AU (RPE 8 × 90 min) on day 36: the EWMA ratio is
        // (0.25 × 720 + 0.75 × 60) ÷ (0.068966 × 720 + 0.931034 × 60) = 225 ÷ 105.52 = 2.13 (Williams et al.
        // 2017 formula, clinical.md §7.4), above the default caution level 1.5 (Gabbett 2016, contested).
        for (int day = 0; day < 35; day++) {
            LocalDate date = plan.startsOn().plusDays(day);
            sessions.log(clinic.trainer(), plan.episodeId(), asPlanned(date, 1, 2, 30, 0, 0));
        }
        assertThat(alertsOf(plan)).isEmpty();
        sessions.log(clinic.trainer(), plan.episodeId(), asPlanned(plan.startsOn().plusDays(35), 1, 8, 90, 0, 0));
        List<Map<String, Object>> alerts = alertsOf(plan);
        assertThat(alerts).hasSize(1);
        assertThat(alerts.get(0)).containsEntry("kind", "LOAD_RATIO").containsEntry("threshold", 1.5)
                .containsEntry("regress_to_step", 1);
        assertThat((Double) alerts.get(0).get("observed")).isCloseTo(2.132, within(0.001));
    }
}
