package org.swingclearance.engine.mechanics;

/** Where a club's inertia about its balance point came from, best first (engine.md §2). */
public enum InertiaSource {
    /** Measured, directly or from a pendulum timing (physical pendulum relation as used by ASTM F2398). */
    MEASURED("measured"),
    /** Modelled: a uniform rod over the full length plus a point mass at the head centre. */
    MODELLED("modelled as rod plus head"),
    /** Safe upper bound m·x_cm·(L − x_cm): the largest inertia any mass distribution on the club can have. */
    BOUND("safe upper bound");

    private final String label;

    InertiaSource(String label) {
        this.label = label;
    }

    /** Plain-language label shown beside the value. */
    public String label() {
        return label;
    }
}
