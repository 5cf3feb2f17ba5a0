package org.swingclearance.plan;

import java.util.List;
import java.util.Optional;

/**
 * The load bands a plan can use, lowest first (the LoadBand names of the screening's signed facts). Hold is not
 * among them: a patient on Hold gets no plan.
 */
public final class PlanBands {

    public static final String HOLD = "HOLD";
    public static final List<String> PLANNABLE = List.of("BAND_1", "BAND_2", "BAND_3", "OPEN");

    private PlanBands() {
    }

    public static boolean plannable(String band) {
        return PLANNABLE.contains(band);
    }

    /** The band above, or empty for Open (the highest). */
    public static Optional<String> next(String band) {
        int i = PLANNABLE.indexOf(band);
        if (i < 0) {
            throw new IllegalArgumentException("not a plannable band: " + band);
        }
        return i + 1 < PLANNABLE.size() ? Optional.of(PLANNABLE.get(i + 1)) : Optional.empty();
    }

    /** The lower of two bands (Hold is lowest of all). */
    public static String lower(String a, String b) {
        return rank(a) <= rank(b) ? a : b;
    }

    private static int rank(String band) {
        if (HOLD.equals(band)) {
            return -1;
        }
        int i = PLANNABLE.indexOf(band);
        if (i < 0) {
            throw new IllegalArgumentException("not a load band: " + band);
        }
        return i;
    }
}
