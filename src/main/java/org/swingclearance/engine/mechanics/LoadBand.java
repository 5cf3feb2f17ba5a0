package org.swingclearance.engine.mechanics;

/**
 * The share of measured capacity a plan may use, lowest first (engine.md §5). The default fractions follow the
 * common classification of exercise intensity as low ≤ 20 %, moderate 21–40 %, high 41–60 % of maximal
 * voluntary effort; a clinic's practice rules may set others.
 */
public enum LoadBand {
    HOLD(0.0), BAND_1(0.20), BAND_2(0.40), BAND_3(0.60), OPEN(0.80);

    private final double defaultFraction;

    LoadBand(double defaultFraction) {
        this.defaultFraction = defaultFraction;
    }

    /** Default band fraction f in [0, 1] when the practice rules set none. */
    public double defaultFraction() {
        return defaultFraction;
    }

    /** Whether this band is at least {@code minimum}. */
    public boolean reaches(LoadBand minimum) {
        return compareTo(minimum) >= 0;
    }
}
