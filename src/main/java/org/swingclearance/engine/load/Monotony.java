package org.swingclearance.engine.load;

import java.util.List;
import java.util.Objects;
import java.util.OptionalDouble;

/**
 * Training monotony and strain over one week (Foster 1998): monotony = mean daily load ÷ SD of daily loads (rest
 * days count as 0); strain = weekly load × monotony. "High" monotony is often quoted as &gt; 2.0 (from memory, low
 * confidence).
 *
 * @param weeklyLoad Σ of the 7 daily loads in AU
 * @param mean       mean daily load in AU
 * @param sd         standard deviation of the daily loads in AU, by {@code convention}
 * @param monotony   mean ÷ SD, ≥ 0; empty when SD = 0 (identical days)
 * @param strain     weekly load × monotony in AU; empty when monotony is
 * @param convention the SD convention used; never null
 */
public record Monotony(double weeklyLoad, double mean, double sd, OptionalDouble monotony, OptionalDouble strain,
        SdConvention convention) {

    public Monotony {
        Objects.requireNonNull(monotony, "monotony");
        Objects.requireNonNull(strain, "strain");
        Objects.requireNonNull(convention, "convention");
    }

    /**
     * Computes monotony and strain.
     *
     * @param dailyLoads exactly 7 daily loads in AU, each ≥ 0, rest days as 0; never null
     * @param convention sample or population SD; never null
     */
    public static Monotony of(List<Double> dailyLoads, SdConvention convention) {
        Objects.requireNonNull(dailyLoads, "dailyLoads");
        Objects.requireNonNull(convention, "convention");
        if (dailyLoads.size() != RollingAcwr.WEEK) {
            throw new IllegalArgumentException("monotony needs 7 daily loads, got " + dailyLoads.size());
        }
        double sum = 0;
        for (Double load : dailyLoads) {
            sum += Checks.nonNegative(load, "daily load");
        }
        double mean = sum / dailyLoads.size();
        double squares = 0;
        for (Double load : dailyLoads) {
            squares += (load - mean) * (load - mean);
        }
        int denominator = convention == SdConvention.SAMPLE ? dailyLoads.size() - 1 : dailyLoads.size();
        double sd = Math.sqrt(squares / denominator);
        if (sd == 0) {
            return new Monotony(sum, mean, 0, OptionalDouble.empty(), OptionalDouble.empty(), convention);
        }
        double monotony = mean / sd;
        return new Monotony(sum, mean, sd, OptionalDouble.of(monotony), OptionalDouble.of(sum * monotony),
                convention);
    }
}
