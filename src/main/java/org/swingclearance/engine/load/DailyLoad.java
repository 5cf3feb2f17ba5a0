package org.swingclearance.engine.load;

import java.time.LocalDate;
import java.util.Objects;
import java.util.OptionalDouble;

/**
 * One day's load.
 *
 * @param date   never null
 * @param status never null
 * @param load   Σ session loads in AU for {@link DayStatus#TRAINED}, 0 for {@link DayStatus#REST}, empty for
 *               {@link DayStatus#MISSING}
 */
public record DailyLoad(LocalDate date, DayStatus status, OptionalDouble load) {

    public DailyLoad {
        Objects.requireNonNull(date, "date");
        Objects.requireNonNull(status, "status");
        Objects.requireNonNull(load, "load");
        if (load.isPresent() == (status == DayStatus.MISSING)) {
            throw new IllegalArgumentException("a missing day has no load, every other day has one");
        }
        if (status == DayStatus.REST && load.getAsDouble() != 0) {
            throw new IllegalArgumentException("a rest day has load 0");
        }
    }
}
