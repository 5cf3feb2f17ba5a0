package org.swingclearance.rules;

import java.util.EnumMap;
import java.util.Map;
import org.swingclearance.engine.rules.DefaultRules;
import org.swingclearance.engine.rules.LoadBand;
import org.swingclearance.engine.scoring.ScoringPolicy;

/** The settings every clinic's version 1 starts from. */
final class DefaultSettings {

    /** Default margin below measured active flexion for C4 (engine.md §5). */
    static final double RANGE_MARGIN_DEG = 10;
    /** Default relative rise of the demand ratio per plan step (engine.md §7; common practice, no source). */
    static final double STEP_LIMIT = 0.10;
    /** Pain during activity allowed up to 5/10 (Silbernagel et al. 2007; clinical.md §6.4). */
    static final int PAIN_DURING_LIMIT = 5;
    /** ACWR "danger" ≥ 1.5 (Gabbett 2016, numbers from memory; contested, informational only; clinical.md §6.5). */
    static final double ACWR_CAUTION = 1.5;

    private DefaultSettings() {
    }

    static RuleSetSettings create() {
        Map<LoadBand, Double> fractions = new EnumMap<>(LoadBand.class);
        for (LoadBand band : LoadBand.values()) {
            fractions.put(band, band.defaultFraction());
        }
        // Plan-step defaults per band: common practice, no source; a clinic edits them with its rules.
        Map<LoadBand, BandPlanDefaults> plans = new EnumMap<>(LoadBand.class);
        plans.put(LoadBand.BAND_1, new BandPlanDefaults(2, 10, 3));
        plans.put(LoadBand.BAND_2, new BandPlanDefaults(3, 10, 4));
        plans.put(LoadBand.BAND_3, new BandPlanDefaults(3, 12, 6));
        plans.put(LoadBand.OPEN, new BandPlanDefaults(4, 12, 7));
        return new RuleSetSettings(DefaultRules.DEFAULT_BAND, fractions, Double.NaN, true, RANGE_MARGIN_DEG,
                LoadBand.BAND_2, STEP_LIMIT, PAIN_DURING_LIMIT, ACWR_CAUTION, plans, ScoringPolicy.DEFAULT,
                DefaultRules.ruleSet().rules());
    }
}
