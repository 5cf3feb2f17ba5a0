package org.swingclearance.audit;

import static org.assertj.core.api.Assertions.assertThat;

import java.time.Instant;
import org.junit.jupiter.api.Test;

/** Page cursors round-trip at microsecond precision and reject anything they did not make. */
class LogCursorTests {

    @Test
    void aTokenReadsBackToTheSameCursor() {
        LogCursor cursor = new LogCursor(Instant.parse("2026-03-04T05:06:07.123456Z"), 42);
        assertThat(cursor.token()).isEqualTo("1772600767123456.42");
        assertThat(LogCursor.parse(cursor.token())).contains(cursor);
        LogCursor early = new LogCursor(Instant.parse("1969-12-31T23:59:59.999999Z"), 1);
        assertThat(LogCursor.parse(early.token())).contains(early);
    }

    @Test
    void foreignTokensAreRefused() {
        assertThat(LogCursor.parse("not-a-cursor")).isEmpty();
        assertThat(LogCursor.parse("1.2.3")).isEmpty();
        assertThat(LogCursor.parse("99999999999999999999.1")).isEmpty();
        assertThat(LogCursor.parse(null)).isEmpty();
    }
}
