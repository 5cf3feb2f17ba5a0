package org.swingclearance.engine.load;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Objects;
import java.util.OptionalDouble;
import org.swingclearance.engine.evidence.Citations;

/**
 * Derives the alerts of the latest logged session: pain during above the limit, pain not settled next morning, a
 * weekly rise of pain (each suggests the previous step), a configuration heavier than the current step (suggests
 * the current step as prescribed, since the step itself was not shown to be too much), and an acute:chronic ratio
 * above the caution level (suggests the previous step; the ratio is a disputed monitoring signal).
 */
public final class Alerts {

    private Alerts() {
    }

    /**
     * The alerts, in a fixed order (pain, configuration, ratio).
     *
     * @param currentStep         the plan step the session was logged against, ≥ 1
     * @param pain                the pain-monitoring decision after the session; never null
     * @param latestConfiguration how the latest session matched its step; null when unknown
     * @param shownRatio          the acute:chronic ratio as shown today (empty during warm-up or when undefined)
     * @param policy              caution level; never null
     * @return alerts; empty when none; never null
     */
    public static List<Alert> derive(int currentStep, PainDecision pain, ConfigurationMatch latestConfiguration,
            OptionalDouble shownRatio, MonitoringPolicy policy) {
        Objects.requireNonNull(pain, "pain");
        Objects.requireNonNull(shownRatio, "shownRatio");
        Objects.requireNonNull(policy, "policy");
        if (currentStep < 1) {
            throw new IllegalArgumentException("steps are numbered from 1, was " + currentStep);
        }
        int previousStep = Math.max(1, currentStep - 1);
        List<Alert> alerts = new ArrayList<>();
        for (PainReason reason : pain.reasons()) {
            Alert.Kind kind = switch (reason.kind()) {
                case PAIN_DURING_ABOVE_LIMIT -> Alert.Kind.PAIN_DURING_ABOVE_LIMIT;
                case NOT_SETTLED_NEXT_MORNING -> Alert.Kind.PAIN_NOT_SETTLED;
                case WEEKLY_RISE -> Alert.Kind.PAIN_RISING_WEEKLY;
                default -> null;
            };
            if (kind != null && alerts.stream().noneMatch(alert -> alert.kind() == kind)) {
                alerts.add(new Alert(kind, reason.detail(), previousStep, Citations.SILBERNAGEL_2007));
            }
        }
        if (latestConfiguration == ConfigurationMatch.HEAVIER) {
            alerts.add(new Alert(Alert.Kind.CONFIGURATION_HEAVIER, "the logged configuration had a higher demand "
                    + "than step " + currentStep, currentStep, Citations.CONFIGURATION_CHECK));
        }
        if (shownRatio.isPresent() && shownRatio.getAsDouble() > policy.acwrCaution()) {
            alerts.add(new Alert(Alert.Kind.ACWR_ABOVE_CAUTION, String.format(Locale.ROOT,
                    "acute:chronic ratio %.2f above the caution level %.2f (a monitoring signal whose predictive "
                            + "value is disputed, not a clearance)", shownRatio.getAsDouble(), policy.acwrCaution()),
                    previousStep, MonitoringPolicy.ACWR_CAUTION_SOURCE));
        }
        return List.copyOf(alerts);
    }
}
