package org.swingclearance.engine.envelope;

import org.swingclearance.engine.mechanics.Verdict;

/**
 * The shortest cycle time in [{@value EnvelopeCalculator#MIN_CYCLE_TIME_S}, {@value
 * EnvelopeCalculator#MAX_CYCLE_TIME_S}] s that is permitted at the chosen grip mark.
 *
 * @param status     OK or NOT_PERMISSIBLE
 * @param cycleTimeS the limit, s; null when not permissible
 * @param verdict    the verdict at the limit, or, when not permissible, at the slowest cycle time; never null
 */
public record CycleTimeLimit(LimitStatus status, Double cycleTimeS, Verdict verdict) {

    /** The limit as swings (full cycles) per minute, 60/T; null when not permissible. */
    public Double cyclesPerMinute() {
        return cycleTimeS == null ? null : 60.0 / cycleTimeS;
    }
}
