package org.swingclearance.envelope;

/** Why no envelope can be computed for an episode yet, each with what the clinician should do about it. */
public enum EnvelopeBlock {
    /** The episode has no signed screening: limits come only from signed measurements. */
    NO_SIGNED_SCREENING,
    /** A red flag is open (Hold): stop and refer; no loading is computed until a referral is recorded. */
    RED_FLAG_OPEN,
    /** The clinician set the shoulder band to Hold: no share of capacity may be used. */
    SHOULDER_HOLD,
    /** Neither side's shoulder flexion torque was measured: there is no capacity to compare demand with. */
    NO_SHOULDER_TORQUE,
    /** Stature, body mass or the measured shoulder-to-grip distance lie outside what the mechanics model covers. */
    BODY_OUTSIDE_MODEL,
    /** The clinic has no club in service. */
    NO_CLUBS
}
