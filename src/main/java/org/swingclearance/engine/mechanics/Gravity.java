package org.swingclearance.engine.mechanics;

/**
 * Gravitational acceleration used by a calculation. Every calculation takes g as a parameter so the published
 * worked examples (which use 9.81 m/s²) can be reproduced exactly.
 */
public final class Gravity {

    /** Standard gravity, m/s² (the conventional value defined by the CGPM, 1901). */
    public static final double STANDARD = 9.80665;

    /** Smallest and largest accepted value, m/s² (anything outside is an input error, not a planet). */
    public static final double MIN = 1.0;
    public static final double MAX = 30.0;

    private Gravity() {
    }

    /**
     * Returns {@code g} when it lies in [{@link #MIN}, {@link #MAX}] m/s².
     *
     * @throws IllegalArgumentException otherwise (including NaN)
     */
    public static double checked(double g) {
        return Checks.inRange("gravity", g, MIN, MAX);
    }
}
