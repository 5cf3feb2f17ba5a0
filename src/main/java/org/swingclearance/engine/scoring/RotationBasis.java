package org.swingclearance.engine.scoring;

/** Which rotation measurements the rotation deficits of a screening were computed from. */
public enum RotationBasis {
    /** Passive rotation on both sides, as Wilk measured. */
    PASSIVE,
    /** Active rotation, because passive rotation was not recorded on both sides. */
    ACTIVE
}
