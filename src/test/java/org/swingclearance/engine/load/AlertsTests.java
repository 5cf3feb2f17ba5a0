package org.swingclearance.engine.load;

import static org.assertj.core.api.Assertions.assertThat;

import java.time.LocalDate;
import java.util.List;
import java.util.OptionalDouble;
import org.junit.jupiter.api.Test;
import org.swingclearance.engine.evidence.Citations;

/** Alerts raised from a logged session and the monitoring signals. */
class AlertsTests {

    private static final LocalDate TODAY = LocalDate.of(2025, 3, 20);

    private static PainDecision pain(int during, Integer nextMorning) {
        return PainMonitoring.assess(TODAY, TODAY.minusDays(10), 1,
                List.of(new PainRecord(TODAY.minusDays(1), during, nextMorning)), PainPolicy.DEFAULT);
    }

    @Test
    void painAlertsSuggestThePreviousStep() {
        // Silbernagel 2007 [S,M] / clinical.md §6.4: above 5/10 during or not settled -> previous step
        List<Alert> alerts = Alerts.derive(4, pain(6, 3), ConfigurationMatch.AS_PLANNED, OptionalDouble.empty(),
                MonitoringPolicy.DEFAULT);
        assertThat(alerts).extracting(Alert::kind).containsExactly(Alert.Kind.PAIN_DURING_ABOVE_LIMIT,
                Alert.Kind.PAIN_NOT_SETTLED);
        assertThat(alerts).allSatisfy(alert -> {
            assertThat(alert.suggestedStep()).isEqualTo(3);
            assertThat(alert.source()).isEqualTo(Citations.SILBERNAGEL_2007);
        });
    }

    @Test
    void theFirstStepIsTheFloor() {
        assertThat(Alerts.derive(1, pain(7, 1), null, OptionalDouble.empty(), MonitoringPolicy.DEFAULT).get(0)
                .suggestedStep()).isEqualTo(1);
    }

    @Test
    void aHeavierConfigurationSendsTheTrainerBackToTheCurrentStep() {
        List<Alert> alerts = Alerts.derive(4, pain(3, 1), ConfigurationMatch.HEAVIER, OptionalDouble.empty(),
                MonitoringPolicy.DEFAULT);
        assertThat(alerts).extracting(Alert::kind).containsExactly(Alert.Kind.CONFIGURATION_HEAVIER);
        assertThat(alerts.get(0).suggestedStep()).isEqualTo(4);
        assertThat(Alerts.derive(4, pain(3, 1), ConfigurationMatch.LIGHTER, OptionalDouble.empty(),
                MonitoringPolicy.DEFAULT)).isEmpty();
    }

    @Test
    void ratioAboveTheCautionLevelIsAnInformationalAlert() {
        // Gabbett 2016 "danger" ≥ 1.5 [M,H], contested (clinical.md §7.5): caution above 1.5 by default
        List<Alert> alerts = Alerts.derive(4, pain(3, 1), ConfigurationMatch.AS_PLANNED, OptionalDouble.of(1.6),
                MonitoringPolicy.DEFAULT);
        assertThat(alerts).extracting(Alert::kind).containsExactly(Alert.Kind.ACWR_ABOVE_CAUTION);
        assertThat(alerts.get(0).reason()).contains("1.60").contains("disputed").contains("not a clearance");
        assertThat(alerts.get(0).suggestedStep()).isEqualTo(3);
        assertThat(Alerts.derive(4, pain(3, 1), null, OptionalDouble.of(1.5), MonitoringPolicy.DEFAULT)).isEmpty();
        // during the warm-up no ratio is shown, so none can alert
        assertThat(Alerts.derive(4, pain(3, 1), null, OptionalDouble.empty(), MonitoringPolicy.DEFAULT)).isEmpty();
    }
}
