package org.swingclearance.engine.load;

/**
 * The pain-monitoring limits (Silbernagel 2007 as summarised in clinical.md §6.4; hold period §6.5 [C]).
 *
 * @param painDuringLimit     highest allowed pain during a session, 0–10 (default 5)
 * @param minDaysOnStep       days a step is held with stable symptoms before progressing, ≥ 0 (default 7, rule of
 *                            thumb)
 * @param weeklyRiseTolerance rise of the weekly mean pain still counted as "no rise", ≥ 0 (default 0)
 */
public record PainPolicy(double painDuringLimit, int minDaysOnStep, double weeklyRiseTolerance) {

    /** Pain during ≤ 5/10, one week on a step, no weekly rise at all. */
    public static final PainPolicy DEFAULT = new PainPolicy(5, 7, 0);

    public PainPolicy {
        Checks.inRange(painDuringLimit, 0, 10, "pain limit");
        if (minDaysOnStep < 0) {
            throw new IllegalArgumentException("days on step must be ≥ 0, was " + minDaysOnStep);
        }
        Checks.inRange(weeklyRiseTolerance, 0, 10, "weekly rise tolerance");
    }
}
