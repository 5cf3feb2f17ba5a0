package org.swingclearance.plan;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.content;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.model;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.view;

import java.io.IOException;
import java.time.LocalDate;
import java.util.EnumSet;
import java.util.List;
import java.util.UUID;
import java.util.stream.Stream;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestInstance;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.jdbc.core.JdbcTemplate;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.MvcResult;
import org.swingclearance.equipment.Clubs;
import org.swingclearance.identity.CurrentStaff;
import org.swingclearance.identity.StaffRole;
import org.swingclearance.patient.Hand;
import org.swingclearance.patient.PatientDetails;
import org.swingclearance.patient.Patients;
import org.swingclearance.patient.RedFlag;
import org.swingclearance.patient.RedFlagContext;
import org.swingclearance.patient.Sex;
import org.swingclearance.screening.Screenings;
import org.swingclearance.support.IntegrationTest;
import org.swingclearance.support.PostgresTestBase;
import org.swingclearance.support.TestData;

/**
 * The plan pages over HTTP: who reaches which page (trainers only through a share, other clinics never, 404 and
 * audited), the trainer sees nothing clinical beyond the plan (marker strings seeded in clinical fields never appear),
 * the handout is a valid PDF with the steps and the caution, and bad settings come back as field errors.
 */
@IntegrationTest
@TestInstance(TestInstance.Lifecycle.PER_CLASS)
class PlanWebTests extends PostgresTestBase {

    static final String MARKER_CONTACT = "MARKER-CONTACT-7731";
    static final String MARKER_GOAL = "MARKER-GOAL-5512";
    static final String MARKER_REFERRAL = "MARKER-REFERRAL-9043";
    // The screening's own text (band override reasons, PlanScenario) is a marker too.

    @Autowired
    MockMvc mvc;
    @Autowired
    TestData data;
    @Autowired
    Clubs clubs;
    @Autowired
    Screenings screenings;
    @Autowired
    Plans plans;
    @Autowired
    PlanDrafting drafting;
    @Autowired
    Patients patients;
    @Autowired
    JdbcTemplate jdbc;

    PlanScenario s;
    UUID planId;
    CurrentStaff unsharedTrainer;
    PlanScenario other;

    @BeforeAll
    void shareAnIssuedPlan() {
        s = PlanScenario.create(data, clubs, screenings);
        // Clinical text the trainer must never see: contact details, the episode's goal, a referral note.
        var p = patients.find(s.clinician(), s.patientId).orElseThrow();
        patients.update(s.clinician(), s.patientId, p.version(), new PatientDetails(p.code(), p.fullName(),
                p.dateOfBirth(), Sex.MALE, p.statureM(), p.bodyMassKg(), Hand.RIGHT, MARKER_CONTACT));
        jdbc.update("update episode set goal = ? where id = ?", MARKER_GOAL, s.episodeId);
        patients.recordRedFlags(s.clinician(), s.episodeId, RedFlagContext.RECHECK, EnumSet.of(RedFlag.values()[0]));
        patients.recordReferral(s.clinician(), s.episodeId, "Example referral service", MARKER_REFERRAL);
        planId = plans.generate(s.clinician(), s.episodeId, s.settings(drafting));
        plans.issue(s.clinician(), planId, plans.page(s.clinician(), s.episodeId).draft().lockVersion());
        s.consentForTrainer(patients);
        plans.share(s.clinician(), planId, s.trainer().staffId());
        unsharedTrainer = data.account(s.clinic.id(), StaffRole.TRAINER, "unshared-" + UUID.randomUUID() + "@test.local");
        other = PlanScenario.create(data, clubs, screenings);
    }

    Stream<Arguments> readers() {
        return Stream.of(
                Arguments.of("shared trainer", 200),
                Arguments.of("trainer without share", 404),
                Arguments.of("trainer of another clinic", 404),
                Arguments.of("clinician", 302),
                Arguments.of("clinician of another clinic", 404),
                Arguments.of("manager", 403),
                Arguments.of("admin", 403));
    }

    CurrentStaff who(String name) {
        return switch (name) {
            case "shared trainer" -> s.trainer();
            case "trainer without share" -> unsharedTrainer;
            case "trainer of another clinic" -> other.trainer();
            case "clinician" -> s.clinician();
            case "clinician of another clinic" -> other.clinician();
            case "manager" -> s.clinic.manager();
            default -> s.clinic.admin();
        };
    }

    @ParameterizedTest(name = "{0} GET /plans/'{id}' -> {1}")
    @MethodSource("readers")
    void thePlanPageIsReachedOnlyThroughAShare(String name, int expected) throws Exception {
        CurrentStaff staff = who(name);
        int before = denials(staff);
        mvc.perform(get("/plans/{id}", planId).with(data.as(staff))).andExpect(status().is(expected));
        if (expected == 404) {
            assertThat(denials(staff)).as("the refusal is audited").isEqualTo(before + 1);
        }
    }

    @ParameterizedTest(name = "{0} GET handout -> {1}")
    @MethodSource("readers")
    void theHandoutIsReachedOnlyThroughAShare(String name, int expected) throws Exception {
        mvc.perform(get("/plans/{id}/handout.pdf", planId).with(data.as(who(name))))
                .andExpect(status().is(expected == 302 ? 200 : expected));
    }

    /** The page before any plan still shows the patient: it is audited as a read of the episode, naming the patient. */
    @Test
    void thePlanPageOfAnEpisodeWithoutAPlanIsAuditedToo() throws Exception {
        UUID patient = data.patient(s.clinic);
        UUID episode = data.shoulderEpisode(s.clinic, patient);
        mvc.perform(get("/episodes/{e}/plan", episode).with(data.as(s.clinician()))).andExpect(status().isOk());
        assertThat(jdbc.queryForObject("select count(*) from audit_event where action = 'PLAN_READ'"
                + " and object_type = 'Episode' and object_id = ? and patient_id = ? and actor_id = ?",
                Integer.class, episode.toString(), patient, s.clinician().staffId())).isEqualTo(1);
    }

    @Test
    void theClinicianPlanPageIsForClinicians() throws Exception {
        mvc.perform(get("/episodes/{e}/plan", s.episodeId).with(data.as(s.clinician())))
                .andExpect(status().isOk()).andExpect(view().name("plan/page"))
                .andExpect(content().string(org.hamcrest.Matchers.containsString("Decision support only")));
        mvc.perform(get("/episodes/{e}/plan", s.episodeId).with(data.as(s.trainer()))).andExpect(status().isForbidden());
        mvc.perform(get("/episodes/{e}/plan", s.episodeId).with(data.as(other.clinician())))
                .andExpect(status().isNotFound());
        mvc.perform(post("/plans/{p}/shares", planId).param("trainerId", other.trainer().staffId().toString())
                .with(csrf()).with(data.as(other.clinician()))).andExpect(status().isNotFound());
    }

    @Test
    void theTrainerSeesThePlanAndNothingClinicalBeyondIt() throws Exception {
        // The markers are really in the record: at least one override reason was stored with the screening.
        assertThat(jdbc.queryForObject("select count(*) from screening_version v join screening s on s.id = v.screening_id"
                + " where s.episode_id = ? and (v.shoulder_override_reason is not null"
                + " or v.lumbopelvic_override_reason is not null)", Integer.class, s.episodeId)).isPositive();
        List<String> pages = List.of(
                body(get("/plans/{id}", planId), s.trainer()),
                body(get("/plans"), s.trainer()),
                body(get("/"), s.trainer()),
                pdfText(s.trainer()));
        for (String page : pages) {
            assertThat(page).contains("Test Patient").contains("Decision support only");
            assertThat(page).doesNotContain(MARKER_CONTACT).doesNotContain(MARKER_GOAL)
                    .doesNotContain(MARKER_REFERRAL).doesNotContain(PlanScenario.SHOULDER_OVERRIDE_REASON)
                    .doesNotContain(PlanScenario.LUMBOPELVIC_OVERRIDE_REASON);
            // No screening values or bands of the record: capacity and band words are not on the trainer's pages.
            assertThat(page).doesNotContain("N·m").doesNotContain("torque (C");
        }
        assertThat(pages.get(0)).contains("This week").contains("Club 4.0 kg");
    }

    @Test
    void theHandoutIsAValidPdfWithTheStepsAndTheCaution() throws Exception {
        String text = pdfText(s.clinician());
        IssuedPlanView plan = plans.currentIssued(s.clinician(), s.episodeId).orElseThrow();
        for (PlanStepView step : plan.steps()) {
            assertThat(text).contains(step.clubName());
        }
        assertThat(text).contains("Decision support only: these are mechanical estimates")
                .contains("Pain during the session up to").contains(s.clinic.name());
        assertThat(jdbc.queryForObject("select count(*) from audit_event where object_id = ? and action = 'PLAN_EXPORT'",
                Integer.class, planId.toString())).isGreaterThanOrEqualTo(1);
    }

    @Test
    void aTargetOffTheGridComesBackAsAFieldErrorAndNothingIsSaved() throws Exception {
        PlanScenario fresh = PlanScenario.create(data, clubs, screenings);
        mvc.perform(post("/episodes/{e}/plan", fresh.episodeId).with(csrf()).with(data.as(fresh.clinician()))
                        .param("patternId", PlanScenario.TWO_HAND_LOW_PENDULUM.toString())
                        .param("targetClubId", fresh.clubs.get(0).toString())
                        .param("targetGripMarkCm", "11").param("targetCycleTimeS", "2.0")
                        .param("stepUnit", "SESSIONS").param("stepLength", "3").param("sessionsPerWeek", "3")
                        .param("startsOn", LocalDate.now().toString())
                        .param("doses[0].band", "BAND_2").param("doses[0].sets", "3").param("doses[0].reps", "10")
                        .param("doses[0].effortCap", "4"))
                .andExpect(status().isOk()).andExpect(view().name("plan/page"))
                .andExpect(model().attributeHasFieldErrorCode("settingsForm", "targetGripMarkCm",
                        "plan.settings.error.gripGrid"))
                .andExpect(content().string(org.hamcrest.Matchers.containsString("nearest marks 10.0 cm and 12.5 cm")));
        assertThat(plans.page(fresh.clinician(), fresh.episodeId).hasPlan()).isFalse();
    }

    String body(org.springframework.test.web.servlet.request.MockHttpServletRequestBuilder request, CurrentStaff as)
            throws Exception {
        return mvc.perform(request.with(data.as(as))).andExpect(status().isOk()).andReturn().getResponse()
                .getContentAsString();
    }

    String pdfText(CurrentStaff as) throws Exception {
        MvcResult result = mvc.perform(get("/plans/{id}/handout.pdf", planId).with(data.as(as)))
                .andExpect(status().isOk())
                .andExpect(content().contentType("application/pdf")).andReturn();
        return text(result.getResponse().getContentAsByteArray());
    }

    static String text(byte[] pdf) throws IOException {
        try (PDDocument document = Loader.loadPDF(pdf)) {
            return new PDFTextStripper().getText(document).replaceAll("\\s+", " ");
        }
    }

    int denials(CurrentStaff staff) {
        return jdbc.queryForObject("select count(*) from audit_event where actor_id = ? and outcome = 'DENIED'",
                Integer.class, staff.staffId());
    }
}
