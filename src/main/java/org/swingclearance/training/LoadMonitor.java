package org.swingclearance.training;

import java.time.LocalDate;
import java.util.List;
import java.util.Optional;
import org.springframework.stereotype.Component;

/**
 * Hands the session logs to the load engine ({@code org.swingclearance.engine.load}) and turns its results into
 * the workspace's report and alert findings. No formula lives here: session load, EWMA, ratios, monotony, strain,
 * dose, adherence and the pain rule are the engine's.
 */
@Component
class LoadMonitor {

    // Wired to the engine when branch h2 lands (the engine's load package is being built in parallel).
    private static IllegalStateException notWired() {
        return new IllegalStateException("load engine not merged yet");
    }

    LoadReport report(List<SessionLogVersion> sessions, TrainingPlan plan, LocalDate asOf) {
        throw notWired();
    }

    double sessionLoad(SessionLogVersion session) {
        throw notWired();
    }

    Double dose(SessionLogVersion session) {
        throw notWired();
    }

    List<AlertFinding> findingsForSession(SessionLogVersion session, List<SessionLogVersion> all, TrainingPlan plan,
                                          AlertLimits limits) {
        throw notWired();
    }

    Optional<AlertFinding> findingForMorning(MorningPain morning, SessionLogVersion session, AlertLimits limits) {
        throw notWired();
    }
}
