package org.swingclearance.audit;

/** Audit events of one month (UTC, "YYYY-MM"): all, those about a patient, denied attempts, failed sign-ins. */
public record MonthlyActivity(String month, long events, long aboutPatients, long denied, long failed) {
}
