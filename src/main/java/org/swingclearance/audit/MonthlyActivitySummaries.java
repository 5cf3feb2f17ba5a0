package org.swingclearance.audit;

import java.sql.Date;
import java.time.Clock;
import java.time.Duration;
import java.time.Instant;
import java.time.YearMonth;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.UUID;
import org.springframework.jdbc.core.JdbcTemplate;
import org.springframework.stereotype.Repository;

/**
 * Events per month for the activity chart, without scanning a year of events on every view: a month that ended
 * more than a day ago (a margin for clocks) is counted once and its counts kept in audit_month_summary; the
 * months since are counted live. Closed months cannot change: events are append-only and stamped at append.
 */
@Repository
class MonthlyActivitySummaries {

    private static final Duration CLOSING_MARGIN = Duration.ofDays(1);

    private final JdbcTemplate jdbc;
    private final AuditEventQueries events;
    private final Clock clock;

    MonthlyActivitySummaries(JdbcTemplate jdbc, AuditEventQueries events, Clock clock) {
        this.jdbc = jdbc;
        this.events = events;
        this.clock = clock;
    }

    /** One entry per month from {@code first} to {@code last}, zeros included. */
    List<MonthlyActivity> months(UUID clinicId, YearMonth first, YearMonth last) {
        YearMonth open = YearMonth.from(clock.instant().minus(CLOSING_MARGIN).atZone(ZoneOffset.UTC));
        Map<String, MonthlyActivity> kept = new HashMap<>();
        jdbc.query("""
                select month, events, about_patients, denied, failed from audit_month_summary
                where clinic_id = ? and month between ? and ?""",
                rs -> {
                    String month = YearMonth.from(rs.getDate(1).toLocalDate()).toString();
                    kept.put(month, new MonthlyActivity(month, rs.getLong(2), rs.getLong(3), rs.getLong(4),
                            rs.getLong(5)));
                }, clinicId, Date.valueOf(first.atDay(1)), Date.valueOf(last.atDay(1)));
        List<MonthlyActivity> result = new ArrayList<>();
        for (YearMonth month = first; !month.isAfter(last); month = month.plusMonths(1)) {
            MonthlyActivity counts = kept.get(month.toString());
            if (counts == null) {
                counts = count(clinicId, month);
                if (month.isBefore(open)) {
                    keep(clinicId, month, counts);
                }
            }
            result.add(counts);
        }
        return result;
    }

    private MonthlyActivity count(UUID clinicId, YearMonth month) {
        Instant from = month.atDay(1).atStartOfDay(ZoneOffset.UTC).toInstant();
        Instant until = month.plusMonths(1).atDay(1).atStartOfDay(ZoneOffset.UTC).toInstant();
        return events.monthlyActivity(clinicId, from, until).stream().findFirst()
                .orElse(new MonthlyActivity(month.toString(), 0, 0, 0, 0));
    }

    private void keep(UUID clinicId, YearMonth month, MonthlyActivity counts) {
        jdbc.update("""
                insert into audit_month_summary (clinic_id, month, events, about_patients, denied, failed, computed_at)
                values (?, ?, ?, ?, ?, ?, ?) on conflict do nothing""",
                clinicId, Date.valueOf(month.atDay(1)), counts.events(), counts.aboutPatients(), counts.denied(),
                counts.failed(), java.sql.Timestamp.from(clock.instant()));
    }
}
