package org.swingclearance.screening;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.content;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.jsonPath;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.model;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.view;

import java.util.Map;
import java.util.UUID;
import org.hamcrest.Matchers;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.jdbc.core.JdbcTemplate;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.request.MockHttpServletRequestBuilder;
import org.swingclearance.identity.CurrentStaff;
import org.swingclearance.support.IntegrationTest;
import org.swingclearance.support.PostgresTestBase;
import org.swingclearance.support.TestData;
import org.swingclearance.support.TestData.TestClinic;

/**
 * The screening pages through the web: field messages for impossible values with nothing saved, the JSON preview,
 * the no-JavaScript "Calculate", signing with a refused override, stale drafts, and who may see screenings.
 */
@IntegrationTest
class ScreeningWebTests extends PostgresTestBase {

    @Autowired
    MockMvc mvc;
    @Autowired
    TestData data;
    @Autowired
    JdbcTemplate jdbc;
    @Autowired
    Screenings screenings;

    TestClinic clinic;
    CurrentStaff clinician;
    UUID patient;
    UUID episode;
    UUID screening;

    @BeforeEach
    void setUp() throws Exception {
        clinic = data.clinic();
        clinician = clinic.clinician();
        patient = data.patient(clinic);
        episode = data.shoulderEpisode(clinic, patient);
        String location = mvc.perform(post("/episodes/{id}/screenings", episode).with(csrf()).with(data.as(clinician)))
                .andExpect(status().is3xxRedirection()).andReturn().getResponse().getRedirectedUrl();
        screening = UUID.fromString(location.substring(location.lastIndexOf('/') + 1));
    }

    /** The full screening form with some fields replaced (pairs of key and typed value; "lockVersion" too). */
    private MockHttpServletRequestBuilder form(String path, String action, String... overrides) {
        Map<String, String> typed = FullScreening.typed();
        for (int i = 0; i < overrides.length; i += 2) {
            typed.put(overrides[i], overrides[i + 1]);
        }
        String lock = typed.containsKey("lockVersion") ? typed.remove("lockVersion") : String.valueOf(lockVersion());
        MockHttpServletRequestBuilder request = post(path, screening).with(csrf()).with(data.as(clinician))
                .param("lockVersion", lock);
        if (action != null) {
            request.param("action", action);
        }
        typed.forEach((k, v) -> request.param("values[" + k + "]", v));
        return request;
    }

    private long lockVersion() {
        return jdbc.queryForObject("select lock_version from screening_version where screening_id = ? and status = 'DRAFT'",
                Long.class, screening);
    }

    private String storedMeasurements() {
        return jdbc.queryForObject("select measurements::text from screening_version where screening_id = ?",
                String.class, screening);
    }

    @Nested
    class ImpossibleValues {

        @Test
        void flexionAbove200DegreesIsRefusedAndNothingIsSaved() throws Exception {
            String before = storedMeasurements();
            mvc.perform(form("/screenings/{id}", "save", "SHOULDER_FLEXION_ACTIVE_RIGHT", "201"))
                    .andExpect(status().isOk()).andExpect(view().name("screening/form"))
                    .andExpect(model().attributeHasFieldErrorCode("form", "values[SHOULDER_FLEXION_ACTIVE_RIGHT]",
                            "screening.value.aboveMax"))
                    .andExpect(content().string(Matchers.containsString("Must be at most 200.")));
            assertThat(storedMeasurements()).isEqualTo(before);
        }

        @Test
        void negativeTimesLeverArmsOfZeroAndOutOfScaleResponsesAreRefused() throws Exception {
            String before = storedMeasurements();
            mvc.perform(form("/screenings/{id}", "save", "TRUNK_FLEXOR_HOLD", "-5", "SHOULDER_FLEXION_LEVER_ARM_LEFT", "0",
                            "QUICKDASH_4", "6", "ODI_2", "1.5", "PAIN_AT_REST", "two"))
                    .andExpect(model().attributeHasFieldErrorCode("form", "values[TRUNK_FLEXOR_HOLD]", "screening.value.negative"))
                    .andExpect(model().attributeHasFieldErrorCode("form", "values[SHOULDER_FLEXION_LEVER_ARM_LEFT]",
                            "screening.value.notPositive"))
                    .andExpect(model().attributeHasFieldErrorCode("form", "values[QUICKDASH_4]", "screening.value.scale"))
                    .andExpect(model().attributeHasFieldErrorCode("form", "values[ODI_2]", "screening.value.notWhole"))
                    .andExpect(model().attributeHasFieldErrorCode("form", "values[PAIN_AT_REST]", "screening.value.notNumber"))
                    .andExpect(model().attributeErrorCount("form", 6));
            assertThat(storedMeasurements()).isEqualTo(before);
        }
    }

    @Test
    void aDraftWithGapsIsSavedAndNotTestedStaysDistinctFromZero() throws Exception {
        mvc.perform(form("/screenings/{id}", "save", "PAIN_AT_REST", "0", "PAIN_WORST_24H", ""))
                .andExpect(status().is3xxRedirection());
        Measurements stored = screenings.page(clinician, screening).shown().measurements();
        assertThat(stored.get(Measurement.PAIN_AT_REST)).isZero();
        assertThat(stored.get(Measurement.PAIN_WORST_24H)).isNull();
        mvc.perform(get("/screenings/{id}", screening).with(data.as(clinician)))
                .andExpect(status().isOk()).andExpect(view().name("screening/form"))
                .andExpect(content().string(Matchers.containsString("name=\"values[PAIN_AT_REST]\" value=\"0\"")))
                .andExpect(content().string(Matchers.containsString("name=\"values[PAIN_WORST_24H]\" value=\"\"")));
    }

    @Test
    void thePreviewAnswersWithTheFindingsPanelAndSavesNothing() throws Exception {
        String before = storedMeasurements();
        mvc.perform(form("/screenings/{id}/preview", null))
                .andExpect(status().isOk())
                .andExpect(jsonPath("$.bands[0].region").value("SHOULDER"))
                .andExpect(jsonPath("$.bands[0].band").value("BAND_1"))
                .andExpect(jsonPath("$.findings[?(@.rule == 'shoulder.gird-ge-20')].line")
                        .value(Matchers.hasItem("25 ° (≥ 20 °): caps the shoulder band at Band 2.")))
                .andExpect(jsonPath("$.findings[?(@.rule == 'shoulder.gird-ge-20')].evidence").value(Matchers.hasItem("Verified")))
                .andExpect(jsonPath("$.derived[?(@.key == 'QUICKDASH_SCORE')].value").value(Matchers.hasItem("40.91 points")))
                .andExpect(jsonPath("$.fieldErrors").isEmpty());
        mvc.perform(form("/screenings/{id}/preview", null, "SHOULDER_FLEXION_ACTIVE_LEFT", "250"))
                .andExpect(jsonPath("$.fieldErrors.SHOULDER_FLEXION_ACTIVE_LEFT").value("Must be at most 200."));
        assertThat(storedMeasurements()).isEqualTo(before);
    }

    @Test
    void calculateShowsResultsWithoutJavaScriptAndSavesNothing() throws Exception {
        String before = storedMeasurements();
        mvc.perform(form("/screenings/{id}", "calculate"))
                .andExpect(status().isOk()).andExpect(view().name("screening/form"))
                .andExpect(content().string(Matchers.containsString("caps the shoulder band at Band 1.")))
                .andExpect(content().string(Matchers.containsString("40.91")));
        assertThat(storedMeasurements()).isEqualTo(before);
    }

    @Test
    void anOverrideWithoutAReasonIsNotSignedButTheValuesAreKept() throws Exception {
        mvc.perform(form("/screenings/{id}", "sign").param("shoulderBand", "BAND_3"))
                .andExpect(status().isOk())
                .andExpect(model().attributeHasFieldErrorCode("form", "shoulderOverrideReason",
                        "screening.decision.reasonRequired"));
        assertThat(jdbc.queryForObject("select status from screening_version where screening_id = ?", String.class,
                screening)).isEqualTo("DRAFT");
        assertThat(screenings.page(clinician, screening).shown().measurements()).isEqualTo(FullScreening.measurements());

        mvc.perform(form("/screenings/{id}", "sign").param("shoulderBand", "BAND_3")
                        .param("shoulderOverrideReason", "Strength tested twice, stable"))
                .andExpect(status().is3xxRedirection());
        mvc.perform(get("/screenings/{id}", screening).with(data.as(clinician)))
                .andExpect(view().name("screening/view"))
                .andExpect(content().string(Matchers.containsString("Strength tested twice, stable")))
                .andExpect(content().string(Matchers.containsString("verifies")));

        // The same form sent again (a second click, another tab) changes nothing and says why.
        String signed = jdbc.queryForObject("select v::text from screening_version v where screening_id = ?",
                String.class, screening);
        mvc.perform(post("/screenings/{id}", screening).with(csrf()).with(data.as(clinician))
                        .param("lockVersion", "0").param("action", "save").param("values[PAIN_AT_REST]", "9"))
                .andExpect(status().is3xxRedirection())
                .andExpect(org.springframework.test.web.servlet.result.MockMvcResultMatchers.flash()
                        .attribute("flash", "screening.error.signed"));
        assertThat(jdbc.queryForObject("select v::text from screening_version v where screening_id = ?", String.class,
                screening)).isEqualTo(signed);
    }

    @Test
    void aStaleDraftGetsTheConflictPageAndChangesNothing() throws Exception {
        mvc.perform(form("/screenings/{id}", "save")).andExpect(status().is3xxRedirection());
        String saved = storedMeasurements();
        MockHttpServletRequestBuilder stale = form("/screenings/{id}", "save", "PAIN_AT_REST", "9", "lockVersion", "0");
        mvc.perform(stale).andExpect(status().isConflict()).andExpect(view().name("error/409"));
        assertThat(storedMeasurements()).isEqualTo(saved);
    }

    @Test
    void trainersNeverSeeScreeningsAndAdminsCannotStartThem() throws Exception {
        CurrentStaff trainer = clinic.trainer();
        mvc.perform(get("/screenings/{id}", screening).with(data.as(trainer))).andExpect(status().isForbidden());
        mvc.perform(post("/screenings/{id}/preview", screening).with(csrf()).with(data.as(trainer)))
                .andExpect(status().isForbidden());
        mvc.perform(post("/episodes/{id}/screenings", episode).with(csrf()).with(data.as(trainer)))
                .andExpect(status().isForbidden());
        mvc.perform(post("/episodes/{id}/screenings", episode).with(csrf()).with(data.as(clinic.admin())))
                .andExpect(status().isForbidden());
    }

    @Test
    void aManagerReadsTheScreeningButCannotChangeIt() throws Exception {
        mvc.perform(get("/screenings/{id}", screening).with(data.as(clinic.manager())))
                .andExpect(status().isOk()).andExpect(view().name("screening/view"));
        mvc.perform(form("/screenings/{id}", "save").with(data.as(clinic.manager()))).andExpect(status().isForbidden());
    }

    @Test
    void anotherClinicsScreeningIsA404AndAudited() throws Exception {
        CurrentStaff stranger = data.clinic().clinician();
        mvc.perform(get("/screenings/{id}", screening).with(data.as(stranger)))
                .andExpect(status().isNotFound()).andExpect(view().name("error/404"));
        mvc.perform(form("/screenings/{id}/preview", null).with(data.as(stranger))).andExpect(status().isNotFound());
        mvc.perform(post("/episodes/{id}/screenings", episode).with(csrf()).with(data.as(stranger)))
                .andExpect(status().isNotFound());
        assertThat(jdbc.queryForObject("select count(*) from audit_event where clinic_id = ? and outcome = 'DENIED'",
                Integer.class, stranger.clinicId())).isEqualTo(3);
    }

    @Test
    void thePatientPageAndTheHomePageShowTheScreenings() throws Exception {
        mvc.perform(get("/patients/{id}", patient).with(data.as(clinician)))
                .andExpect(status().isOk())
                .andExpect(content().string(Matchers.containsString("Continue the draft")));
        mvc.perform(get("/").with(data.as(clinician)))
                .andExpect(content().string(Matchers.containsString("Draft screenings")))
                .andExpect(content().string(Matchers.containsString("/screenings/" + screening)));
    }
}
