package org.swingclearance.engine.mechanics;

/**
 * The short answer for one configuration, for callers that judge many (plan search, envelope inversions).
 *
 * @param permitted   all applicable constraints C1–C5 hold
 * @param demandRatio D, the largest demand-to-capacity ratio of the load constraints C1–C3 that apply, ≥ 0;
 *                    {@link Double#POSITIVE_INFINITY} when the band fraction is 0 (Hold). The gates C4 and C5
 *                    have no ratio: they only exclude a pattern
 * @param binding     the constraint that decides: the failed gate when C4 or C5 fails, otherwise the load
 *                    constraint with the largest ratio; never null
 */
public record Verdict(boolean permitted, double demandRatio, Constraint binding) {
}
