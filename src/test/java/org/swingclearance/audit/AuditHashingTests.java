package org.swingclearance.audit;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.ByteArrayOutputStream;
import java.nio.ByteBuffer;
import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.time.Instant;
import java.util.UUID;
import org.junit.jupiter.api.Test;

/**
 * The canonical encoding of security-audit-interop.md B.2 step 3: previous hash, then each field as a 4-byte
 * big-endian length and its UTF-8 bytes (null as length -1), time as epoch microseconds. The expected hash is
 * built here byte by byte, independently of AuditHashing.
 */
class AuditHashingTests {

    private static final UUID CHAIN = UUID.fromString("00000000-0000-4000-8000-000000000001");
    private static final UUID EVENT = UUID.fromString("00000000-0000-4000-8000-00000000e001");
    private static final UUID ACTOR = UUID.fromString("00000000-0000-4000-8000-000000000101");

    private static AuditRecord record(String objectType, String objectId, String detail) {
        return new AuditRecord(CHAIN, 1, EVENT, Instant.parse("2026-01-02T03:04:05.678901Z"), CHAIN, ACTOR,
                "clinician@demo.local", "CLINICIAN", "PATIENT_READ", objectType, objectId, null, AuditOutcome.SUCCESS,
                "127.0.0.1", null, detail, AuditHashing.GENESIS);
    }

    @Test
    void theHashIsSha256OfTheDocumentedByteLayout() throws Exception {
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        bytes.write(new byte[32]);
        for (String field : new String[] {CHAIN.toString(), "1", EVENT.toString(), "1767323045678901",
                CHAIN.toString(), ACTOR.toString(), "clinician@demo.local", "CLINICIAN", "PATIENT_READ", "Patient",
                "p-1", null, "SUCCESS", "127.0.0.1", null, "n=1"}) {
            if (field == null) {
                bytes.write(ByteBuffer.allocate(4).putInt(-1).array());
            } else {
                byte[] utf8 = field.getBytes(StandardCharsets.UTF_8);
                bytes.write(ByteBuffer.allocate(4).putInt(utf8.length).array());
                bytes.write(utf8);
            }
        }
        byte[] expected = MessageDigest.getInstance("SHA-256").digest(bytes.toByteArray());

        assertThat(AuditHashing.hash(record("Patient", "p-1", "n=1"))).isEqualTo(expected);
    }

    @Test
    void lengthPrefixesKeepFieldBoundariesAndNullApartFromEmpty() {
        assertThat(AuditHashing.hash(record("ab", "c", null))).isNotEqualTo(AuditHashing.hash(record("a", "bc", null)));
        assertThat(AuditHashing.hash(record("Patient", "p-1", null)))
                .isNotEqualTo(AuditHashing.hash(record("Patient", "p-1", "")));
    }

    @Test
    void timeIsHashedToTheMicrosecondPostgresKeeps() {
        Instant withNanos = Instant.parse("2026-01-02T03:04:05.678901999Z");
        assertThat(AuditHashing.toStoredPrecision(withNanos)).isEqualTo(Instant.parse("2026-01-02T03:04:05.678901Z"));
        assertThat(AuditHashing.micros(Instant.parse("1970-01-01T00:00:00.000001Z"))).isEqualTo(1);
    }
}
