package org.swingclearance.engine.scoring;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.swingclearance.engine.evidence.Citations;

/** Change since the previous screening against the published MCIDs (clinical.md §4). */
class ImportantChangeTests {

    @ParameterizedTest
    @CsvSource({
        // Farrar 2001; Ostelo 2008 [V,H] / clinical.md §4.4 and Appendix D nprs_change
        "6, 3, 3, 50.0, true", // 3 points, 50 % -> met
        "8, 6, 2, 25.0, true", // 2 points, 25 % -> met (absolute)
        "3, 2, 1, 33.33, true", // 1 point, 33.3 % -> met (relative)
        "5, 4, 1, 20.0, false" // 1 point, 20 % -> not met
    })
    void painRatingChange(double baseline, double followUp, double points, double percent, boolean met) {
        ImportantChange change = ImportantChange.between(baseline, followUp, Mcid.NPRS);
        assertThat(change.improvement().orElseThrow()).isEqualTo(points);
        assertThat(change.percentImprovement().orElseThrow()).isCloseTo(percent, within(0.01));
        assertThat(change.importantImprovement().isYes()).isEqualTo(met);
        assertThat(change.importantImprovement().citation()).isEqualTo(Citations.FARRAR_2001_OSTELO_2008);
    }

    @ParameterizedTest
    @CsvSource({
        // Ostelo 2008 [V,H] / clinical.md §4.2: 40 -> 28 = 12 points (met); 30 -> 22 = 8 points, 26.7 % (not met)
        "40, 28, true",
        "30, 22, false",
        "20, 14, true" // 6 points but 30 % -> met by the relative criterion
    })
    void oswestryChange(double previous, double current, boolean met) {
        assertThat(ImportantChange.between(previous, current, Mcid.ODI).importantImprovement().isYes()).isEqualTo(met);
    }

    @Test
    void quickDashChangeUsesTheShoulderMcidByDefault() {
        // Mintken 2009 [V,H] / clinical.md §4.1: MCID 8.0 in shoulder pain
        assertThat(Mcid.defaultFor(Instrument.QUICKDASH).points()).isEqualTo(8.0);
        assertThat(ImportantChange.between(40.91, 31.82, Mcid.QUICKDASH_SHOULDER).importantImprovement().isYes())
                .isTrue(); // 9.09 points
        // Franchignoni 2014 [V,H] (15.91, default 16 [C]) for general upper-limb presentations: not met
        assertThat(ImportantChange.between(40.91, 31.82, Mcid.QUICKDASH_UPPER_LIMB).importantImprovement().isYes())
                .isFalse();
    }

    @Test
    void spadiAndTskMcids() {
        // Roy 2009 [V,H] / clinical.md §4.3: MCID 8–13, default the upper end 13
        assertThat(ImportantChange.between(39.23, 26.0, Mcid.SPADI).importantImprovement().isYes()).isTrue();
        assertThat(ImportantChange.between(39.23, 30.0, Mcid.SPADI).importantImprovement().isYes()).isFalse();
        // TSK-11 MCID ≈ 4 [M,L] / clinical.md §4.5
        assertThat(ImportantChange.between(28.0, 24.0, Mcid.TSK_11).importantImprovement().isYes()).isTrue();
        assertThat(ImportantChange.between(28.0, 25.0, Mcid.TSK_11).importantImprovement().isYes()).isFalse();
    }

    @Test
    void worseningByTheMcidIsReported() {
        // product convention [C]: worsening by at least the MCID points counts as important
        ImportantChange worse = ImportantChange.between(20.0, 32.0, Mcid.ODI);
        assertThat(worse.improvement().orElseThrow()).isEqualTo(-12.0);
        assertThat(worse.importantImprovement().isYes()).isFalse();
        assertThat(worse.importantWorsening().isYes()).isTrue();
        assertThat(ImportantChange.between(20.0, 25.0, Mcid.ODI).importantWorsening().isYes()).isFalse();
    }

    @Test
    void noPreviousScoreMeansNoChange() {
        ImportantChange change = ImportantChange.between(null, 30.0, Mcid.ODI);
        assertThat(change.improvement().scorable()).isFalse();
        assertThat(change.importantImprovement().scorable()).isFalse();
        ImportantChange fromZero = ImportantChange.between(0.0, 0.0, Mcid.NPRS);
        assertThat(fromZero.percentImprovement().notScorable().orElseThrow().reason())
                .isEqualTo(NotScorable.Reason.UNDEFINED);
        assertThat(fromZero.importantImprovement().isYes()).isFalse();
        assertThatThrownBy(() -> ImportantChange.between(11.0, 3.0, Mcid.NPRS))
                .isInstanceOf(IllegalArgumentException.class);
    }
}
