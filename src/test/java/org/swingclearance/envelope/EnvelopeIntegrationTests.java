package org.swingclearance.envelope;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.content;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.util.EnumSet;
import java.util.List;
import java.util.UUID;
import org.hamcrest.Matchers;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.jdbc.core.JdbcTemplate;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.MvcResult;
import org.swingclearance.engine.envelope.Envelope;
import org.swingclearance.engine.envelope.EnvelopeCalculator;
import org.swingclearance.engine.mechanics.Assessment;
import org.swingclearance.engine.mechanics.Assessor;
import org.swingclearance.engine.mechanics.Body;
import org.swingclearance.engine.mechanics.Capacity;
import org.swingclearance.engine.mechanics.Club;
import org.swingclearance.engine.mechanics.ClubInertia;
import org.swingclearance.engine.mechanics.Configuration;
import org.swingclearance.engine.mechanics.EngineVersion;
import org.swingclearance.engine.mechanics.Gravity;
import org.swingclearance.engine.mechanics.InertiaSource;
import org.swingclearance.engine.rules.LoadBand;
import org.swingclearance.engine.mechanics.LoadRules;
import org.swingclearance.engine.mechanics.SwingKind;
import org.swingclearance.engine.mechanics.SwingPattern;
import org.swingclearance.equipment.ClubDetails;
import org.swingclearance.equipment.ClubView;
import org.swingclearance.equipment.Clubs;
import org.swingclearance.equipment.InertiaMethod;
import org.swingclearance.equipment.PendulumReading;
import org.swingclearance.equipment.SwingPatternView;
import org.swingclearance.equipment.SwingPatterns;
import org.swingclearance.identity.CurrentStaff;
import org.swingclearance.patient.Patients;
import org.swingclearance.patient.RedFlag;
import org.swingclearance.patient.RedFlagContext;
import org.swingclearance.screening.Screenings;
import org.swingclearance.screening.SignedScreeningFacts;
import org.swingclearance.support.IntegrationTest;
import org.swingclearance.support.PostgresTestBase;
import org.swingclearance.support.TestData;
import org.swingclearance.support.TestData.TestClinic;
import tools.jackson.databind.json.JsonMapper;

/**
 * The envelope page on real PostgreSQL for a demo-like patient (CASE-M80 body, the clinical.md worked screening):
 * what is missing before a signed screening, every row and the what-if equal to the engine's own results for the
 * same inputs, the snapshot stored once and reused, red flags holding everything, tenant isolation, the export.
 */
@IntegrationTest
class EnvelopeIntegrationTests extends PostgresTestBase {

    @Autowired
    MockMvc mvc;
    @Autowired
    TestData data;
    @Autowired
    JdbcTemplate jdbc;
    @Autowired
    Screenings screenings;
    @Autowired
    Clubs clubs;
    @Autowired
    SwingPatterns patterns;
    @Autowired
    Envelopes envelopes;
    @Autowired
    Patients patients;
    @Autowired
    JsonMapper json;

    TestClinic clinic;
    CurrentStaff clinician;
    UUID patient;
    UUID episode;

    @BeforeEach
    void setUp() {
        clinic = data.clinic();
        clinician = clinic.clinician();
        patient = data.patient(clinic);
        episode = data.shoulderEpisode(clinic, patient);
    }

    /** Three invented clubs: modelled, pendulum-measured (biomechanics.md S41 timing) and at the safe bound. */
    private void addClubs() {
        clubs.create(clinician, new ClubDetails("Club 2 kg", 2, 0.50, 0.36, 0.18, 0.44, InertiaMethod.HEAD_MODEL, null));
        clubs.create(clinician, new ClubDetails("Club 6 kg", 6, 0.60, 0.45, 0.22, null, InertiaMethod.PENDULUM,
                new PendulumReading(0.45, 20, 28.0)));
        clubs.create(clinician, new ClubDetails("Club 10 kg", 10, 0.65, 0.50, 0.24, null, InertiaMethod.BOUND, null));
    }

    private EnvelopePage pageOf(MvcResult result) {
        return (EnvelopePage) result.getModelAndView().getModel().get("page");
    }

    private int snapshots() {
        return jdbc.queryForObject("select count(*) from envelope_snapshot where clinic_id = ? and episode_id = ?",
                Integer.class, clinic.id(), episode);
    }

    private int audited(String action) {
        return jdbc.queryForObject("select count(*) from audit_event where clinic_id = ? and action = ?",
                Integer.class, clinic.id(), action);
    }

    @Test
    void withoutASignedScreeningThePageSaysWhatIsMissing() throws Exception {
        addClubs();
        EnvelopePage page = pageOf(mvc.perform(get("/episodes/{id}/envelope", episode).with(data.as(clinician)))
                .andExpect(status().isOk())
                .andExpect(content().string(Matchers.containsString("There is no signed screening")))
                .andExpect(content().string(Matchers.containsString("mechanical estimates from population tables")))
                .andReturn());
        assertThat(page.blocks()).containsExactly(EnvelopeBlock.NO_SIGNED_SCREENING);
        assertThat(snapshots()).isZero();
        assertThat(envelopes.latest(clinician, episode)).isEmpty();
        assertThat(audited("ENVELOPE_READ")).isEqualTo(1);
        // The patient page links each episode to its envelope (a PatientPanel of this feature).
        mvc.perform(get("/patients/{id}", patient).with(data.as(clinician)))
                .andExpect(content().string(Matchers.containsString("/episodes/" + episode + "/envelope")));
    }

    @Test
    void withoutClubsThePageSaysToAddThem() throws Exception {
        SignedScreeningFixture.sign(screenings, clinician, episode);
        EnvelopePage page = pageOf(mvc.perform(get("/episodes/{id}/envelope", episode).with(data.as(clinician)))
                .andExpect(status().isOk()).andReturn());
        assertThat(page.blocks()).containsExactly(EnvelopeBlock.NO_CLUBS);
    }

    @Test
    void everyRowIsTheEnginesOwnResultForTheSameInputs() throws Exception {
        addClubs();
        UUID screening = SignedScreeningFixture.sign(screenings, clinician, episode);
        EnvelopePage page = pageOf(mvc.perform(get("/episodes/{id}/envelope", episode).param("cycleTime", "1.8")
                        .with(data.as(clinician)))
                .andExpect(status().isOk())
                .andExpect(content().string(Matchers.containsString("Club 6 kg")))
                .andExpect(content().string(Matchers.containsString("mechanical estimates from population tables")))
                .andReturn());
        EnvelopeSnapshotView s = page.snapshot();
        List<SwingPatternView> all = patterns.all(clinician);
        assertThat(s.rows()).hasSize(3 * all.size());
        assertThat(s.screeningId()).isEqualTo(screening);
        assertThat(s.screeningVersion()).isEqualTo(1);
        assertThat(s.engineVersion()).isEqualTo(EngineVersion.ENGINE_VERSION);
        assertThat(s.rulesVersion()).isEqualTo(1);
        assertThat(s.cycleTimeS()).isEqualTo(1.8);

        // The engine called directly with the signed facts: right shoulder 150 N × 0.28 m = 42.0 N·m (clinical.md
        // §2.3) for one hand and the weaker side, 42.0 N·m, for two; best grip 40 kg; flexion 150°; measured
        // shoulder-to-grip 0.63 m; Band 2 at the default 0.40; default rules (controlled stop, 10° margin, hip drive
        // from Band 2); CASE-M80 body 1.78 m, 80 kg; usual grip 5 cm from the knob.
        SignedScreeningFacts facts = screenings.latestSigned(clinician, episode).orElseThrow();
        assertThat(facts.shoulderFlexionTorqueInvolvedNm()).isCloseTo(42.0, within(1e-9));
        assertThat(facts.shoulderFlexionTorqueWeakerNm()).isCloseTo(42.0, within(1e-9));
        assertThat(facts.gripStrengthInvolvedKg()).isEqualTo(40.0);
        assertThat(facts.activeFlexionInvolvedDeg()).isEqualTo(150.0);
        assertThat(facts.shoulderToGripMeasuredM()).isCloseTo(0.63, within(1e-9));
        Body body = new Body(1.78, 80, facts.shoulderToGripMeasuredM());
        Capacity capacity = new Capacity(facts.shoulderFlexionTorqueInvolvedNm(), facts.gripStrengthInvolvedKg(), null,
                LoadBand.BAND_2).withShoulderFlexionRangeDeg(facts.activeFlexionInvolvedDeg());
        for (EnvelopeRow row : s.rows()) {
            ClubView cv = clubs.find(clinician, row.clubId()).orElseThrow();
            SwingPatternView pv = all.stream().filter(p -> p.id().equals(row.patternId())).findFirst().orElseThrow();
            LoadRules rules = new LoadRules(0.40, null, true, Math.toRadians(10), LoadBand.BAND_2);
            Club club = new Club(cv.massKg(), cv.lengthM(), cv.balancePointM(), cv.handleLengthM(),
                    new ClubInertia(cv.inertiaAboutBalancePointKgM2(), InertiaSource.valueOf(cv.inertiaSource())));
            SwingPattern pattern = SwingPattern.ofDegrees(pv.centreDeg(), pv.halfArcDeg(), pv.hands(), pv.reach(),
                    SwingKind.valueOf(pv.kind()), pv.hipDriven());
            Envelope expected = EnvelopeCalculator.envelope(new Configuration(body, club,
                    Math.min(0.05, cv.handleLengthM()), pattern, 1.8, Gravity.STANDARD), capacity, rules);
            assertThat(row.status()).isEqualTo(EnvelopeRow.COMPUTED);
            assertThat(row.permitted()).as(row.clubName() + " / " + row.patternName())
                    .isEqualTo(expected.atConfiguration().permitted());
            assertThat(row.demandRatio()).isEqualTo(expected.atConfiguration().demandRatio());
            assertThat(row.binding()).isEqualTo(expected.atConfiguration().binding().name());
            assertThat(row.furthestGripCm()).isEqualTo(expected.furthestGrip().gripMarkM() == null ? null
                    : expected.furthestGrip().gripMarkM() * 100);
            assertThat(row.shortestCycleTimeS()).isEqualTo(expected.shortestCycle().cycleTimeS());
            assertThat(row.heaviestMassKg()).isEqualTo(expected.heaviestMass().massKg());
            assertThat(row.largestHalfArcDeg()).isEqualTo(expected.maxHalfArcRad() == null ? null
                    : Math.toDegrees(expected.maxHalfArcRad()));
        }
        // C4 (engine.md §5): the raise to overhead reaches 130° ≤ 150° − 10° and stays; the arc behind the head
        // reaches 160° > 140° and is excluded, its largest permitted half-arc 150 − 10 − 130 = 10°.
        EnvelopeRow behindHead = s.rows().stream().filter(r -> r.patternName().contains("behind the head"))
                .findFirst().orElseThrow();
        assertThat(behindHead.binding()).isEqualTo("RANGE_OF_MOTION");
        assertThat(behindHead.largestHalfArcDeg()).isCloseTo(10.0, within(1e-9));

        // The what-if endpoint is the engine's assessment of the same configuration.
        ClubView six = clubs.active(clinician).stream().filter(c -> c.name().equals("Club 6 kg")).findFirst()
                .orElseThrow();
        SwingPatternView arc = all.stream().filter(p -> p.name().startsWith("One-hand front arc")).findFirst()
                .orElseThrow();
        String body2 = mvc.perform(post("/episodes/{id}/envelope/what-if", episode).with(csrf()).with(data.as(clinician))
                        .param("club", six.id().toString()).param("pattern", arc.id().toString())
                        .param("gripCm", "12.5").param("cycleTimeS", "1.6"))
                .andExpect(status().isOk()).andReturn().getResponse().getContentAsString();
        WhatIf w = json.readValue(body2, WhatIf.class);
        Assessment a = Assessor.assess(new Configuration(body, new Club(6, 0.60, 0.45, 0.22,
                        new ClubInertia(six.inertiaAboutBalancePointKgM2(), InertiaSource.MEASURED)), 0.125,
                SwingPattern.ofDegrees(45, 45, 1, 1.0, SwingKind.RHYTHMIC, false), 1.6, Gravity.STANDARD), capacity,
                new LoadRules(0.40, null, true, Math.toRadians(10), LoadBand.BAND_2));
        assertThat(w.demandRatio()).isEqualTo(a.demandRatio());
        assertThat(w.binding()).isEqualTo(a.binding().name());
        assertThat(w.permitted()).isEqualTo(a.permitted());
        assertThat(w.peakShoulderTorqueNm()).isEqualTo(a.demand().peakShoulderTorqueNm());
        assertThat(w.bindingLabel()).endsWith("(" + a.binding().code() + ")");
        assertThat(audited("ENVELOPE_WHATIF")).isEqualTo(1);
    }

    @Test
    void theSnapshotIsStoredOnceAndReusedUntilAnInputChanges() throws Exception {
        addClubs();
        SignedScreeningFixture.sign(screenings, clinician, episode);
        mvc.perform(get("/episodes/{id}/envelope", episode).with(data.as(clinician))).andExpect(status().isOk());
        assertThat(snapshots()).isEqualTo(1);
        mvc.perform(get("/episodes/{id}/envelope", episode).with(data.as(clinician))).andExpect(status().isOk());
        assertThat(envelopes.latest(clinician, episode)).hasValueSatisfying(s -> assertThat(s.cycleTimeS()).isEqualTo(2.0));
        assertThat(snapshots()).isEqualTo(1);
        // Another usual cycle time is another input: a second snapshot, and the usual one from now on.
        mvc.perform(get("/episodes/{id}/envelope", episode).param("cycleTime", "2.5").with(data.as(clinician)))
                .andExpect(status().isOk());
        assertThat(snapshots()).isEqualTo(2);
        assertThat(envelopes.latest(clinician, episode)).hasValueSatisfying(s -> assertThat(s.cycleTimeS()).isEqualTo(2.5));
        assertThat(snapshots()).isEqualTo(2);
        // A new club changes the inputs.
        clubs.create(clinician, new ClubDetails("Club 4 kg", 4, 0.70, 0.53, 0.30, 0.62, InertiaMethod.HEAD_MODEL, null));
        EnvelopeSnapshotView latest = envelopes.latest(clinician, episode).orElseThrow();
        assertThat(snapshots()).isEqualTo(3);
        assertThat(latest.rows()).extracting(EnvelopeRow::clubName).contains("Club 4 kg");
        assertThat(audited("ENVELOPE_COMPUTE")).isEqualTo(3);
        // Snapshots are append-only in the database itself.
        assertThatThrownBy(() -> jdbc.update("update envelope_snapshot set cycle_time_s = 3 where id = ?", latest.id()))
                .hasMessageContaining("append-only");
        Integer stored = jdbc.queryForObject("select count(*) from envelope_snapshot where id = ? and outputs @> ?::jsonb",
                Integer.class, latest.id(), "{\"rows\": [{\"clubName\": \"Club 4 kg\"}]}");
        assertThat(stored).isEqualTo(1);
    }

    @Test
    void anOpenRedFlagHoldsEverything() throws Exception {
        addClubs();
        SignedScreeningFixture.sign(screenings, clinician, episode);
        patients.recordRedFlags(clinician, episode, RedFlagContext.RECHECK, EnumSet.of(RedFlag.SHOULDER_TRAUMA_WEAKNESS));
        EnvelopePage page = pageOf(mvc.perform(get("/episodes/{id}/envelope", episode).with(data.as(clinician)))
                .andExpect(status().isOk())
                .andExpect(content().string(Matchers.containsString("stop and refer")))
                .andReturn());
        assertThat(page.blocks()).contains(EnvelopeBlock.RED_FLAG_OPEN);
        assertThat(envelopes.latest(clinician, episode)).isEmpty();
        UUID anyClub = clubs.active(clinician).get(0).id();
        UUID anyPattern = patterns.all(clinician).get(0).id();
        mvc.perform(post("/episodes/{id}/envelope/what-if", episode).with(csrf()).with(data.as(clinician))
                        .param("club", anyClub.toString()).param("pattern", anyPattern.toString())
                        .param("gripCm", "5").param("cycleTimeS", "2"))
                .andExpect(status().isConflict());
    }

    @Test
    void anotherClinicsEpisodeOrClubIsA404AndOtherRolesAreRefused() throws Exception {
        addClubs();
        SignedScreeningFixture.sign(screenings, clinician, episode);
        TestClinic other = data.clinic();
        UUID foreignClub = clubs.create(other.clinician(), new ClubDetails("Club x", 4, 0.6, 0.45, 0.2, null,
                InertiaMethod.BOUND, null));
        mvc.perform(get("/episodes/{id}/envelope", episode).with(data.as(other.clinician())))
                .andExpect(status().isNotFound());
        mvc.perform(get("/episodes/{id}/envelope/export.csv", episode).with(data.as(other.clinician())))
                .andExpect(status().isNotFound());
        mvc.perform(post("/episodes/{id}/envelope/what-if", episode).with(csrf()).with(data.as(clinician))
                        .param("club", foreignClub.toString()).param("pattern", patterns.all(clinician).get(0).id().toString())
                        .param("gripCm", "5").param("cycleTimeS", "2"))
                .andExpect(status().isNotFound());
        mvc.perform(post("/episodes/{id}/envelope/what-if", episode).with(data.as(clinician))
                        .param("club", foreignClub.toString()).param("pattern", patterns.all(clinician).get(0).id().toString())
                        .param("gripCm", "5").param("cycleTimeS", "2"))
                .andExpect(status().isForbidden());
        for (CurrentStaff refused : List.of(clinic.trainer(), clinic.manager(), clinic.admin())) {
            mvc.perform(get("/episodes/{id}/envelope", episode).with(data.as(refused))).andExpect(status().isForbidden());
        }
        assertThat(jdbc.queryForObject("select count(*) from audit_event where clinic_id = ? and outcome = 'DENIED'"
                + " and object_id = ?", Integer.class, other.id(), episode.toString())).isEqualTo(2);
        assertThat(snapshots()).isZero();
    }

    @Test
    void theCsvExportStartsWithTheCaution() throws Exception {
        addClubs();
        SignedScreeningFixture.sign(screenings, clinician, episode);
        String csv = mvc.perform(get("/episodes/{id}/envelope/export.csv", episode).with(data.as(clinician)))
                .andExpect(status().isOk())
                .andExpect(content().contentTypeCompatibleWith("text/csv"))
                .andReturn().getResponse().getContentAsString();
        assertThat(csv.lines().findFirst().orElseThrow()).contains("Decision support only")
                .contains("mechanical estimates");
        assertThat(csv).contains("Club 6 kg").contains("One-hand front arc to shoulder height, controlled");
        assertThat(audited("ENVELOPE_EXPORT")).isEqualTo(1);
    }
}
