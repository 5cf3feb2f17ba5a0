package org.swingclearance.engine.load;

import java.time.LocalDate;
import java.util.Objects;
import java.util.OptionalDouble;

/**
 * Rolling-average acute:chronic ratios of one day (clinical.md §7.3). Acute = the 7-day total ending that day;
 * coupled chronic = mean of the four 7-day totals ending that day, including the acute week (Hulin 2016);
 * uncoupled chronic = mean of the three 7-day totals before the acute week (Lolli 2019).
 *
 * @param date             never null
 * @param acute            acute 7-day total in AU; empty when the window is incomplete
 * @param coupledChronic   coupled chronic weekly load in AU
 * @param uncoupledChronic uncoupled chronic weekly load in AU
 * @param coupled          acute ÷ coupled chronic; empty when incomplete or the chronic load is 0
 * @param uncoupled        acute ÷ uncoupled chronic; empty when incomplete or the chronic load is 0
 * @param status           {@link RatioStatus#SHOWN} or why not; never null
 */
public record RollingRatio(LocalDate date, OptionalDouble acute, OptionalDouble coupledChronic,
        OptionalDouble uncoupledChronic, OptionalDouble coupled, OptionalDouble uncoupled, RatioStatus status) {

    public RollingRatio {
        Objects.requireNonNull(date, "date");
        Objects.requireNonNull(acute, "acute");
        Objects.requireNonNull(coupledChronic, "coupledChronic");
        Objects.requireNonNull(uncoupledChronic, "uncoupledChronic");
        Objects.requireNonNull(coupled, "coupled");
        Objects.requireNonNull(uncoupled, "uncoupled");
        Objects.requireNonNull(status, "status");
    }
}
