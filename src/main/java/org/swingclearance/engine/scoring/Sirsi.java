package org.swingclearance.engine.scoring;

import java.util.List;
import org.swingclearance.engine.evidence.Citations;

/**
 * Shoulder Instability–Return to Sport after Injury scale (clinical.md §4.5): 12 items, each 0–10, identified by
 * index only; score % = Σ ÷ 120 × 100 (the denominator is recalled, not verified). A readiness indicator, not a gate.
 */
public final class Sirsi {

    /** Items of the scale. */
    public static final int ITEMS = 12;

    private Sirsi() {
    }

    /**
     * Scores the scale.
     *
     * @param responses 12 entries, each 0–10 or null; never null
     * @return score in {@link Unit#PERCENT}; not scorable unless all 12 are answered
     */
    public static Score score(List<Integer> responses) {
        Inputs.items(responses, ITEMS, 0, 10, "SIRSI");
        int answered = Inputs.answered(responses);
        if (answered < ITEMS) {
            return Score.notScorable(Unit.PERCENT, Citations.ALL_ITEMS_REQUIRED, NotScorable.Reason.INCOMPLETE,
                    "SIRSI needs all 12 items answered; " + answered + " answered");
        }
        return Score.of(Inputs.sum(responses) / 120.0 * 100, Unit.PERCENT, Citations.SIRSI_SCORING);
    }
}
