package org.swingclearance.engine.rules;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.function.Function;
import org.swingclearance.engine.scoring.DerivedValues;
import org.swingclearance.engine.scoring.MeasureKey;
import org.swingclearance.engine.scoring.NotScorable;
import org.swingclearance.engine.scoring.ValueKey;

/**
 * Applies a rule set to a screening's values: every rule whose condition holds becomes a finding; each region's
 * band is the most restrictive of the rule set's default band and the caps of its fired rules; red flags force
 * {@link LoadBand#HOLD} in every region. The default band is therefore also a ceiling: a fired rule never raises a
 * band.
 */
public final class Banding {

    private Banding() {
    }

    /**
     * Bands plain values (e.g. re-banding a stored snapshot).
     *
     * @param ruleSet         never null
     * @param values          scorable values by key; an absent key is missing; never null
     * @param redFlagsPresent true when any unresolved red flag is recorded
     * @return findings, bands and gaps; the gaps carry no measurement slots
     */
    public static BandingResult evaluate(RuleSet ruleSet, Map<ValueKey, Double> values, boolean redFlagsPresent) {
        Objects.requireNonNull(values, "values");
        return evaluate(ruleSet, values::get, key -> List.of(), key -> Optional.empty(), redFlagsPresent);
    }

    /**
     * Bands the derived values of a screening; gaps name the unrecorded measurement slots and why each value is not
     * scorable.
     */
    public static BandingResult evaluate(RuleSet ruleSet, DerivedValues derived, boolean redFlagsPresent) {
        Objects.requireNonNull(derived, "derived");
        return evaluate(ruleSet, key -> derived.score(key).scorable() ? derived.score(key).orElseThrow() : null,
                derived::missingMeasures, key -> derived.score(key).notScorable(), redFlagsPresent);
    }

    private static BandingResult evaluate(RuleSet ruleSet, Function<ValueKey, Double> valueOf,
            Function<ValueKey, List<MeasureKey>> slotsOf, Function<ValueKey, Optional<NotScorable>> whyOf,
            boolean redFlagsPresent) {
        Objects.requireNonNull(ruleSet, "ruleSet");
        List<Finding> findings = new ArrayList<>();
        List<MissingValue> missing = new ArrayList<>();
        for (Rule rule : ruleSet.rules()) {
            Double value = valueOf.apply(rule.key());
            if (value == null) {
                MissingValue.Need need = rule.required() ? MissingValue.Need.REQUIRED : MissingValue.Need.NOT_EVALUATED;
                missing.add(new MissingValue(rule, rule.key(), need, slotsOf.apply(rule.key()),
                        whyOf.apply(rule.key())));
            } else if (rule.firesFor(value)) {
                findings.add(Finding.of(rule, value));
                for (ValueKey needed : rule.alsoNeedsWhenFired()) {
                    if (valueOf.apply(needed) == null) {
                        missing.add(new MissingValue(rule, needed, MissingValue.Need.NEEDED_BY_FIRED_RULE,
                                slotsOf.apply(needed), whyOf.apply(needed)));
                    }
                }
            }
        }
        Map<Region, RegionBand> regions = new EnumMap<>(Region.class);
        for (Region region : Region.values()) {
            regions.put(region, band(region, ruleSet.defaultBand(), findings, redFlagsPresent));
        }
        return new BandingResult(ruleSet.version(), redFlagsPresent, regions, findings, missing);
    }

    private static RegionBand band(Region region, LoadBand defaultBand, List<Finding> findings,
            boolean redFlagsPresent) {
        List<Finding> regionFindings = findings.stream().filter(finding -> finding.rule().region() == region)
                .sorted(Comparator.comparing(Finding::cappedBand)).toList();
        if (redFlagsPresent) {
            return new RegionBand(region, LoadBand.HOLD, RegionBand.Basis.RED_FLAGS, regionFindings);
        }
        LoadBand band = defaultBand;
        for (Finding finding : regionFindings) {
            band = LoadBand.mostRestrictive(band, finding.cappedBand());
        }
        RegionBand.Basis basis = band.isMoreRestrictiveThan(defaultBand) ? RegionBand.Basis.FINDINGS
                : RegionBand.Basis.DEFAULT;
        return new RegionBand(region, band, basis, regionFindings);
    }
}
