package org.swingclearance.engine.load;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.time.LocalDate;
import java.util.List;
import java.util.OptionalDouble;
import org.junit.jupiter.api.Test;

/**
 * The pain-monitoring rule after Silbernagel 2007 ([S,M], clinical.md §6.4) with the one-week hold of §6.5
 * (rule of thumb, common practice, no source).
 */
class PainMonitoringTests {

    private static final LocalDate TODAY = LocalDate.of(2025, 3, 20);
    private static final LocalDate STEP_START = TODAY.minusDays(10);
    private static final int BASELINE = 1;

    @Test
    void withinLimitsSettledAndFlatAllowsProgression() {
        // clinical.md §6.4 check: during 4/10, next morning back to baseline, weekly trend flat -> allow progression
        List<PainRecord> sessions = List.of(new PainRecord(TODAY.minusDays(9), 4, 1),
                new PainRecord(TODAY.minusDays(5), 4, 1), new PainRecord(TODAY.minusDays(1), 4, 1));
        PainDecision decision = PainMonitoring.assess(TODAY, STEP_START, BASELINE, sessions, PainPolicy.DEFAULT);
        assertThat(decision.decision()).isEqualTo(PainDecision.Decision.PROGRESS);
        assertThat(decision.has(PainReason.Kind.WITHIN_LIMITS)).isTrue();
    }

    @Test
    void painDuringAboveTheLimitRegresses() {
        // clinical.md §6.4 check: during 6/10 -> reduce
        PainDecision decision = PainMonitoring.assess(TODAY, STEP_START, BASELINE,
                List.of(new PainRecord(TODAY.minusDays(1), 6, 1)), PainPolicy.DEFAULT);
        assertThat(decision.decision()).isEqualTo(PainDecision.Decision.REGRESS);
        assertThat(decision.reasons().get(0).kind()).isEqualTo(PainReason.Kind.PAIN_DURING_ABOVE_LIMIT);
        assertThat(decision.reasons().get(0).detail()).contains("6/10").contains("limit 5/10");
        // 5/10 is allowed ("up to 5")
        assertThat(PainMonitoring.assess(TODAY, STEP_START, BASELINE, List.of(new PainRecord(TODAY.minusDays(1), 5, 1)),
                PainPolicy.DEFAULT).decision()).isNotEqualTo(PainDecision.Decision.REGRESS);
    }

    @Test
    void painNotSettledByNextMorningRegresses() {
        // clinical.md §6.4 check: next morning still elevated -> hold or reduce (the model says reduce)
        PainDecision decision = PainMonitoring.assess(TODAY, STEP_START, BASELINE,
                List.of(new PainRecord(TODAY.minusDays(1), 4, 3)), PainPolicy.DEFAULT);
        assertThat(decision.decision()).isEqualTo(PainDecision.Decision.REGRESS);
        assertThat(decision.has(PainReason.Kind.NOT_SETTLED_NEXT_MORNING)).isTrue();
    }

    @Test
    void weekOnWeekRiseRegresses() {
        // Silbernagel 2007 / clinical.md §6.4: pain must not increase from week to week
        List<PainRecord> sessions = List.of(new PainRecord(TODAY.minusDays(10), 2, 1),
                new PainRecord(TODAY.minusDays(8), 2, 1), new PainRecord(TODAY.minusDays(3), 3, 1),
                new PainRecord(TODAY.minusDays(1), 4, 1));
        PainDecision decision = PainMonitoring.assess(TODAY, STEP_START, BASELINE, sessions, PainPolicy.DEFAULT);
        assertThat(decision.decision()).isEqualTo(PainDecision.Decision.REGRESS);
        assertThat(decision.reasons()).extracting(PainReason::kind).containsExactly(PainReason.Kind.WEEKLY_RISE);
        assertThat(decision.reasons().get(0).detail()).contains("from 2 to 3.5");
        // a tolerance of 2 points treats that rise as flat
        PainDecision tolerant = PainMonitoring.assess(TODAY, STEP_START, BASELINE, sessions,
                new PainPolicy(5, 7, 2));
        assertThat(tolerant.decision()).isEqualTo(PainDecision.Decision.PROGRESS);
    }

    @Test
    void threeSessionsWithRisingPainEndInARegressAlert() {
        // issue 7 scenario: three sessions with rising pain during, the last above 5/10
        List<PainRecord> sessions = List.of(new PainRecord(TODAY.minusDays(4), 3, 1),
                new PainRecord(TODAY.minusDays(2), 5, 2), new PainRecord(TODAY, 7, null));
        PainDecision decision = PainMonitoring.assess(TODAY, TODAY.minusDays(4), BASELINE, sessions,
                PainPolicy.DEFAULT);
        assertThat(decision.decision()).isEqualTo(PainDecision.Decision.REGRESS);
        List<Alert> alerts = Alerts.derive(3, decision, ConfigurationMatch.AS_PLANNED, OptionalDouble.empty(),
                MonitoringPolicy.DEFAULT);
        assertThat(alerts).extracting(Alert::kind).containsExactly(Alert.Kind.PAIN_DURING_ABOVE_LIMIT);
        assertThat(alerts.get(0).suggestedStep()).isEqualTo(2);
    }

    @Test
    void holdsWhileInformationIsMissingOrTheStepIsNew() {
        assertThat(PainMonitoring.assess(TODAY, STEP_START, BASELINE, List.of(), PainPolicy.DEFAULT).reasons())
                .extracting(PainReason::kind).containsExactly(PainReason.Kind.NO_SESSION);
        PainDecision pending = PainMonitoring.assess(TODAY, STEP_START, BASELINE,
                List.of(new PainRecord(TODAY, 3, null)), PainPolicy.DEFAULT);
        assertThat(pending.decision()).isEqualTo(PainDecision.Decision.HOLD);
        assertThat(pending.has(PainReason.Kind.NEXT_MORNING_NOT_RECORDED)).isTrue();
        PainDecision noBaseline = PainMonitoring.assess(TODAY, STEP_START, null,
                List.of(new PainRecord(TODAY.minusDays(1), 3, 1)), PainPolicy.DEFAULT);
        assertThat(noBaseline.decision()).isEqualTo(PainDecision.Decision.HOLD);
        assertThat(noBaseline.has(PainReason.Kind.NO_BASELINE)).isTrue();
        // clinical.md §6.5 rule of thumb: hold a new load until stable for ≥ 1 week
        PainDecision newStep = PainMonitoring.assess(TODAY, TODAY.minusDays(3), BASELINE,
                List.of(new PainRecord(TODAY.minusDays(1), 3, 1)), PainPolicy.DEFAULT);
        assertThat(newStep.decision()).isEqualTo(PainDecision.Decision.HOLD);
        assertThat(newStep.has(PainReason.Kind.STEP_HELD_TOO_SHORT)).isTrue();
    }

    @Test
    void aRecentFlareWithinTheHoldPeriodHolds() {
        List<PainRecord> sessions = List.of(new PainRecord(TODAY.minusDays(5), 6, 2),
                new PainRecord(TODAY.minusDays(1), 3, 1));
        PainDecision decision = PainMonitoring.assess(TODAY, STEP_START, BASELINE, sessions, PainPolicy.DEFAULT);
        assertThat(decision.decision()).isEqualTo(PainDecision.Decision.HOLD);
        assertThat(decision.has(PainReason.Kind.RECENT_SYMPTOMS)).isTrue();
    }

    @Test
    void futureSessionsAndStepsAreRefused() {
        assertThatThrownBy(() -> PainMonitoring.assess(TODAY, TODAY.plusDays(1), BASELINE, List.of(),
                PainPolicy.DEFAULT)).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> PainMonitoring.assess(TODAY, STEP_START, BASELINE,
                List.of(new PainRecord(TODAY.plusDays(1), 3, null)), PainPolicy.DEFAULT))
                .isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> new PainRecord(TODAY, 11, null)).isInstanceOf(IllegalArgumentException.class);
    }
}
