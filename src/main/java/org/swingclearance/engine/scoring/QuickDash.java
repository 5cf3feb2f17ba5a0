package org.swingclearance.engine.scoring;

import java.util.List;
import org.swingclearance.engine.evidence.Citations;

/**
 * QuickDASH (clinical.md §4.1): 11 items, each 1–5, identified by index only. Score = ((Σ ÷ n) − 1) × 25 over the
 * n answered items, range 0 (no disability) – 100, only when at least 10 of 11 are answered. The optional work and
 * sport/music modules (4 items each) are scored the same way and need all 4 items.
 */
public final class QuickDash {

    /** Items of the main questionnaire. */
    public static final int ITEMS = 11;
    /** Fewest answered items that still give a score. */
    public static final int MIN_ANSWERED = 10;
    /** Items of each optional module. */
    public static final int MODULE_ITEMS = 4;

    private QuickDash() {
    }

    /**
     * Scores the main questionnaire.
     *
     * @param responses 11 entries in item order, each 1–5 or null (unanswered); never null
     * @return score in {@link Unit#POINTS}, 0–100; not scorable with fewer than 10 answered
     * @throws IllegalArgumentException when there are not 11 entries or a response is outside 1–5
     */
    public static Score score(List<Integer> responses) {
        Inputs.items(responses, ITEMS, 1, 5, "QuickDASH");
        return scoreAnswered(responses, MIN_ANSWERED, "QuickDASH");
    }

    /**
     * Scores an optional module (work, or sport/music).
     *
     * @param responses 4 entries, each 1–5 or null; never null
     * @return score in {@link Unit#POINTS}, 0–100; not scorable unless all 4 are answered
     */
    public static Score moduleScore(List<Integer> responses) {
        Inputs.items(responses, MODULE_ITEMS, 1, 5, "QuickDASH module");
        return scoreAnswered(responses, MODULE_ITEMS, "a QuickDASH module");
    }

    private static Score scoreAnswered(List<Integer> responses, int minAnswered, String instrument) {
        int answered = Inputs.answered(responses);
        if (answered < minAnswered) {
            return Score.notScorable(Unit.POINTS, Citations.QUICKDASH_SCORING, NotScorable.Reason.INCOMPLETE,
                    instrument + " needs at least " + minAnswered + " of " + responses.size()
                            + " items answered; " + answered + " answered");
        }
        double mean = (double) Inputs.sum(responses) / answered;
        return Score.of((mean - 1) * 25, Unit.POINTS, Citations.QUICKDASH_SCORING);
    }
}
