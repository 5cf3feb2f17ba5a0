package org.swingclearance.screening.web;

import java.math.BigDecimal;
import java.math.RoundingMode;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import org.springframework.context.MessageSource;
import org.swingclearance.engine.rules.Comparison;
import org.swingclearance.engine.scoring.Unit;
import org.swingclearance.engine.scoring.ValueKey;
import org.swingclearance.screening.ScreeningSnapshot;

/**
 * The findings panel as display text: derived values, fired rules with value, threshold, source and evidence tag,
 * suggested bands, what signing still needs, and the change since the previous signed screening. The page renders
 * it, and the live preview sends the same object as JSON, so the two never disagree. Numbers are rounded for
 * display only (2 decimals, trailing zeros dropped); everything was computed by the engine.
 */
record FindingsPanel(List<ValueRow> derived, List<FindingRow> findings, List<BandRow> bands, List<String> missing,
                     List<ChangeRow> changes, String previous, int rulesVersion, String rulesLabel,
                     boolean redFlagsOpen, Map<String, String> fieldErrors) {

    private static final java.time.format.DateTimeFormatter MINUTE = java.time.format.DateTimeFormatter
            .ofPattern("yyyy-MM-dd HH:mm 'UTC'").withZone(java.time.ZoneOffset.UTC);

    /** A panel carrying only field problems (the preview of a form with unacceptable values). */
    static FindingsPanel problems(Map<String, String> fieldErrors) {
        return new FindingsPanel(List.of(), List.of(), List.of(), List.of(), List.of(), null, 0, null, false,
                fieldErrors);
    }

    /** A derived value, or why it has none. */
    record ValueRow(String key, String label, String value, String notScorable, String source) {
    }

    /** A fired rule. */
    record FindingRow(String rule, String label, String line, String source, String evidence) {
    }

    /** The suggested band of a region and what decided it. */
    record BandRow(String region, String regionLabel, String band, String bandLabel, String basis) {
    }

    /** Change of an outcome score since the previous signed screening, against its MCID. */
    record ChangeRow(String label, String previous, String current, String improvement, String mcid, String verdict,
                     String source) {
    }

    static FindingsPanel of(ScreeningSnapshot s, Set<String> recordedMeasures,
                            MessageSource messages, Locale locale, Map<String, String> fieldErrors) {
        Text t = new Text(messages, locale);
        List<ValueRow> derived = new ArrayList<>();
        for (ScreeningSnapshot.Derived d : s.derived()) {
            if (d.value() == null && !inputRecorded(d.key(), recordedMeasures)) {
                continue;
            }
            derived.add(new ValueRow(d.key(), t.valueLabel(d.key()),
                    d.value() == null ? null : t.value(d.value(), d.unit()), d.notScorable(), d.source()));
        }
        List<FindingRow> findings = s.findings().stream().map(f -> new FindingRow(f.ruleCode(),
                t.valueLabel(f.measurement()), t.msg("OPEN".equals(f.cappedBand()) ? "screening.finding.informational"
                        : "screening.finding.line", t.value(f.value(), f.unit()),
                        t.threshold(f.comparison(), f.threshold(), f.unit()),
                        t.msg("Region." + f.region()).toLowerCase(locale), t.msg("LoadBand." + f.cappedBand())),
                f.source(), t.msg("EvidenceTag." + f.evidenceTag()))).toList();
        List<BandRow> bands = List.of(
                new BandRow("SHOULDER", t.msg("Region.SHOULDER"), s.shoulder().band(),
                        t.msg("LoadBand." + s.shoulder().band()), t.msg("SuggestionBasis." + s.shoulder().basis())),
                new BandRow("LUMBOPELVIC", t.msg("Region.LUMBOPELVIC"), s.lumbopelvic().band(),
                        t.msg("LoadBand." + s.lumbopelvic().band()), t.msg("SuggestionBasis." + s.lumbopelvic().basis())));
        List<String> missing = s.missingForSigning().stream().map(m -> t.msg("screening.missing.line",
                t.valueLabel(m.measurement()), t.msg("Region." + m.region()),
                String.join(", ", m.slots().stream().map(t::slotLabel).toList()))).distinct().toList();
        List<ChangeRow> changes = s.changes().stream().map(c -> new ChangeRow(t.valueLabel(c.key()),
                c.previous() == null ? null : t.number(c.previous()), c.current() == null ? null : t.number(c.current()),
                c.improvement() == null ? null : t.number(c.improvement()),
                c.mcidPercent() == null ? t.msg("screening.change.mcid", t.number(c.mcidPoints()))
                        : t.msg("screening.change.mcidOrPercent", t.number(c.mcidPoints()), t.number(c.mcidPercent())),
                t.msg(c.importantImprovement() ? "screening.change.improved"
                        : c.importantWorsening() ? "screening.change.worse" : "screening.change.belowMcid"),
                c.mcidSource())).toList();
        String previous = s.previous() == null ? null : t.msg("screening.change.since",
                String.valueOf(s.previous().versionNo()), MINUTE.format(java.time.Instant.parse(s.previous().signedAt())));
        return new FindingsPanel(derived, findings, bands, missing, changes, previous, s.rulesVersion(),
                t.msg("screening.findings.rulesVersion", String.valueOf(s.rulesVersion())), s.redFlagsOpen(),
                fieldErrors);
    }

    /** True when any raw input of a derived value was recorded (then a missing value is shown with its reason). */
    private static boolean inputRecorded(String key, Set<String> recordedMeasures) {
        for (ValueKey k : ValueKey.values()) {
            if (k.name().equals(key)) {
                return k.inputs().stream().anyMatch(ref -> recordedMeasures.contains(ref.measure().name()));
            }
        }
        return false;
    }

    /** Message lookup and number formatting for one locale. */
    record Text(MessageSource messages, Locale locale) {

        String msg(String code, Object... args) {
            return messages.getMessage(code, args, code, locale);
        }

        /** Label of a derived value: a value key, or one of the evaluator's per-side values. */
        String valueLabel(String key) {
            for (ValueKey k : ValueKey.values()) {
                if (k.name().equals(key)) {
                    return msg("ValueKey." + key);
                }
            }
            return msg("SideValue." + key);
        }

        /** A measurement slot as the engine names it, e.g. "SHOULDER_FLEXION_ACTIVE:LEFT". */
        String slotLabel(String slot) {
            int colon = slot.indexOf(':');
            if (colon < 0) {
                return msg("Measure." + slot);
            }
            return msg("screening.slot", msg("Measure." + slot.substring(0, colon)),
                    msg("Side." + slot.substring(colon + 1)));
        }

        String value(double value, String unitName) {
            Unit unit = Unit.valueOf(unitName);
            if (unit == Unit.YES_NO) {
                return msg(value == 1 ? "form.yes" : "form.no");
            }
            return number(value) + (unit.symbol().isEmpty() ? "" : " " + unit.symbol());
        }

        String threshold(String comparison, double threshold, String unitName) {
            Unit unit = Unit.valueOf(unitName);
            if (unit == Unit.YES_NO) {
                return Comparison.valueOf(comparison).symbol() + " " + msg(threshold == 1 ? "form.yes" : "form.no");
            }
            return Comparison.valueOf(comparison).symbol() + " " + value(threshold, unitName);
        }

        String number(double value) {
            return BigDecimal.valueOf(value).setScale(2, RoundingMode.HALF_UP).stripTrailingZeros().toPlainString();
        }
    }
}
