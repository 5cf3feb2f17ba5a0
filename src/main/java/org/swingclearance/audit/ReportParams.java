package org.swingclearance.audit;

import java.time.LocalDate;

/**
 * The period of a report (UTC days, both inclusive), the age in days that makes a draft stale, and the day the
 * report is made on (overdue is judged against it).
 */
public record ReportParams(LocalDate from, LocalDate to, int staleDays, LocalDate today) {
}
