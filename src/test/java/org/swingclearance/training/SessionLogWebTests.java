package org.swingclearance.training;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.content;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.flash;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.model;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.view;

import java.time.LocalDate;
import java.time.ZoneOffset;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.UUID;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.dao.DataAccessException;
import org.springframework.jdbc.core.JdbcTemplate;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.request.MockHttpServletRequestBuilder;
import org.springframework.transaction.support.TransactionTemplate;
import org.swingclearance.identity.CurrentStaff;
import org.swingclearance.identity.StaffRole;
import org.swingclearance.patient.Patients;
import org.swingclearance.plan.Plans;
import org.swingclearance.support.IntegrationTest;
import org.swingclearance.support.PostgresTestBase;
import org.swingclearance.support.TestData;
import org.swingclearance.support.TestData.TestClinic;
import org.swingclearance.training.TrainingFixtures.SharedPlan;

/**
 * The session log through the web on real PostgreSQL: every validation rule answers with its field error code and
 * saves nothing; trainers reach only shared plans (404, audited); two trainers logging the same day both keep their
 * entry; a correction is a new version and the database refuses to change or delete the old one.
 */
@IntegrationTest
class SessionLogWebTests extends PostgresTestBase {

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

    TestClinic clinic;
    SharedPlan plan;
    LocalDate today;

    @BeforeEach
    void setUp() {
        clinic = data.clinic();
        plan = new TrainingFixtures(data, jdbc, patients, plans, tx).sharedPlan(clinic, clinic.trainer());
        today = LocalDate.now(ZoneOffset.UTC);
    }

    /** A valid session (step 2 as planned, yesterday); pairs of name and value replace or add fields. */
    private MockHttpServletRequestBuilder logSession(CurrentStaff who, String... overrides) {
        Map<String, String> fields = new LinkedHashMap<>();
        fields.put("sessionDate", today.minusDays(1).toString());
        fields.put("stepNumber", "2");
        fields.put("asPlanned", "true");
        fields.put("durationMin", "40");
        fields.put("rpe", "5");
        fields.put("painBefore", "1");
        fields.put("painDuring", "2");
        for (int i = 0; i < overrides.length; i += 2) {
            fields.put(overrides[i], overrides[i + 1]);
        }
        MockHttpServletRequestBuilder request = post("/training/episodes/{id}/sessions", plan.episodeId())
                .with(csrf()).with(data.as(who));
        fields.forEach((k, v) -> {
            if (v != null) {
                request.param(k, v);
            }
        });
        return request;
    }

    private int logsOfEpisode() {
        return jdbc.queryForObject("select count(*) from session_log where episode_id = ?", Integer.class,
                plan.episodeId());
    }

    private int versionsOfEpisode() {
        return jdbc.queryForObject("select count(*) from session_log_version v join session_log l"
                + " on l.id = v.session_log_id where l.episode_id = ?", Integer.class, plan.episodeId());
    }

    private UUID onlyLog() {
        return jdbc.queryForObject("select id from session_log where episode_id = ?", UUID.class, plan.episodeId());
    }

    @Test
    void aTrainerLogsASessionAndSeesItOnTheTrainingLog() throws Exception {
        mvc.perform(logSession(clinic.trainer())).andExpect(status().is3xxRedirection());
        assertThat(logsOfEpisode()).isEqualTo(1);
        Workspace ws = (Workspace) mvc.perform(get("/training/episodes/{id}", plan.episodeId())
                        .with(data.as(clinic.trainer())))
                .andExpect(status().isOk()).andExpect(view().name("training/workspace"))
                .andReturn().getModelAndView().getModel().get("ws");
        assertThat(ws.sessions()).hasSize(1);
        assertThat(ws.sessions().get(0).sessionLoadAu()).isEqualTo(200.0); // RPE 5 × 40 min (Foster et al. 2001)
        Integer audited = jdbc.queryForObject("select count(*) from audit_event where clinic_id = ? and action = ?"
                + " and outcome = 'SUCCESS'", Integer.class, clinic.id(), "SESSION_LOG_CREATE");
        assertThat(audited).isEqualTo(1);
        Integer loadReads = jdbc.queryForObject("select count(*) from audit_event where clinic_id = ? and action = ?"
                + " and patient_id = ?", Integer.class, clinic.id(), "LOAD_READ", plan.patientId());
        assertThat(loadReads).isEqualTo(1);
    }

    @Test
    void withoutAnIssuedPlanTheClinicianSeesWhyAndCannotLog() throws Exception {
        UUID patient = data.patient(clinic);
        UUID episode = data.shoulderEpisode(clinic, patient);
        mvc.perform(get("/training/episodes/{id}", episode).with(data.as(clinic.clinician())))
                .andExpect(status().isOk()).andExpect(content().string(org.hamcrest.Matchers.containsString(
                        "There is no issued plan for this episode yet")));
        mvc.perform(get("/training/episodes/{id}/sessions/new", episode).with(data.as(clinic.clinician())))
                .andExpect(status().is3xxRedirection()).andExpect(flash().attribute("flash", "training.noPlan"));
        mvc.perform(get("/training/episodes/{id}", episode).with(data.as(clinic.trainer())))
                .andExpect(status().isNotFound());
    }

    @Nested
    class BadInput {

        @Test
        void sessionRpeOutsideZeroToTenIsRefused() throws Exception {
            // Session RPE is rated on the CR-10 scale, 0–10 (Foster et al. 2001).
            mvc.perform(logSession(clinic.trainer(), "rpe", "11"))
                    .andExpect(status().isOk()).andExpect(view().name("training/log-form"))
                    .andExpect(model().attributeHasFieldErrorCode("form", "rpe", "Max"));
            mvc.perform(logSession(clinic.trainer(), "rpe", "-1"))
                    .andExpect(model().attributeHasFieldErrorCode("form", "rpe", "Min"));
            assertThat(logsOfEpisode()).isZero();
        }

        @Test
        void painOutsideZeroToTenIsRefused() throws Exception {
            // Numeric pain rating scale 0–10 (clinical.md §4.4).
            mvc.perform(logSession(clinic.trainer(), "painDuring", "11"))
                    .andExpect(model().attributeHasFieldErrorCode("form", "painDuring", "Max"));
            mvc.perform(logSession(clinic.trainer(), "painDuring", "-1"))
                    .andExpect(model().attributeHasFieldErrorCode("form", "painDuring", "Min"));
            mvc.perform(logSession(clinic.trainer(), "painBefore", "11"))
                    .andExpect(model().attributeHasFieldErrorCode("form", "painBefore", "Max"));
            assertThat(logsOfEpisode()).isZero();
        }

        @Test
        void durationOfZeroOrOverSixHundredMinutesIsRefused() throws Exception {
            mvc.perform(logSession(clinic.trainer(), "durationMin", "0"))
                    .andExpect(model().attributeHasFieldErrorCode("form", "durationMin", "Min"));
            mvc.perform(logSession(clinic.trainer(), "durationMin", "-5"))
                    .andExpect(model().attributeHasFieldErrorCode("form", "durationMin", "Min"));
            mvc.perform(logSession(clinic.trainer(), "durationMin", "601"))
                    .andExpect(model().attributeHasFieldErrorCode("form", "durationMin", "Max"));
            mvc.perform(logSession(clinic.trainer(), "durationMin", "600"))
                    .andExpect(status().is3xxRedirection());
            assertThat(logsOfEpisode()).isEqualTo(1);
        }

        @Test
        void aDateInTheFutureIsRefused() throws Exception {
            mvc.perform(logSession(clinic.trainer(), "sessionDate", today.plusDays(1).toString()))
                    .andExpect(view().name("training/log-form"))
                    .andExpect(model().attributeHasFieldErrorCode("form", "sessionDate", "sessionLog.error.future"));
            assertThat(logsOfEpisode()).isZero();
        }

        @Test
        void aDateBeforeThePlanStartedIsRefused() throws Exception {
            mvc.perform(logSession(clinic.trainer(), "sessionDate", plan.startsOn().minusDays(1).toString()))
                    .andExpect(model().attributeHasFieldErrorCode("form", "sessionDate",
                            "sessionLog.error.beforePlan"));
            assertThat(logsOfEpisode()).isZero();
        }

        @Test
        void missingValuesAndTextInNumberFieldsAreRefused() throws Exception {
            mvc.perform(logSession(clinic.trainer(), "rpe", null, "durationMin", "forty", "sessionDate", null))
                    .andExpect(model().attributeHasFieldErrorCode("form", "rpe", "NotNull"))
                    .andExpect(model().attributeHasFieldErrorCode("form", "durationMin", "typeMismatch"))
                    .andExpect(model().attributeHasFieldErrorCode("form", "sessionDate", "NotNull"));
            assertThat(logsOfEpisode()).isZero();
        }

        @Test
        void aStepThePlanDoesNotHaveIsRefused() throws Exception {
            mvc.perform(logSession(clinic.trainer(), "stepNumber", "9"))
                    .andExpect(model().attributeHasFieldErrorCode("form", "stepNumber", "sessionLog.error.noSuchStep"));
            assertThat(logsOfEpisode()).isZero();
        }

        @Test
        void aDifferentConfigurationNeedsWhatWasActuallyDone() throws Exception {
            mvc.perform(logSession(clinic.trainer(), "asPlanned", "false"))
                    .andExpect(model().attributeHasFieldErrorCode("form", "clubGivenWhenDifferent", "AssertTrue"))
                    .andExpect(model().attributeHasFieldErrorCode("form", "gripMarkGivenWhenDifferent", "AssertTrue"))
                    .andExpect(model().attributeHasFieldErrorCode("form", "cycleTimeGivenWhenDifferent", "AssertTrue"))
                    .andExpect(model().attributeHasFieldErrorCode("form", "volumeGivenWhenDifferent", "AssertTrue"));
            mvc.perform(logSession(clinic.trainer(), "asPlanned", "false", "clubId", UUID.randomUUID().toString(),
                            "gripMarkCm", "15", "cycleTimeS", "2.5", "sets", "3", "reps", "10"))
                    .andExpect(model().attributeHasFieldErrorCode("form", "clubId", "sessionLog.error.unknownClub"));
            mvc.perform(logSession(clinic.trainer(), "asPlanned", "false", "otherClubMassKg", "60",
                            "gripMarkCm", "151", "cycleTimeS", "0.2", "sets", "3", "reps", "10"))
                    .andExpect(model().attributeHasFieldErrorCode("form", "otherClubMassKg", "DecimalMax"))
                    .andExpect(model().attributeHasFieldErrorCode("form", "gripMarkCm", "DecimalMax"))
                    .andExpect(model().attributeHasFieldErrorCode("form", "cycleTimeS", "DecimalMin"));
            assertThat(logsOfEpisode()).isZero();
        }

        @Test
        void aCorrectionWithoutAReasonIsRefusedAndChangesNothing() throws Exception {
            mvc.perform(logSession(clinic.trainer())).andExpect(status().is3xxRedirection());
            UUID log = onlyLog();
            mvc.perform(post("/training/episodes/{e}/sessions/{l}/correct", plan.episodeId(), log).with(csrf())
                            .with(data.as(clinic.trainer())).param("sessionDate", today.minusDays(1).toString())
                            .param("stepNumber", "2").param("asPlanned", "true").param("durationMin", "45")
                            .param("rpe", "6").param("painBefore", "1").param("painDuring", "2").param("version", "1").param("reason", " "))
                    .andExpect(view().name("training/correct-form"))
                    .andExpect(model().attributeHasFieldErrorCode("form", "reason", "NotBlank"));
            assertThat(versionsOfEpisode()).isEqualTo(1);
        }

        @Test
        void nextMorningPainIsRefusedOnTheSameDayAndOutsideZeroToTen() throws Exception {
            mvc.perform(logSession(clinic.trainer(), "sessionDate", today.toString()))
                    .andExpect(status().is3xxRedirection());
            UUID log = onlyLog();
            mvc.perform(post("/training/episodes/{e}/sessions/{l}/morning", plan.episodeId(), log).with(csrf())
                            .with(data.as(clinic.trainer())).param("pain", "3").param("version", "0"))
                    .andExpect(view().name("training/morning-form"))
                    .andExpect(model().attributeHasFieldErrorCode("form", "pain", "morningPain.error.tooEarly"));
            mvc.perform(post("/training/episodes/{e}/sessions/{l}/morning", plan.episodeId(), log).with(csrf())
                            .with(data.as(clinic.trainer())).param("pain", "11").param("version", "0"))
                    .andExpect(model().attributeHasFieldErrorCode("form", "pain", "Max"));
            assertThat(jdbc.queryForObject("select count(*) from session_morning_pain where session_log_id = ?",
                    Integer.class, log)).isZero();
        }
    }

    @Nested
    class Access {

        @Test
        void aTrainerWithoutAShareGetsNotFoundAndTheAttemptIsAudited() throws Exception {
            CurrentStaff stranger = data.account(clinic.id(), StaffRole.TRAINER, "other-" + UUID.randomUUID()
                    + "@test.local");
            mvc.perform(logSession(stranger)).andExpect(status().isNotFound());
            mvc.perform(get("/training/episodes/{id}", plan.episodeId()).with(data.as(stranger)))
                    .andExpect(status().isNotFound());
            mvc.perform(get("/training/episodes/{id}/sessions/new", plan.episodeId()).with(data.as(stranger)))
                    .andExpect(status().isNotFound());
            assertThat(logsOfEpisode()).isZero();
            List<String> denied = jdbc.queryForList("select action from audit_event where clinic_id = ?"
                    + " and actor_id = ? and outcome = 'DENIED' and object_id = ?", String.class, clinic.id(),
                    stranger.staffId(), plan.episodeId().toString());
            assertThat(denied).contains("SESSION_LOG_CREATE", "LOAD_READ", "TRAINING_PLAN_READ");
        }

        @Test
        void aTrainerWhosePlanWasUnsharedLosesAccessAtOnce() throws Exception {
            mvc.perform(logSession(clinic.trainer())).andExpect(status().is3xxRedirection());
            UUID share = jdbc.queryForObject("select id from plan_share where plan_id = ?", UUID.class, plan.planId());
            plans.unshare(clinic.clinician(), plan.planId(), share);
            mvc.perform(logSession(clinic.trainer())).andExpect(status().isNotFound());
            mvc.perform(get("/training/episodes/{e}/sessions/{l}/correct", plan.episodeId(), onlyLog())
                    .with(data.as(clinic.trainer()))).andExpect(status().isNotFound());
            assertThat(logsOfEpisode()).isEqualTo(1);
        }

        @Test
        void anotherClinicsClinicianGetsNotFoundAndManagersAreNotAllowed() throws Exception {
            TestClinic other = data.clinic();
            mvc.perform(get("/training/episodes/{id}", plan.episodeId()).with(data.as(other.clinician())))
                    .andExpect(status().isNotFound());
            mvc.perform(logSession(other.clinician())).andExpect(status().isNotFound());
            mvc.perform(get("/training/episodes/{id}", plan.episodeId()).with(data.as(clinic.manager())))
                    .andExpect(status().isForbidden());
            assertThat(logsOfEpisode()).isZero();
        }

        @Test
        void theClinicianOfTheClinicMayLogToo() throws Exception {
            mvc.perform(logSession(clinic.clinician())).andExpect(status().is3xxRedirection());
            assertThat(logsOfEpisode()).isEqualTo(1);
        }
    }

    @Test
    void twoTrainersLoggingTheSameDayBothKeepTheirEntry() throws Exception {
        CurrentStaff second = data.account(clinic.id(), StaffRole.TRAINER, "second-" + UUID.randomUUID()
                + "@test.local");
        new TrainingFixtures(data, jdbc, patients, plans, tx).share(clinic, plan.patientId(), plan.planId(), second);
        mvc.perform(logSession(clinic.trainer(), "durationMin", "30")).andExpect(status().is3xxRedirection());
        mvc.perform(logSession(second, "durationMin", "50")).andExpect(status().is3xxRedirection());
        List<Map<String, Object>> rows = jdbc.queryForList("select l.created_by, v.duration_min from session_log l"
                + " join session_log_version v on v.session_log_id = l.id where l.episode_id = ?"
                + " order by v.duration_min", plan.episodeId());
        assertThat(rows).hasSize(2);
        assertThat(rows.get(0)).containsEntry("created_by", clinic.trainer().staffId()).containsEntry("duration_min", 30);
        assertThat(rows.get(1)).containsEntry("created_by", second.staffId()).containsEntry("duration_min", 50);
    }

    @Nested
    class Corrections {

        private MockHttpServletRequestBuilder correction(CurrentStaff who, UUID log, int version, String rpe) {
            return post("/training/episodes/{e}/sessions/{l}/correct", plan.episodeId(), log).with(csrf())
                    .with(data.as(who)).param("sessionDate", today.minusDays(1).toString()).param("stepNumber", "2")
                    .param("asPlanned", "true").param("durationMin", "40").param("rpe", rpe)
                    .param("painBefore", "1").param("painDuring", "2").param("version", String.valueOf(version))
                    .param("reason", "RPE was entered wrongly");
        }

        @Test
        void aCorrectionIsANewVersionAndTheOldOneStaysUnchangeable() throws Exception {
            mvc.perform(logSession(clinic.trainer())).andExpect(status().is3xxRedirection());
            UUID log = onlyLog();
            mvc.perform(correction(clinic.trainer(), log, 1, "7")).andExpect(status().is3xxRedirection());
            List<Map<String, Object>> versions = jdbc.queryForList("select version, rpe, reason"
                    + " from session_log_version where session_log_id = ? order by version", log);
            assertThat(versions).hasSize(2);
            assertThat(versions.get(0)).containsEntry("rpe", 5).containsEntry("reason", null);
            assertThat(versions.get(1)).containsEntry("rpe", 7).containsEntry("reason", "RPE was entered wrongly");
            Integer corrections = jdbc.queryForObject("select count(*) from audit_event where clinic_id = ?"
                    + " and action = 'SESSION_LOG_CORRECT' and object_id = ?", Integer.class, clinic.id(),
                    log.toString());
            assertThat(corrections).isEqualTo(1);

            // The database itself refuses to rewrite or remove a logged version, not just the code.
            assertThatThrownBy(() -> jdbc.update("update session_log_version set rpe = 1 where session_log_id = ?"
                    + " and version = 1", log)).isInstanceOf(DataAccessException.class)
                    .hasMessageContaining("append-only");
            assertThatThrownBy(() -> jdbc.update("delete from session_log_version where session_log_id = ?", log))
                    .isInstanceOf(DataAccessException.class).hasMessageContaining("append-only");
            assertThatThrownBy(() -> jdbc.update("delete from session_log where id = ?", log))
                    .isInstanceOf(DataAccessException.class);
            assertThat(jdbc.queryForObject("select rpe from session_log_version where session_log_id = ?"
                    + " and version = 1", Integer.class, log)).isEqualTo(5);
        }

        @Test
        void aCorrectionOfAnOutdatedVersionIsAConflictAndSavesNothing() throws Exception {
            mvc.perform(logSession(clinic.trainer())).andExpect(status().is3xxRedirection());
            UUID log = onlyLog();
            mvc.perform(correction(clinic.clinician(), log, 1, "6")).andExpect(status().is3xxRedirection());
            mvc.perform(correction(clinic.trainer(), log, 1, "8")).andExpect(status().isConflict());
            assertThat(versionsOfEpisode()).isEqualTo(2);
        }

        @Test
        void aTrainerCannotCorrectAnotherTrainersEntry() throws Exception {
            CurrentStaff second = data.account(clinic.id(), StaffRole.TRAINER, "third-" + UUID.randomUUID()
                    + "@test.local");
            new TrainingFixtures(data, jdbc, patients, plans, tx).share(clinic, plan.patientId(), plan.planId(),
                    second);
            mvc.perform(logSession(clinic.trainer())).andExpect(status().is3xxRedirection());
            mvc.perform(correction(second, onlyLog(), 1, "9")).andExpect(status().is3xxRedirection());
            assertThat(versionsOfEpisode()).isEqualTo(1);
        }

        @Test
        void theNextMorningPainIsALaterAppendOnlyEntryOfTheSameLog() throws Exception {
            mvc.perform(logSession(clinic.trainer())).andExpect(status().is3xxRedirection());
            UUID log = onlyLog();
            mvc.perform(post("/training/episodes/{e}/sessions/{l}/morning", plan.episodeId(), log).with(csrf())
                            .with(data.as(clinic.trainer())).param("pain", "1").param("version", "0"))
                    .andExpect(status().is3xxRedirection());
            // Replacing it needs a reason, and keeps the first rating.
            mvc.perform(post("/training/episodes/{e}/sessions/{l}/morning", plan.episodeId(), log).with(csrf())
                            .with(data.as(clinic.trainer())).param("pain", "2").param("version", "1"))
                    .andExpect(model().attributeHasFieldErrorCode("form", "reasonGivenWhenCorrecting", "AssertTrue"));
            mvc.perform(post("/training/episodes/{e}/sessions/{l}/morning", plan.episodeId(), log).with(csrf())
                            .with(data.as(clinic.trainer())).param("pain", "2").param("version", "1")
                            .param("reason", "Rated the evening by mistake"))
                    .andExpect(status().is3xxRedirection());
            assertThat(jdbc.queryForList("select pain from session_morning_pain where session_log_id = ?"
                    + " order by version", Integer.class, log)).containsExactly(1, 2);
            assertThatThrownBy(() -> jdbc.update("update session_morning_pain set pain = 0 where session_log_id = ?",
                    log)).isInstanceOf(DataAccessException.class).hasMessageContaining("append-only");
            assertThat(versionsOfEpisode()).isEqualTo(1);
        }
    }
}
