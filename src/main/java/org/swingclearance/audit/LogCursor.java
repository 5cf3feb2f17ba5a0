package org.swingclearance.audit;

import java.time.Instant;
import java.util.Optional;

/**
 * Where a page of the audit log ended: the (time, seq) of its last row. The next page starts strictly after it
 * in the order (occurred_at DESC, seq DESC), so paging stays an index range scan however deep it goes.
 */
public record LogCursor(Instant occurredAt, long seq) {

    /** The cursor as a short token for a link: epoch microseconds and seq. */
    public String token() {
        return AuditHashing.micros(occurredAt) + "." + seq;
    }

    /** The cursor of a token, or empty if the token is not one this class made. */
    public static Optional<LogCursor> parse(String token) {
        if (token == null || !token.matches("-?\\d{1,19}\\.\\d{1,19}")) {
            return Optional.empty();
        }
        try {
            String[] parts = token.split("\\.");
            long micros = Long.parseLong(parts[0]);
            Instant at = Instant.ofEpochSecond(Math.floorDiv(micros, 1_000_000L), Math.floorMod(micros, 1_000_000L) * 1_000L);
            return Optional.of(new LogCursor(at, Long.parseLong(parts[1])));
        } catch (NumberFormatException | java.time.DateTimeException e) {
            return Optional.empty();
        }
    }
}
