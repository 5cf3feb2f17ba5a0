package org.swingclearance.plan;

import java.time.LocalDate;

/**
 * When each step of a plan starts: steps follow one another every {@code daysPerStep} days from the start date. A
 * step length counted in sessions becomes days through the planned sessions per week (rounded up to whole days, so
 * a step never gets fewer sessions than asked for).
 */
public record StepSchedule(LocalDate startsOn, StepUnit unit, int length, int sessionsPerWeek) {

    public StepSchedule {
        if (length < 1 || sessionsPerWeek < 1) {
            throw new IllegalArgumentException("step length and sessions per week must be at least 1");
        }
    }

    public int daysPerStep() {
        return daysFor(unit, length, sessionsPerWeek);
    }

    /** Days one step lasts: its length in days, or its sessions spread over the planned sessions per week. */
    public static int daysFor(StepUnit unit, int length, int sessionsPerWeek) {
        return unit == StepUnit.DAYS ? length : (length * 7 + sessionsPerWeek - 1) / sessionsPerWeek;
    }

    /** The day step {@code number} (1-based) starts. */
    public LocalDate startOf(int number) {
        return startsOn.plusDays((long) (number - 1) * daysPerStep());
    }
}
