package org.swingclearance.engine.rules;

/** How a rule compares a value with its threshold; the rule fires when the comparison holds. */
public enum Comparison {
    LT("<"),
    LE("≤"),
    GT(">"),
    GE("≥"),
    /** Equal within 1e-9, meant for counts and yes/no values (1 = yes). */
    EQ("="),
    /** |value| &gt; threshold, for signed differences. */
    ABS_GT("|x| >"),
    /** |value| ≥ threshold. */
    ABS_GE("|x| ≥");

    private static final double EQUALITY_TOLERANCE = 1e-9;

    private final String symbol;

    Comparison(String symbol) {
        this.symbol = symbol;
    }

    /** Symbol for reports, e.g. "≥"; never null. */
    public String symbol() {
        return symbol;
    }

    /** True when {@code value} compared with {@code threshold} holds; both finite. */
    public boolean holds(double value, double threshold) {
        return switch (this) {
            case LT -> value < threshold;
            case LE -> value <= threshold;
            case GT -> value > threshold;
            case GE -> value >= threshold;
            case EQ -> Math.abs(value - threshold) <= EQUALITY_TOLERANCE;
            case ABS_GT -> Math.abs(value) > threshold;
            case ABS_GE -> Math.abs(value) >= threshold;
        };
    }
}
