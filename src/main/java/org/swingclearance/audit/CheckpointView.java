package org.swingclearance.audit;

import java.time.Instant;
import java.util.UUID;

/** A stored checkpoint as exported: the chain head it fixes, when, with which key, and its HMAC (hex). */
public record CheckpointView(UUID chainId, long seq, String rowHash, Instant createdAt, String keyId, String mac) {
}
