package org.swingclearance.engine.load;

import java.time.LocalDate;
import java.util.Objects;

/**
 * Pain logged for one session.
 *
 * @param date            day of the session; never null
 * @param painDuring      pain during the session, 0–10
 * @param painNextMorning pain the next morning, 0–10; null until it is entered the next day
 */
public record PainRecord(LocalDate date, int painDuring, Integer painNextMorning) {

    public PainRecord {
        Objects.requireNonNull(date, "date");
        Checks.inRange(painDuring, 0, 10, "pain during");
        if (painNextMorning != null) {
            Checks.inRange(painNextMorning, 0, 10, "pain next morning");
        }
    }
}
