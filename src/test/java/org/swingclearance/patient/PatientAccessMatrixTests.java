package org.swingclearance.patient;

import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.util.List;
import java.util.UUID;
import java.util.stream.Stream;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.TestInstance;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.request.MockHttpServletRequestBuilder;
import org.swingclearance.identity.StaffRole;
import org.swingclearance.support.IntegrationTest;
import org.swingclearance.support.PostgresTestBase;
import org.swingclearance.support.TestData;
import org.swingclearance.support.TestData.TestClinic;

/**
 * Every role against every patient page, for a patient of the own clinic and of another clinic: clinicians reach
 * their own clinic's patients, other roles are refused (403), and another clinic's patient is a 404 for everyone.
 */
@IntegrationTest
@TestInstance(TestInstance.Lifecycle.PER_CLASS)
class PatientAccessMatrixTests extends PostgresTestBase {

    @Autowired
    MockMvc mvc;
    @Autowired
    TestData data;

    TestClinic own;
    UUID ownPatient;
    UUID foreignPatient;

    @BeforeAll
    void setUp() {
        own = data.clinic();
        ownPatient = data.patient(own);
        data.shoulderEpisode(own, ownPatient);
        TestClinic other = data.clinic();
        foreignPatient = data.patient(other);
    }

    /** The patient pages; {id} is the patient. POSTs carry no valid body: only access is tested. */
    static List<String> pages() {
        return List.of("GET /patients/{id}", "GET /patients/{id}/edit", "GET /patients/{id}/episodes/new",
                "POST /patients/{id}", "POST /patients/{id}/episodes", "POST /patients/{id}/consents");
    }

    Stream<Arguments> matrix() {
        return Stream.of(StaffRole.values()).flatMap(role -> pages().stream().flatMap(page -> Stream.of(
                Arguments.of(role, page, true), Arguments.of(role, page, false))));
    }

    @ParameterizedTest(name = "{0} {1} own clinic={2}")
    @MethodSource("matrix")
    void access(StaffRole role, String page, boolean ownClinic) throws Exception {
        UUID patient = ownClinic ? ownPatient : foreignPatient;
        String[] parts = page.split(" ");
        MockHttpServletRequestBuilder request = parts[0].equals("GET") ? get(parts[1], patient)
                : post(parts[1], patient).with(csrf());
        var result = mvc.perform(request.with(data.as(own.staff().get(role))));
        if (role != StaffRole.CLINICIAN) {
            result.andExpect(status().isForbidden());
        } else if (!ownClinic) {
            result.andExpect(status().isNotFound());
        } else {
            result.andExpect(status().is(org.hamcrest.Matchers.lessThan(400)));
        }
    }
}
