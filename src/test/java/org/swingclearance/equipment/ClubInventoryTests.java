package org.swingclearance.equipment;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.content;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.model;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.view;

import java.util.LinkedHashMap;
import java.util.Map;
import java.util.UUID;
import org.hamcrest.Matchers;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.jdbc.core.JdbcTemplate;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.MvcResult;
import org.springframework.test.web.servlet.request.MockHttpServletRequestBuilder;
import org.swingclearance.engine.mechanics.Gravity;
import org.swingclearance.engine.mechanics.PendulumTiming;
import org.swingclearance.identity.CurrentStaff;
import org.swingclearance.support.IntegrationTest;
import org.swingclearance.support.PostgresTestBase;
import org.swingclearance.support.TestData;
import org.swingclearance.support.TestData.TestClinic;

/**
 * The club inventory through the web on real PostgreSQL: units, the pendulum measurement and its plausibility,
 * validation that names the measurement to repeat and saves nothing, retire instead of delete, optimistic locking,
 * tenant isolation and the trainer's read-only access.
 */
@IntegrationTest
class ClubInventoryTests extends PostgresTestBase {

    @Autowired
    MockMvc mvc;
    @Autowired
    TestData data;
    @Autowired
    JdbcTemplate jdbc;
    @Autowired
    Clubs clubs;

    TestClinic clinic;

    @BeforeEach
    void setUp() {
        clinic = data.clinic();
    }

    /**
     * The biomechanics.md CASE-M80 club (6 kg, 60 cm, balance point 45 cm) measured by pendulum about the knob:
     * 20 full swings in 28.0 s with the pivot 45 cm from the balance point (§3.2 worked example S41).
     */
    private MockHttpServletRequestBuilder pendulumClub(String name, String... overrides) {
        return clubForm(clinic.clinician(), "/clubs", name, overrides);
    }

    /** The pendulum club form posted by {@code who} to {@code path}; pairs of name and value replace fields. */
    private MockHttpServletRequestBuilder clubForm(CurrentStaff who, String path, String name, String... overrides) {
        Map<String, String> fields = new LinkedHashMap<>();
        fields.put("name", name);
        fields.put("massUnit", "KG");
        fields.put("lengthUnit", "CM");
        fields.put("mass", "6");
        fields.put("length", "60");
        fields.put("balancePoint", "45");
        fields.put("handleLength", "22");
        fields.put("inertiaMethod", "PENDULUM");
        fields.put("pendulumPivot", "45");
        fields.put("pendulumSwings", "20");
        fields.put("pendulumSeconds", "28.0");
        fields.put("version", "0");
        for (int i = 0; i < overrides.length; i += 2) {
            fields.put(overrides[i], overrides[i + 1]);
        }
        MockHttpServletRequestBuilder request = post(path).with(csrf()).with(data.as(who));
        fields.forEach(request::param);
        return request;
    }

    private int clubsOfClinic(UUID clinicId) {
        return jdbc.queryForObject("select count(*) from club where clinic_id = ?", Integer.class, clinicId);
    }

    private UUID createdId(MvcResult result) {
        String location = result.getResponse().getRedirectedUrl();
        return UUID.fromString(location.substring(location.lastIndexOf('/') + 1));
    }

    @Test
    void aPendulumMeasuredClubIsStoredInSiWithTheEnginesInertia() throws Exception {
        UUID id = createdId(mvc.perform(pendulumClub("Club 6 kg"))
                .andExpect(status().is3xxRedirection()).andReturn());
        ClubView club = clubs.find(clinic.clinician(), id).orElseThrow();
        assertThat(club.massKg()).isEqualTo(6.0);
        assertThat(club.lengthM()).isEqualTo(0.6);
        assertThat(club.balancePointM()).isEqualTo(0.45);
        assertThat(club.handleLengthM()).isEqualTo(0.22);
        assertThat(club.inertiaSource()).isEqualTo("MEASURED");
        // Physical pendulum (biomechanics.md §3.2; ASTM F2398): I_cm = m·d·(g·T²/(4π²) − d) with T = 28.0/20 s.
        double period = 28.0 / 20;
        double expected = 6 * 0.45 * (Gravity.STANDARD * period * period / (4 * Math.PI * Math.PI) - 0.45);
        assertThat(club.inertiaAboutBalancePointKgM2()).isCloseTo(expected, within(1e-12));
        assertThat(club.inertiaAboutBalancePointKgM2()).isEqualTo(
                new PendulumTiming(0.45, 20, 28.0).inertiaAboutBalancePointKgM2(6, Gravity.STANDARD));
        // The same relation at g = 9.81 gives the published worked value 0.100010 kg·m² (biomechanics.md S41).
        assertThat(new PendulumTiming(0.45, 20, 28.0).inertiaAboutBalancePointKgM2(6, 9.81))
                .isCloseTo(0.100010, within(5e-7));
        assertThat(jdbc.queryForObject("select count(*) from audit_event where clinic_id = ? and action = 'CLUB_CREATE'"
                + " and object_id = ?", Integer.class, clinic.id(), id.toString())).isEqualTo(1);
        mvc.perform(get("/clubs/{id}", id).with(data.as(clinic.clinician())))
                .andExpect(status().isOk()).andExpect(content().string(Matchers.containsString("20 full swings in 28.00 s")));
    }

    @Test
    void poundsAndInchesAreConvertedExactly() throws Exception {
        UUID id = createdId(mvc.perform(pendulumClub("Club 10 lb", "massUnit", "LB", "lengthUnit", "IN",
                        "mass", "10", "length", "24", "balancePoint", "17.5", "handleLength", "8", "pendulumPivot", "17.5",
                        "pendulumSwings", "20", "pendulumSeconds", "28"))
                .andExpect(status().is3xxRedirection()).andReturn());
        ClubView club = clubs.find(clinic.clinician(), id).orElseThrow();
        // 1 lb = 0.45359237 kg, 1 in = 2.54 cm, exact by definition.
        assertThat(club.massKg()).isEqualTo(4.5359237);
        assertThat(club.lengthM()).isEqualTo(0.6096);
        assertThat(club.balancePointM()).isEqualTo(0.4445);
        assertThat(club.handleLengthM()).isEqualTo(0.2032);
    }

    @Test
    void computeShowsTheInertiaAndItsPlausibilityWithoutSaving() throws Exception {
        mvc.perform(pendulumClub("Club preview").param("compute", "1"))
                .andExpect(status().isOk()).andExpect(view().name("equipment/club-form"))
                .andExpect(model().attributeExists("estimate"))
                .andExpect(content().string(Matchers.containsString("Plausible")));
        assertThat(clubsOfClinic(clinic.id())).isZero();
    }

    @Test
    void theHeadModelAndTheBoundNeedNoPendulum() throws Exception {
        UUID modelled = createdId(mvc.perform(pendulumClub("Club model", "inertiaMethod", "HEAD_MODEL",
                "headCentre", "50", "pendulumPivot", "", "pendulumSwings", "", "pendulumSeconds", ""))
                .andExpect(status().is3xxRedirection()).andReturn());
        // Rod plus head at 50 cm for the CASE-M80 club: I_cm = 0.090 kg·m² (biomechanics.md S12).
        assertThat(clubs.find(clinic.clinician(), modelled).orElseThrow().inertiaAboutBalancePointKgM2())
                .isCloseTo(0.090, within(1e-12));
        UUID bound = createdId(mvc.perform(pendulumClub("Club bound", "inertiaMethod", "BOUND",
                "pendulumPivot", "", "pendulumSwings", "", "pendulumSeconds", ""))
                .andExpect(status().is3xxRedirection()).andReturn());
        // Safe bound m·x_cm·(L − x_cm) = 6 × 0.45 × 0.15 (engine.md §2).
        ClubView b = clubs.find(clinic.clinician(), bound).orElseThrow();
        assertThat(b.inertiaAboutBalancePointKgM2()).isCloseTo(0.405, within(1e-12));
        assertThat(b.inertiaSource()).isEqualTo("BOUND");
    }

    @Nested
    class BadInput {

        @Test
        void aBalancePointBeyondTheLengthIsRefusedAndNamesTheMeasurement() throws Exception {
            mvc.perform(pendulumClub("Club bad", "balancePoint", "61"))
                    .andExpect(status().isOk()).andExpect(view().name("equipment/club-form"))
                    .andExpect(model().attributeHasFieldErrorCode("form", "balancePoint", "club.error.balanceBeyondLength"))
                    .andExpect(content().string(Matchers.containsString("Measure the balance point again")));
            assertThat(clubsOfClinic(clinic.id())).isZero();
        }

        @Test
        void aHandleLongerThanTheClubIsRefused() throws Exception {
            mvc.perform(pendulumClub("Club bad", "handleLength", "65"))
                    .andExpect(model().attributeHasFieldErrorCode("form", "handleLength", "club.error.handleLongerThanClub"))
                    .andExpect(content().string(Matchers.containsString("Measure the handle again")));
            assertThat(clubsOfClinic(clinic.id())).isZero();
        }

        @Test
        void pendulumTimingsGivingNoPositiveInertiaAreRefused() throws Exception {
            // T = 1.0 s about a pivot 45 cm away: g·T²/(4π²) = 0.248 m < d, so I_cm = m·d·(L_eq − d) < 0.
            mvc.perform(pendulumClub("Club bad", "pendulumSeconds", "20"))
                    .andExpect(model().attributeHasFieldErrorCode("form", "pendulumSeconds", "club.error.pendulumNonPositive"))
                    .andExpect(content().string(Matchers.containsString("Time the swings again")));
            assertThat(clubsOfClinic(clinic.id())).isZero();
        }

        @Test
        void pendulumTimingsAboveTheSafeBoundAreRefused() throws Exception {
            // T = 1.7 s: I_cm = 2.7 × (0.7178 − 0.45) ≈ 0.72 kg·m² > bound 6 × 0.45 × 0.15 = 0.405 kg·m².
            mvc.perform(pendulumClub("Club bad", "pendulumSeconds", "34"))
                    .andExpect(model().attributeHasFieldErrorCode("form", "pendulumSeconds", "club.error.pendulumAboveBound"))
                    .andExpect(content().string(Matchers.containsString("0.4050 kg·m²")));
            assertThat(clubsOfClinic(clinic.id())).isZero();
        }

        @Test
        void missingPendulumFieldsAndTextInNumbersAreRefused() throws Exception {
            mvc.perform(pendulumClub("Club bad", "pendulumSwings", "", "mass", "heavy"))
                    .andExpect(model().attributeHasFieldErrorCode("form", "pendulumSwings", "NotNull"))
                    .andExpect(model().attributeHasFieldErrorCode("form", "mass", "typeMismatch"))
                    .andExpect(content().string(Matchers.containsString("Enter a number")));
            assertThat(clubsOfClinic(clinic.id())).isZero();
        }

        @Test
        void aHeadCentreTheModelCannotUseIsRefused() throws Exception {
            mvc.perform(pendulumClub("Club bad", "inertiaMethod", "HEAD_MODEL", "headCentre", "40"))
                    .andExpect(model().attributeHasFieldErrorCode("form", "headCentre", "club.error.headModelGeometry"));
            assertThat(clubsOfClinic(clinic.id())).isZero();
        }

        @Test
        void aSecondClubInServiceWithTheSameNameIsRefused() throws Exception {
            mvc.perform(pendulumClub("Club twin")).andExpect(status().is3xxRedirection());
            mvc.perform(pendulumClub("club TWIN"))
                    .andExpect(model().attributeHasFieldErrorCode("form", "name", "club.error.nameTaken"));
            assertThat(clubsOfClinic(clinic.id())).isEqualTo(1);
        }
    }

    @Test
    void editingWithAStaleVersionIsAConflictAndChangesNothing() throws Exception {
        UUID id = createdId(mvc.perform(pendulumClub("Club edit")).andReturn());
        mvc.perform(clubForm(clinic.clinician(), "/clubs/" + id, "Club edited", "mass", "7"))
                .andExpect(status().is3xxRedirection());
        assertThat(clubs.find(clinic.clinician(), id).orElseThrow().massKg()).isEqualTo(7.0);
        // A second edit still quoting version 0 lost the race: 409, nothing saved.
        MockHttpServletRequestBuilder stale = post("/clubs/{id}", id).with(csrf()).with(data.as(clinic.manager()))
                .param("name", "Club stale").param("massUnit", "KG").param("lengthUnit", "CM").param("mass", "8")
                .param("length", "60").param("balancePoint", "45").param("handleLength", "22")
                .param("inertiaMethod", "BOUND").param("version", "0");
        mvc.perform(stale).andExpect(status().isConflict()).andExpect(view().name("error/409"));
        assertThat(clubs.find(clinic.clinician(), id).orElseThrow().name()).isEqualTo("Club edited");
    }

    @Test
    void retiringKeepsTheClubAndHidesItFromNewPlans() throws Exception {
        UUID id = createdId(mvc.perform(pendulumClub("Club old")).andReturn());
        mvc.perform(post("/clubs/{id}/retire", id).with(csrf()).with(data.as(clinic.clinician())).param("version", "0"))
                .andExpect(status().is3xxRedirection());
        CurrentStaff staff = clinic.clinician();
        assertThat(clubs.active(staff)).extracting(ClubView::id).doesNotContain(id);
        assertThat(clubs.find(staff, id)).hasValueSatisfying(c -> assertThat(c.retired()).isTrue());
        assertThat(clubsOfClinic(clinic.id())).isEqualTo(1);
        // The database itself refuses to delete a club: history is never lost.
        assertThatThrownBy(() -> jdbc.update("delete from club where id = ?", id))
                .hasMessageContaining("DELETE refused");
        // A retired club's name is free for a new club.
        mvc.perform(pendulumClub("Club old")).andExpect(status().is3xxRedirection());
        assertThat(jdbc.queryForObject("select count(*) from audit_event where clinic_id = ? and action = 'CLUB_RETIRE'",
                Integer.class, clinic.id())).isEqualTo(1);
    }

    @Test
    void anotherClinicsClubIsA404ForEveryPageAndAudited() throws Exception {
        TestClinic other = data.clinic();
        UUID foreign = clubs.create(other.clinician(), new ClubDetails("Club other", 4, 0.6, 0.45, 0.2, null,
                InertiaMethod.BOUND, null));
        mvc.perform(get("/clubs/{id}", foreign).with(data.as(clinic.clinician()))).andExpect(status().isNotFound());
        mvc.perform(get("/clubs/{id}/edit", foreign).with(data.as(clinic.manager()))).andExpect(status().isNotFound());
        mvc.perform(get("/clubs/{id}", foreign).with(data.as(clinic.trainer()))).andExpect(status().isNotFound());
        mvc.perform(post("/clubs/{id}/retire", foreign).with(csrf()).with(data.as(clinic.admin())).param("version", "0"))
                .andExpect(status().isNotFound());
        mvc.perform(post("/clubs/{id}", foreign).with(csrf()).with(data.as(clinic.clinician()))
                        .param("name", "Taken over").param("massUnit", "KG").param("lengthUnit", "CM").param("mass", "8")
                        .param("length", "60").param("balancePoint", "45").param("handleLength", "22")
                        .param("inertiaMethod", "BOUND").param("version", "0"))
                .andExpect(status().isNotFound());
        assertThat(clubs.find(other.clinician(), foreign).orElseThrow().name()).isEqualTo("Club other");
        assertThat(clubs.find(clinic.clinician(), foreign)).isEmpty();
        assertThat(jdbc.queryForObject("select count(*) from audit_event where clinic_id = ? and outcome = 'DENIED'"
                + " and object_id = ?", Integer.class, clinic.id(), foreign.toString())).isEqualTo(5);
    }

    @Test
    void aTrainerReadsTheClubPageButNoInventoryPage() throws Exception {
        UUID id = createdId(mvc.perform(pendulumClub("Club for plans")).andReturn());
        CurrentStaff trainer = clinic.trainer();
        mvc.perform(get("/clubs/{id}", id).with(data.as(trainer)))
                .andExpect(status().isOk()).andExpect(content().string(Matchers.containsString("Club for plans")))
                .andExpect(content().string(Matchers.not(Matchers.containsString("/retire"))));
        mvc.perform(get("/clubs").with(data.as(trainer))).andExpect(status().isForbidden());
        mvc.perform(get("/clubs/new").with(data.as(trainer))).andExpect(status().isForbidden());
        mvc.perform(get("/clubs/{id}/edit", id).with(data.as(trainer))).andExpect(status().isForbidden());
        mvc.perform(clubForm(trainer, "/clubs", "Club by trainer")).andExpect(status().isForbidden());
        mvc.perform(post("/clubs/{id}/retire", id).with(csrf()).with(data.as(trainer)).param("version", "0"))
                .andExpect(status().isForbidden());
        mvc.perform(get("/patterns").with(data.as(trainer))).andExpect(status().isForbidden());
        assertThat(clubsOfClinic(clinic.id())).isEqualTo(1);
    }

    @Test
    void managersAndAdministratorsKeepTheInventoryToo() throws Exception {
        mvc.perform(get("/clubs").with(data.as(clinic.manager()))).andExpect(status().isOk());
        mvc.perform(clubForm(clinic.admin(), "/clubs", "Club by admin")).andExpect(status().is3xxRedirection());
        mvc.perform(get("/clubs").with(data.as(clinic.admin())))
                .andExpect(status().isOk()).andExpect(content().string(Matchers.containsString("Club by admin")));
    }
}
