package org.swingclearance.engine.rules;

/**
 * The share of measured capacity a plan may use, from most to least restrictive. Default fractions after the common
 * classification of exercise intensity (low ≤ 20 %, moderate 21–40 %, high 41–60 % of maximal voluntary effort;
 * engine.md §5); clinics may edit the fractions, never the order.
 */
public enum LoadBand {
    /** No loaded swinging. */
    HOLD(0.0),
    BAND_1(0.20),
    BAND_2(0.40),
    BAND_3(0.60),
    OPEN(0.80);

    private final double defaultFraction;

    LoadBand(double defaultFraction) {
        this.defaultFraction = defaultFraction;
    }

    /** Default fraction of measured capacity, 0–0.8. */
    public double defaultFraction() {
        return defaultFraction;
    }

    /** True when this band allows less than {@code other}. */
    public boolean isMoreRestrictiveThan(LoadBand other) {
        return compareTo(other) < 0;
    }

    /** The more restrictive of two bands; never null. */
    public static LoadBand mostRestrictive(LoadBand a, LoadBand b) {
        return a.compareTo(b) <= 0 ? a : b;
    }
}
