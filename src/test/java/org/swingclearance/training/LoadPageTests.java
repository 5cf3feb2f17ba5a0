package org.swingclearance.training;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.time.LocalDate;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.jdbc.core.JdbcTemplate;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.MvcResult;
import org.springframework.transaction.support.TransactionTemplate;
import org.swingclearance.engine.load.DailyLoads;
import org.swingclearance.engine.load.LoadMonitor;
import org.swingclearance.engine.load.LoadReport;
import org.swingclearance.engine.load.MechanicalDose;
import org.swingclearance.engine.load.MonitoringPolicy;
import org.swingclearance.patient.Patients;
import org.swingclearance.plan.Plans;
import org.swingclearance.support.IntegrationTest;
import org.swingclearance.support.PostgresTestBase;
import org.swingclearance.support.TestData;
import org.swingclearance.support.TestData.TestClinic;
import org.swingclearance.training.TrainingFixtures.SharedPlan;

/**
 * The numbers on the training log page are the load engine's for the same logs (the engine's own check values are
 * tested in the engine), and they reproduce the worked examples of clinical.md §7 end to end.
 */
@IntegrationTest
class LoadPageTests extends PostgresTestBase {

    @Autowired
    MockMvc mvc;
    @Autowired
    TestData data;
    @Autowired
    JdbcTemplate jdbc;
    @Autowired
    Patients patients;
    @Autowired
    Plans plans;
    @Autowired
    TransactionTemplate tx;
    @Autowired
    SessionLogs sessions;

    TestClinic clinic;
    SharedPlan plan;
    LocalDate today;

    @BeforeEach
    void setUp() {
        clinic = data.clinic();
        plan = new TrainingFixtures(data, jdbc, patients, plans, tx).sharedPlan(clinic, clinic.trainer());
        today = LocalDate.now(ZoneOffset.UTC);
    }

    private void log(LocalDate day, int rpe, int minutes) {
        sessions.log(clinic.trainer(), plan.episodeId(), new SessionEntry(day, 1, true, null, minutes, rpe, 0, 0, null));
    }

    private Workspace page() throws Exception {
        MvcResult result = mvc.perform(get("/training/episodes/{id}", plan.episodeId())
                .with(data.as(clinic.clinician()))).andExpect(status().isOk()).andReturn();
        return (Workspace) result.getModelAndView().getModel().get("ws");
    }

    @Test
    void theEwmaSeriesOnThePageIsTheEnginesAndReproducesTheWilliamsCheck() throws Exception {
        // 14 days at 100 AU (RPE 5 × 20 min), then 300 AU (RPE 6 × 50 min) on day 15, then rest to today.
        List<Double> daily = new ArrayList<>();
        for (int day = 0; day < 14; day++) {
            log(plan.startsOn().plusDays(day), 5, 20);
            daily.add(100.0);
        }
        log(plan.startsOn().plusDays(14), 6, 50);
        daily.add(300.0);
        while (daily.size() < TrainingFixtures.START_DAYS_AGO + 1) {
            daily.add(0.0);
        }
        LoadView load = page().load();

        // clinical.md §7.4 check (Williams et al. 2017, seed = first day's load): acute 150.000, chronic 113.793.
        LoadDay spike = load.days().get(14);
        assertThat(spike.date()).isEqualTo(plan.startsOn().plusDays(14));
        assertThat(spike.load()).isEqualTo(300.0);
        assertThat(spike.acute()).isCloseTo(150.000, within(0.001));
        assertThat(spike.chronic()).isCloseTo(113.793, within(0.001));

        // Every day of the page equals the engine run on the same daily loads.
        LoadReport engine = LoadMonitor.analyse(DailyLoads.ofValues(plan.startsOn(), daily), MonitoringPolicy.DEFAULT);
        assertThat(load.days()).hasSize(daily.size());
        for (int i = 0; i < daily.size(); i++) {
            assertThat(load.days().get(i).load()).isEqualTo(daily.get(i));
            assertThat(load.days().get(i).acute()).isEqualTo(engine.ewma().get(i).acute().getAsDouble());
            assertThat(load.days().get(i).chronic()).isEqualTo(engine.ewma().get(i).chronic().getAsDouble());
        }
        assertThat(load.ratioEwma()).isNull(); // day 21 of the series: still within the 28-day warm-up
        assertThat(load.weeklyLoad()).isEqualTo(engine.lastWeek().orElseThrow().weeklyLoad());
        // Dose: 15 sessions of 3 × 10 swings at step 1's D = 0.18 (engine.md §9: Σ reps × D).
        assertThat(load.mechanicalDose()).isCloseTo(MechanicalDose.of(java.util.Collections.nCopies(15,
                new MechanicalDose.Block(30, 0.18))), within(1e-9)).isCloseTo(81.0, within(1e-9));
        // Adherence: 3 sessions a week over the 21 days since the plan started = 9 planned, 15 done as planned.
        assertThat(load.sessionsPlanned()).isEqualTo(9);
        assertThat(load.sessionsDone()).isEqualTo(15);
        assertThat(load.sessionsAsPlanned()).isEqualTo(15);
    }

    @Test
    void monotonyAndStrainOfTheLastWeekReproduceTheFosterCheck() throws Exception {
        // clinical.md §7.2 check (Foster 1998): daily loads 300, 0, 450, 200, 0, 500, 250 → weekly 1,700 AU,
        // monotony 1.235 and strain 2,098.9 with the sample SD.
        log(today.minusDays(6), 5, 60);
        log(today.minusDays(4), 9, 50);
        log(today.minusDays(3), 5, 40);
        log(today.minusDays(1), 10, 50);
        log(today, 5, 50);
        Workspace ws = page();
        assertThat(ws.load().weeklyLoad()).isEqualTo(1700.0);
        assertThat(ws.load().monotony()).isCloseTo(1.235, within(0.001));
        assertThat(ws.load().strain()).isCloseTo(2098.9, within(0.1));
        // Session load on the page: RPE 6 × 45 min would be 270 AU (Foster 2001); here RPE 10 × 50 = 500 AU.
        assertThat(ws.sessions()).filteredOn(s -> s.date().equals(today.minusDays(1)))
                .extracting(SessionView::sessionLoadAu).containsExactly(500.0);
        String html = mvc.perform(get("/training/episodes/{id}", plan.episodeId()).with(data.as(clinic.trainer())))
                .andReturn().getResponse().getContentAsString();
        assertThat(html).contains("id=\"load-monotony\">1.23<").contains("id=\"load-weekly\">1700 AU<")
                .contains("training-chart-data").contains("predictive");
    }
}
