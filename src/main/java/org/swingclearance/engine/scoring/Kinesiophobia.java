package org.swingclearance.engine.scoring;

import java.util.List;
import java.util.Set;
import org.swingclearance.engine.evidence.Citations;

/**
 * Tampa Scale of Kinesiophobia, 11- and 17-item forms (clinical.md §4.5), items identified by index only. No
 * missing-item rule is published, so every item must be answered.
 */
public final class Kinesiophobia {

    /** Items of TSK-11. */
    public static final int TSK11_ITEMS = 11;
    /** Items of TSK-17. */
    public static final int TSK17_ITEMS = 17;
    /** 1-based items of TSK-17 scored in reverse (5 − response). */
    public static final Set<Integer> TSK17_REVERSED = Set.of(4, 8, 12, 16);

    private Kinesiophobia() {
    }

    /**
     * TSK-11 = Σ of 11 items scored 1–4; range 11–44, higher = more fear; no reversal.
     *
     * @param responses 11 entries, each 1–4 or null; never null
     * @return score in {@link Unit#POINTS}; not scorable unless all 11 are answered
     */
    public static Score tsk11(List<Integer> responses) {
        Inputs.items(responses, TSK11_ITEMS, 1, 4, "TSK-11");
        int answered = Inputs.answered(responses);
        if (answered < TSK11_ITEMS) {
            return Score.notScorable(Unit.POINTS, Citations.ALL_ITEMS_REQUIRED, NotScorable.Reason.INCOMPLETE,
                    "TSK-11 needs all 11 items answered; " + answered + " answered");
        }
        return Score.of(Inputs.sum(responses), Unit.POINTS, Citations.TSK11_SCORING);
    }

    /**
     * TSK-17 = Σ of 17 items scored 1–4 with items 4, 8, 12 and 16 reversed; range 17–68.
     *
     * @param responses 17 raw entries, each 1–4 or null; never null
     * @return score in {@link Unit#POINTS}; not scorable unless all 17 are answered
     */
    public static Score tsk17(List<Integer> responses) {
        Inputs.items(responses, TSK17_ITEMS, 1, 4, "TSK-17");
        int answered = Inputs.answered(responses);
        if (answered < TSK17_ITEMS) {
            return Score.notScorable(Unit.POINTS, Citations.ALL_ITEMS_REQUIRED, NotScorable.Reason.INCOMPLETE,
                    "TSK-17 needs all 17 items answered; " + answered + " answered");
        }
        int sum = 0;
        for (int item = 1; item <= TSK17_ITEMS; item++) {
            int response = responses.get(item - 1);
            sum += TSK17_REVERSED.contains(item) ? 5 - response : response;
        }
        return Score.of(sum, Unit.POINTS, Citations.TSK17_SCORING);
    }
}
