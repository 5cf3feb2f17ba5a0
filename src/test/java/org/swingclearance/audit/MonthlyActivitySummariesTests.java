package org.swingclearance.audit;

import static org.assertj.core.api.Assertions.assertThat;

import java.time.Clock;
import java.time.LocalDate;
import java.time.YearMonth;
import java.time.ZoneOffset;
import java.util.UUID;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.jdbc.core.JdbcTemplate;
import org.springframework.transaction.PlatformTransactionManager;
import org.springframework.transaction.support.TransactionTemplate;
import org.swingclearance.support.IntegrationTest;
import org.swingclearance.support.PostgresTestBase;
import org.swingclearance.support.TestData;
import org.swingclearance.support.TestData.TestClinic;

/** The activity chart's months: closed months counted once and kept, the current month counted live. */
@IntegrationTest
class MonthlyActivitySummariesTests extends PostgresTestBase {

    @Autowired
    MonthlyActivitySummaries summaries;
    @Autowired
    TestData data;
    @Autowired
    JdbcTemplate jdbc;
    @Autowired
    PlatformTransactionManager transactions;
    @Autowired
    TransactionTemplate tx;

    @Test
    void closedMonthsAreKeptAndTheCurrentMonthIsLive() {
        TestClinic clinic = data.clinic();
        YearMonth now = YearMonth.now(ZoneOffset.UTC);
        LocalDate twoMonthsAgo = now.minusMonths(2).atDay(10);
        AuditLog then = new AuditLog(jdbc, Clock.fixed(twoMonthsAgo.atTime(9, 0).toInstant(ZoneOffset.UTC),
                ZoneOffset.UTC), transactions);
        UUID patient = UUID.randomUUID();
        tx.executeWithoutResult(s -> {
            then.record(clinic.clinician(), "PATIENT_READ", "Patient", patient, patient, null);
            then.record(clinic.clinician(), "PATIENT_READ", "Patient", patient, patient, null);
        });
        then.recordDenied(clinic.trainer(), "PATIENT_READ", "Patient", patient, "not shared");

        assertThat(summaries.months(clinic.id(), now.minusMonths(2), now)).containsExactly(
                new MonthlyActivity(now.minusMonths(2).toString(), 3, 2, 1, 0),
                new MonthlyActivity(now.minusMonths(1).toString(), 0, 0, 0, 0),
                // This month: the clinic's staff accounts were created, nothing audited yet.
                new MonthlyActivity(now.toString(), 0, 0, 0, 0));
        assertThat(jdbc.queryForList("select to_char(month, 'YYYY-MM') from audit_month_summary where clinic_id = ?"
                + " order by month", String.class, clinic.id())).contains(now.minusMonths(2).toString())
                .doesNotContain(now.toString());

        new ChainFixture(new AuditLog(jdbc, Clock.systemUTC(), transactions), tx, jdbc)
                .reads(clinic.clinician(), patient, 4);
        assertThat(summaries.months(clinic.id(), now, now)).containsExactly(
                new MonthlyActivity(now.toString(), 4, 4, 0, 0));
        // A kept month is not counted again: its events cannot change.
        assertThat(summaries.months(clinic.id(), now.minusMonths(2), now.minusMonths(2)).get(0).events()).isEqualTo(3);
    }
}
