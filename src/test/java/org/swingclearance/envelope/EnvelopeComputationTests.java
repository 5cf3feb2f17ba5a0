package org.swingclearance.envelope;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import java.util.UUID;
import org.junit.jupiter.api.Test;
import org.swingclearance.engine.envelope.Envelope;
import org.swingclearance.engine.envelope.EnvelopeCalculator;
import org.swingclearance.engine.mechanics.Body;
import org.swingclearance.engine.mechanics.Capacity;
import org.swingclearance.engine.mechanics.Club;
import org.swingclearance.engine.mechanics.ClubInertia;
import org.swingclearance.engine.mechanics.Configuration;
import org.swingclearance.engine.mechanics.EngineVersion;
import org.swingclearance.engine.mechanics.Gravity;
import org.swingclearance.engine.rules.LoadBand;
import org.swingclearance.engine.mechanics.LoadRules;
import org.swingclearance.engine.mechanics.SwingKind;
import org.swingclearance.engine.mechanics.SwingPattern;
import org.swingclearance.equipment.ClubView;
import org.swingclearance.equipment.SwingPatternView;

/**
 * The envelope glue without a database: stored inputs become the engine's inputs one to one, every row is the
 * engine's own result for the same configuration, and the published CASE-M80 quantities come through unchanged.
 */
class EnvelopeComputationTests {

    /** The CASE-M80 club of biomechanics.md §0.1: 6 kg, 0.60 m, balance point 0.45 m, rod + head at 0.50 m. */
    static final ClubView CASE_M80_CLUB = new ClubView(UUID.randomUUID(), "Club 6 kg", 6.0, 0.60, 0.45, 0.22, 0.50,
            0.09, "MODELLED", false);
    static final ClubView LIGHT_CLUB = new ClubView(UUID.randomUUID(), "Club 3 kg", 3.0, 0.66, 0.49, 0.28, null,
            3.0 * 0.49 * (0.66 - 0.49), "BOUND", false);
    static final SwingPatternView ONE_HAND_SHOULDER = new SwingPatternView(UUID.randomUUID(),
            "One-hand front arc to shoulder height, controlled", 45, 45, 1, 1.0, "RHYTHMIC", false, null, true);
    static final SwingPatternView TWO_HAND_HIP = new SwingPatternView(UUID.randomUUID(),
            "Two-hand front pendulum, hip-driven", 30, 60, 2, 1.0, "RHYTHMIC", true, "BAND_2", true);
    static final SwingPatternView OVERHEAD = new SwingPatternView(UUID.randomUUID(),
            "One-hand raise from hanging to overhead, single controlled arc", 65, 65, 1, 1.0, "SINGLE_ARC", false,
            null, true);

    /** A demo-like patient: CASE-M80 body (1.78 m, 80 kg), Band 2 (0.40) on both sides, shoulder 60 N·m. */
    static EnvelopeInputs inputs(Double torqueWeaker, String lumbopelvicBand, Double flexionDeg) {
        return new EnvelopeInputs(UUID.randomUUID(), 1, new EnvelopeInputs.BodyInput(1.78, 80, null),
                new EnvelopeInputs.CapacityInput("BAND_2", 0.40, lumbopelvicBand, 60.0, torqueWeaker, 45.0, 42.0,
                        flexionDeg),
                new EnvelopeInputs.RulesInput(1, null, true, 10, "BAND_2"), 2.0,
                List.of(LIGHT_CLUB, CASE_M80_CLUB), List.of(ONE_HAND_SHOULDER, TWO_HAND_HIP, OVERHEAD),
                EngineVersion.ENGINE_VERSION);
    }

    @Test
    void everyRowIsTheEnginesOwnEnvelopeForTheSameConfiguration() {
        EnvelopeInputs in = inputs(55.0, "BAND_2", 170.0);
        EnvelopeOutputs out = EnvelopeComputation.compute(in);
        assertThat(out.rows()).hasSize(6);
        Body body = Body.of(1.78, 80);
        for (EnvelopeRow row : out.rows()) {
            ClubView cv = row.clubId().equals(CASE_M80_CLUB.id()) ? CASE_M80_CLUB : LIGHT_CLUB;
            SwingPatternView pv = List.of(ONE_HAND_SHOULDER, TWO_HAND_HIP, OVERHEAD).stream()
                    .filter(p -> p.id().equals(row.patternId())).findFirst().orElseThrow();
            Club club = new Club(cv.massKg(), cv.lengthM(), cv.balancePointM(), cv.handleLengthM(),
                    cv.inertiaSource().equals("BOUND") ? ClubInertia.bound(cv.massKg(), cv.lengthM(), cv.balancePointM())
                            : ClubInertia.modelled(cv.massKg(), cv.lengthM(), cv.balancePointM(), cv.headCentreM()));
            SwingPattern pattern = SwingPattern.ofDegrees(pv.centreDeg(), pv.halfArcDeg(), pv.hands(), pv.reach(),
                    SwingKind.valueOf(pv.kind()), pv.hipDriven());
            Capacity capacity = new Capacity(pv.hands() == 2 ? 55.0 : 60.0, pv.hands() == 2 ? 42.0 : 45.0, null,
                    LoadBand.BAND_2).withShoulderFlexionRangeDeg(170);
            Envelope expected = EnvelopeCalculator.envelope(
                    new Configuration(body, club, 0.05, pattern, 2.0, Gravity.STANDARD), capacity,
                    LoadRules.forFraction(0.40));
            assertThat(row.permitted()).isEqualTo(expected.atConfiguration().permitted());
            assertThat(row.demandRatio()).isEqualTo(expected.atConfiguration().demandRatio());
            assertThat(row.binding()).isEqualTo(expected.atConfiguration().binding().name());
            assertThat(row.furthestGripCm()).isEqualTo(expected.furthestGrip().gripMarkM() == null ? null
                    : expected.furthestGrip().gripMarkM() * 100);
            assertThat(row.shortestCycleTimeS()).isEqualTo(expected.shortestCycle().cycleTimeS());
            assertThat(row.heaviestMassKg()).isEqualTo(expected.heaviestMass().massKg());
        }
        assertThat(out.modelStatements()).isNotEmpty();
    }

    @Test
    void theCaseM80ConfigurationCarriesThePublishedFirstMomentAndArmGeometry() {
        // CASE-M80, one hand, straight arm, grip 5 cm from the knob: r_c = 1.08708 m and Σmr = 7.7753152 kg·m
        // (biomechanics.md S10, S18), so the hold torque over an arc through the horizontal is g·Σmr (S19 uses
        // g = 9.81; here standard gravity).
        WhatIf w = EnvelopeComputation.whatIf(inputs(55.0, "BAND_2", 170.0), CASE_M80_CLUB, ONE_HAND_SHOULDER, 0.05,
                2.0);
        assertThat(w.momentArmCm()).isCloseTo(108.708, within(1e-9));
        assertThat(w.holdTorqueNm()).isCloseTo(Gravity.STANDARD * 7.7753152, within(1e-6));
        assertThat(w.holdTorqueNm() * 9.81 / Gravity.STANDARD).isCloseTo(76.2758, within(1e-4));
        // Allowance = band fraction × measured torque = 0.40 × 60 N·m; hold ratio = hold / allowance.
        assertThat(w.shoulderAllowanceNm()).isCloseTo(24.0, within(1e-12));
        assertThat(w.holdTorqueRatio()).isCloseTo(w.holdTorqueNm() / 24.0, within(1e-12));
        assertThat(w.permitted()).isFalse();
        assertThat(w.gripSeries()).hasSize(EnvelopeComputation.GRIP_SERIES_POINTS);
        assertThat(w.gripSeries().get(0).x()).isZero();
        assertThat(w.gripSeries().get(w.gripSeries().size() - 1).x()).isCloseTo(22.0, within(1e-9));
        assertThat(w.cycleSeries().get(0).x()).isCloseTo(0.6, within(1e-12));
        assertThat(w.cycleSeries().get(w.cycleSeries().size() - 1).x()).isCloseTo(8.0, within(1e-9));
    }

    @Test
    void aTwoHandPatternWithoutTheWeakerSidesTorqueHasNoLimits() {
        EnvelopeOutputs out = EnvelopeComputation.compute(inputs(null, "BAND_2", 170.0));
        assertThat(out.rows()).filteredOn(r -> r.hands() == 2)
                .allSatisfy(r -> assertThat(r.status()).isEqualTo(EnvelopeRow.NO_CAPACITY));
        assertThat(out.rows()).filteredOn(r -> r.hands() == 1)
                .allSatisfy(r -> assertThat(r.status()).isEqualTo(EnvelopeRow.COMPUTED));
        assertThat(out.noteKeys()).contains("envelope.note.noTorqueWeaker", "envelope.note.reachEstimated",
                "envelope.note.inertiaBound");
    }

    @Test
    void rangeOfMotionAndLumbopelvicBandExcludePatterns() {
        EnvelopeOutputs out = EnvelopeComputation.compute(inputs(55.0, "BAND_1", 120.0));
        EnvelopeRow overhead = out.rows().stream().filter(r -> r.patternId().equals(OVERHEAD.id())).findFirst()
                .orElseThrow();
        // C4: θ_c + A = 130° > 120° − 10°; largest half-arc = 120 − 10 − 65 = 45° (engine.md §5).
        assertThat(overhead.binding()).isEqualTo("RANGE_OF_MOTION");
        assertThat(overhead.largestHalfArcDeg()).isCloseTo(45.0, within(1e-9));
        assertThat(overhead.furthestGripCm()).isNull();
        assertThat(overhead.furthestGripBlocking()).isNotNull();
        EnvelopeRow hip = out.rows().stream().filter(r -> r.patternId().equals(TWO_HAND_HIP.id())).findFirst()
                .orElseThrow();
        // C5: hip-driven needs Band 2 on the lumbopelvic side; Band 1 excludes it.
        assertThat(hip.binding()).isEqualTo("HIP_DRIVE");
        assertThat(hip.permitted()).isFalse();
    }

    @Test
    void aPatternsOwnBandCanOnlyMakeTheHipDriveRuleStricter() {
        SwingPatternView needsBand3 = new SwingPatternView(UUID.randomUUID(), "Own", 30, 60, 2, 1.0, "RHYTHMIC", true,
                "BAND_3", false);
        SwingPatternView needsBand1 = new SwingPatternView(UUID.randomUUID(), "Own", 30, 60, 2, 1.0, "RHYTHMIC", true,
                "BAND_1", false);
        EnvelopeInputs.RulesInput rules = new EnvelopeInputs.RulesInput(1, null, true, 10, "BAND_2");
        EnvelopeInputs.CapacityInput capacity = inputs(55.0, "BAND_2", 170.0).capacity();
        assertThat(EnvelopeComputation.rules(rules, capacity, needsBand3).hipDriveMinimumBand()).isEqualTo(LoadBand.BAND_3);
        assertThat(EnvelopeComputation.rules(rules, capacity, needsBand1).hipDriveMinimumBand()).isEqualTo(LoadBand.BAND_2);
    }
}
