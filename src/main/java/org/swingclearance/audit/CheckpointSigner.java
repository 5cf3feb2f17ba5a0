package org.swingclearance.audit;

import java.nio.charset.StandardCharsets;
import java.security.GeneralSecurityException;
import java.security.MessageDigest;
import java.time.Instant;
import java.util.UUID;
import javax.crypto.Mac;
import javax.crypto.spec.SecretKeySpec;
import org.springframework.stereotype.Component;
import org.swingclearance.web.LengthPrefixed;

/**
 * HMAC-SHA256 over a checkpoint (chain, seq, row hash, time, key id) with the configured secret. The key id is
 * a short fingerprint of the key, so a checkpoint made with a rotated key is recognised as such rather than
 * reported as forged. Fields are length-prefixed like the rows (AuditHashing), so no two inputs collide.
 */
@Component
public class CheckpointSigner {

    private final byte[] key;
    private final String keyId;

    CheckpointSigner(AuditSettings settings) {
        this.key = settings.checkpointKey().getBytes(StandardCharsets.UTF_8);
        this.keyId = fingerprint(key);
    }

    public String keyId() {
        return keyId;
    }

    public byte[] mac(UUID chainId, long seq, byte[] rowHash, Instant createdAt) {
        try {
            Mac mac = Mac.getInstance("HmacSHA256");
            mac.init(new SecretKeySpec(key, "HmacSHA256"));
            field(mac, chainId.toString());
            field(mac, Long.toString(seq));
            field(mac, AuditHashing.hex(rowHash));
            field(mac, Long.toString(AuditHashing.micros(createdAt)));
            field(mac, keyId);
            return mac.doFinal();
        } catch (GeneralSecurityException e) {
            throw new IllegalStateException("every Java runtime provides HmacSHA256", e);
        }
    }

    /** Constant-time comparison of a stored MAC with the one this key gives. */
    public boolean verifies(UUID chainId, long seq, byte[] rowHash, Instant createdAt, byte[] storedMac) {
        return MessageDigest.isEqual(mac(chainId, seq, rowHash, createdAt), storedMac);
    }

    private static void field(Mac mac, String value) {
        mac.update(LengthPrefixed.encode(value));
    }

    private static String fingerprint(byte[] key) {
        try {
            MessageDigest sha = MessageDigest.getInstance("SHA-256");
            sha.update("swing-clearance audit checkpoint key id".getBytes(StandardCharsets.UTF_8));
            return AuditHashing.hex(sha.digest(key)).substring(0, 16);
        } catch (GeneralSecurityException e) {
            throw new IllegalStateException("every Java runtime provides SHA-256", e);
        }
    }
}
