package org.swingclearance.engine.mechanics;

/** How the arm angle moves through the arc (engine.md §3). */
public enum SwingKind {
    /** Continuous swing, θ(t) = θ_c + A·sin(2πt/T): close to sinusoidal near a preferred frequency. */
    RHYTHMIC,
    /**
     * One controlled arc from rest to rest, θ_c − A to θ_c + A in T/2 on the minimum-jerk profile
     * 10τ³ − 15τ⁴ + 6τ⁵ (Flash &amp; Hogan 1985), then back the same way.
     */
    SINGLE_ARC
}
