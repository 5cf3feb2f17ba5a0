package org.swingclearance.patient;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.content;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.model;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.view;

import java.util.UUID;
import org.hamcrest.Matchers;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.jdbc.core.JdbcTemplate;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.request.MockHttpServletRequestBuilder;
import org.swingclearance.support.IntegrationTest;
import org.swingclearance.support.PostgresTestBase;
import org.swingclearance.support.TestData;
import org.swingclearance.support.TestData.TestClinic;

/** Patient intake through the web: validation, escaping, tenant isolation, optimistic locking, red-flag hold. */
@IntegrationTest
class PatientWebTests extends PostgresTestBase {

    @Autowired
    MockMvc mvc;
    @Autowired
    TestData data;
    @Autowired
    JdbcTemplate jdbc;

    TestClinic clinic;

    @BeforeEach
    void setUp() {
        clinic = data.clinic();
    }

    /** A valid intake form; pairs of name and value replace single fields. */
    private MockHttpServletRequestBuilder validPatient(String code, String... overrides) {
        java.util.Map<String, String> fields = new java.util.LinkedHashMap<>();
        fields.put("code", code);
        fields.put("fullName", "Pat Example");
        fields.put("dateOfBirth", "1980-04-02");
        fields.put("sex", "FEMALE");
        fields.put("statureCm", "168");
        fields.put("bodyMassKg", "64.5");
        fields.put("dominantHand", "RIGHT");
        fields.put("version", "0");
        for (int i = 0; i < overrides.length; i += 2) {
            fields.put(overrides[i], overrides[i + 1]);
        }
        MockHttpServletRequestBuilder request = post("/patients").with(csrf()).with(data.as(clinic.clinician()));
        fields.forEach(request::param);
        return request;
    }

    private int patientsOfClinic() {
        return jdbc.queryForObject("select count(*) from patient where clinic_id = ?", Integer.class, clinic.id());
    }

    @Test
    void createsAPatientAndShowsItInTheList() throws Exception {
        mvc.perform(validPatient("P-100")).andExpect(status().is3xxRedirection());
        assertThat(patientsOfClinic()).isEqualTo(1);
        Double stature = jdbc.queryForObject("select stature_m from patient where clinic_id = ?", Double.class, clinic.id());
        assertThat(stature).isEqualTo(1.68);
        mvc.perform(get("/patients").with(data.as(clinic.clinician())))
                .andExpect(status().isOk()).andExpect(content().string(Matchers.containsString("P-100")));
    }

    @Nested
    class BadInput {

        @Test
        void statureOutsideHalfToTwoAndAHalfMetresIsRefused() throws Exception {
            mvc.perform(validPatient("P-101", "statureCm", "251"))
                    .andExpect(status().isOk()).andExpect(view().name("patients/form"))
                    .andExpect(model().attributeHasFieldErrorCode("form", "statureCm", "DecimalMax"));
            mvc.perform(validPatient("P-101", "statureCm", "49"))
                    .andExpect(model().attributeHasFieldErrorCode("form", "statureCm", "DecimalMin"));
            assertThat(patientsOfClinic()).isZero();
        }

        @Test
        void massOutsideTenToThreeHundredKilogramsIsRefused() throws Exception {
            mvc.perform(validPatient("P-102", "bodyMassKg", "301"))
                    .andExpect(model().attributeHasFieldErrorCode("form", "bodyMassKg", "DecimalMax"));
            mvc.perform(validPatient("P-102", "bodyMassKg", "9.9"))
                    .andExpect(model().attributeHasFieldErrorCode("form", "bodyMassKg", "DecimalMin"));
            assertThat(patientsOfClinic()).isZero();
        }

        @Test
        void birthDateInTheFutureAndTextInNumberFieldsAreRefused() throws Exception {
            mvc.perform(validPatient("P-103", "dateOfBirth", "2999-01-01", "statureCm", "tall"))
                    .andExpect(model().attributeHasFieldErrorCode("form", "dateOfBirth", "Past"))
                    .andExpect(model().attributeHasFieldErrorCode("form", "statureCm", "typeMismatch"))
                    .andExpect(content().string(Matchers.containsString("Enter a number")));
            assertThat(patientsOfClinic()).isZero();
        }

        @Test
        void aDuplicateCodeIsRefusedWithAMessage() throws Exception {
            mvc.perform(validPatient("P-104")).andExpect(status().is3xxRedirection());
            mvc.perform(validPatient("p-104"))
                    .andExpect(model().attributeHasFieldErrorCode("form", "code", "patient.error.codeTaken"));
            assertThat(patientsOfClinic()).isEqualTo(1);
        }

        @Test
        void htmlInATextFieldIsShownAsText() throws Exception {
            mvc.perform(validPatient("P-105", "fullName", "<script>alert(1)</script>"))
                    .andExpect(status().is3xxRedirection());
            mvc.perform(get("/patients").param("q", "P-105").with(data.as(clinic.clinician())))
                    .andExpect(content().string(Matchers.containsString("&lt;script&gt;alert(1)&lt;/script&gt;")))
                    .andExpect(content().string(Matchers.not(Matchers.containsString("<script>alert(1)"))));
        }

        @Test
        void aShoulderEpisodeNeedsItsSide() throws Exception {
            UUID patient = data.patient(clinic);
            mvc.perform(post("/patients/{id}/episodes", patient).with(csrf()).with(data.as(clinic.clinician()))
                            .param("region", "SHOULDER").param("injuryDate", "2026-01-10").param("goal", "Swing again"))
                    .andExpect(model().attributeHasFieldErrorCode("form", "sideGivenForShoulder", "AssertTrue"));
            assertThat(jdbc.queryForObject("select count(*) from episode where patient_id = ?", Integer.class, patient))
                    .isZero();
        }
    }

    @Test
    void anotherClinicsPatientIsA404AndTheAttemptIsAudited() throws Exception {
        TestClinic other = data.clinic();
        UUID foreign = data.patient(other);
        mvc.perform(get("/patients/{id}", foreign).with(data.as(clinic.clinician())))
                .andExpect(status().isNotFound()).andExpect(view().name("error/404"))
                .andExpect(content().string(Matchers.containsString("This record does not exist")));
        mvc.perform(get("/patients/not-a-record-id").with(data.as(clinic.clinician())))
                .andExpect(status().isNotFound());
        mvc.perform(post("/patients/{id}", foreign).with(csrf()).with(data.as(clinic.clinician()))
                        .param("code", "X").param("dateOfBirth", "1980-01-01").param("sex", "MALE")
                        .param("statureCm", "170").param("bodyMassKg", "70").param("dominantHand", "LEFT")
                        .param("version", "0"))
                .andExpect(status().isNotFound());
        Integer denied = jdbc.queryForObject("select count(*) from audit_event where clinic_id = ? and outcome = 'DENIED'"
                + " and object_id = ?", Integer.class, clinic.id(), foreign.toString());
        assertThat(denied).isEqualTo(2);
    }

    @Test
    void aStaleEditGetsTheConflictPageAndChangesNothing() throws Exception {
        UUID patient = data.patient(clinic);
        MockHttpServletRequestBuilder firstSave = post("/patients/{id}", patient).with(csrf()).with(data.as(clinic.clinician()))
                .param("code", "FIRST").param("dateOfBirth", "1985-05-20").param("sex", "MALE").param("statureCm", "178")
                .param("bodyMassKg", "80").param("dominantHand", "RIGHT").param("version", "0");
        mvc.perform(firstSave).andExpect(status().is3xxRedirection());
        mvc.perform(post("/patients/{id}", patient).with(csrf()).with(data.as(clinic.clinician()))
                        .param("code", "SECOND").param("dateOfBirth", "1985-05-20").param("sex", "MALE")
                        .param("statureCm", "178").param("bodyMassKg", "81").param("dominantHand", "RIGHT")
                        .param("version", "0"))
                .andExpect(status().isConflict()).andExpect(view().name("error/409"))
                .andExpect(content().string(Matchers.containsString("Nothing of yours was saved")));
        assertThat(jdbc.queryForObject("select code from patient where id = ?", String.class, patient)).isEqualTo("FIRST");
    }

    @Test
    void aRedFlagAtIntakePutsTheEpisodeOnHoldUntilTheReferralIsRecorded() throws Exception {
        UUID patient = data.patient(clinic);
        mvc.perform(post("/patients/{id}/episodes", patient).with(csrf()).with(data.as(clinic.clinician()))
                        .param("region", "LUMBOPELVIC").param("injuryDate", "2026-01-10").param("goal", "Swing again")
                        .param("redFlags", "LUMBAR_CAUDA_EQUINA"))
                .andExpect(status().is3xxRedirection());
        mvc.perform(get("/patients/{id}", patient).with(data.as(clinic.clinician())))
                .andExpect(content().string(Matchers.containsString("No plan is made while a red flag is open")));
        UUID episode = jdbc.queryForObject("select id from episode where patient_id = ?", UUID.class, patient);
        mvc.perform(post("/patients/{id}/episodes/{e}/referral", patient, episode).with(csrf())
                        .with(data.as(clinic.clinician())).param("referredTo", "Emergency department"))
                .andExpect(status().is3xxRedirection());
        mvc.perform(get("/patients/{id}", patient).with(data.as(clinic.clinician())))
                .andExpect(content().string(Matchers.not(Matchers.containsString("No plan is made while a red flag is open"))))
                .andExpect(content().string(Matchers.containsString("Emergency department")));
    }

    @Test
    void readsAndChangesOfPatientDataAreAudited() throws Exception {
        UUID patient = data.patient(clinic);
        mvc.perform(get("/patients/{id}", patient).with(data.as(clinic.clinician()))).andExpect(status().isOk());
        assertThat(jdbc.queryForList("select action from audit_event where patient_id = ? order by seq", String.class, patient))
                .containsSubsequence("PATIENT_CREATE", "PATIENT_READ");
    }
}
