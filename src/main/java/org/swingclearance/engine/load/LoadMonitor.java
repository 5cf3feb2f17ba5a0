package org.swingclearance.engine.load;

import java.util.Objects;
import java.util.Optional;

/** Computes the full load report of a date range: the entry point of the training feature's charts. */
public final class LoadMonitor {

    private LoadMonitor() {
    }

    /**
     * Analyses daily loads.
     *
     * @param loads  the range, ending on the day of interest; never null
     * @param policy monitoring settings; never null
     */
    public static LoadReport analyse(DailyLoads loads, MonitoringPolicy policy) {
        Objects.requireNonNull(loads, "loads");
        Objects.requireNonNull(policy, "policy");
        WindowStatus lastWeekStatus = loads.windowStatus(loads.to(), RollingAcwr.WEEK);
        Optional<Monotony> lastWeek = lastWeekStatus == WindowStatus.COMPLETE
                ? Optional.of(Monotony.of(loads.window(loads.to(), RollingAcwr.WEEK), policy.sdConvention()))
                : Optional.empty();
        return new LoadReport(loads, Ewma.series(loads, policy.ewma()), RollingAcwr.series(loads), lastWeekStatus,
                lastWeek, LoadConventions.describe(policy));
    }
}
