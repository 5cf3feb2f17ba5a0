package org.swingclearance.engine.load;

import java.time.LocalDate;
import java.util.Objects;
import java.util.OptionalDouble;

/**
 * The exponentially weighted averages of one day.
 *
 * @param date    never null
 * @param acute   acute EWMA in AU; empty before the first known day
 * @param chronic chronic EWMA in AU; empty before the first known day
 * @param ratio   acute ÷ chronic as computed (also during warm-up, for analysis); empty when undefined or the day is
 *                missing
 * @param status  whether the ratio is shown; never null
 */
public record EwmaDay(LocalDate date, OptionalDouble acute, OptionalDouble chronic, OptionalDouble ratio,
        RatioStatus status) {

    public EwmaDay {
        Objects.requireNonNull(date, "date");
        Objects.requireNonNull(acute, "acute");
        Objects.requireNonNull(chronic, "chronic");
        Objects.requireNonNull(ratio, "ratio");
        Objects.requireNonNull(status, "status");
    }

    /** The ratio to display: present only when {@link #status()} is {@link RatioStatus#SHOWN}. */
    public OptionalDouble shownRatio() {
        return status == RatioStatus.SHOWN ? ratio : OptionalDouble.empty();
    }
}
