package org.swingclearance.rules;

import java.util.Collections;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import org.swingclearance.engine.rules.LoadBand;
import org.swingclearance.engine.rules.Rule;
import org.swingclearance.engine.rules.RuleSet;
import org.swingclearance.engine.scoring.ScoringPolicy;

/**
 * The content of one practice-rules version: everything a manager edits. Checked on construction, so a stored
 * version is always usable by the engine.
 *
 * @param defaultBand          band of a region when no rule restricts it (and the ceiling of every suggestion)
 * @param bandFractions        fraction of measured capacity each band permits, non-decreasing from Hold to Open, 0–1
 * @param gripFraction         fraction for the grip constraint; NaN = the band's own fraction
 * @param controlledStop       constraint C2 on: the patient must be able to stop the club anywhere in its arc
 * @param rangeMarginDeg       margin below measured active flexion for C4, degrees
 * @param hipDrivenMinimumBand lumbopelvic band a hip-driven pattern needs (C5)
 * @param stepLimit            largest relative rise of the demand ratio per plan step (common practice, no source)
 * @param painDuringLimit      highest pain during a session that allows progression, 0–10 (Silbernagel 2007)
 * @param acwrCaution          acute:chronic ratio shown as a caution, informational only
 * @param planDefaults         sets, reps and effort cap per band that permits training
 * @param scoringPolicy        missing-item limits, SPADI total method, MCIDs
 * @param rules                the rules in display order, codes unique
 */
public record RuleSetSettings(LoadBand defaultBand, Map<LoadBand, Double> bandFractions, double gripFraction,
                              boolean controlledStop, double rangeMarginDeg, LoadBand hipDrivenMinimumBand,
                              double stepLimit, int painDuringLimit, double acwrCaution,
                              Map<LoadBand, BandPlanDefaults> planDefaults, ScoringPolicy scoringPolicy,
                              List<Rule> rules) {

    public RuleSetSettings {
        Objects.requireNonNull(defaultBand, "defaultBand");
        Objects.requireNonNull(hipDrivenMinimumBand, "hipDrivenMinimumBand");
        Objects.requireNonNull(scoringPolicy, "scoringPolicy");
        Map<LoadBand, Double> fractions = new EnumMap<>(LoadBand.class);
        fractions.putAll(bandFractions);
        double previous = 0;
        for (LoadBand band : LoadBand.values()) {
            Double f = fractions.get(band);
            if (f == null || !(f >= previous) || f > 1) {
                throw new IllegalArgumentException("band fractions must rise from Hold to Open within 0–1");
            }
            previous = f;
        }
        if (!Double.isNaN(gripFraction) && !(gripFraction > 0 && gripFraction <= 1)) {
            throw new IllegalArgumentException("grip fraction must be in (0, 1] or NaN");
        }
        if (!(rangeMarginDeg >= 0 && rangeMarginDeg <= 90) || !(stepLimit > 0 && stepLimit <= 1)
                || painDuringLimit < 0 || painDuringLimit > 10 || !(acwrCaution > 0 && acwrCaution <= 5)) {
            throw new IllegalArgumentException("a setting is out of range");
        }
        Map<LoadBand, BandPlanDefaults> plans = new EnumMap<>(LoadBand.class);
        plans.putAll(planDefaults);
        for (LoadBand band : LoadBand.values()) {
            if ((band == LoadBand.HOLD) == plans.containsKey(band)) {
                throw new IllegalArgumentException("plan defaults are needed for every band but Hold: " + band);
            }
        }
        bandFractions = Collections.unmodifiableMap(fractions);
        planDefaults = Collections.unmodifiableMap(plans);
        rules = List.copyOf(rules);
        new RuleSet("check", defaultBand, rules);
    }
}
