package org.swingclearance.engine.scoring;

import java.util.ArrayList;
import java.util.Collections;
import java.util.EnumMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.Set;

/**
 * Everything the screening battery derives from one {@link ScreeningInput}: a {@link Score} for every
 * {@link ValueKey}, scorable or not.
 *
 * @param input         the raw inputs; never null
 * @param scores        one score per value key, in key order; never null, complete
 * @param rotationBasis whether rotation deficits came from passive or active rotation; never null
 * @param odiBand       band of the ODI score; empty when not scorable
 * @param policy        the scoring policy applied; never null
 */
public record DerivedValues(ScreeningInput input, Map<ValueKey, Score> scores, RotationBasis rotationBasis,
        Optional<OdiBand> odiBand, ScoringPolicy policy) {

    public DerivedValues {
        Objects.requireNonNull(input, "input");
        Objects.requireNonNull(rotationBasis, "rotationBasis");
        Objects.requireNonNull(odiBand, "odiBand");
        Objects.requireNonNull(policy, "policy");
        Map<ValueKey, Score> copy = new EnumMap<>(ValueKey.class);
        copy.putAll(Objects.requireNonNull(scores, "scores"));
        for (ValueKey key : ValueKey.values()) {
            Score score = copy.get(key);
            if (score == null) {
                throw new IllegalArgumentException("no score for " + key);
            }
            if (score.unit() != key.unit()) {
                throw new IllegalArgumentException(key + " is in " + key.unit() + ", score in " + score.unit());
            }
        }
        scores = Collections.unmodifiableMap(copy);
    }

    /** The score of a value; never null. */
    public Score score(ValueKey key) {
        return scores.get(key);
    }

    /** The scorable values, for {@code Banding}; never null. */
    public Map<ValueKey, Double> values() {
        Map<ValueKey, Double> values = new EnumMap<>(ValueKey.class);
        scores.forEach((key, score) -> score.value().ifPresent(value -> values.put(key, value)));
        return Collections.unmodifiableMap(values);
    }

    /**
     * The measurement slots a value needs that were not recorded, in input order. Empty for a scorable value; may be
     * empty for an unscorable one whose inputs are all present (e.g. no involved side, a zero denominator, or an
     * incomplete questionnaire — its {@link Score#notScorable()} says why).
     */
    public List<MeasureKey> missingMeasures(ValueKey key) {
        if (score(key).scorable()) {
            return List.of();
        }
        Set<MeasureKey> missing = new LinkedHashSet<>();
        for (InputRef ref : key.inputs()) {
            for (MeasureKey slot : ref.resolve(input.involvedSide())) {
                if (!input.has(slot)) {
                    missing.add(slot);
                }
            }
        }
        return List.copyOf(new ArrayList<>(missing));
    }

    /**
     * Change of every value that has an MCID against the values of a previous signed screening.
     *
     * @param previous values of the previous screening (e.g. from its snapshot); absent keys were not scorable then
     * @return one change per value key with an instrument, in key order; never null
     */
    public Map<ValueKey, ImportantChange> changesSince(Map<ValueKey, Double> previous) {
        Objects.requireNonNull(previous, "previous");
        Map<ValueKey, ImportantChange> changes = new EnumMap<>(ValueKey.class);
        for (ValueKey key : ValueKey.values()) {
            key.instrument().ifPresent(instrument -> changes.put(key, ImportantChange.between(previous.get(key),
                    score(key).value().isPresent() ? score(key).orElseThrow() : null, policy.mcid(instrument))));
        }
        return Collections.unmodifiableMap(changes);
    }
}
