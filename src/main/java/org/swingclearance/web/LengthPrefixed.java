package org.swingclearance.web;

import java.nio.ByteBuffer;
import java.nio.charset.StandardCharsets;
import java.time.Instant;

/**
 * The one canonical field encoding behind every hash and MAC of the application (audit rows, checkpoints, signed
 * screening content): a 4-byte big-endian length and the UTF-8 bytes of the value's text, null as length -1, so no
 * two different field lists can encode to the same bytes.
 */
public final class LengthPrefixed {

    private LengthPrefixed() {
    }

    public static byte[] encode(Object value) {
        if (value == null) {
            return ByteBuffer.allocate(4).putInt(-1).array();
        }
        byte[] bytes = value.toString().getBytes(StandardCharsets.UTF_8);
        return ByteBuffer.allocate(4 + bytes.length).putInt(bytes.length).put(bytes).array();
    }

    /** A time as epoch microseconds, the precision PostgreSQL stores, so a re-read value encodes the same. */
    public static long epochMicros(Instant t) {
        return Math.addExact(Math.multiplyExact(t.getEpochSecond(), 1_000_000L), t.getNano() / 1_000);
    }
}
