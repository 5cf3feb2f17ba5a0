package org.swingclearance.screening;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.EnumSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.UUID;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.dao.DataAccessException;
import org.springframework.jdbc.core.JdbcTemplate;
import org.swingclearance.engine.rules.Rule;
import org.swingclearance.identity.CurrentStaff;
import org.swingclearance.patient.RedFlag;
import org.swingclearance.rules.CurrentRuleSet;
import org.swingclearance.rules.PracticeRules;
import org.swingclearance.rules.RuleSetSettings;
import org.swingclearance.support.IntegrationTest;
import org.swingclearance.support.PostgresTestBase;
import org.swingclearance.support.TestData;
import org.swingclearance.support.TestData.TestClinic;
import org.swingclearance.web.NotFoundException;

/**
 * A screening's life on real PostgreSQL: draft, derived values and bands from the engine, refused signing, signing,
 * the database refusing changes to a signed version, amendment, and the facts other features read (Contract S).
 */
@IntegrationTest
class ScreeningLifecycleTests extends PostgresTestBase {

    @Autowired
    Screenings screenings;
    @Autowired
    TestData data;
    @Autowired
    JdbcTemplate jdbc;
    @Autowired
    PracticeRules rules;

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

    private UUID savedFullScreening() {
        UUID id = screenings.start(clinician, episode);
        screenings.saveDraft(clinician, id, lock(id), FullScreening.measurements());
        return id;
    }

    private long lock(UUID id) {
        return screenings.page(clinician, id).shown().lockVersion();
    }

    private static double value(ScreeningSnapshot s, String key) {
        return s.derived().stream().filter(d -> d.key().equals(key)).findFirst().orElseThrow().value();
    }

    @Test
    void derivedValuesAndSuggestedBandsComeFromTheEngine() {
        UUID id = savedFullScreening();
        ScreeningSnapshot s = screenings.page(clinician, id).shown().snapshot();

        assertThat(value(s, "FLEXION_ROM_LSI")).isCloseTo(88.24, within(0.01)); // clinical.md §1.3: 150/170
        assertThat(value(s, "GIRD")).isCloseTo(25.0, within(0.01)); // §1.4 Wilk 2011 worked check
        assertThat(value(s, "TRM_DEFICIT")).isCloseTo(10.0, within(0.01)); // §1.4: 165 − 155
        assertThat(value(s, "SHOULDER_FLEXION_TORQUE_RIGHT")).isCloseTo(42.0, within(0.01)); // §2.3: 150 N × 0.28 m
        assertThat(value(s, "ER_IR_RATIO_INVOLVED")).isCloseTo(0.789, within(0.01)); // §2.2: 150/190
        assertThat(value(s, "CKCUEST_MEAN")).isCloseTo(23.0, within(0.01)); // §2.1 Pontillo 2014 check
        assertThat(value(s, "CKCUEST_POWER")).isCloseTo(83.41, within(0.01)); // §2.1: 23 × 0.68 × 80 / 15
        assertThat(value(s, "GRIP_BEST_RIGHT")).isEqualTo(40.0); // best of three trials
        assertThat(value(s, "SIDE_BRIDGE_IMBALANCE")).isCloseTo(0.111, within(0.01)); // §3.1 McGill: |1 − 80/90|
        assertThat(value(s, "ASLR_TOTAL")).isEqualTo(3.0); // §3.3 Mens 2001: 2 + 1
        assertThat(value(s, "BASMI_LUMBAR_FLEXION")).isEqualTo(1.0); // §3.5: 4.0 cm belongs to 2–4
        assertThat(value(s, "QUICKDASH_SCORE")).isCloseTo(40.91, within(0.01)); // §4.1: Σ29, n = 11
        assertThat(value(s, "ODI_SCORE")).isCloseTo(30.0, within(0.01)); // §4.2 Fairbank 2000: Σ15/50
        assertThat(value(s, "SPADI_TOTAL")).isCloseTo(39.23, within(0.01)); // §4.3: 51/130
        assertThat(value(s, "TSK11_SCORE")).isEqualTo(24.0); // §4.5: Σ

        assertThat(s.findings()).extracting(ScreeningSnapshot.Finding::ruleCode)
                .contains("shoulder.gird-ge-20", "shoulder.trm-deficit-gt-5", "shoulder.flexion-rom-lsi-lt-90",
                        "shoulder.quickdash-gt-40", "lumbopelvic.odi-gt-20", "lumbopelvic.aslr-ge-1");
        // Most restrictive cap: QuickDASH > 40 caps the shoulder at Band 1; ODI > 20 and ASLR cap lumbopelvic at Band 2.
        assertThat(s.shoulder().band()).isEqualTo("BAND_1");
        assertThat(s.lumbopelvic().band()).isEqualTo("BAND_2");
        assertThat(s.missingForSigning()).isEmpty();
        assertThat(s.rulesVersion()).isEqualTo(1);
        assertThat(s.engineVersion()).isEqualTo(ScreeningEvaluator.ENGINE_VERSION);
    }

    @Test
    void aDraftWithGapsSavesButSigningNamesWhatIsMissing() {
        UUID id = screenings.start(clinician, episode);
        Measurements gaps = FullScreening.without("QUICKDASH_1", "QUICKDASH_2", "QUICKDASH_3", "QUICKDASH_4",
                "QUICKDASH_5", "QUICKDASH_6", "QUICKDASH_7", "QUICKDASH_8", "QUICKDASH_9", "QUICKDASH_10", "QUICKDASH_11");
        long lock = screenings.saveDraft(clinician, id, lock(id), gaps);

        assertThatThrownBy(() -> screenings.sign(clinician, id, lock, Decision.confirmAll()))
                .isInstanceOfSatisfying(ScreeningRefused.class, e -> {
                    assertThat(e.problems()).hasSize(1);
                    assertThat(e.problems().get(0).code()).isEqualTo("screening.sign.missing");
                    assertThat(e.problems().get(0).args().get(0)).contains("QUICKDASH_SCORE");
                });
        assertThat(screenings.page(clinician, id).shown().status()).isEqualTo(ScreeningStatus.DRAFT);
    }

    @Test
    void anIncompleteQuestionnaireIsNotScoredAndBlocksSigning() {
        UUID id = screenings.start(clinician, episode);
        // 9 of 11 QuickDASH items: below the ≥ 10 rule (clinical.md §4.1), so no score, never a number
        long lock = screenings.saveDraft(clinician, id, lock(id), FullScreening.without("QUICKDASH_10", "QUICKDASH_11"));
        ScreeningSnapshot s = screenings.page(clinician, id).shown().snapshot();
        ScreeningSnapshot.Derived quickDash = s.derived().stream().filter(d -> d.key().equals("QUICKDASH_SCORE"))
                .findFirst().orElseThrow();
        assertThat(quickDash.value()).isNull();
        assertThat(quickDash.notScorable()).isNotBlank();
        assertThatThrownBy(() -> screenings.sign(clinician, id, lock, Decision.confirmAll()))
                .isInstanceOf(ScreeningRefused.class);
    }

    @Test
    void overridingABandNeedsAReason() {
        UUID id = savedFullScreening();
        assertThatThrownBy(() -> screenings.sign(clinician, id, lock(id), new Decision("BAND_2", " ", null, null)))
                .isInstanceOfSatisfying(ScreeningRefused.class, e -> assertThat(e.problems())
                        .extracting(ScreeningRefused.Problem::field, ScreeningRefused.Problem::code)
                        .containsExactly(org.assertj.core.groups.Tuple.tuple("shoulderOverrideReason",
                                "screening.decision.reasonRequired")));
    }

    @Test
    void aSignedVersionIsRefusedByTheDatabaseWhateverIssuesTheUpdate() {
        UUID id = savedFullScreening();
        screenings.sign(clinician, id, lock(id), Decision.confirmAll());
        UUID versionId = jdbc.queryForObject("select id from screening_version where screening_id = ?", UUID.class, id);

        assertThatThrownBy(() -> jdbc.update("update screening_version set shoulder_band = 'OPEN' where id = ?", versionId))
                .isInstanceOf(DataAccessException.class).hasMessageContaining("read-only");
        assertThatThrownBy(() -> jdbc.update("delete from screening_version where id = ?", versionId))
                .isInstanceOf(DataAccessException.class).hasMessageContaining("read-only");
        assertThatThrownBy(() -> jdbc.update("update screening set created_at = now() where id = ?", id))
                .isInstanceOf(DataAccessException.class).hasMessageContaining("append-only");
        assertThat(jdbc.queryForObject("select shoulder_band from screening_version where id = ?", String.class,
                versionId)).isEqualTo("BAND_1");
    }

    @Test
    void anAmendmentIsANewVersionAndLeavesTheSignedOneByteIdentical() {
        UUID id = savedFullScreening();
        screenings.sign(clinician, id, lock(id), Decision.confirmAll());
        String before = rowText(id, 1);

        int v2 = screenings.amend(clinician, id, "Right IR re-measured with the scapula stabilised");
        assertThat(v2).isEqualTo(2);
        Map<String, String> typed = FullScreening.typed();
        typed.put("SHOULDER_IR_90_PASSIVE_RIGHT", "55");
        screenings.saveDraft(clinician, id, lock(id), MeasurementReading.of(typed, Set.of()).measurements());
        screenings.sign(clinician, id, lock(id), new Decision(null, null, "BAND_1", "Lumbar pain flared this week"));

        assertThat(rowText(id, 1)).isEqualTo(before);
        ScreeningPage original = screenings.page(clinician, id, 1);
        assertThat(original.shown().status()).isEqualTo(ScreeningStatus.SIGNED);
        assertThat(original.shown().hashVerifies()).isTrue();
        ScreeningPage amended = screenings.page(clinician, id);
        assertThat(amended.shown().status()).isEqualTo(ScreeningStatus.AMENDED);
        assertThat(amended.shown().supersedesVersionNo()).isEqualTo(1);
        assertThat(amended.shown().changeReason()).isEqualTo("Right IR re-measured with the scapula stabilised");
        assertThat(amended.shown().hashVerifies()).isTrue();
        assertThat(amended.shown().lumbopelvicBand()).isEqualTo("BAND_1");
        assertThat(amended.shown().lumbopelvicOverrideReason()).isEqualTo("Lumbar pain flared this week");
        assertThat(value(amended.shown().snapshot(), "GIRD")).isCloseTo(15.0, within(0.01)); // 70 − 55
        assertThat(auditActions(id)).contains("SCREENING_CREATE", "SCREENING_UPDATE", "SCREENING_SIGN",
                "SCREENING_AMEND", "BAND_OVERRIDE", "SCREENING_READ");
    }

    @Test
    void aTamperedSignedVersionNoLongerVerifies() {
        UUID id = savedFullScreening();
        screenings.sign(clinician, id, lock(id), Decision.confirmAll());
        // Only with the trigger switched off (as a superuser could) can the row change; the hash then tells.
        jdbc.execute("alter table screening_version disable trigger screening_version_signed_read_only");
        try {
            jdbc.update("update screening_version set shoulder_band = 'OPEN' where screening_id = ?", id);
        } finally {
            jdbc.execute("alter table screening_version enable trigger screening_version_signed_read_only");
        }
        assertThat(screenings.page(clinician, id).shown().hashVerifies()).isFalse();
    }

    @Test
    void theLatestSignedScreeningIsWhatOtherFeaturesRead() {
        assertThat(screenings.latestSigned(clinician, episode)).isEmpty();
        UUID id = savedFullScreening();
        screenings.sign(clinician, id, lock(id), new Decision("BAND_2", "Tolerated loaded carries last week", null, null));

        SignedScreeningFacts facts = screenings.latestSigned(clinician, episode).orElseThrow();
        assertThat(facts.screeningId()).isEqualTo(id);
        assertThat(facts.version()).isEqualTo(1);
        assertThat(facts.patientId()).isEqualTo(patient);
        assertThat(facts.shoulderBand()).isEqualTo("BAND_2");
        assertThat(facts.lumbopelvicBand()).isEqualTo("BAND_2");
        assertThat(facts.shoulderBandFraction()).isEqualTo(0.40); // default Band 2 fraction (engine.md §5)
        assertThat(facts.shoulderFlexionTorqueInvolvedNm()).isCloseTo(42.0, within(1e-9)); // right: 150 N × 0.28 m
        assertThat(facts.shoulderFlexionTorqueWeakerNm()).isCloseTo(42.0, within(1e-9)); // left 44.8 N·m is stronger
        assertThat(facts.gripStrengthInvolvedKg()).isEqualTo(40.0);
        assertThat(facts.gripStrengthWeakerKg()).isEqualTo(40.0);
        assertThat(facts.activeFlexionInvolvedDeg()).isEqualTo(150.0);
        assertThat(facts.shoulderToGripMeasuredM()).isCloseTo(0.63, within(1e-9));
        assertThat(facts.rulesVersion()).isEqualTo(1);
        assertThat(facts.redFlagsOpen()).isFalse();
    }

    @Test
    void redFlagsForceHoldAndHoldCannotBeOverriddenWhileTheyAreOpen() {
        UUID id = screenings.start(clinician, episode);
        Measurements flagged = new Measurements(FullScreening.measurements().values(),
                EnumSet.of(RedFlag.SHOULDER_TRAUMA_WEAKNESS));
        long lock = screenings.saveDraft(clinician, id, lock(id), flagged);
        ScreeningSnapshot s = screenings.page(clinician, id).shown().snapshot();
        assertThat(s.shoulder().band()).isEqualTo("HOLD");
        assertThat(s.lumbopelvic().band()).isEqualTo("HOLD");

        assertThatThrownBy(() -> screenings.sign(clinician, id, lock,
                new Decision("BAND_1", "Feels fine", null, null)))
                .isInstanceOfSatisfying(ScreeningRefused.class, e -> assertThat(e.problems())
                        .extracting(ScreeningRefused.Problem::code).contains("screening.decision.redFlagsHold"));
        screenings.sign(clinician, id, lock, Decision.confirmAll());
        SignedScreeningFacts facts = screenings.latestSigned(clinician, episode).orElseThrow();
        assertThat(facts.shoulderBand()).isEqualTo("HOLD");
        assertThat(facts.shoulderBandFraction()).isZero();
        assertThat(facts.redFlagsOpen()).isTrue();
    }

    @Test
    void theChangeSinceThePreviousSignedScreeningIsJudgedAgainstThePublishedMcid() {
        UUID first = savedFullScreening();
        screenings.sign(clinician, first, lock(first), Decision.confirmAll());
        UUID second = screenings.start(clinician, episode);
        assertThat(second).isNotEqualTo(first);
        Map<String, String> typed = FullScreening.typed();
        // QuickDASH Σ25 → 31.82 (clinical.md §4.1): 9.09 points better, above the MCID of 8 (Mintken 2009)
        int[] better = {3, 2, 2, 3, 1, 2, 4, 3, 2, 1, 2};
        for (int i = 0; i < better.length; i++) {
            typed.put("QUICKDASH_" + (i + 1), String.valueOf(better[i]));
        }
        screenings.saveDraft(clinician, second, lock(second), MeasurementReading.of(typed, Set.of()).measurements());
        ScreeningSnapshot s = screenings.page(clinician, second).shown().snapshot();
        ScreeningSnapshot.Change change = s.changes().stream().filter(c -> c.key().equals("QUICKDASH_SCORE"))
                .findFirst().orElseThrow();
        assertThat(change.previous()).isCloseTo(40.91, within(0.01));
        assertThat(change.current()).isCloseTo(31.82, within(0.01));
        assertThat(change.improvement()).isCloseTo(9.09, within(0.01));
        assertThat(change.mcidPoints()).isEqualTo(8.0);
        assertThat(change.importantImprovement()).isTrue();
        assertThat(s.previous().screeningId()).isEqualTo(first);
    }

    @Test
    void aRulesEditNeverChangesASignedScreeningAndNewScreeningsUseTheNewVersion() {
        UUID first = savedFullScreening();
        screenings.sign(clinician, first, lock(first), Decision.confirmAll());
        String signedRow = rowText(first, 1);

        CurrentRuleSet v1 = rules.current(clinic.id());
        List<Rule> edited = v1.rules().stream().map(r -> !r.code().equals("shoulder.gird-ge-20") ? r
                : new Rule(r.code(), r.key(), r.comparison(), 30, r.unit(), r.region(), r.caps(), r.source(),
                        r.required(), r.alsoNeedsWhenFired())).toList();
        RuleSetSettings s = v1.settings();
        rules.edit(clinic.manager(), 1, new RuleSetSettings(s.defaultBand(), s.bandFractions(), s.gripFraction(),
                s.controlledStop(), s.rangeMarginDeg(), s.hipDrivenMinimumBand(), s.stepLimit(), s.painDuringLimit(),
                s.acwrCaution(), s.planDefaults(), s.scoringPolicy(), edited), "GIRD threshold 30°");

        assertThat(rowText(first, 1)).isEqualTo(signedRow);
        ScreeningSnapshot old = screenings.page(clinician, first).shown().snapshot();
        assertThat(old.rulesVersion()).isEqualTo(1);
        assertThat(old.findings()).extracting(ScreeningSnapshot.Finding::ruleCode).contains("shoulder.gird-ge-20");
        assertThat(screenings.latestSigned(clinician, episode).orElseThrow().rulesVersion()).isEqualTo(1);

        UUID second = screenings.start(clinician, episode);
        screenings.saveDraft(clinician, second, lock(second), FullScreening.measurements());
        ScreeningSnapshot now = screenings.page(clinician, second).shown().snapshot();
        assertThat(now.rulesVersion()).isEqualTo(2);
        assertThat(now.findings()).extracting(ScreeningSnapshot.Finding::ruleCode).doesNotContain("shoulder.gird-ge-20");
    }

    @Test
    void anotherClinicsScreeningIsNotFoundAndTheAttemptAudited() {
        UUID id = savedFullScreening();
        CurrentStaff stranger = data.clinic().clinician();
        assertThatThrownBy(() -> screenings.page(stranger, id)).isInstanceOf(NotFoundException.class);
        assertThatThrownBy(() -> screenings.start(stranger, episode)).isInstanceOf(NotFoundException.class);
        assertThat(screenings.latestSigned(stranger, episode)).isEmpty();
        assertThat(jdbc.queryForObject("select count(*) from audit_event where clinic_id = ? and outcome = 'DENIED'"
                + " and object_id = ?", Integer.class, stranger.clinicId(), id.toString())).isEqualTo(1);
    }

    /** Every column of a version as text, to compare a row before and after later changes. */
    private String rowText(UUID screeningId, int versionNo) {
        return jdbc.queryForObject("select v::text from screening_version v where screening_id = ? and version_no = ?",
                String.class, screeningId, versionNo);
    }

    private List<String> auditActions(UUID screeningId) {
        return jdbc.queryForList("select action from audit_event where object_id = ? order by seq", String.class,
                screeningId.toString());
    }
}
