package org.swingclearance.audit;

import java.util.List;

/**
 * A computed report: message keys of its columns and its rows as display text (times in UTC), the same for the
 * page and the CSV export.
 */
public record Report(ReportKind kind, List<String> columnKeys, List<List<String>> rows, ReportParams params) {
}
