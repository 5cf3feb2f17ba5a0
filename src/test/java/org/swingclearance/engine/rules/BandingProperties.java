package org.swingclearance.engine.rules;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import org.swingclearance.engine.evidence.Citations;
import org.swingclearance.engine.scoring.ValueKey;

/** Banding invariants over arbitrary rule sets and values. */
class BandingProperties {

    @Property
    void bandNeverExceedsTheDefaultAndFollowsTheMostRestrictiveCap(@ForAll("ruleSets") RuleSet ruleSet,
            @ForAll("values") Map<ValueKey, Double> values) {
        BandingResult result = Banding.evaluate(ruleSet, values, false);
        for (Region region : Region.values()) {
            LoadBand band = result.band(region);
            assertThat(band.compareTo(ruleSet.defaultBand())).isLessThanOrEqualTo(0);
            for (Finding finding : result.regions().get(region).findings()) {
                assertThat(band.compareTo(finding.cappedBand())).isLessThanOrEqualTo(0);
            }
            if (result.regions().get(region).findings().isEmpty()) {
                assertThat(band).isEqualTo(ruleSet.defaultBand());
            }
        }
    }

    @Property
    void redFlagsAlwaysHold(@ForAll("ruleSets") RuleSet ruleSet, @ForAll("values") Map<ValueKey, Double> values) {
        BandingResult result = Banding.evaluate(ruleSet, values, true);
        for (Region region : Region.values()) {
            assertThat(result.band(region)).isEqualTo(LoadBand.HOLD);
        }
    }

    @Property
    void aFindingNeverRaisesABand(@ForAll("ruleSets") RuleSet ruleSet, @ForAll("values") Map<ValueKey, Double> values,
            @ForAll("keys") ValueKey extraKey, @ForAll("numbers") double extraValue) {
        Map<ValueKey, Double> fewer = new EnumMap<>(ValueKey.class);
        fewer.putAll(values);
        fewer.remove(extraKey);
        Map<ValueKey, Double> more = new EnumMap<>(fewer);
        more.put(extraKey, extraValue);
        BandingResult before = Banding.evaluate(ruleSet, fewer, false);
        BandingResult after = Banding.evaluate(ruleSet, more, false);
        for (Region region : Region.values()) {
            assertThat(after.band(region).compareTo(before.band(region))).isLessThanOrEqualTo(0);
        }
    }

    @Provide
    Arbitrary<RuleSet> ruleSets() {
        Arbitrary<Rule> rules = Combinators.combine(keys(), Arbitraries.of(Comparison.class), numbers(),
                Arbitraries.of(Region.class), Arbitraries.of(LoadBand.class))
                .as((key, comparison, threshold, region, caps) -> Rule.of("r", key, comparison, threshold, region,
                        caps, Citations.BAND_CAP));
        return Combinators.combine(Arbitraries.of(LoadBand.class), rules.list().ofMaxSize(12))
                .as((defaultBand, drawn) -> {
                    List<Rule> numbered = new ArrayList<>();
                    for (int i = 0; i < drawn.size(); i++) {
                        Rule rule = drawn.get(i);
                        numbered.add(Rule.of("r" + i, rule.key(), rule.comparison(), rule.threshold(), rule.region(),
                                rule.caps(), rule.source()));
                    }
                    return new RuleSet("p", defaultBand, numbered);
                });
    }

    @Provide
    Arbitrary<Map<ValueKey, Double>> values() {
        return Arbitraries.maps(keys(), numbers()).ofMaxSize(20);
    }

    @Provide
    Arbitrary<ValueKey> keys() {
        // a few keys so that rules and values meet often
        return Arbitraries.of(ValueKey.GIRD, ValueKey.CKCUEST_MEAN, ValueKey.ODI_SCORE, ValueKey.ASLR_TOTAL,
                ValueKey.PAIN_DURING_MOVEMENT);
    }

    @Provide
    Arbitrary<Double> numbers() {
        return Arbitraries.doubles().between(-50, 100).ofScale(1);
    }
}
