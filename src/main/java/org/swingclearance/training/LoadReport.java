package org.swingclearance.training;

import java.time.LocalDate;
import java.util.List;

/**
 * The load monitoring of an episode up to a day, as computed by the load engine: the daily series, the latest
 * acute and chronic loads and ratios, monotony and strain of the last 7 days, the mechanical dose and adherence.
 * Monotony and strain are null when the 7 loads do not vary.
 */
public record LoadReport(LocalDate asOf, List<LoadDay> days, int warmUpDays, double weeklyLoad, Double acute,
                         Double chronic, Double ratioEwma, Double ratioCoupled, Double ratioUncoupled,
                         Double monotony, Double strain, double mechanicalDose, int sessionsWithoutDose,
                         int sessionsDone, int sessionsPlanned, int sessionsAsPlanned, int sessionsDifferent) {

    public boolean empty() {
        return days.isEmpty();
    }

    /** The latest day of the series, or null before any session. */
    public LoadDay latest() {
        return days.isEmpty() ? null : days.get(days.size() - 1);
    }
}
