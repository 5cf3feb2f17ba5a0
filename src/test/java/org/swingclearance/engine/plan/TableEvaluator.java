package org.swingclearance.engine.plan;

import java.util.HashMap;
import java.util.Map;

/** Test evaluator with a hand-written evaluation per state, for worked examples small enough to check by hand. */
final class TableEvaluator implements StateEvaluator {

    private final Map<String, Evaluation> table = new HashMap<>();

    /** Within the band when D ≤ 1, else within the next band when D ≤ nextBandLimit, else outside ("C1"). */
    TableEvaluator put(String clubId, double gripMarkCm, double cycleTimeS, double d, double nextBandLimit) {
        Evaluation evaluation = d <= 1 ? Evaluation.withinBand(d, "C1")
                : d <= nextBandLimit ? Evaluation.withinNextBand(d, "C1") : Evaluation.outsideEnvelope(d, "C1");
        return put(clubId, gripMarkCm, cycleTimeS, evaluation);
    }

    TableEvaluator put(String clubId, double gripMarkCm, double cycleTimeS, double d) {
        return put(clubId, gripMarkCm, cycleTimeS, d, 1);
    }

    TableEvaluator put(String clubId, double gripMarkCm, double cycleTimeS, Evaluation evaluation) {
        table.put(key(clubId, gripMarkCm / 100, cycleTimeS), evaluation);
        return this;
    }

    @Override
    public Evaluation evaluate(ClubOption club, double gripMarkM, double cycleTimeS) {
        Evaluation evaluation = table.get(key(club.id(), gripMarkM, cycleTimeS));
        if (evaluation == null) {
            throw new IllegalStateException("No table entry for " + key(club.id(), gripMarkM, cycleTimeS));
        }
        return evaluation;
    }

    private static String key(String clubId, double gripMarkM, double cycleTimeS) {
        return clubId + "@" + Math.round(gripMarkM * 10_000) + "@" + Math.round(cycleTimeS * 1000);
    }
}
