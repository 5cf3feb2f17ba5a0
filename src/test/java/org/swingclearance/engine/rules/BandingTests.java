package org.swingclearance.engine.rules;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.tuple;

import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.swingclearance.engine.evidence.Citations;
import org.swingclearance.engine.evidence.EvidenceTag;
import org.swingclearance.engine.scoring.DerivedValues;
import org.swingclearance.engine.scoring.Measure;
import org.swingclearance.engine.scoring.ScreeningBattery;
import org.swingclearance.engine.scoring.ScreeningInput;
import org.swingclearance.engine.scoring.Side;
import org.swingclearance.engine.scoring.Unit;
import org.swingclearance.engine.scoring.ValueKey;

/** Banding with the default rules reproduces the flags of clinical.md §0 and Appendix D. */
class BandingTests {

    private static final RuleSet DEFAULTS = DefaultRules.ruleSet();

    @ParameterizedTest
    @CsvSource({
        // Wilk 2011 [V,H] / clinical.md §1.4 and Appendix D gird: GIRD 25 -> flag; threshold ≥ 20 includes 20
        "GIRD, 25, shoulder.gird-ge-20, true",
        "GIRD, 20, shoulder.gird-ge-20, true",
        "GIRD, 11, shoulder.gird-ge-20, false", // Wilk 2012 group means: no flag
        // Wilk 2011; Manske 2013 [V,H] / §1.4: TRM deficit 10 -> flag; Wilk 2012 means 6 -> flag
        "TRM_DEFICIT, 10, shoulder.trm-deficit-gt-5, true",
        "TRM_DEFICIT, 6, shoulder.trm-deficit-gt-5, true",
        "TRM_DEFICIT, 5, shoulder.trm-deficit-gt-5, false",
        // Burkhart 2003 [M,M] / §1.4: 15.15 % -> "> 10 % rule also met"
        "GIRD_PERCENT_OF_TRM, 15.15, shoulder.gird-pct-trm-gt-10, true",
        // Pontillo 2014 [V,M] / §2.1 and Appendix D ckcuest flag_lt21: mean 23.0 -> no flag
        "CKCUEST_MEAN, 23.0, shoulder.ckcuest-lt-21, false",
        "CKCUEST_MEAN, 20.67, shoulder.ckcuest-lt-21, true",
        // Riemann 2010 [V,M] / §2.2: 0.789 below the healthy range -> informational flag
        "ER_IR_RATIO_INVOLVED, 0.789, shoulder.er-ir-lt-0.86, true",
        "ER_IR_RATIO_INVOLVED, 0.90, shoulder.er-ir-lt-0.86, false",
        // LSI 90 % and 10° borrowed [C,M] / §1.3: 88.24 % and 20° -> flag
        "FLEXION_ROM_LSI, 88.24, shoulder.flexion-rom-lsi-lt-90, true",
        "FLEXION_ROM_DEFICIT, 20, shoulder.flexion-rom-deficit-gt-10, true",
        // provisional 4 cm (Plisky 2006 borrowed) [C,L] / §2.5: MED 5 -> flag, SL 2 -> no flag, LSI 95.2 -> none
        "UQ_REACH_MEDIAL_DIFFERENCE, 5, shoulder.reach-medial-diff-gt-4, true",
        "UQ_REACH_SUPEROLATERAL_DIFFERENCE, 2, shoulder.reach-superolateral-diff-gt-4, false",
        "UQ_REACH_COMPOSITE_LSI, 95.2, shoulder.reach-composite-lsi-lt-90, false",
        // McGill [S,M] / §3.1 and Appendix D trunk_ratios: flex/ext 0.80 OK; |1 − R/L| 0.111 -> flag; SB/ext OK
        "TRUNK_FLEXOR_EXTENSOR_RATIO, 0.80, lumbopelvic.flexor-extensor-gt-1, false",
        "SIDE_BRIDGE_IMBALANCE, 0.111, lumbopelvic.side-bridge-imbalance-gt-0.05, true",
        "SIDE_BRIDGE_RIGHT_EXTENSOR_RATIO, 0.533, lumbopelvic.right-side-bridge-extensor-gt-0.75, false",
        "SIDE_BRIDGE_LEFT_EXTENSOR_RATIO, 0.600, lumbopelvic.left-side-bridge-extensor-gt-0.75, false",
        // Mens 2001 [V,H] / §3.3: 3 -> positive; 0 -> negative
        "ASLR_TOTAL, 3, lumbopelvic.aslr-ge-1, true",
        "ASLR_TOTAL, 0, lumbopelvic.aslr-ge-1, false",
        // Hicks 2005 [V LR; count M] / §3.4: 3/4 -> rule positive
        "STABILISATION_RULE_POSITIVE, 1, lumbopelvic.stabilisation-rule-positive, true",
        // Fairbank 2000 [V,H] / §4.2: 30.00 % is moderate (> 20) -> Band 2 finding, not > 40
        "ODI_SCORE, 30.0, lumbopelvic.odi-gt-20, true",
        "ODI_SCORE, 30.0, lumbopelvic.odi-gt-40, false",
        // Silbernagel 2007 [S,M] / §6.4: 6/10 during -> reduce; 5/10 allowed
        "PAIN_DURING_MOVEMENT, 6, shoulder.pain-during-gt-5, true",
        "PAIN_DURING_MOVEMENT, 5, shoulder.pain-during-gt-5, false",
        // BASMI 3-point via ASAS [S,H] / §3.5: 4.0 cm scores 1, not 2
        "BASMI_LUMBAR_FLEXION, 1, lumbopelvic.basmi-lumbar-ge-2, false"
    })
    void defaultRuleFiresExactlyAtTheReferenceThreshold(ValueKey key, double value, String code, boolean fires) {
        BandingResult result = Banding.evaluate(DEFAULTS, Map.of(key, value), false);
        Set<String> fired = result.findings().stream().map(finding -> finding.rule().code())
                .collect(Collectors.toSet());
        assertThat(fired.contains(code)).as(code).isEqualTo(fires);
    }

    @Test
    void workedExampleScreeningBandsAndListsFindingsWithSources() {
        DerivedValues derived = ScreeningBattery.derive(workedScreening());
        BandingResult result = Banding.evaluate(DEFAULTS, derived, false);

        // pain during 6/10 caps both regions at Band 1 (Silbernagel 2007 threshold; cap is a product rule)
        assertThat(result.band(Region.SHOULDER)).isEqualTo(LoadBand.BAND_1);
        assertThat(result.regions().get(Region.SHOULDER).basis()).isEqualTo(RegionBand.Basis.FINDINGS);
        assertThat(result.band(Region.LUMBOPELVIC)).isEqualTo(LoadBand.BAND_1);
        Finding gird = result.findings().stream().filter(f -> f.rule().code().equals("shoulder.gird-ge-20"))
                .findFirst().orElseThrow();
        assertThat(gird.value()).isEqualTo(25.0);
        assertThat(gird.threshold()).isEqualTo(20.0);
        assertThat(gird.source()).isEqualTo(Citations.WILK_2011);
        assertThat(gird.cappedBand()).isEqualTo(LoadBand.BAND_2);
        // the region's findings are listed most restrictive first
        assertThat(result.regions().get(Region.SHOULDER).findings().get(0).cappedBand()).isEqualTo(LoadBand.BAND_1);
        assertThat(result.ruleSetVersion()).isEqualTo(DefaultRules.VERSION);
        assertThat(result.signable(Region.SHOULDER, Region.LUMBOPELVIC)).isTrue();
    }

    @Test
    void noFiredRuleGivesTheDefaultBand() {
        BandingResult result = Banding.evaluate(DEFAULTS, Map.of(ValueKey.PAIN_DURING_MOVEMENT, 2.0,
                ValueKey.QUICKDASH_SCORE, 10.0, ValueKey.ODI_SCORE, 12.0), false);
        assertThat(result.band(Region.SHOULDER)).isEqualTo(DefaultRules.DEFAULT_BAND);
        assertThat(result.regions().get(Region.SHOULDER).basis()).isEqualTo(RegionBand.Basis.DEFAULT);
        assertThat(result.findings()).isEmpty();
    }

    @Test
    void informationalFindingsDoNotChangeTheBand() {
        BandingResult result = Banding.evaluate(DEFAULTS, Map.of(ValueKey.ER_IR_RATIO_INVOLVED, 0.789), false);
        assertThat(result.findings()).extracting(f -> f.rule().code()).containsExactly("shoulder.er-ir-lt-0.86");
        assertThat(result.band(Region.SHOULDER)).isEqualTo(DefaultRules.DEFAULT_BAND);
        assertThat(result.regions().get(Region.SHOULDER).basis()).isEqualTo(RegionBand.Basis.DEFAULT);
    }

    @Test
    void mostRestrictiveCapWins() {
        // QuickDASH 65 fires all three cut-points; Hold is the most restrictive (cut-points [C], no source)
        BandingResult result = Banding.evaluate(DEFAULTS, Map.of(ValueKey.QUICKDASH_SCORE, 65.0,
                ValueKey.GIRD, 25.0, ValueKey.TRM_DEFICIT, 10.0), false);
        assertThat(result.band(Region.SHOULDER)).isEqualTo(LoadBand.HOLD);
        assertThat(result.band(Region.LUMBOPELVIC)).isEqualTo(DefaultRules.DEFAULT_BAND);
    }

    @Test
    void redFlagsForceHoldEverywhereAndStillListFindings() {
        BandingResult result = Banding.evaluate(DEFAULTS, Map.of(ValueKey.GIRD, 25.0, ValueKey.TRM_DEFICIT, 10.0),
                true);
        assertThat(result.band(Region.SHOULDER)).isEqualTo(LoadBand.HOLD);
        assertThat(result.band(Region.LUMBOPELVIC)).isEqualTo(LoadBand.HOLD);
        assertThat(result.regions().get(Region.LUMBOPELVIC).basis()).isEqualTo(RegionBand.Basis.RED_FLAGS);
        assertThat(result.findings()).hasSize(2);
    }

    @Test
    void requiredValuesAndValuesNeededByFiredRulesBlockSigning() {
        BandingResult result = Banding.evaluate(DEFAULTS, Map.of(ValueKey.GIRD, 25.0,
                ValueKey.PAIN_DURING_MOVEMENT, 3.0, ValueKey.QUICKDASH_SCORE, 10.0), false);
        // GIRD fired without the total rotation deficit (Manske 2013: pathological GIRD needs TRM)
        assertThat(result.blockingGaps(Region.SHOULDER)).extracting(MissingValue::key, MissingValue::need)
                .containsExactly(tuple(ValueKey.TRM_DEFICIT,
                        MissingValue.Need.NEEDED_BY_FIRED_RULE));
        assertThat(result.signable(Region.SHOULDER)).isFalse();
        // the lumbopelvic region is missing its required ODI
        assertThat(result.blockingGaps(Region.LUMBOPELVIC)).extracting(MissingValue::key)
                .containsOnly(ValueKey.ODI_SCORE);
        // a rule that could not be checked is shown but does not block
        assertThat(result.missing()).anySatisfy(gap -> {
            assertThat(gap.key()).isEqualTo(ValueKey.CKCUEST_MEAN);
            assertThat(gap.blocksSigning()).isFalse();
        });
    }

    @Test
    void gapsOfDerivedValuesNameTheUnrecordedMeasurements() {
        ScreeningInput input = ScreeningInput.builder(Side.RIGHT).number(Measure.PAIN_DURING_MOVEMENT, 2.0)
                .series(Measure.QUICKDASH, Arrays.asList(3, 3, 3, 2, 3, 2, 3, 3, 2, null, null)).build();
        BandingResult result = Banding.evaluate(DEFAULTS, ScreeningBattery.derive(input), false);
        MissingValue quickDash = result.blockingGaps(Region.SHOULDER).get(0);
        assertThat(quickDash.key()).isEqualTo(ValueKey.QUICKDASH_SCORE);
        assertThat(quickDash.why().orElseThrow().rule()).contains("at least 10 of 11");
        MissingValue gird = result.missing().stream().filter(gap -> gap.key() == ValueKey.GIRD).findFirst()
                .orElseThrow();
        assertThat(gird.measures()).containsExactly(Measure.SHOULDER_IR_90_ACTIVE.on(Side.LEFT),
                Measure.SHOULDER_IR_90_ACTIVE.on(Side.RIGHT));
    }

    @Test
    void defaultRulesCarryTheTagsTheClinicalReferenceGives() {
        Map<String, EvidenceTag> tags = DEFAULTS.rules().stream()
                .collect(Collectors.toMap(Rule::code, rule -> rule.source().tag()));
        assertThat(tags.get("shoulder.gird-ge-20")).isEqualTo(EvidenceTag.VERIFIED); // Wilk 2011 [V,H]
        assertThat(tags.get("shoulder.ckcuest-lt-21")).isEqualTo(EvidenceTag.VERIFIED); // Pontillo 2014 [V,M]
        assertThat(tags.get("shoulder.flexion-rom-lsi-lt-90")).isEqualTo(EvidenceTag.COMMON_PRACTICE); // [C,M]
        assertThat(tags.get("shoulder.reach-medial-diff-gt-4")).isEqualTo(EvidenceTag.COMMON_PRACTICE); // [C,L]
        assertThat(tags.get("shoulder.quickdash-gt-40")).isEqualTo(EvidenceTag.COMMON_PRACTICE); // no source
        assertThat(tags.get("shoulder.pain-during-gt-5")).isEqualTo(EvidenceTag.SECONDARY); // Silbernagel [S,M]
        assertThat(tags.get("lumbopelvic.side-bridge-imbalance-gt-0.05")).isEqualTo(EvidenceTag.SECONDARY); // McGill
        assertThat(tags.get("lumbopelvic.aslr-ge-1")).isEqualTo(EvidenceTag.VERIFIED); // Mens 2001 [V,H]
        assertThat(tags.get("lumbopelvic.odi-gt-20")).isEqualTo(EvidenceTag.VERIFIED); // Fairbank 2000 [V,H]
        assertThat(tags.get("lumbopelvic.stabilisation-rule-positive")).isEqualTo(EvidenceTag.FROM_MEMORY); // [M,M]
        assertThat(tags.get("lumbopelvic.basmi-lumbar-ge-2")).isEqualTo(EvidenceTag.SECONDARY); // ASAS [S,H]
        assertThat(tags.values()).doesNotContain(EvidenceTag.PHYSICAL_LAW);
    }

    @Test
    void ruleUnitMustMatchTheValueAndCodesMustBeUnique() {
        assertThatThrownBy(() -> new Rule("x", ValueKey.GIRD, Comparison.GE, 20,
                Unit.PERCENT, Region.SHOULDER, LoadBand.BAND_2, Citations.WILK_2011,
                false, Set.of())).isInstanceOf(IllegalArgumentException.class).hasMessageContaining("GIRD");
        Rule rule = Rule.of("x", ValueKey.GIRD, Comparison.GE, 20, Region.SHOULDER, LoadBand.BAND_2,
                Citations.WILK_2011);
        assertThatThrownBy(() -> new RuleSet("v", LoadBand.OPEN, List.of(rule, rule)))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("duplicate");
        assertThat(rule.condition()).isEqualTo("GIRD ≥ 20 °");
    }

    @Test
    void loadBandsCarryTheDefaultFractionsOfEngineMd() {
        // engine.md §5: Hold 0, Band 1 0.20, Band 2 0.40, Band 3 0.60, Open 0.80
        assertThat(List.of(LoadBand.values())).extracting(LoadBand::defaultFraction)
                .containsExactly(0.0, 0.20, 0.40, 0.60, 0.80);
        assertThat(LoadBand.mostRestrictive(LoadBand.OPEN, LoadBand.BAND_1)).isEqualTo(LoadBand.BAND_1);
    }

    private static ScreeningInput workedScreening() {
        return ScreeningInput.builder(Side.RIGHT)
                .number(Measure.PAIN_DURING_MOVEMENT, 6.0)
                .sides(Measure.SHOULDER_IR_90_ACTIVE, 70.0, 45.0)
                .sides(Measure.SHOULDER_ER_90_ACTIVE, 95.0, 110.0)
                .series(Measure.CKCUEST_TRIALS, List.of(22, 24, 23))
                .series(Measure.QUICKDASH, List.of(3, 3, 3, 2, 3, 2, 3, 3, 2, 3, 2))
                .series(Measure.ODI, List.of(2, 1, 3, 2, 1, 2, 1, 0, 1, 2))
                .sides(Measure.ASLR, 2.0, 1.0)
                .build();
    }
}
