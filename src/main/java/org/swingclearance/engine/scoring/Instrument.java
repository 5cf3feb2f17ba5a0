package org.swingclearance.engine.scoring;

/**
 * Outcome measures with a published minimal clinically important difference; on every one a lower score is better.
 * The range is the scale of the score the instrument's scoring function returns.
 */
public enum Instrument {
    QUICKDASH(0, 100, Unit.POINTS),
    ODI(0, 100, Unit.PERCENT),
    SPADI(0, 100, Unit.PERCENT),
    /** Numeric pain rating scale, 0–10. */
    NPRS(0, 10, Unit.POINTS),
    TSK_11(11, 44, Unit.POINTS);

    private final double min;
    private final double max;
    private final Unit unit;

    Instrument(double min, double max, Unit unit) {
        this.min = min;
        this.max = max;
        this.unit = unit;
    }

    /** Lowest possible score. */
    public double min() {
        return min;
    }

    /** Highest possible score. */
    public double max() {
        return max;
    }

    /** Unit of the score; never null. */
    public Unit unit() {
        return unit;
    }
}
