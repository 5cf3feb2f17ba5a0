package org.swingclearance.equipment;

/** How the clinic wants a club's inertia about its balance point found, best first. */
public enum InertiaMethod {
    /** Timed swings of the club hung from a pivot (a physical pendulum). */
    PENDULUM,
    /** A uniform rod over the full length plus a point mass at the head centre. */
    HEAD_MODEL,
    /** The largest inertia any mass distribution on the club can have: errs toward more demand. */
    BOUND
}
