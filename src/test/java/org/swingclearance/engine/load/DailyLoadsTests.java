package org.swingclearance.engine.load;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.time.LocalDate;
import java.util.Collections;
import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;

/** Rest days count as 0, missing days stay unknown, and the EWMA and windows treat them as the conventions say. */
class DailyLoadsTests {

    private static final LocalDate MONDAY = LocalDate.of(2025, 3, 3);

    @Test
    void sessionsAreSummedPerDayAndUnloggedDaysAreRest() {
        DailyLoads loads = DailyLoads.of(MONDAY, MONDAY.plusDays(3), List.of(new SessionLoad(MONDAY, 6, 45),
                new SessionLoad(MONDAY, 3, 20), new SessionLoad(MONDAY.plusDays(2), 5, 30),
                new SessionLoad(MONDAY.plusDays(9), 5, 30)), Set.of(MONDAY.plusDays(3)));
        assertThat(loads.days()).extracting(DailyLoad::status).containsExactly(DayStatus.TRAINED, DayStatus.REST,
                DayStatus.TRAINED, DayStatus.MISSING);
        assertThat(loads.days().get(0).load().getAsDouble()).isEqualTo(330.0); // 270 + 60
        assertThat(loads.days().get(1).load().getAsDouble()).isEqualTo(0.0);
        assertThat(loads.days().get(3).load()).isEmpty();
        assertThat(loads.windowStatus(MONDAY.plusDays(2), 3)).isEqualTo(WindowStatus.COMPLETE);
        assertThat(loads.windowStatus(MONDAY.plusDays(3), 3)).isEqualTo(WindowStatus.MISSING_DAYS);
        assertThat(loads.windowStatus(MONDAY.plusDays(1), 3)).isEqualTo(WindowStatus.INSUFFICIENT_HISTORY);
        assertThat(loads.window(MONDAY.plusDays(2), 3)).containsExactly(330.0, 0.0, 150.0);
    }

    @Test
    void aDayCannotBeBothLoggedAndMissing() {
        assertThatThrownBy(() -> DailyLoads.of(MONDAY, MONDAY, List.of(new SessionLoad(MONDAY, 6, 45)),
                Set.of(MONDAY))).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> DailyLoads.of(MONDAY, MONDAY.minusDays(1), List.of(), Set.of()))
                .isInstanceOf(IllegalArgumentException.class);
    }

    @Test
    void ewmaCarriesOverAMissingDayAndShowsNoRatioForIt() {
        DailyLoads loads = DailyLoads.of(MONDAY, MONDAY.plusDays(3), List.of(new SessionLoad(MONDAY, 5, 20),
                new SessionLoad(MONDAY.plusDays(2), 5, 40)), Set.of(MONDAY.plusDays(1)));
        List<EwmaDay> series = Ewma.series(loads, new EwmaPolicy(7, 28, 0));
        assertThat(series.get(1).status()).isEqualTo(RatioStatus.MISSING_DAY);
        assertThat(series.get(1).acute()).isEqualTo(series.get(0).acute());
        assertThat(series.get(1).ratio()).isEmpty();
        // day 3 updates from the seed 100 as if the missing day had not happened: 0.25 × 200 + 0.75 × 100
        assertThat(series.get(2).acute().getAsDouble()).isEqualTo(125.0);
        assertThat(series.get(2).status()).isEqualTo(RatioStatus.SHOWN);
    }

    @Test
    void ewmaWaitsForTheFirstKnownDayAndReportsAZeroChronicLoad() {
        DailyLoads loads = DailyLoads.of(MONDAY, MONDAY.plusDays(2), List.of(), Set.of(MONDAY));
        List<EwmaDay> series = Ewma.series(loads, EwmaPolicy.DEFAULT);
        assertThat(series.get(0).status()).isEqualTo(RatioStatus.NO_DATA);
        assertThat(series.get(0).acute()).isEmpty();
        assertThat(series.get(1).status()).isEqualTo(RatioStatus.ZERO_CHRONIC);
        assertThat(series.get(1).acute().getAsDouble()).isEqualTo(0.0);
    }

    @Test
    void reportSummarisesTheRangeAndStatesItsConventions() {
        DailyLoads loads = DailyLoads.ofValues(MONDAY, List.of(300.0, 0.0, 450.0, 200.0, 0.0, 500.0, 250.0));
        LoadReport report = LoadMonitor.analyse(loads, MonitoringPolicy.DEFAULT);
        // Foster 1998 / clinical.md §7.2: monotony 1.235 with the default sample SD
        assertThat(report.lastWeek().orElseThrow().monotony().getAsDouble()).isBetween(1.234, 1.236);
        assertThat(report.ewma()).hasSize(7);
        assertThat(report.rolling()).allSatisfy(r -> assertThat(r.status()).isEqualTo(RatioStatus.INCOMPLETE_WINDOW));
        assertThat(report.conventions()).extracting(Convention::code).contains("load.ewma-seed",
                "load.ewma-warm-up", "load.rest-or-missing", "load.acwr-disputed", "load.monotony");
        assertThat(report.conventions()).filteredOn(c -> c.code().equals("load.ewma-warm-up")).singleElement()
                .satisfies(c -> assertThat(c.text()).contains("28 days"));
        DailyLoads withGap = DailyLoads.of(MONDAY, MONDAY.plusDays(6), List.of(), Set.of(MONDAY.plusDays(6)));
        assertThat(LoadMonitor.analyse(withGap, MonitoringPolicy.DEFAULT).lastWeek()).isEmpty();
        assertThat(DailyLoads.ofValues(MONDAY, Collections.nCopies(3, 0.0)).days())
                .allSatisfy(day -> assertThat(day.status()).isEqualTo(DayStatus.REST));
    }

    @Test
    void mechanicalDoseAndAdherence() {
        // engine.md §9 (product definition): dose = Σ reps × D = 30 × 0.25 + 20 × 0.4 = 15.5
        assertThat(MechanicalDose.of(List.of(new MechanicalDose.Block(30, 0.25), new MechanicalDose.Block(20, 0.4))))
                .isEqualTo(15.5);
        Adherence adherence = Adherence.of(4, List.of(ConfigurationMatch.AS_PLANNED, ConfigurationMatch.AS_PLANNED,
                ConfigurationMatch.HEAVIER));
        assertThat(adherence.done()).isEqualTo(3);
        assertThat(adherence.completionPercent().getAsDouble()).isEqualTo(75.0);
        assertThat(adherence.asPlannedPercent().getAsDouble()).isCloseTo(66.667, within(0.001));
        assertThat(adherence.heavier()).isEqualTo(1);
        assertThat(Adherence.of(0, List.of()).completionPercent()).isEmpty();
        assertThat(ConfigurationMatch.compare(false, 0.45, 0.40)).isEqualTo(ConfigurationMatch.HEAVIER);
        assertThat(ConfigurationMatch.compare(false, 0.35, 0.40)).isEqualTo(ConfigurationMatch.LIGHTER);
        assertThat(ConfigurationMatch.compare(false, 0.40, 0.40)).isEqualTo(ConfigurationMatch.DIFFERENT);
        assertThat(ConfigurationMatch.compare(true, 0.40, 0.40)).isEqualTo(ConfigurationMatch.AS_PLANNED);
    }
}
