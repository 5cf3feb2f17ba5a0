package org.swingclearance.engine.envelope;

import org.swingclearance.engine.mechanics.Verdict;

/**
 * The furthest grip from the head: the smallest grip mark (longest moment arm) in [0, handle length] that is
 * permitted at the chosen cycle time.
 *
 * @param status     OK or NOT_PERMISSIBLE
 * @param gripMarkM  the limit from the knob, m; null when not permissible
 * @param momentArmM the moment arm r_c at the limit, m; null when not permissible
 * @param verdict    the verdict at the limit, or, when not permissible, at the handle's end (the shortest moment
 *                   arm) so the blocking constraint is named; never null
 */
public record GripLimit(LimitStatus status, Double gripMarkM, Double momentArmM, Verdict verdict) {
}
