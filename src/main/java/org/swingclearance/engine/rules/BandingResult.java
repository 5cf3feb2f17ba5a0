package org.swingclearance.engine.rules;

import java.util.Collections;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;

/**
 * The outcome of banding one screening with one rule set.
 *
 * @param ruleSetVersion  the version used, to be recorded with the screening; never blank
 * @param redFlagsPresent whether red flags forced Hold
 * @param regions         the band of each region; never null, covers every {@link Region}
 * @param findings        every fired rule in rule-set order; never null
 * @param missing         every value a rule needed and did not get; never null
 */
public record BandingResult(String ruleSetVersion, boolean redFlagsPresent, Map<Region, RegionBand> regions,
        List<Finding> findings, List<MissingValue> missing) {

    public BandingResult {
        Objects.requireNonNull(ruleSetVersion, "ruleSetVersion");
        Map<Region, RegionBand> copy = new EnumMap<>(Region.class);
        copy.putAll(Objects.requireNonNull(regions, "regions"));
        for (Region region : Region.values()) {
            if (!copy.containsKey(region)) {
                throw new IllegalArgumentException("no band for " + region);
            }
        }
        regions = Collections.unmodifiableMap(copy);
        findings = List.copyOf(Objects.requireNonNull(findings, "findings"));
        missing = List.copyOf(Objects.requireNonNull(missing, "missing"));
    }

    /** The suggested band of a region; never null. */
    public LoadBand band(Region region) {
        return regions.get(region).band();
    }

    /** The gaps that block signing for a region (required values, values a fired rule needs). */
    public List<MissingValue> blockingGaps(Region region) {
        return missing.stream().filter(MissingValue::blocksSigning).filter(gap -> gap.rule().region() == region)
                .toList();
    }

    /** True when nothing blocks signing for any of the given regions (the episode's regions in scope). */
    public boolean signable(Region... regionsInScope) {
        for (Region region : regionsInScope) {
            if (!blockingGaps(region).isEmpty()) {
                return false;
            }
        }
        return true;
    }
}
