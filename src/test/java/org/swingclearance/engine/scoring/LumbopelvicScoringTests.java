package org.swingclearance.engine.scoring;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.swingclearance.engine.evidence.EvidenceTag;

/** Lumbopelvic check values of clinical.md §0, §3 and Appendix D, each with its published source. */
class LumbopelvicScoringTests {

    private static final double TOLERANCE = 0.01;

    @Test
    void trunkEnduranceRatios() {
        // McGill ratio criteria [S,M] / clinical.md §3.1: flexor 120, extensor 150, right SB 80, left SB 90 s
        TrunkEndurance ratios = TrunkEndurance.of(120.0, 150.0, 80.0, 90.0);
        assertThat(ratios.flexorExtensor().orElseThrow()).isCloseTo(0.80, within(TOLERANCE)); // flex/ext 0.80
        assertThat(ratios.rightLeftSideBridge().orElseThrow()).isCloseTo(0.889, within(0.001)); // R/L 0.889
        assertThat(ratios.sideBridgeImbalance().orElseThrow()).isCloseTo(0.111, within(0.001)); // |1 − R/L| 0.111
        assertThat(ratios.rightSideBridgeExtensor().orElseThrow()).isCloseTo(0.533, within(0.001)); // R SB/ext
        assertThat(ratios.leftSideBridgeExtensor().orElseThrow()).isCloseTo(0.600, within(0.001)); // L SB/ext
        assertThat(ratios.flexorExtensor().citation().tag()).isEqualTo(EvidenceTag.SECONDARY);
    }

    @Test
    void trunkRatiosWithAMissingTimeOrZeroDenominator() {
        TrunkEndurance ratios = TrunkEndurance.of(120.0, null, 80.0, 0.0);
        assertThat(ratios.flexorExtensor().scorable()).isFalse();
        assertThat(ratios.rightLeftSideBridge().notScorable().orElseThrow().reason())
                .isEqualTo(NotScorable.Reason.UNDEFINED);
        assertThat(ratios.sideBridgeImbalance().scorable()).isFalse();
        assertThatThrownBy(() -> TrunkEndurance.of(-1.0, 1.0, 1.0, 1.0)).isInstanceOf(IllegalArgumentException.class);
    }

    @ParameterizedTest
    @CsvSource({
        // Mens 2001 [V,H] / clinical.md §3.3: left 2 + right 1 = 3 -> positive; 0 + 0 = 0 -> negative
        "2, 1, 3, true",
        "0, 0, 0, false",
        "0, 1, 1, true"
    })
    void activeStraightLegRaise(int left, int right, int total, boolean positive) {
        ActiveStraightLegRaise aslr = ActiveStraightLegRaise.of(left, right);
        assertThat(aslr.total().orElseThrow()).isEqualTo(total);
        assertThat(aslr.positive().isYes()).isEqualTo(positive);
    }

    @Test
    void activeStraightLegRaiseNeedsBothSides() {
        assertThat(ActiveStraightLegRaise.of(2, null).positive().scorable()).isFalse();
        assertThatThrownBy(() -> ActiveStraightLegRaise.of(6, 0)).isInstanceOf(IllegalArgumentException.class);
    }

    @Test
    void proneInstabilityTest() {
        // Hicks 2005 [V,H] / clinical.md §3.4: pain in P1, eased in P2 -> positive; no P1 pain -> negative
        assertThat(ProneInstability.classify(true, true).isYes()).isTrue();
        assertThat(ProneInstability.classify(true, false).isYes()).isFalse(); // mild or no easing -> negative
        assertThat(ProneInstability.classify(false, null).isYes()).isFalse();
        assertThat(ProneInstability.classify(false, null).scorable()).isTrue();
        assertThat(ProneInstability.classify(true, null).scorable()).isFalse();
        assertThat(ProneInstability.classify(null, true).scorable()).isFalse();
    }

    @Test
    void stabilisationPredictionRule() {
        // Hicks 2005 (LR+ 4.0 [V]; "3 of 4" from memory [M,M]) / clinical.md §3.4:
        // age 32, SLR 95°, aberrant movement yes, PIT negative -> 3/4 -> rule positive
        StabilisationPrediction rule = StabilisationPrediction.evaluate(32.0, 95.0, true, false);
        assertThat(rule.predictorsPresent().orElseThrow()).isEqualTo(3);
        assertThat(rule.positive().isYes()).isTrue();
        assertThat(rule.positive().citation().tag()).isEqualTo(EvidenceTag.FROM_MEMORY);
    }

    @Test
    void stabilisationRuleDecidedOrUndecidedWithUnknownPredictors() {
        // 3 present already decides it although the PIT is unknown
        assertThat(StabilisationPrediction.evaluate(32.0, 95.0, true, null).positive().isYes()).isTrue();
        assertThat(StabilisationPrediction.evaluate(32.0, 95.0, true, null).predictorsPresent().scorable()).isFalse();
        // 0 present and 1 unknown can never reach 3
        StabilisationPrediction negative = StabilisationPrediction.evaluate(55.0, 80.0, false, null);
        assertThat(negative.positive().scorable()).isTrue();
        assertThat(negative.positive().isYes()).isFalse();
        // 2 present and 1 unknown: undecided
        assertThat(StabilisationPrediction.evaluate(32.0, 95.0, false, null).positive().scorable()).isFalse();
        // SLR exactly 91° is not "> 91°"
        assertThat(StabilisationPrediction.evaluate(32.0, 91.0, true, false).positive().isYes()).isFalse();
    }

    @ParameterizedTest
    @CsvSource({
        // Jenkinson 1994 via ASAS [S,H] / clinical.md §3.5 and Appendix D basmi_lumbar
        "4.5, 0, 4.143",
        "4.0, 1, 4.857", // boundary 4.0 belongs to 2–4
        "2.0, 1, 7.714",
        "8.0, 0, 0.0", // linear −0.857 clipped to 0
        "1.5, 2, 8.4286"
    })
    void modifiedSchoberBasmi(double increase, int threePoint, double linear) {
        ModifiedSchober schober = ModifiedSchober.of(increase);
        assertThat(schober.basmiThreePoint().orElseThrow()).isEqualTo(threePoint);
        assertThat(schober.basmiLinear().orElseThrow()).isCloseTo(linear, within(0.001));
    }

    @Test
    void schoberIncreaseFromDistances() {
        assertThat(ModifiedSchober.increase(15.0, 20.5).orElseThrow()).isCloseTo(5.5, within(1e-9));
        assertThat(ModifiedSchober.increase(15.0, null).scorable()).isFalse();
        assertThat(ModifiedSchober.of(null).basmiLinear().scorable()).isFalse();
        assertThatThrownBy(() -> ModifiedSchober.increase(15.0, 14.0)).isInstanceOf(IllegalArgumentException.class);
    }

    @Test
    void singleLegStanceReference() {
        // Bohannon 2006 [V,H] / clinical.md §0 row 3.7 and §3.7: 60–69 y mean 27.0 s; 65-year-old at 20 s is below it
        ReferenceValues.ReferenceValue mean = ReferenceValues.singleLegStanceEyesOpenMean(65).orElseThrow();
        assertThat(mean.value()).isEqualTo(27.0);
        assertThat(20.0).isLessThan(mean.value());
        assertThat(ReferenceValues.singleLegStanceEyesOpenMean(75).orElseThrow().value()).isEqualTo(17.2);
        assertThat(ReferenceValues.singleLegStanceEyesOpenMean(85).orElseThrow().value()).isEqualTo(8.5);
        assertThat(ReferenceValues.singleLegStanceEyesOpenMean(45)).isEmpty();
    }
}
