package org.swingclearance.engine.scoring;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.Arrays;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.swingclearance.engine.evidence.Citations;
import org.swingclearance.engine.evidence.EvidenceTag;

/** Shoulder check values of clinical.md §0, §1–2 and Appendix D, each with its published source. */
class ShoulderScoringTests {

    private static final double TOLERANCE = 0.01;

    @Test
    void aaosFlexionReference() {
        // Norkin & White App. A Table A.1 (AAOS) / clinical.md §0 row 1.2: lookup returns flex = 180
        assertThat(ReferenceValues.aaosShoulder(ReferenceValues.ShoulderMotion.FLEXION).value()).isEqualTo(180);
        assertThat(ReferenceValues.aaosShoulder(ReferenceValues.ShoulderMotion.INTERNAL_ROTATION).value())
                .isEqualTo(70); // same table: IR 70
    }

    @Test
    void limbSymmetryIndex() {
        // clinical.md §1.3 (common practice [C,M]): 150° vs 170° -> 88.24 %, deficit 20°
        Score lsi = Symmetry.limbSymmetryIndex(150.0, 170.0);
        assertThat(lsi.orElseThrow()).isCloseTo(88.24, within(TOLERANCE));
        assertThat(lsi.citation().tag()).isEqualTo(EvidenceTag.COMMON_PRACTICE);
        assertThat(Symmetry.deficit(150.0, 170.0, Unit.DEGREE).orElseThrow()).isEqualTo(20.0);
    }

    @Test
    void limbSymmetryIndexNotScorableWhenASideIsNotTested() {
        Score lsi = Symmetry.limbSymmetryIndex(150.0, null);
        assertThat(lsi.scorable()).isFalse();
        assertThat(lsi.notScorable().orElseThrow().reason()).isEqualTo(NotScorable.Reason.NOT_TESTED);
        assertThat(lsi.notScorable().orElseThrow().rule()).contains("uninvolved side");
        assertThat(Symmetry.limbSymmetryIndex(10.0, 0.0).notScorable().orElseThrow().reason())
                .isEqualTo(NotScorable.Reason.UNDEFINED);
    }

    @Test
    void rotationDeficitsWorkedCheck() {
        // Wilk 2011; Manske 2013 / clinical.md §1.4: IR dom 45, IR non-dom 70, ER dom 110, ER non-dom 95
        RotationProfile profile = RotationProfile.of(45.0, 110.0, 70.0, 95.0);
        assertThat(profile.gird().orElseThrow()).isEqualTo(25.0); // Wilk 2011: GIRD = 70 − 45 = 25°
        assertThat(profile.trmInvolved().orElseThrow()).isEqualTo(155.0); // TRM dom = 45 + 110
        assertThat(profile.trmUninvolved().orElseThrow()).isEqualTo(165.0); // TRM non-dom = 70 + 95
        assertThat(profile.trmDeficit().orElseThrow()).isEqualTo(10.0); // Wilk 2011: TRM deficit 10°
        // Burkhart 2003 alternative [M,M] / clinical.md §1.4: 25/165 × 100 = 15.15 %
        assertThat(profile.girdPercentOfUninvolvedTrm().orElseThrow()).isCloseTo(15.15, within(TOLERANCE));
        assertThat(profile.erGain().orElseThrow()).isEqualTo(15.0); // ER gain = 110 − 95
        assertThat(profile.gird().citation()).isEqualTo(Citations.WILK_2011);
    }

    @Test
    void rotationDeficitsWithWilk2012GroupMeans() {
        // Wilk 2012 (PMC3348299) group means / clinical.md §1.4 second check: GIRD 11°, TRM 184 vs 190 -> 6°
        RotationProfile profile = RotationProfile.of(52.0, 132.0, 63.0, 127.0);
        assertThat(profile.gird().orElseThrow()).isEqualTo(11.0);
        assertThat(profile.trmInvolved().orElseThrow()).isEqualTo(184.0);
        assertThat(profile.trmUninvolved().orElseThrow()).isEqualTo(190.0);
        assertThat(profile.trmDeficit().orElseThrow()).isEqualTo(6.0);
    }

    @Test
    void rotationValuesAreScorableIndependently() {
        RotationProfile profile = RotationProfile.of(45.0, null, 70.0, 95.0);
        assertThat(profile.gird().scorable()).isTrue();
        assertThat(profile.trmDeficit().scorable()).isFalse();
        assertThat(profile.trmDeficit().notScorable().orElseThrow().rule()).contains("ER involved");
        assertThat(profile.girdPercentOfUninvolvedTrm().scorable()).isTrue();
        assertThatThrownBy(() -> RotationProfile.of(-1.0, null, null, null))
                .isInstanceOf(IllegalArgumentException.class);
    }

    @Test
    void ckcuestWorkedCheck() {
        // Tucci 2014 (mean of maximal trials) / clinical.md §2.1: [22, 24, 23] -> 23.0
        Ckcuest test = Ckcuest.of(List.of(22, 24, 23), 80.0, 1.80);
        assertThat(test.mean().orElseThrow()).isCloseTo(23.0, within(TOLERANCE));
        // Roush 2007 via secondary summary [S,M] / clinical.md §2.1: 23 × 0.68 × 80 / 15 = 83.41
        assertThat(test.powerScore().orElseThrow()).isCloseTo(83.41, within(TOLERANCE));
        // clinical.md §2.1 normalised score [S]: 23 / 1.80 m = 12.778 touches/m; 0.3246 touches/in at 70.87 in
        assertThat(test.touchesPerMetre().orElseThrow()).isCloseTo(12.778, within(0.001));
        assertThat(test.touchesPerInch().orElseThrow()).isCloseTo(0.3246, within(0.0001));
    }

    @Test
    void ckcuestWithoutBodyMassHasNoPowerScore() {
        Ckcuest test = Ckcuest.of(List.of(20, 21), null, null);
        assertThat(test.mean().orElseThrow()).isEqualTo(20.5);
        assertThat(test.powerScore().scorable()).isFalse();
        assertThat(test.touchesPerMetre().scorable()).isFalse();
        assertThat(Ckcuest.of(List.of(), 80.0, 1.8).mean().scorable()).isFalse();
    }

    @Test
    void externalInternalRatio() {
        // Riemann 2010 [V,M] / clinical.md §2.2: ER 150 N, IR 190 N -> 0.789
        Score ratio = Strength.externalInternalRatio(150.0, 190.0);
        assertThat(ratio.orElseThrow()).isCloseTo(0.789, within(0.001));
        assertThat(ratio.citation()).isEqualTo(Citations.RIEMANN_2010);
    }

    @Test
    void forceToTorqueAndBodyMassNormalisation() {
        // physics / clinical.md §2.3: 150 N × 0.28 m = 42.0 N·m; 150 N / 80 kg = 1.875 N/kg = 19.12 % BW
        assertThat(Strength.torque(150.0, 0.28).orElseThrow()).isCloseTo(42.0, within(TOLERANCE));
        assertThat(Strength.forcePerKilogram(150.0, 80.0).orElseThrow()).isCloseTo(1.875, within(0.001));
        assertThat(Strength.percentBodyWeight(150.0, 80.0).orElseThrow()).isCloseTo(19.12, within(TOLERANCE));
        assertThat(Strength.torque(150.0, 0.28).citation().tag()).isEqualTo(EvidenceTag.PHYSICAL_LAW);
    }

    @Test
    void clubStaticMomentIsForceTimesLeverArm() {
        // physics / clinical.md Appendix A and D club_static_torque: 8 kg at d = 0.60 m, horizontal -> 47.07 N·m.
        // The club's weight m·g is the force and d the lever arm (cos 0° = 1), so force × lever reproduces it.
        double weight = 8.0 * Strength.STANDARD_GRAVITY;
        assertThat(Strength.torque(weight, 0.6).orElseThrow()).isCloseTo(47.07, within(TOLERANCE));
    }

    @Test
    void leverArmOfZeroIsRefused() {
        assertThatThrownBy(() -> Strength.torque(150.0, 0.0)).isInstanceOf(IllegalArgumentException.class)
                .hasMessageContaining("lever arm");
        assertThat(Strength.torque(150.0, null).scorable()).isFalse();
    }

    @ParameterizedTest
    @CsvSource({
        // exact pound (0.45359237 kg) / clinical.md §2.4: 120.8 lb = 54.79 kg; 121.0 lb = 54.88 kg; 70.4 lb = 31.93 kg
        "120.8, 54.79",
        "121.0, 54.88",
        "70.4, 31.93"
    })
    void gripPoundsToKilograms(double pounds, double kilograms) {
        assertThat(Grip.poundsToKilograms(pounds)).isCloseTo(kilograms, within(TOLERANCE));
        assertThat(Grip.kilogramsToPounds(Grip.poundsToKilograms(pounds))).isCloseTo(pounds, within(1e-9));
    }

    @Test
    void gripSummaryByProtocol() {
        List<Double> trials = Arrays.asList(40.0, 42.0, null, 38.0);
        assertThat(Grip.summarise(trials, Grip.Protocol.BEST).orElseThrow()).isEqualTo(42.0);
        assertThat(Grip.summarise(trials, Grip.Protocol.MEAN).orElseThrow()).isEqualTo(40.0);
        assertThat(Grip.summarise(null, Grip.Protocol.BEST).scorable()).isFalse();
    }

    @Test
    void gripAgainstMathiowetzNorm() {
        // Mathiowetz 1985 / clinical.md §2.4: man 27, right 40 kg vs 25–29 mean 54.79 kg (SD 23.0 lb = 10.43 kg)
        GripNorms.Norm norm = GripNorms.mathiowetz(Sex.MALE, 27, Side.RIGHT).orElseThrow();
        assertThat(norm.ageBand()).isEqualTo("25–29");
        assertThat(norm.meanKg()).isCloseTo(54.79, within(TOLERANCE));
        assertThat(norm.sdKg()).isCloseTo(10.43, within(TOLERANCE));
        assertThat(GripNorms.percentOfNorm(40, norm)).isCloseTo(73.0, within(0.05)); // 73.0 % of norm
        assertThat(GripNorms.zScore(40, norm)).isCloseTo(-1.42, within(TOLERANCE)); // z = −1.42
        assertThat(GripNorms.mathiowetz(Sex.FEMALE, 80, Side.LEFT).orElseThrow().meanKg())
                .isCloseTo(Grip.poundsToKilograms(37.6), within(1e-9)); // 75+ women left 37.6 lb
        assertThat(GripNorms.mathiowetz(Sex.MALE, 19, Side.RIGHT)).isEmpty();
    }

    @Test
    void ewgsop2LowGrip() {
        // EWGSOP2 numbers [M,H] / clinical.md §2.4: man 40 kg vs 27 -> not low; woman 15 kg vs 16 -> low
        assertThat(GripNorms.lowGripEwgsop2(Sex.MALE, 40)).isFalse();
        assertThat(GripNorms.lowGripEwgsop2(Sex.FEMALE, 15)).isTrue();
    }

    @Test
    void upperQuarterReach() {
        // Gorman 2012 method / clinical.md §2.5: 95, 85, 70 cm, limb 90 cm -> 92.59 %; other side 90, 80, 68 -> 88.15 %
        Score involved = UpperQuarterReach.composite(90.0, 80.0, 68.0, 90.0);
        Score uninvolved = UpperQuarterReach.composite(95.0, 85.0, 70.0, 90.0);
        assertThat(uninvolved.orElseThrow()).isCloseTo(92.59, within(TOLERANCE));
        assertThat(involved.orElseThrow()).isCloseTo(88.15, within(TOLERANCE));
        // clinical.md §2.5: composite LSI = 88.15 / 92.59 = 95.2 %
        assertThat(Symmetry.limbSymmetryIndex(involved.orElseThrow(), uninvolved.orElseThrow()).orElseThrow())
                .isCloseTo(95.2, within(0.05));
        // clinical.md §2.5 (4 cm borrowed from Plisky 2006, provisional [C,L]): MED 5, IL 5, SL 2 cm
        assertThat(UpperQuarterReach.sideDifference(95.0, 90.0).orElseThrow()).isEqualTo(5.0);
        assertThat(UpperQuarterReach.sideDifference(85.0, 80.0).orElseThrow()).isEqualTo(5.0);
        assertThat(UpperQuarterReach.sideDifference(70.0, 68.0).orElseThrow()).isEqualTo(2.0);
        assertThat(UpperQuarterReach.normalised(95.0, 90.0).orElseThrow()).isCloseTo(105.56, within(TOLERANCE));
    }
}
