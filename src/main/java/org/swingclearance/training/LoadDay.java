package org.swingclearance.training;

import java.time.LocalDate;

/**
 * One calendar day of the load series: the day's summed session load (AU), the acute and chronic EWMA, the
 * ratios (null while suppressed in the first 28 days), and the demand ratio D of the step the plan schedules
 * that day (null outside the plan).
 */
public record LoadDay(LocalDate date, double load, double acute, double chronic, Double ratioEwma,
                      Double ratioCoupled, Double ratioUncoupled, Double plannedDemand) {
}
