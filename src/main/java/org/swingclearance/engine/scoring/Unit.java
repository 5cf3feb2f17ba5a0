package org.swingclearance.engine.scoring;

/** Unit of a measurement or derived value; the symbol is what reports print after the number. */
public enum Unit {
    DEGREE("°"),
    PERCENT("%"),
    /** A dimensionless ratio such as ER:IR or flexor:extensor hold time. */
    RATIO(""),
    NEWTON("N"),
    NEWTON_METRE("N·m"),
    NEWTON_PER_KILOGRAM("N/kg"),
    KILOGRAM("kg"),
    POUND("lb"),
    METRE("m"),
    CENTIMETRE("cm"),
    SECOND("s"),
    MINUTE("min"),
    YEAR("y"),
    TOUCHES("touches"),
    TOUCHES_PER_METRE("touches/m"),
    TOUCHES_PER_INCH("touches/in"),
    /** CKCUEST power score: touches × kg ÷ s, reported without a unit in the literature. */
    POWER_SCORE(""),
    /** Questionnaire or rating-scale points. */
    POINTS("points"),
    /** A count, e.g. predictors present. */
    COUNT(""),
    /** A yes/no result coded 1 (yes, positive) or 0 (no, negative). */
    YES_NO(""),
    /** Training-load arbitrary units (session RPE × minutes). */
    ARBITRARY_UNIT("AU");

    private final String symbol;

    Unit(String symbol) {
        this.symbol = symbol;
    }

    /** Symbol printed after a value, possibly empty; never null. */
    public String symbol() {
        return symbol;
    }
}
