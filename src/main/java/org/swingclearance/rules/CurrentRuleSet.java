package org.swingclearance.rules;

import java.time.Instant;
import java.util.List;
import java.util.Map;
import java.util.UUID;
import org.swingclearance.engine.rules.LoadBand;
import org.swingclearance.engine.rules.Rule;
import org.swingclearance.engine.rules.RuleSet;
import org.swingclearance.engine.scoring.ScoringPolicy;

/**
 * One version of a clinic's practice rules as other features see it (Contract R). Versions are immutable: a
 * screening or plan that records {@link #version()} can always show the rules it used.
 *
 * @param id        the version's id
 * @param clinicId  the clinic
 * @param version   1, 2, … within the clinic
 * @param createdAt when it was saved
 * @param createdBy who saved it; null for the seeded defaults
 * @param changeNote why it was changed; null for the seeded defaults
 * @param settings  the content
 */
public record CurrentRuleSet(UUID id, UUID clinicId, int version, Instant createdAt, UUID createdBy, String changeNote,
                             RuleSetSettings settings) {

    /** Fraction of measured capacity each band permits. */
    public Map<LoadBand, Double> bandFractions() {
        return settings.bandFractions();
    }

    public double fraction(LoadBand band) {
        return settings.bandFractions().get(band);
    }

    /** Fraction of a band given by name (HOLD, BAND_1, BAND_2, BAND_3, OPEN). */
    public double fraction(String bandName) {
        return fraction(LoadBand.valueOf(bandName));
    }

    /** The grip fraction setting; NaN means "the band's own fraction". */
    public double gripFraction() {
        return settings.gripFraction();
    }

    /** True when the grip constraint uses each band's own fraction. */
    public boolean gripFollowsBand() {
        return Double.isNaN(settings.gripFraction());
    }

    /** The fraction the grip constraint (C3) uses in a band. */
    public double gripFractionFor(LoadBand band) {
        return Double.isNaN(settings.gripFraction()) ? fraction(band) : settings.gripFraction();
    }

    public boolean controlledStop() {
        return settings.controlledStop();
    }

    public double rangeMarginDeg() {
        return settings.rangeMarginDeg();
    }

    /** The lumbopelvic band a hip-driven pattern needs, as a LoadBand name. */
    public String hipDrivenMinimumBand() {
        return settings.hipDrivenMinimumBand().name();
    }

    public double stepLimit() {
        return settings.stepLimit();
    }

    public int painDuringLimit() {
        return settings.painDuringLimit();
    }

    public double acwrCaution() {
        return settings.acwrCaution();
    }

    public LoadBand defaultBand() {
        return settings.defaultBand();
    }

    /** Sets, reps and effort cap of plan steps per band; Hold has none. */
    public Map<LoadBand, BandPlanDefaults> planDefaults() {
        return settings.planDefaults();
    }

    public BandPlanDefaults planDefaults(LoadBand band) {
        BandPlanDefaults d = settings.planDefaults().get(band);
        if (d == null) {
            throw new IllegalArgumentException("no plan defaults in " + band);
        }
        return d;
    }

    public ScoringPolicy scoringPolicy() {
        return settings.scoringPolicy();
    }

    public List<Rule> rules() {
        return settings.rules();
    }

    /** The label the engine records for this version, e.g. "v3". */
    public String versionLabel() {
        return "v" + version;
    }

    /** The rules as the engine's rule set. */
    public RuleSet ruleSet() {
        return new RuleSet(versionLabel(), settings.defaultBand(), settings.rules());
    }
}
