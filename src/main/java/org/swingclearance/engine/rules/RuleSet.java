package org.swingclearance.engine.rules;

import java.util.HashSet;
import java.util.List;
import java.util.Objects;
import java.util.Set;

/**
 * A clinic's versioned practice rules. A screening records the version it was banded with; an edit is a new version.
 *
 * @param version     version label, e.g. "clinic-12-v3"; never blank
 * @param defaultBand band of a region when no rule restricts it, and the ceiling of every region's band; never null
 * @param rules       the rules, codes unique; never null
 */
public record RuleSet(String version, LoadBand defaultBand, List<Rule> rules) {

    public RuleSet {
        if (version == null || version.isBlank()) {
            throw new IllegalArgumentException("version must not be blank");
        }
        Objects.requireNonNull(defaultBand, "defaultBand");
        rules = List.copyOf(Objects.requireNonNull(rules, "rules"));
        Set<String> codes = new HashSet<>();
        for (Rule rule : rules) {
            if (!codes.add(rule.code())) {
                throw new IllegalArgumentException("duplicate rule code " + rule.code());
            }
        }
    }

    /** The rules of one region, in order. */
    public List<Rule> rulesFor(Region region) {
        return rules.stream().filter(rule -> rule.region() == region).toList();
    }
}
