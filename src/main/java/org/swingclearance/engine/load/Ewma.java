package org.swingclearance.engine.load;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.OptionalDouble;

/**
 * EWMA acute and chronic load (Williams, West, Cross, Stokes 2017): EWMA_t = λ·L_t + (1 − λ)·EWMA_{t−1},
 * λ = 2/(N + 1). Conventions (clinical.md §7.4, [C]): both series are seeded with the first known day's load; a day
 * marked missing leaves both averages unchanged and has no ratio; the ratio is suppressed during the warm-up.
 */
public final class Ewma {

    private Ewma() {
    }

    /**
     * The acute and chronic EWMA and their ratio for every day of the range.
     *
     * @param loads  daily loads; never null
     * @param policy window lengths and warm-up; never null
     * @return one entry per day, in date order; never null
     */
    public static List<EwmaDay> series(DailyLoads loads, EwmaPolicy policy) {
        Objects.requireNonNull(loads, "loads");
        Objects.requireNonNull(policy, "policy");
        double acuteLambda = policy.acuteLambda();
        double chronicLambda = policy.chronicLambda();
        List<EwmaDay> series = new ArrayList<>();
        Double acute = null;
        Double chronic = null;
        int daysSinceSeed = -1;
        for (DailyLoad day : loads.days()) {
            if (acute != null) {
                daysSinceSeed++;
            }
            if (day.status() == DayStatus.MISSING) {
                series.add(new EwmaDay(day.date(), optional(acute), optional(chronic), OptionalDouble.empty(),
                        acute == null ? RatioStatus.NO_DATA : RatioStatus.MISSING_DAY));
                continue;
            }
            double load = day.load().getAsDouble();
            if (acute == null) {
                acute = load;
                chronic = load;
                daysSinceSeed = 0;
            } else {
                acute = acuteLambda * load + (1 - acuteLambda) * acute;
                chronic = chronicLambda * load + (1 - chronicLambda) * chronic;
            }
            OptionalDouble ratio = chronic == 0 ? OptionalDouble.empty() : OptionalDouble.of(acute / chronic);
            RatioStatus status = chronic == 0 ? RatioStatus.ZERO_CHRONIC
                    : daysSinceSeed < policy.warmUpDays() ? RatioStatus.WARM_UP : RatioStatus.SHOWN;
            series.add(new EwmaDay(day.date(), OptionalDouble.of(acute), OptionalDouble.of(chronic), ratio, status));
        }
        return series;
    }

    private static OptionalDouble optional(Double value) {
        return value == null ? OptionalDouble.empty() : OptionalDouble.of(value);
    }
}
