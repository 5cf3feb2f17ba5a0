package org.swingclearance.engine.scoring;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import org.swingclearance.engine.evidence.Citations;

/**
 * Shoulder Pain and Disability Index, 0–10 numeric version (clinical.md §4.3): 5 pain and 8 disability items,
 * identified by index only. Pain % = Σ ÷ 50 × 100, disability % = Σ ÷ 80 × 100, total % = Σ ÷ 130 × 100; each
 * unanswered item takes 10 off the relevant denominator.
 *
 * @param pain        pain subscale, {@link Unit#PERCENT}
 * @param disability  disability subscale, {@link Unit#PERCENT}
 * @param total       total, {@link Unit#PERCENT}, by the chosen {@link TotalMethod}
 * @param totalMethod how the total was formed (recorded because the two methods differ)
 */
public record Spadi(Score pain, Score disability, Score total, TotalMethod totalMethod) {

    /** Pain items. */
    public static final int PAIN_ITEMS = 5;
    /** Disability items. */
    public static final int DISABILITY_ITEMS = 8;
    /** Default limit on unanswered items in total (no published limit; clinical.md §4.3 [C,L]). */
    public static final int DEFAULT_MAX_MISSING = 2;

    /** How the total is formed. */
    public enum TotalMethod {
        /** Σ of all answered items ÷ (10 × items answered) × 100 — the scoring sheet's method, the default. */
        SUM_OF_ITEMS,
        /** Mean of the two subscale percentages, as some summaries describe it. */
        MEAN_OF_SUBSCALES
    }

    public Spadi {
        Objects.requireNonNull(pain, "pain");
        Objects.requireNonNull(disability, "disability");
        Objects.requireNonNull(total, "total");
        Objects.requireNonNull(totalMethod, "totalMethod");
    }

    /** Scores with the default missing limit and {@link TotalMethod#SUM_OF_ITEMS}. */
    public static Spadi score(List<Integer> painItems, List<Integer> disabilityItems) {
        return score(painItems, disabilityItems, DEFAULT_MAX_MISSING, TotalMethod.SUM_OF_ITEMS);
    }

    /**
     * Scores the questionnaire.
     *
     * @param painItems       5 entries, each 0–10 or null; never null
     * @param disabilityItems 8 entries, each 0–10 or null; never null
     * @param maxMissing      most unanswered items in total still scored, 0–12
     * @param totalMethod     never null
     * @return all three scores; none is scorable when more than {@code maxMissing} items are unanswered
     */
    public static Spadi score(List<Integer> painItems, List<Integer> disabilityItems, int maxMissing,
            TotalMethod totalMethod) {
        Inputs.items(painItems, PAIN_ITEMS, 0, 10, "SPADI pain");
        Inputs.items(disabilityItems, DISABILITY_ITEMS, 0, 10, "SPADI disability");
        Inputs.inRange(maxMissing, 0, PAIN_ITEMS + DISABILITY_ITEMS - 1, "SPADI missing-item limit");
        Objects.requireNonNull(totalMethod, "totalMethod");
        int missing = PAIN_ITEMS + DISABILITY_ITEMS - Inputs.answered(painItems) - Inputs.answered(disabilityItems);
        if (missing > maxMissing) {
            String rule = "SPADI is scored with at most " + maxMissing + " unanswered item(s) in total; " + missing
                    + " unanswered";
            Score none = Score.notScorable(Unit.PERCENT,
                    maxMissing == DEFAULT_MAX_MISSING ? Citations.SPADI_MISSING_LIMIT : Citations.SPADI_SCORING,
                    NotScorable.Reason.INCOMPLETE, rule);
            return new Spadi(none, none, none, totalMethod);
        }
        Score pain = percent(painItems, "SPADI pain");
        Score disability = percent(disabilityItems, "SPADI disability");
        Score total;
        if (totalMethod == TotalMethod.SUM_OF_ITEMS) {
            List<Integer> all = new ArrayList<>(painItems);
            all.addAll(disabilityItems);
            total = percent(all, "SPADI total");
        } else if (pain.scorable() && disability.scorable()) {
            total = Score.of((pain.orElseThrow() + disability.orElseThrow()) / 2, Unit.PERCENT,
                    Citations.SPADI_SCORING);
        } else {
            total = Score.notScorable(Unit.PERCENT, Citations.SPADI_SCORING, NotScorable.Reason.INCOMPLETE,
                    "the mean-of-subscales total needs both subscales");
        }
        return new Spadi(pain, disability, total, totalMethod);
    }

    private static Score percent(List<Integer> items, String scale) {
        int answered = Inputs.answered(items);
        if (answered == 0) {
            return Score.notScorable(Unit.PERCENT, Citations.SPADI_SCORING, NotScorable.Reason.INCOMPLETE,
                    scale + " needs at least one answered item");
        }
        return Score.of((double) Inputs.sum(items) / (10 * answered) * 100, Unit.PERCENT, Citations.SPADI_SCORING);
    }
}
