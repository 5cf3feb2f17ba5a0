package org.swingclearance.engine.scoring;

/**
 * Oswestry disability bands (Fairbank & Pynsent 2000): ≤ 20, &gt; 20–40, &gt; 40–60, &gt; 60–80, &gt; 80, so that
 * non-integer scores from missing sections fall in a band (clinical.md §4.2).
 */
public enum OdiBand {
    MINIMAL,
    MODERATE,
    SEVERE,
    CRIPPLED,
    BED_BOUND_OR_EXAGGERATING;

    /** Band of a score in 0–100. */
    public static OdiBand of(double score) {
        Inputs.inRange(score, 0, 100, "ODI score");
        if (score <= 20) {
            return MINIMAL;
        }
        if (score <= 40) {
            return MODERATE;
        }
        if (score <= 60) {
            return SEVERE;
        }
        return score <= 80 ? CRIPPLED : BED_BOUND_OR_EXAGGERATING;
    }
}
