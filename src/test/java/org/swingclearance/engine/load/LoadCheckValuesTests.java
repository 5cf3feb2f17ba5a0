package org.swingclearance.engine.load;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import org.junit.jupiter.api.Test;

/** Training-load check values of clinical.md §0, §7 and Appendix D, each with its published source. */
class LoadCheckValuesTests {

    private static final LocalDate START = LocalDate.of(2025, 3, 3);

    @Test
    void sessionRpeLoad() {
        // Foster 2001 [V,H] / clinical.md §7.1: RPE 6 × 45 min = 270 AU
        assertThat(new SessionLoad(START, 6, 45).load()).isEqualTo(270.0);
    }

    @Test
    void sessionInputsOutsideTheirScalesAreRefused() {
        // issue 7: RPE outside 0–10, duration ≤ 0 or over 600 min refused
        assertThatThrownBy(() -> new SessionLoad(START, 11, 45)).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> new SessionLoad(START, 5, 0)).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> new SessionLoad(START, 5, 601)).isInstanceOf(IllegalArgumentException.class);
    }

    @Test
    void monotonyAndStrainWithSampleAndPopulationSd() {
        // Foster 1998 [S,H]; SD convention [C] / clinical.md §7.2: weekly 1,700 AU, mean 242.857
        List<Double> week = List.of(300.0, 0.0, 450.0, 200.0, 0.0, 500.0, 250.0);
        Monotony sample = Monotony.of(week, SdConvention.SAMPLE);
        assertThat(sample.weeklyLoad()).isEqualTo(1700.0);
        assertThat(sample.mean()).isCloseTo(242.857, within(0.001));
        assertThat(sample.sd()).isCloseTo(196.699, within(0.001)); // sample SD 196.699
        assertThat(sample.monotony().getAsDouble()).isCloseTo(1.235, within(0.001)); // monotony 1.235
        assertThat(sample.strain().getAsDouble()).isCloseTo(2098.9, within(0.1)); // strain 2,098.9
        Monotony population = Monotony.of(week, SdConvention.POPULATION);
        assertThat(population.sd()).isCloseTo(182.108, within(0.001)); // population SD 182.108
        assertThat(population.monotony().getAsDouble()).isCloseTo(1.334, within(0.001)); // monotony 1.334
        assertThat(population.strain().getAsDouble()).isCloseTo(2267.1, within(0.1)); // strain 2,267.1
    }

    @Test
    void monotonyIsAbsentWhenEveryDayIsTheSame() {
        // clinical.md §7.2 [C]: return null when SD = 0
        Monotony flat = Monotony.of(Collections.nCopies(7, 100.0), SdConvention.SAMPLE);
        assertThat(flat.monotony()).isEmpty();
        assertThat(flat.strain()).isEmpty();
    }

    @Test
    void rollingRatiosFromWeeklyTotals() {
        // Hulin 2016 [V,H]; uncoupled per Lolli 2019 [S,H] / clinical.md §7.3: 1000, 1200, 1100 then 1500
        RollingRatio ratio = RollingAcwr.fromWeeklyTotals(List.of(1000.0, 1200.0, 1100.0), 1500, START);
        assertThat(ratio.coupled().getAsDouble()).isCloseTo(1.250, within(0.001)); // 1500 / 1200
        assertThat(ratio.uncoupled().getAsDouble()).isCloseTo(1.364, within(0.001)); // 1500 / 1100
    }

    @Test
    void rollingRatiosFromDailyLoads() {
        // same weeks spread over days (Hulin 2016 / clinical.md §7.3): the daily route must give 1.250 and 1.364
        List<Double> daily = new ArrayList<>();
        for (double week : new double[] {1000, 1200, 1100, 1500}) {
            daily.addAll(List.of(week * 0.3, 0.0, week * 0.3, 0.0, week * 0.4, 0.0, 0.0));
        }
        DailyLoads loads = DailyLoads.ofValues(START, daily);
        RollingRatio ratio = RollingAcwr.at(loads, loads.to());
        assertThat(ratio.status()).isEqualTo(RatioStatus.SHOWN);
        assertThat(ratio.acute().getAsDouble()).isCloseTo(1500, within(1e-9));
        assertThat(ratio.coupled().getAsDouble()).isCloseTo(1.250, within(0.001));
        assertThat(ratio.uncoupled().getAsDouble()).isCloseTo(1.364, within(0.001));
        assertThat(RollingAcwr.at(loads, loads.to().minusDays(1)).status()).isEqualTo(RatioStatus.INCOMPLETE_WINDOW);
    }

    @Test
    void ewmaLambdas() {
        // Williams 2017 [V,H] / clinical.md §7.4: N = 7 and 28 -> λa = 0.25, λc = 0.068966
        assertThat(EwmaPolicy.DEFAULT.acuteLambda()).isEqualTo(0.25);
        assertThat(EwmaPolicy.DEFAULT.chronicLambda()).isCloseTo(0.068966, within(1e-6));
    }

    @Test
    void ewmaWorkedCheck() {
        // Williams 2017; seed = first day [C] / clinical.md §7.4 and Appendix D acwr_ewma:
        // 14 days at 100 AU, day 15 at 300 -> acute 150.000, chronic 113.793, ratio 1.318;
        // day 16 at 0 -> acute 112.500, chronic 105.945, ratio 1.062
        List<Double> daily = new ArrayList<>(Collections.nCopies(14, 100.0));
        daily.add(300.0);
        daily.add(0.0);
        List<EwmaDay> series = Ewma.series(DailyLoads.ofValues(START, daily), EwmaPolicy.DEFAULT);
        EwmaDay day15 = series.get(14);
        assertThat(day15.acute().getAsDouble()).isCloseTo(150.000, within(0.001));
        assertThat(day15.chronic().getAsDouble()).isCloseTo(113.793, within(0.001));
        assertThat(day15.ratio().getAsDouble()).isCloseTo(1.318, within(0.001));
        EwmaDay day16 = series.get(15);
        assertThat(day16.acute().getAsDouble()).isCloseTo(112.500, within(0.001));
        assertThat(day16.chronic().getAsDouble()).isCloseTo(105.945, within(0.001));
        assertThat(day16.ratio().getAsDouble()).isCloseTo(1.062, within(0.001));
        // clinical.md §7.4 [C]: the ratio is suppressed during the first 28 days
        assertThat(day15.status()).isEqualTo(RatioStatus.WARM_UP);
        assertThat(day15.shownRatio()).isEmpty();
    }

    @Test
    void constantLoadGivesRatioOneShownAfterTheWarmUp() {
        // Williams 2017 / clinical.md §7.4: constant 100 AU every day -> ratio 1.000
        List<EwmaDay> series = Ewma.series(DailyLoads.ofValues(START, Collections.nCopies(30, 100.0)),
                EwmaPolicy.DEFAULT);
        assertThat(series.get(27).status()).isEqualTo(RatioStatus.WARM_UP); // day 28
        assertThat(series.get(28).status()).isEqualTo(RatioStatus.SHOWN); // day 29
        assertThat(series.get(29).shownRatio().getAsDouble()).isCloseTo(1.000, within(1e-12));
    }
}
