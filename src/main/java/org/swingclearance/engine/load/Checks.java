package org.swingclearance.engine.load;

/** Argument checks of the load package; a failed check is a caller error. */
final class Checks {

    private Checks() {
    }

    static double inRange(double value, double min, double max, String name) {
        if (!Double.isFinite(value) || value < min || value > max) {
            throw new IllegalArgumentException(name + " must be within " + min + "–" + max + ", was " + value);
        }
        return value;
    }

    static double nonNegative(double value, String name) {
        if (!Double.isFinite(value) || value < 0) {
            throw new IllegalArgumentException(name + " must be a finite number ≥ 0, was " + value);
        }
        return value;
    }
}
