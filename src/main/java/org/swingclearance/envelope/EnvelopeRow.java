package org.swingclearance.envelope;

import java.util.UUID;

/**
 * One club × swing pattern of an envelope. At the usual grip (the hand against the knob) and the usual cycle time:
 * {@code permitted}, the demand ratio D and the binding constraint. Then the limits: the furthest grip from the
 * head at the usual cycle time (grip mark from the knob and how far to choke up from the usual grip), the
 * shortest cycle time at the usual grip, and the heaviest club of this shape at both. A limit is null when nothing
 * in its range is permitted ({@code *Blocking} then names the constraint that blocks it). When the range of
 * motion excludes the pattern, {@code largestHalfArcDeg} is the largest half-arc it permits.
 *
 * @param status         COMPUTED, or NO_CAPACITY when the torque this pattern needs (involved side for one hand,
 *                       weaker side for two) was not measured, or INVALID when the club cannot be held in this
 *                       pattern (its centre of mass would pass behind the shoulder)
 * @param binding        constraint name (SHOULDER_TORQUE, HOLD_TORQUE, GRIP_PULL, RANGE_OF_MOTION, HIP_DRIVE)
 */
public record EnvelopeRow(UUID clubId, String clubName, double clubMassKg, String inertiaSource, UUID patternId,
                          String patternName, int hands, String status, boolean permitted, Double demandRatio,
                          String binding, double usualGripCm, Double furthestGripCm, Double chokeUpCm,
                          Double momentArmCm, String furthestGripBlocking, Double shortestCycleTimeS,
                          Double swingsPerMinute, String shortestCycleBlocking, Double heaviestMassKg,
                          String heaviestMassBlocking, Double largestHalfArcDeg) {

    public static final String COMPUTED = "COMPUTED";
    public static final String NO_CAPACITY = "NO_CAPACITY";
    public static final String INVALID = "INVALID";

    public boolean computed() {
        return COMPUTED.equals(status);
    }

    /** Whether the range of motion (C4) excludes the pattern as it stands. */
    public boolean excludedByRange() {
        return largestHalfArcDeg != null;
    }
}
