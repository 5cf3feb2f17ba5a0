package org.swingclearance.engine.mechanics;

/** Argument checks shared by the engine's value types; every message names the quantity and its unit range. */
final class Checks {

    private Checks() {
    }

    /** {@code value} in [min, max]; NaN and infinities fail. */
    static double inRange(String name, double value, double min, double max) {
        if (!(value >= min && value <= max)) {
            throw new IllegalArgumentException(name + " must be between " + min + " and " + max + ", was " + value);
        }
        return value;
    }

    /** {@code value} in (min, max]; NaN and infinities fail. */
    static double aboveAtMost(String name, double value, double min, double max) {
        if (!(value > min && value <= max)) {
            throw new IllegalArgumentException(
                    name + " must be greater than " + min + " and at most " + max + ", was " + value);
        }
        return value;
    }

    static <T> T present(String name, T value) {
        if (value == null) {
            throw new IllegalArgumentException(name + " is required");
        }
        return value;
    }
}
