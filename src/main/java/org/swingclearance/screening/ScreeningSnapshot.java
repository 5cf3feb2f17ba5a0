package org.swingclearance.screening;

import java.util.List;
import java.util.Map;
import java.util.UUID;

/**
 * What the engine made of one screening version, stored with it as JSON so a signed record never changes when code
 * or rules change later: the inputs it used, every derived value, the findings under the rules version, the
 * suggested bands and why, what signing still needs, and the change since the previous signed screening.
 *
 * @param engineVersion     version of the engine that computed this
 * @param ruleSetId         the practice-rules version used
 * @param rulesVersion      its number within the clinic
 * @param inputs            engine inputs besides the measurements (body mass, stature, involved side, region)
 * @param derived           every derived value, scorable or not
 * @param findings          each rule that fired
 * @param shoulder          suggested shoulder band
 * @param lumbopelvic       suggested lumbopelvic band
 * @param missingForSigning what a required or fired rule needs and was not recorded
 * @param changes           change of each outcome score with an MCID since the previous signed screening
 * @param redFlags          the red flags ticked at this screening plus those still open on the episode
 */
public record ScreeningSnapshot(String engineVersion, UUID ruleSetId, int rulesVersion, EngineInputs inputs,
                                List<Derived> derived, List<Finding> findings, Suggestion shoulder,
                                Suggestion lumbopelvic, List<Missing> missingForSigning, PreviousScreening previous,
                                List<Change> changes, List<String> redFlags, boolean redFlagsOpen) {

    /**
     * The patient and episode facts the engine used. {@code involvedSide} is the side the engine compared against
     * (null for a lumbopelvic-only episode: no side-to-side indices); {@code factsSide} is the side other features
     * read as involved (the episode's shoulder, else the dominant hand) and {@code factsSideBasis} says which.
     */
    public record EngineInputs(String region, String involvedSide, String factsSide, String factsSideBasis,
                               double bodyMassKg, double statureM, int ageYears, String sex) {
    }

    /** One derived value; {@code value} null when not scorable, then {@code notScorable} says why. */
    public record Derived(String key, Double value, String unit, String notScorable, String source) {
    }

    /** A rule that fired: the value it saw against its threshold, the band it caps and where the threshold comes from. */
    public record Finding(String ruleCode, String measurement, String comparison, double threshold, String unit,
                          double value, String region, String cappedBand, String source, String evidenceTag) {
    }

    /** The band the engine suggests for a region and what decided it. */
    public record Suggestion(String band, String basis, List<String> ruleCodes) {
    }

    /** A value a rule needs for signing, and the measurement slots that were not recorded. */
    public record Missing(String measurement, String ruleCode, String region, List<String> slots) {
    }

    /** The signed screening the changes compare with. */
    public record PreviousScreening(UUID screeningId, int versionNo, String signedAt) {
    }

    /** Change of an outcome score since the previous signed screening (improvement = previous − current). */
    public record Change(String key, Double previous, Double current, Double improvement, Double percentImprovement,
                         double mcidPoints, Double mcidPercent, String mcidSource, boolean importantImprovement,
                         boolean importantWorsening) {
    }

    /** Derived values by key, for trends and change. */
    public Map<String, Double> values() {
        Map<String, Double> values = new java.util.LinkedHashMap<>();
        derived.forEach(d -> {
            if (d.value() != null) {
                values.put(d.key(), d.value());
            }
        });
        return values;
    }
}
