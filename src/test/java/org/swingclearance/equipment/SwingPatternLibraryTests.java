package org.swingclearance.equipment;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.content;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.model;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.util.List;
import java.util.UUID;
import org.hamcrest.Matchers;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.jdbc.core.JdbcTemplate;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.request.MockHttpServletRequestBuilder;
import org.swingclearance.support.IntegrationTest;
import org.swingclearance.support.PostgresTestBase;
import org.swingclearance.support.TestData;
import org.swingclearance.support.TestData.TestClinic;

/** The swing pattern library: built-ins shared and fixed, a clinic's own patterns added, isolated and retired. */
@IntegrationTest
class SwingPatternLibraryTests extends PostgresTestBase {

    @Autowired
    MockMvc mvc;
    @Autowired
    TestData data;
    @Autowired
    JdbcTemplate jdbc;
    @Autowired
    SwingPatterns patterns;

    TestClinic clinic;

    @BeforeEach
    void setUp() {
        clinic = data.clinic();
    }

    /** A valid pattern form; pairs of name and value replace single fields. */
    private MockHttpServletRequestBuilder addPattern(String name, String... overrides) {
        java.util.Map<String, String> fields = new java.util.LinkedHashMap<>();
        fields.put("name", name);
        fields.put("centreDeg", "20");
        fields.put("halfArcDeg", "40");
        fields.put("hands", "2");
        fields.put("reach", "1");
        fields.put("kind", "RHYTHMIC");
        for (int i = 0; i < overrides.length; i += 2) {
            fields.put(overrides[i], overrides[i + 1]);
        }
        MockHttpServletRequestBuilder request = post("/patterns").with(csrf()).with(data.as(clinic.clinician()));
        fields.forEach(request::param);
        return request;
    }

    @Test
    void everyClinicSeesTheBuiltInLibraryByPlainName() throws Exception {
        List<SwingPatternView> all = patterns.all(clinic.clinician());
        assertThat(all).filteredOn(SwingPatternView::builtIn).hasSize(6);
        assertThat(all).extracting(SwingPatternView::name)
                .contains("Two-hand front pendulum, hip-driven", "One-hand front arc to shoulder height, controlled",
                        "One-hand overhead arc behind the head, controlled", "Two-hand side-to-side arc");
        SwingPatternView hip = all.stream().filter(SwingPatternView::hipDriven).findFirst().orElseThrow();
        assertThat(hip.minimumLumbopelvicBand()).isEqualTo("BAND_2");
        assertThat(hip.hands()).isEqualTo(2);
        mvc.perform(get("/patterns").with(data.as(clinic.manager())))
                .andExpect(status().isOk()).andExpect(content().string(Matchers.containsString("from -30° to 90°")));
    }

    @Test
    void aClinicAddsItsOwnPatternWhichOtherClinicsDoNotSee() throws Exception {
        mvc.perform(addPattern("Two-hand low arc, slow")).andExpect(status().is3xxRedirection());
        assertThat(patterns.all(clinic.clinician())).extracting(SwingPatternView::name).contains("Two-hand low arc, slow");
        TestClinic other = data.clinic();
        assertThat(patterns.all(other.clinician())).extracting(SwingPatternView::name)
                .doesNotContain("Two-hand low arc, slow");
        assertThat(jdbc.queryForObject("select count(*) from audit_event where clinic_id = ? and action = 'PATTERN_CREATE'",
                Integer.class, clinic.id())).isEqualTo(1);
    }

    @Test
    void badPatternsAreRefusedWithAFieldMessage() throws Exception {
        mvc.perform(addPattern("Hip swing", "hipDriven", "true"))
                .andExpect(status().isOk())
                .andExpect(model().attributeHasFieldErrorCode("form", "bandGivenForHipDriven", "AssertTrue"))
                .andExpect(content().string(Matchers.containsString("must name the lumbopelvic band")));
        mvc.perform(addPattern("Too wide", "halfArcDeg", "200", "reach", "0.1"))
                .andExpect(model().attributeHasFieldErrorCode("form", "halfArcDeg", "DecimalMax"))
                .andExpect(model().attributeHasFieldErrorCode("form", "reach", "DecimalMin"));
        assertThat(jdbc.queryForObject("select count(*) from swing_pattern where clinic_id = ?", Integer.class,
                clinic.id())).isZero();
    }

    @Test
    void retiringHidesTheClinicsPatternButTheBuiltInsCannotBeRetired() throws Exception {
        mvc.perform(addPattern("One-hand short arc")).andExpect(status().is3xxRedirection());
        UUID own = patterns.all(clinic.clinician()).stream().filter(p -> !p.builtIn()).findFirst().orElseThrow().id();
        mvc.perform(post("/patterns/{id}/retire", own).with(csrf()).with(data.as(clinic.clinician())).param("version", "0"))
                .andExpect(status().is3xxRedirection());
        assertThat(patterns.all(clinic.clinician())).extracting(SwingPatternView::id).doesNotContain(own);
        assertThat(patterns.find(clinic.clinician(), own)).isPresent();

        UUID builtIn = patterns.all(clinic.clinician()).get(0).id();
        mvc.perform(post("/patterns/{id}/retire", builtIn).with(csrf()).with(data.as(clinic.clinician()))
                .param("version", "0")).andExpect(status().isNotFound());
        // The database keeps the built-in library fixed whatever the code does.
        assertThatThrownBy(() -> jdbc.update("update swing_pattern set half_arc_deg = 90 where id = ?", builtIn))
                .hasMessageContaining("built-in swing patterns cannot be changed");
    }
}
