package org.swingclearance.audit;

import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.time.Instant;
import java.time.temporal.ChronoUnit;
import java.util.HexFormat;
import org.swingclearance.web.LengthPrefixed;

/**
 * The canonical encoding and SHA-256 hash of an audit row: the previous hash, then every field in a fixed
 * order, each as a 4-byte length and its UTF-8 bytes (null as length -1), the time as epoch microseconds.
 * Writer and verifier both use this class, so they can never disagree about what a row's hash covers.
 */
public final class AuditHashing {

    /** The previous-hash of the first row of every chain. */
    public static final byte[] GENESIS = new byte[32];

    private AuditHashing() {
    }

    public static byte[] hash(AuditRecord r) {
        MessageDigest sha = sha256();
        sha.update(r.prevHash());
        field(sha, r.chainId());
        field(sha, Long.toString(r.seq()));
        field(sha, r.eventId());
        field(sha, Long.toString(micros(r.occurredAt())));
        field(sha, r.clinicId());
        field(sha, r.actorId());
        field(sha, r.actorName());
        field(sha, r.actorRole());
        field(sha, r.action());
        field(sha, r.objectType());
        field(sha, r.objectId());
        field(sha, r.patientId());
        field(sha, r.outcome());
        field(sha, r.clientAddress());
        field(sha, r.requestId());
        field(sha, r.detail());
        return sha.digest();
    }

    public static Instant toStoredPrecision(Instant instant) {
        return instant.truncatedTo(ChronoUnit.MICROS);
    }

    public static String hex(byte[] bytes) {
        return HexFormat.of().formatHex(bytes);
    }

    /** A time as integer microseconds since the epoch, independent of any session time zone or date style. */
    public static long micros(Instant t) {
        return LengthPrefixed.epochMicros(t);
    }

    private static void field(MessageDigest sha, Object value) {
        sha.update(LengthPrefixed.encode(value));
    }

    private static MessageDigest sha256() {
        try {
            return MessageDigest.getInstance("SHA-256");
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("every Java runtime provides SHA-256", e);
        }
    }
}
