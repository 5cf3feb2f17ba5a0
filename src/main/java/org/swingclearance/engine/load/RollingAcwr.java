package org.swingclearance.engine.load;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.OptionalDouble;

/**
 * Rolling-average acute:chronic workload ratios, coupled (Hulin et al. 2016) and uncoupled (Lolli et al. 2019).
 * A window with a missing day, or one reaching before the range, gives no ratio.
 */
public final class RollingAcwr {

    /** Days of one week. */
    public static final int WEEK = 7;
    /** Weeks of the coupled chronic window (the acute week included). */
    public static final int CHRONIC_WEEKS = 4;

    private RollingAcwr() {
    }

    /**
     * Ratios from weekly totals.
     *
     * @param earlierWeeks the three weekly totals before the acute week, oldest first, each ≥ 0
     * @param acuteWeek    the current week's total, ≥ 0
     * @param date         the day the acute week ends on; never null
     */
    public static RollingRatio fromWeeklyTotals(List<Double> earlierWeeks, double acuteWeek, LocalDate date) {
        Objects.requireNonNull(earlierWeeks, "earlierWeeks");
        if (earlierWeeks.size() != CHRONIC_WEEKS - 1) {
            throw new IllegalArgumentException("need " + (CHRONIC_WEEKS - 1) + " earlier weeks, got "
                    + earlierWeeks.size());
        }
        double earlierSum = 0;
        for (Double week : earlierWeeks) {
            earlierSum += Checks.nonNegative(week, "weekly load");
        }
        Checks.nonNegative(acuteWeek, "acute weekly load");
        double coupledChronic = (earlierSum + acuteWeek) / CHRONIC_WEEKS;
        double uncoupledChronic = earlierSum / (CHRONIC_WEEKS - 1);
        OptionalDouble coupled = coupledChronic == 0 ? OptionalDouble.empty()
                : OptionalDouble.of(acuteWeek / coupledChronic);
        OptionalDouble uncoupled = uncoupledChronic == 0 ? OptionalDouble.empty()
                : OptionalDouble.of(acuteWeek / uncoupledChronic);
        return new RollingRatio(date, OptionalDouble.of(acuteWeek), OptionalDouble.of(coupledChronic),
                OptionalDouble.of(uncoupledChronic), coupled, uncoupled,
                coupled.isPresent() ? RatioStatus.SHOWN : RatioStatus.ZERO_CHRONIC);
    }

    /** Ratios on one day of the range, from the 28 days ending on it. */
    public static RollingRatio at(DailyLoads loads, LocalDate date) {
        Objects.requireNonNull(loads, "loads");
        int days = WEEK * CHRONIC_WEEKS;
        if (loads.windowStatus(date, days) != WindowStatus.COMPLETE) {
            OptionalDouble none = OptionalDouble.empty();
            return new RollingRatio(date, none, none, none, none, none, RatioStatus.INCOMPLETE_WINDOW);
        }
        List<Double> window = loads.window(date, days);
        List<Double> weeks = new ArrayList<>();
        for (int week = 0; week < CHRONIC_WEEKS; week++) {
            double total = 0;
            for (int day = week * WEEK; day < (week + 1) * WEEK; day++) {
                total += window.get(day);
            }
            weeks.add(total);
        }
        return fromWeeklyTotals(weeks.subList(0, CHRONIC_WEEKS - 1), weeks.get(CHRONIC_WEEKS - 1), date);
    }

    /** Ratios for every day of the range, in date order. */
    public static List<RollingRatio> series(DailyLoads loads) {
        Objects.requireNonNull(loads, "loads");
        return loads.days().stream().map(day -> at(loads, day.date())).toList();
    }
}
