package org.swingclearance.rules.web;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.EnumSet;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;
import java.util.Set;
import org.springframework.validation.Errors;
import org.swingclearance.engine.evidence.Citation;
import org.swingclearance.engine.evidence.Confidence;
import org.swingclearance.engine.evidence.EvidenceTag;
import org.swingclearance.engine.rules.LoadBand;
import org.swingclearance.engine.rules.Rule;
import org.swingclearance.engine.scoring.Instrument;
import org.swingclearance.engine.scoring.Mcid;
import org.swingclearance.engine.scoring.ScoringPolicy;
import org.swingclearance.engine.scoring.ValueKey;
import org.swingclearance.rules.BandPlanDefaults;
import org.swingclearance.rules.RuleSetSettings;

/**
 * Turns the editor form into checked settings, rejecting each bad entry on its field: rule rows that are
 * incomplete, duplicate codes, unknown value keys, practice rules tagged as physics, band fractions that do not
 * rise from Hold to Open, bands without plan defaults.
 */
final class RuleSetFormReader {

    private RuleSetFormReader() {
    }

    /** The settings, or null when {@code errors} received at least one error. */
    static RuleSetSettings read(RuleSetForm form, Errors errors) {
        Map<LoadBand, Double> fractions = new EnumMap<>(LoadBand.class);
        Map<LoadBand, BandPlanDefaults> plans = new EnumMap<>(LoadBand.class);
        double previous = 0;
        for (int i = 0; i < form.getBands().size(); i++) {
            RuleSetForm.BandRow row = form.getBands().get(i);
            String path = "bands[" + i + "]";
            if (row.getBand() == null || row.getFractionPercent() == null) {
                continue;
            }
            double fraction = row.getFractionPercent() / 100.0;
            if (fraction < previous) {
                errors.rejectValue(path + ".fractionPercent", "rules.error.fractionsOrder");
            }
            previous = Math.max(previous, fraction);
            fractions.put(row.getBand(), fraction);
            if (row.getBand() != LoadBand.HOLD) {
                if (row.getSets() == null || row.getReps() == null || row.getEffortCap() == null) {
                    errors.rejectValue(path + ".sets", "rules.error.planRequired");
                } else if (!errors.hasFieldErrors(path + ".*")) {
                    plans.put(row.getBand(), new BandPlanDefaults(row.getSets(), row.getReps(), row.getEffortCap()));
                }
            }
        }
        if (fractions.size() != LoadBand.values().length) {
            errors.reject("rules.error.bandsIncomplete");
        }

        Map<Instrument, Mcid> mcids = new EnumMap<>(Instrument.class);
        for (int i = 0; i < form.getMcids().size(); i++) {
            RuleSetForm.McidRow row = form.getMcids().get(i);
            String path = "mcids[" + i + "]";
            if (row.getEvidenceTag() == EvidenceTag.PHYSICAL_LAW) {
                errors.rejectValue(path + ".evidenceTag", "rules.error.physicsTag");
            }
            if (row.getInstrument() == null || errors.hasFieldErrors(path + ".*")) {
                continue;
            }
            mcids.put(row.getInstrument(), new Mcid(row.getInstrument(), row.getPoints(),
                    row.getPercent() == null ? OptionalDouble.empty() : OptionalDouble.of(row.getPercent()),
                    new Citation(row.getSource().trim(), row.getEvidenceTag(), row.getConfidence(),
                            row.getSourceSection().trim())));
        }

        List<Rule> rules = new ArrayList<>();
        Set<String> codes = new HashSet<>();
        for (int i = 0; i < form.getRules().size(); i++) {
            RuleSetForm.RuleRow row = form.getRules().get(i);
            if (row.isRemove() || row.blank()) {
                continue;
            }
            Rule rule = rule(row, "rules[" + i + "]", codes, errors);
            if (rule != null) {
                rules.add(rule);
            }
        }
        if (errors.hasErrors()) {
            return null;
        }
        try {
            return new RuleSetSettings(form.getDefaultBand(), fractions,
                    form.getGripPercent() == null ? Double.NaN : form.getGripPercent() / 100.0,
                    form.isControlledStop(), form.getRangeMarginDeg(), form.getHipDrivenMinimumBand(),
                    form.getStepLimitPercent() / 100.0, form.getPainDuringLimit(), form.getAcwrCaution(), plans,
                    new ScoringPolicy(form.getOdiMaxMissingSections(), form.getSpadiMaxMissingItems(),
                            form.getSpadiTotalMethod(), mcids), rules);
        } catch (IllegalArgumentException e) {
            errors.reject("rules.error.inconsistent", new Object[] {e.getMessage()}, null);
            return null;
        }
    }

    private static Rule rule(RuleSetForm.RuleRow row, String path, Set<String> codes, Errors errors) {
        int before = errors.getErrorCount();
        String code = row.getCode() == null ? "" : row.getCode().trim();
        if (code.isEmpty()) {
            errors.rejectValue(path + ".code", "NotBlank");
        } else if (!codes.add(code)) {
            errors.rejectValue(path + ".code", "rules.error.duplicateCode");
        }
        require(row.getMeasurement(), path + ".measurement", errors);
        require(row.getComparison(), path + ".comparison", errors);
        require(row.getRegion(), path + ".region", errors);
        require(row.getCappedBand(), path + ".cappedBand", errors);
        require(row.getEvidenceTag(), path + ".evidenceTag", errors);
        if (row.getThreshold() == null || !Double.isFinite(row.getThreshold())) {
            errors.rejectValue(path + ".threshold", "NotNull");
        }
        if (row.getSource() == null || row.getSource().isBlank()) {
            errors.rejectValue(path + ".source", "NotBlank");
        }
        if (row.getEvidenceTag() == EvidenceTag.PHYSICAL_LAW) {
            errors.rejectValue(path + ".evidenceTag", "rules.error.physicsTag");
        }
        Set<ValueKey> needs = EnumSet.noneOf(ValueKey.class);
        if (row.getAlsoNeeds() != null) {
            for (String name : row.getAlsoNeeds().split(",")) {
                if (name.isBlank()) {
                    continue;
                }
                try {
                    needs.add(ValueKey.valueOf(name.trim()));
                } catch (IllegalArgumentException e) {
                    errors.rejectValue(path + ".alsoNeeds", "rules.error.unknownValue", new Object[] {name.trim()},
                            null);
                }
            }
        }
        if (errors.getErrorCount() > before) {
            return null;
        }
        String section = row.getSourceSection() == null || row.getSourceSection().isBlank()
                ? "clinic practice rules" : row.getSourceSection().trim();
        Confidence confidence = row.getConfidence() == null ? Confidence.NOT_STATED : row.getConfidence();
        return new Rule(code, row.getMeasurement(), row.getComparison(), row.getThreshold(), row.getMeasurement().unit(),
                row.getRegion(), row.getCappedBand(), new Citation(row.getSource().trim(), row.getEvidenceTag(),
                confidence, section), row.isRequired(), needs);
    }

    private static void require(Object value, String path, Errors errors) {
        if (value == null) {
            errors.rejectValue(path, "NotNull");
        }
    }
}
