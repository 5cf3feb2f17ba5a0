package org.swingclearance.engine.rules;

import java.util.Collections;
import java.util.EnumSet;
import java.util.Objects;
import java.util.Set;
import org.swingclearance.engine.evidence.Citation;
import org.swingclearance.engine.scoring.Unit;
import org.swingclearance.engine.scoring.ValueKey;

/**
 * One practice rule: when {@code key} compared with {@code threshold} holds, the rule fires, is listed as a finding
 * and caps {@code region}'s band at {@code caps}. A rule capping at {@link LoadBand#OPEN} is informational: it is
 * listed but restricts nothing beyond the rule set's default.
 *
 * @param code               stable identifier within a rule set, e.g. "shoulder.gird-ge-20"; never blank
 * @param key                the measurement or derived value tested; never null
 * @param comparison         never null
 * @param threshold          finite, in {@code unit}
 * @param unit               unit of the threshold; must equal {@code key.unit()}
 * @param region             region whose band the rule caps; never null
 * @param caps               the band the rule caps the region at when it fires; never null
 * @param source             where the threshold comes from, with its evidence tag; never null (the cap itself is a
 *                           product rule, {@link org.swingclearance.engine.evidence.Citations#BAND_CAP})
 * @param required           true when a screening cannot be signed while the value is missing
 * @param alsoNeedsWhenFired values that must be present to sign once this rule fires (e.g. GIRD needs the total
 *                           rotation deficit to tell an adaptation from a pathological pattern); never null
 */
public record Rule(String code, ValueKey key, Comparison comparison, double threshold, Unit unit, Region region,
        LoadBand caps, Citation source, boolean required, Set<ValueKey> alsoNeedsWhenFired) {

    public Rule {
        if (code == null || code.isBlank()) {
            throw new IllegalArgumentException("code must not be blank");
        }
        Objects.requireNonNull(key, "key");
        Objects.requireNonNull(comparison, "comparison");
        Objects.requireNonNull(unit, "unit");
        Objects.requireNonNull(region, "region");
        Objects.requireNonNull(caps, "caps");
        Objects.requireNonNull(source, "source");
        if (!Double.isFinite(threshold)) {
            throw new IllegalArgumentException(code + ": threshold must be finite");
        }
        if (unit != key.unit()) {
            throw new IllegalArgumentException(code + ": " + key + " is in " + key.unit() + ", threshold in " + unit);
        }
        Set<ValueKey> needs = EnumSet.noneOf(ValueKey.class);
        needs.addAll(Objects.requireNonNull(alsoNeedsWhenFired, "alsoNeedsWhenFired"));
        alsoNeedsWhenFired = Collections.unmodifiableSet(needs);
    }

    /** A rule that is not required and needs nothing more when fired; the unit is the key's. */
    public static Rule of(String code, ValueKey key, Comparison comparison, double threshold, Region region,
            LoadBand caps, Citation source) {
        return new Rule(code, key, comparison, threshold, key.unit(), region, caps, source, false, Set.of());
    }

    /** This rule, required for signing. */
    public Rule asRequired() {
        return new Rule(code, key, comparison, threshold, unit, region, caps, source, true, alsoNeedsWhenFired);
    }

    /** This rule, additionally needing {@code keys} to sign once it fires. */
    public Rule needingWhenFired(ValueKey... keys) {
        Set<ValueKey> needs = EnumSet.noneOf(ValueKey.class);
        needs.addAll(alsoNeedsWhenFired);
        needs.addAll(Set.of(keys));
        return new Rule(code, key, comparison, threshold, unit, region, caps, source, required, needs);
    }

    /** True when the rule fires for {@code value}. */
    public boolean firesFor(double value) {
        return comparison.holds(value, threshold);
    }

    /** True when the rule only informs: its cap restricts nothing. */
    public boolean informational() {
        return caps == LoadBand.OPEN;
    }

    /** The condition for reports, e.g. "GIRD ≥ 20 °". */
    public String condition() {
        String number = threshold == Math.rint(threshold) ? String.valueOf((long) threshold) : String.valueOf(threshold);
        return key + " " + comparison.symbol() + " " + number + (unit.symbol().isEmpty() ? "" : " " + unit.symbol());
    }
}
