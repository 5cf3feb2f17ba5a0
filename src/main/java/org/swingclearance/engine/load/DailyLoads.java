package org.swingclearance.engine.load;

import java.time.LocalDate;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.Collection;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.OptionalDouble;
import java.util.Set;

/**
 * Daily loads over a date range, one entry per calendar day: logged days sum their sessions, unlogged days are
 * rest (0 AU), days the caller marks missing stay unknown (clinical.md §7.4: 0 only if the athlete truly rested).
 *
 * @param days consecutive days in date order; never null, never empty
 */
public record DailyLoads(List<DailyLoad> days) {

    public DailyLoads {
        days = List.copyOf(Objects.requireNonNull(days, "days"));
        if (days.isEmpty()) {
            throw new IllegalArgumentException("a range has at least one day");
        }
        for (int i = 1; i < days.size(); i++) {
            if (!days.get(i).date().equals(days.get(i - 1).date().plusDays(1))) {
                throw new IllegalArgumentException("days must be consecutive, gap after " + days.get(i - 1).date());
            }
        }
    }

    /**
     * Builds the range {@code from}–{@code to} inclusive.
     *
     * @param from        first day; never null
     * @param to          last day, not before {@code from}; never null
     * @param sessions    logged sessions; those outside the range are ignored; never null
     * @param missingDays days marked missing; those outside the range are ignored; never null
     * @throws IllegalArgumentException when a day both has a session and is marked missing, or the range is reversed
     */
    public static DailyLoads of(LocalDate from, LocalDate to, Collection<SessionLoad> sessions,
            Set<LocalDate> missingDays) {
        Objects.requireNonNull(from, "from");
        Objects.requireNonNull(to, "to");
        Objects.requireNonNull(sessions, "sessions");
        Objects.requireNonNull(missingDays, "missingDays");
        if (to.isBefore(from)) {
            throw new IllegalArgumentException("range ends " + to + " before it starts " + from);
        }
        Map<LocalDate, Double> sums = new HashMap<>();
        for (SessionLoad session : sessions) {
            sums.merge(session.date(), session.load(), Double::sum);
        }
        List<DailyLoad> days = new ArrayList<>();
        for (LocalDate day = from; !day.isAfter(to); day = day.plusDays(1)) {
            boolean missing = missingDays.contains(day);
            Double sum = sums.get(day);
            if (missing && sum != null) {
                throw new IllegalArgumentException(day + " has a logged session and is marked missing");
            }
            if (missing) {
                days.add(new DailyLoad(day, DayStatus.MISSING, OptionalDouble.empty()));
            } else if (sum != null) {
                days.add(new DailyLoad(day, DayStatus.TRAINED, OptionalDouble.of(sum)));
            } else {
                days.add(new DailyLoad(day, DayStatus.REST, OptionalDouble.of(0)));
            }
        }
        return new DailyLoads(days);
    }

    /** Builds a range starting on {@code from} from known daily loads in AU (each ≥ 0), e.g. for tests and replays. */
    public static DailyLoads ofValues(LocalDate from, List<Double> loads) {
        Objects.requireNonNull(from, "from");
        List<DailyLoad> days = new ArrayList<>();
        for (int i = 0; i < loads.size(); i++) {
            double load = Checks.nonNegative(loads.get(i), "daily load");
            days.add(new DailyLoad(from.plusDays(i), load == 0 ? DayStatus.REST : DayStatus.TRAINED,
                    OptionalDouble.of(load)));
        }
        return new DailyLoads(days);
    }

    /** First day of the range. */
    public LocalDate from() {
        return days.get(0).date();
    }

    /** Last day of the range. */
    public LocalDate to() {
        return days.get(days.size() - 1).date();
    }

    /** Status of the window of {@code length} days ending on {@code end} (inclusive). */
    public WindowStatus windowStatus(LocalDate end, int length) {
        int endIndex = indexOf(end);
        int startIndex = endIndex - length + 1;
        if (startIndex < 0) {
            return WindowStatus.INSUFFICIENT_HISTORY;
        }
        for (int i = startIndex; i <= endIndex; i++) {
            if (days.get(i).status() == DayStatus.MISSING) {
                return WindowStatus.MISSING_DAYS;
            }
        }
        return WindowStatus.COMPLETE;
    }

    /**
     * The loads of the window of {@code length} days ending on {@code end}, oldest first.
     *
     * @throws IllegalStateException when the window is not {@link WindowStatus#COMPLETE}
     */
    public List<Double> window(LocalDate end, int length) {
        WindowStatus status = windowStatus(end, length);
        if (status != WindowStatus.COMPLETE) {
            throw new IllegalStateException("window of " + length + " days ending " + end + " is " + status);
        }
        int endIndex = indexOf(end);
        List<Double> loads = new ArrayList<>();
        for (int i = endIndex - length + 1; i <= endIndex; i++) {
            loads.add(days.get(i).load().getAsDouble());
        }
        return loads;
    }

    int indexOf(LocalDate date) {
        long index = ChronoUnit.DAYS.between(from(), Objects.requireNonNull(date, "date"));
        if (index < 0 || index >= days.size()) {
            throw new IllegalArgumentException(date + " is outside " + from() + "–" + to());
        }
        return (int) index;
    }
}
