package org.swingclearance.envelope.web;

import java.io.IOException;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.util.Locale;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;
import org.springframework.context.MessageSource;
import org.springframework.context.i18n.LocaleContextHolder;
import org.springframework.stereotype.Component;
import org.swingclearance.envelope.EnvelopePage;
import org.swingclearance.envelope.EnvelopeRow;
import org.swingclearance.envelope.EnvelopeSnapshotView;

/**
 * Writes an envelope as CSV: the caution first, then what it was computed from, then one line per club × pattern.
 * Cells that a spreadsheet would run as a formula (starting with =, +, -, @) are prefixed with an apostrophe.
 */
@Component
class EnvelopeCsv {

    private final MessageSource messages;

    EnvelopeCsv(MessageSource messages) {
        this.messages = messages;
    }

    String write(EnvelopePage page) {
        EnvelopeSnapshotView s = page.snapshot();
        StringWriter out = new StringWriter();
        try (CSVPrinter csv = new CSVPrinter(out, CSVFormat.DEFAULT)) {
            csv.printRecord(text("caution.limits"));
            csv.printRecord(text("envelope.csv.patient"), safe(page.patient().code()));
            csv.printRecord(text("envelope.csv.screening"), s.screeningId(), s.screeningVersion());
            csv.printRecord(text("envelope.csv.cycleTime"), number(s.cycleTimeS(), 2));
            csv.printRecord(text("envelope.csv.engineVersion"), s.engineVersion());
            csv.printRecord(text("envelope.csv.rulesVersion"), s.rulesVersion());
            csv.printRecord(text("envelope.csv.computedAt"), s.computedAt());
            csv.printRecord(text("envelope.csv.snapshot"), s.id());
            csv.printRecord(text("envelope.column.club"), text("envelope.csv.clubMass"), text("envelope.column.pattern"),
                    text("envelope.csv.status"), text("envelope.column.permitted"), text("envelope.column.demand"),
                    text("envelope.column.binding"), text("envelope.csv.usualGrip"), text("envelope.csv.furthestGrip"),
                    text("envelope.csv.chokeUp"), text("envelope.csv.shortestCycle"), text("envelope.csv.swingsPerMinute"),
                    text("envelope.csv.heaviestMass"), text("envelope.csv.largestHalfArc"));
            for (EnvelopeRow r : s.rows()) {
                csv.printRecord(safe(r.clubName()), number(r.clubMassKg(), 2), safe(r.patternName()), r.status(),
                        r.computed() ? text(r.permitted() ? "form.yes" : "form.no") : "",
                        number(r.demandRatio(), 3), r.binding() == null ? "" : text("envelope.constraint." + r.binding()),
                        number(r.usualGripCm(), 1), number(r.furthestGripCm(), 1), number(r.chokeUpCm(), 1),
                        number(r.shortestCycleTimeS(), 2), number(r.swingsPerMinute(), 1),
                        number(r.heaviestMassKg(), 2), number(r.largestHalfArcDeg(), 0));
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return out.toString();
    }

    private String text(String key) {
        return messages.getMessage(key, null, LocaleContextHolder.getLocale());
    }

    private static String number(Double value, int decimals) {
        return value == null ? "" : String.format(Locale.ROOT, "%." + decimals + "f", value);
    }

    /** Defuses spreadsheet formulas in user-entered text (CSV injection). */
    private static String safe(String text) {
        return text != null && !text.isEmpty() && "=+-@\t\r".indexOf(text.charAt(0)) >= 0 ? "'" + text : text;
    }
}
