package org.swingclearance.engine.load;

import java.time.LocalDate;
import java.util.Objects;

/**
 * One logged session's internal load (Foster et al. 2001): session RPE on the CR-10 scale × duration in minutes,
 * in arbitrary units (AU). Duration includes warm-up and cool-down.
 *
 * @param date    day of the session; never null
 * @param rpe     session RPE, 0–10 (CR-10)
 * @param minutes duration in minutes, &gt; 0 and ≤ 600
 */
public record SessionLoad(LocalDate date, double rpe, double minutes) {

    /** Longest session accepted, in minutes. */
    public static final double MAX_MINUTES = 600;

    public SessionLoad {
        Objects.requireNonNull(date, "date");
        Checks.inRange(rpe, 0, 10, "session RPE");
        if (!Double.isFinite(minutes) || minutes <= 0 || minutes > MAX_MINUTES) {
            throw new IllegalArgumentException("duration must be > 0 and ≤ " + MAX_MINUTES + " min, was " + minutes);
        }
    }

    /** Session load in AU = RPE × minutes. */
    public double load() {
        return rpe * minutes;
    }
}
