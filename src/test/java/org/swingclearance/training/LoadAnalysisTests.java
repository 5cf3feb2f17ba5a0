package org.swingclearance.training;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.List;
import java.util.Properties;
import java.util.UUID;
import org.junit.jupiter.api.Test;
import org.swingclearance.engine.load.ConfigurationMatch;
import org.swingclearance.training.LoadView.ConventionLine;

/** What the workspace decides around the engine: "heavier", planned sessions, and a message for every convention. */
class LoadAnalysisTests {

    static final UUID CLUB = UUID.randomUUID();
    final SwingConfiguration step = new SwingConfiguration(CLUB, "Light", 4, 15, 2.0, 3, 10);

    @Test
    void heavierOnAnyOneDialCountsAsHeavierEvenWhenDIsLower() {
        // Product rule (issue 7): a heavier club, a grip further from the head or a shorter cycle time is heavier.
        assertThat(LoadAnalysis.match(new SwingConfiguration(null, null, 5, 15, 2.0, 3, 10), null, step, 0.2))
                .isEqualTo(ConfigurationMatch.HEAVIER);
        assertThat(LoadAnalysis.match(new SwingConfiguration(CLUB, "Light", 4, 12.5, 2.0, 3, 10), null, step, 0.2))
                .isEqualTo(ConfigurationMatch.HEAVIER);
        assertThat(LoadAnalysis.match(new SwingConfiguration(CLUB, "Light", 4, 15, 1.8, 3, 10), 0.19, step, 0.2))
                .isEqualTo(ConfigurationMatch.HEAVIER);
    }

    @Test
    void withAKnownDTheEngineComparesDemandRatios() {
        assertThat(LoadAnalysis.match(new SwingConfiguration(CLUB, "Light", 4, 20, 2.5, 3, 10), 0.18, step, 0.2))
                .isEqualTo(ConfigurationMatch.LIGHTER);
        assertThat(LoadAnalysis.match(step, 0.2, step, 0.2)).isEqualTo(ConfigurationMatch.AS_PLANNED);
        // More swings of the same configuration: different, not heavier (volume is not a dial).
        assertThat(LoadAnalysis.match(new SwingConfiguration(CLUB, "Light", 4, 15, 2.0, 4, 10), 0.2, step, 0.2))
                .isEqualTo(ConfigurationMatch.DIFFERENT);
        assertThat(LoadAnalysis.match(new SwingConfiguration(CLUB, "Light", 4, 20, 2.5, 3, 12), null, step, 0.2))
                .isEqualTo(ConfigurationMatch.DIFFERENT);
    }

    @Test
    void plannedSessionsCountWholeSessionsFromThePlansFirstDay() {
        TrainingPlan plan = TrainingPlanTests.plan(); // 3 sessions a week from START
        assertThat(LoadAnalysis.plannedSessions(plan, TrainingPlanTests.START.minusDays(1))).isZero();
        assertThat(LoadAnalysis.plannedSessions(plan, TrainingPlanTests.START)).isZero(); // 1 day × 3/7
        assertThat(LoadAnalysis.plannedSessions(plan, TrainingPlanTests.START.plusDays(2))).isEqualTo(1);
        assertThat(LoadAnalysis.plannedSessions(plan, TrainingPlanTests.START.plusDays(6))).isEqualTo(3);
        assertThat(LoadAnalysis.plannedSessions(plan, TrainingPlanTests.START.plusDays(20))).isEqualTo(9);
    }

    @Test
    void everyConventionTheEngineStatesHasAMessageWithItsValues() throws IOException {
        Properties bundle = new Properties();
        try (var in = new InputStreamReader(Files.newInputStream(
                Path.of("src/main/resources/messages/training.properties")), StandardCharsets.UTF_8)) {
            bundle.load(in);
        }
        List<ConventionLine> lines = LoadAnalysis.conventions(LoadAnalysis.policy(new AlertLimits(1, 5, 1.5)));
        assertThat(lines).isNotEmpty();
        for (ConventionLine line : lines) {
            assertThat(bundle).as(line.key()).containsKey(line.key());
        }
        assertThat(lines).filteredOn(l -> l.key().equals("convention.load.ewma")).singleElement()
                .satisfies(l -> assertThat(l.args()).containsExactly(7, "0.2500", 28, "0.0690"));
        assertThat(lines).filteredOn(l -> l.key().equals("convention.load.acwr-caution")).singleElement()
                .satisfies(l -> assertThat(l.args()).containsExactly("1.50"));
    }

    @Test
    void sessionLoadAndDoseComeFromTheEngine() {
        LoadAnalysis analysis = new LoadAnalysis();
        TrainingPlan plan = TrainingPlanTests.plan();
        TrainingStep step = plan.step(1).orElseThrow();
        SessionEntry entry = new SessionEntry(LocalDate.of(2026, 3, 3), 1, true, null, 45, 6, 0, 1, null);
        SessionLogVersion v = new SessionLogVersion(UUID.randomUUID(), UUID.randomUUID(), UUID.randomUUID(), 1, plan,
                step, entry, step.configuration(), step.demandRatio(), null, UUID.randomUUID(),
                java.time.Instant.now());
        assertThat(analysis.sessionLoad(v)).isEqualTo(270.0); // RPE 6 × 45 min = 270 AU (Foster 2001, clinical.md §7.1)
        assertThat(analysis.dose(v)).isCloseTo(30 * 0.18, org.assertj.core.api.Assertions.within(1e-12));
    }
}
