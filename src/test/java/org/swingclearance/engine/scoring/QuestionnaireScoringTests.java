package org.swingclearance.engine.scoring;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.Arrays;
import java.util.Collections;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** Questionnaire check values of clinical.md §0, §4 and Appendix D (items by index, no wording). */
class QuestionnaireScoringTests {

    private static final double TOLERANCE = 0.01;

    @Test
    void quickDashWorkedChecks() {
        // IWH scoring; Mintken 2009 / clinical.md §4.1: Σ=29, n=11 -> (29/11 − 1) × 25 = 40.91
        assertThat(QuickDash.score(List.of(3, 3, 3, 2, 3, 2, 3, 3, 2, 3, 2)).orElseThrow())
                .isCloseTo(40.91, within(TOLERANCE));
        // IWH scoring / clinical.md §4.1: Σ=25, n=11 -> 31.82
        assertThat(QuickDash.score(List.of(3, 2, 2, 3, 1, 2, 4, 3, 2, 1, 2)).orElseThrow())
                .isCloseTo(31.82, within(TOLERANCE));
        // IWH scoring / clinical.md §4.1: Σ=27, n=10 -> (2.7 − 1) × 25 = 42.50
        assertThat(QuickDash.score(Arrays.asList(3, 3, 3, 2, 3, 2, 3, 3, 2, 3, null)).orElseThrow())
                .isCloseTo(42.50, within(TOLERANCE));
        // IWH scoring / clinical.md §4.1: all 1s -> 0.00; all 5s -> 100.00
        assertThat(QuickDash.score(Collections.nCopies(11, 1)).orElseThrow()).isEqualTo(0.0);
        assertThat(QuickDash.score(Collections.nCopies(11, 5)).orElseThrow()).isEqualTo(100.0);
    }

    @Test
    void quickDashWithNineAnsweredIsNotScorable() {
        // IWH missing rule [V,H] / clinical.md §4.1: n=9 -> invalid (null)
        Score score = QuickDash.score(Arrays.asList(3, 3, 3, 2, 3, 2, 3, 3, 2, null, null));
        assertThat(score.scorable()).isFalse();
        assertThat(score.notScorable().orElseThrow().reason()).isEqualTo(NotScorable.Reason.INCOMPLETE);
        assertThat(score.notScorable().orElseThrow().rule()).contains("at least 10 of 11").contains("9 answered");
    }

    @Test
    void quickDashRefusesResponsesOffTheScale() {
        assertThatThrownBy(() -> QuickDash.score(List.of(0, 3, 3, 2, 3, 2, 3, 3, 2, 3, 2)))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("item 1");
        assertThatThrownBy(() -> QuickDash.score(List.of(3, 3))).isInstanceOf(IllegalArgumentException.class);
    }

    @Test
    void quickDashModulesNeedAllFourItems() {
        // IWH scoring [V,H] / clinical.md §4.1: modules scored the same way, all 4 items required
        assertThat(QuickDash.moduleScore(List.of(2, 3, 2, 1)).orElseThrow()).isCloseTo(25.0, within(1e-9));
        assertThat(QuickDash.moduleScore(Arrays.asList(2, 3, 2, null)).scorable()).isFalse();
    }

    @Test
    void oswestryWorkedChecks() {
        // Fairbank & Pynsent 2000 [V,H] / clinical.md §4.2: [2,1,3,2,1,2,1,0,1,2] -> Σ15/50 -> 30.00 %, moderate
        Oswestry full = Oswestry.score(List.of(2, 1, 3, 2, 1, 2, 1, 0, 1, 2));
        assertThat(full.score().orElseThrow()).isCloseTo(30.00, within(TOLERANCE));
        assertThat(full.band()).contains(OdiBand.MODERATE);
        // Fairbank 2000 missing rule / clinical.md §4.2: nine sections -> Σ13/45 -> 28.89 %, moderate
        Oswestry nine = Oswestry.score(Arrays.asList(2, 1, 3, 2, 1, 2, 1, 0, 1, null));
        assertThat(nine.score().orElseThrow()).isCloseTo(28.89, within(TOLERANCE));
        assertThat(nine.band()).contains(OdiBand.MODERATE);
    }

    @Test
    void oswestryWithTwoMissingSectionsIsNotScorableByDefault() {
        // clinical.md §4.2 default [C,L]: score only if ≤ 1 section missing
        Oswestry two = Oswestry.score(Arrays.asList(2, 1, 3, 2, 1, 2, 1, 0, null, null));
        assertThat(two.score().scorable()).isFalse();
        assertThat(two.band()).isEmpty();
        assertThat(Oswestry.score(Arrays.asList(2, 1, 3, 2, 1, 2, 1, 0, null, null), 2).score().orElseThrow())
                .isCloseTo(12.0 / 40 * 100, within(1e-9));
    }

    @ParameterizedTest
    @CsvSource({
        // Fairbank & Pynsent 2000 bands, implemented as ≤ 20, > 20–40, … [C] / clinical.md §4.2
        "0, MINIMAL", "20, MINIMAL", "20.01, MODERATE", "40, MODERATE", "40.5, SEVERE", "60, SEVERE",
        "61, CRIPPLED", "80, CRIPPLED", "80.1, BED_BOUND_OR_EXAGGERATING", "100, BED_BOUND_OR_EXAGGERATING"
    })
    void oswestryBands(double score, OdiBand band) {
        assertThat(OdiBand.of(score)).isEqualTo(band);
    }

    @Test
    void spadiWorkedChecks() {
        // Roach 1991 scoring sheet [S,H] / clinical.md §4.3: pain 25/50 = 50.00; disability 26/80 = 32.50;
        // total 51/130 = 39.23
        Spadi spadi = Spadi.score(List.of(6, 4, 5, 3, 7), List.of(3, 4, 2, 5, 3, 6, 2, 1));
        assertThat(spadi.pain().orElseThrow()).isCloseTo(50.00, within(TOLERANCE));
        assertThat(spadi.disability().orElseThrow()).isCloseTo(32.50, within(TOLERANCE));
        assertThat(spadi.total().orElseThrow()).isCloseTo(39.23, within(TOLERANCE));
        // clinical.md §4.3: the mean-of-subscales method would give 41.25
        Spadi mean = Spadi.score(List.of(6, 4, 5, 3, 7), List.of(3, 4, 2, 5, 3, 6, 2, 1), 2,
                Spadi.TotalMethod.MEAN_OF_SUBSCALES);
        assertThat(mean.total().orElseThrow()).isCloseTo(41.25, within(TOLERANCE));
    }

    @Test
    void spadiWithOnePainItemMissing() {
        // Roach 1991 missing rule (minus 10 per item) [S,H] / clinical.md §4.3: pain 18/40 = 45.00; total 44/120 = 36.67
        Spadi spadi = Spadi.score(Arrays.asList(6, 4, 5, 3, null), List.of(3, 4, 2, 5, 3, 6, 2, 1));
        assertThat(spadi.pain().orElseThrow()).isCloseTo(45.00, within(TOLERANCE));
        assertThat(spadi.disability().orElseThrow()).isCloseTo(32.50, within(TOLERANCE));
        assertThat(spadi.total().orElseThrow()).isCloseTo(36.67, within(TOLERANCE));
    }

    @Test
    void spadiWithThreeMissingIsNotScorableByDefault() {
        // clinical.md §4.3 default cap [C,L]: ≤ 2 missing in total
        Spadi spadi = Spadi.score(Arrays.asList(6, 4, null, null, null), List.of(3, 4, 2, 5, 3, 6, 2, 1));
        assertThat(spadi.total().scorable()).isFalse();
        assertThat(spadi.pain().scorable()).isFalse();
    }

    @Test
    void tsk11() {
        // TSK-11 scoring [S,H] / clinical.md §4.5: [2,3,2,2,3,2,1,2,3,2,2] -> 24
        assertThat(Kinesiophobia.tsk11(List.of(2, 3, 2, 2, 3, 2, 1, 2, 3, 2, 2)).orElseThrow()).isEqualTo(24.0);
        assertThat(Kinesiophobia.tsk11(Collections.nCopies(11, 1)).orElseThrow()).isEqualTo(11.0); // range 11–44
        assertThat(Kinesiophobia.tsk11(Collections.nCopies(11, 4)).orElseThrow()).isEqualTo(44.0);
        assertThat(Kinesiophobia.tsk11(Arrays.asList(2, 3, 2, 2, 3, 2, 1, 2, 3, 2, null)).scorable()).isFalse();
        assertThatThrownBy(() -> Kinesiophobia.tsk11(Collections.nCopies(11, 5)))
                .isInstanceOf(IllegalArgumentException.class);
    }

    @Test
    void tsk17WithReversedItems() {
        // Vlaeyen 1995 [S,M] / clinical.md §4.5: items 4, 8, 12, 16 reversed -> Σ 49 (> 37)
        List<Integer> raw = List.of(3, 3, 2, 2, 3, 2, 3, 1, 3, 3, 2, 2, 3, 3, 2, 1, 3);
        assertThat(Kinesiophobia.tsk17(raw).orElseThrow()).isEqualTo(49.0);
    }

    @Test
    void sirsi() {
        // Gerometta 2018 design; Σ/120 formula from memory [M,M] / clinical.md §4.5 and Appendix D: Σ 78 -> 65.00 %
        assertThat(Sirsi.score(List.of(7, 6, 8, 5, 7, 6, 7, 6, 8, 6, 6, 6)).orElseThrow())
                .isCloseTo(65.00, within(TOLERANCE));
    }
}
