package org.swingclearance.engine.load;

import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * Everything the load charts show for a date range.
 *
 * @param loads          the daily loads; never null
 * @param ewma           EWMA acute, chronic and ratio per day; never null
 * @param rolling        rolling coupled and uncoupled ratios per day; never null
 * @param lastWeekStatus whether the last 7 days of the range are complete; never null
 * @param lastWeek       monotony and strain of the last 7 days; empty unless that window is complete
 * @param conventions    the conventions applied, for display; never null
 */
public record LoadReport(DailyLoads loads, List<EwmaDay> ewma, List<RollingRatio> rolling,
        WindowStatus lastWeekStatus, Optional<Monotony> lastWeek, List<Convention> conventions) {

    public LoadReport {
        Objects.requireNonNull(loads, "loads");
        ewma = List.copyOf(Objects.requireNonNull(ewma, "ewma"));
        rolling = List.copyOf(Objects.requireNonNull(rolling, "rolling"));
        Objects.requireNonNull(lastWeekStatus, "lastWeekStatus");
        Objects.requireNonNull(lastWeek, "lastWeek");
        conventions = List.copyOf(Objects.requireNonNull(conventions, "conventions"));
    }

    /** The EWMA of the last day of the range; never null. */
    public EwmaDay latestEwma() {
        return ewma.get(ewma.size() - 1);
    }
}
