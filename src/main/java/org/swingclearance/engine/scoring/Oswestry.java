package org.swingclearance.engine.scoring;

import java.util.List;
import java.util.Objects;
import java.util.Optional;
import org.swingclearance.engine.evidence.Citations;

/**
 * Oswestry Disability Index (clinical.md §4.2): 10 sections, each 0–5, identified by index only.
 * Score (%) = Σ ÷ (5 × sections answered) × 100.
 *
 * @param score score in {@link Unit#PERCENT}, 0–100
 * @param band  band of the score; empty when not scorable
 */
public record Oswestry(Score score, Optional<OdiBand> band) {

    /** Sections of the questionnaire. */
    public static final int SECTIONS = 10;
    /** Default limit on unanswered sections (no published limit; clinical.md §4.2 [C,L]). */
    public static final int DEFAULT_MAX_MISSING = 1;

    public Oswestry {
        Objects.requireNonNull(score, "score");
        Objects.requireNonNull(band, "band");
    }

    /** Scores with the default limit of {@value #DEFAULT_MAX_MISSING} unanswered section. */
    public static Oswestry score(List<Integer> sections) {
        return score(sections, DEFAULT_MAX_MISSING);
    }

    /**
     * Scores the questionnaire.
     *
     * @param sections   10 entries in section order, each 0–5 or null (unanswered); never null
     * @param maxMissing most unanswered sections still scored, 0–9 (clinic policy)
     * @throws IllegalArgumentException when there are not 10 entries, a response is outside 0–5, or maxMissing is
     *                                  outside 0–9
     */
    public static Oswestry score(List<Integer> sections, int maxMissing) {
        Inputs.items(sections, SECTIONS, 0, 5, "ODI");
        Inputs.inRange(maxMissing, 0, SECTIONS - 1, "ODI missing-section limit");
        int answered = Inputs.answered(sections);
        int missing = SECTIONS - answered;
        if (missing > maxMissing) {
            return new Oswestry(Score.notScorable(Unit.PERCENT,
                    maxMissing == DEFAULT_MAX_MISSING ? Citations.ODI_MISSING_LIMIT : Citations.FAIRBANK_2000,
                    NotScorable.Reason.INCOMPLETE, "ODI is scored with at most " + maxMissing
                            + " unanswered section(s); " + missing + " unanswered"), Optional.empty());
        }
        double score = (double) Inputs.sum(sections) / (5 * answered) * 100;
        return new Oswestry(Score.of(score, Unit.PERCENT, Citations.FAIRBANK_2000), Optional.of(OdiBand.of(score)));
    }
}
