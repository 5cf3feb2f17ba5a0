package org.swingclearance.engine.load;

import static org.assertj.core.api.Assertions.assertThat;

import java.time.LocalDate;
import java.util.List;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.Tuple;

/** Invariants of the load maths over arbitrary daily loads. */
class LoadProperties {

    private static final LocalDate START = LocalDate.of(2025, 1, 6);

    @Property
    void ewmaStaysBetweenTheSmallestAndLargestDailyLoadSoFar(@ForAll("dailyLoads") List<Double> daily) {
        List<EwmaDay> series = Ewma.series(DailyLoads.ofValues(START, daily), EwmaPolicy.DEFAULT);
        double min = Double.POSITIVE_INFINITY;
        double max = Double.NEGATIVE_INFINITY;
        for (int day = 0; day < daily.size(); day++) {
            min = Math.min(min, daily.get(day));
            max = Math.max(max, daily.get(day));
            double tolerance = 1e-9 * Math.max(1, max);
            assertThat(series.get(day).acute().getAsDouble()).isBetween(min - tolerance, max + tolerance);
            assertThat(series.get(day).chronic().getAsDouble()).isBetween(min - tolerance, max + tolerance);
        }
    }

    @Property
    void monotonyIsNeverNegative(@ForAll("week") List<Double> week) {
        for (SdConvention convention : SdConvention.values()) {
            Monotony monotony = Monotony.of(week, convention);
            monotony.monotony().ifPresent(value -> assertThat(value).isGreaterThanOrEqualTo(0));
            monotony.strain().ifPresent(value -> assertThat(value).isGreaterThanOrEqualTo(0));
        }
    }

    @Property
    void coupledRatioNeverExceedsFourBecauseTheAcuteWeekIsInTheChronicLoad(
            @ForAll("fourWeeks") List<Double> daily) {
        DailyLoads loads = DailyLoads.ofValues(START, daily);
        RollingAcwr.at(loads, loads.to()).coupled()
                .ifPresent(ratio -> assertThat(ratio).isBetween(0.0, 4.0 + 1e-12));
    }

    @Provide
    Arbitrary<List<Double>> dailyLoads() {
        return load().list().ofMinSize(1).ofMaxSize(90);
    }

    @Provide
    Arbitrary<List<Double>> week() {
        return load().list().ofSize(7);
    }

    @Provide
    Arbitrary<List<Double>> fourWeeks() {
        return load().list().ofSize(28);
    }

    private static Arbitrary<Double> load() {
        // RPE 0–10 × up to 600 min, with many rest days
        return Arbitraries.frequencyOf(
                Tuple.of(1, Arbitraries.just(0.0)),
                Tuple.of(3, Arbitraries.doubles().between(0, 6000).ofScale(2)));
    }
}
