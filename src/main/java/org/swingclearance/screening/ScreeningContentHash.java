package org.swingclearance.screening;

import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.time.Instant;
import java.util.Map;
import java.util.TreeMap;
import org.swingclearance.web.LengthPrefixed;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;
import tools.jackson.databind.node.JsonNodeFactory;
import tools.jackson.databind.node.ObjectNode;

/**
 * The SHA-256 content hash of a signed screening version (security-audit-interop.md §B.3–B.4). Covers every
 * field a reader relies on, each as a 4-byte length and its UTF-8 bytes (null as length -1), in a fixed order;
 * JSON documents in canonical form (object keys sorted, no whitespace) so the hash does not depend on how
 * PostgreSQL's jsonb orders keys; times as epoch microseconds (the stored precision).
 */
public final class ScreeningContentHash {

    private static final JsonMapper JSON = JsonMapper.builder().build();

    private ScreeningContentHash() {
    }

    static byte[] of(Screening screening, ScreeningVersion v) {
        MessageDigest sha = sha256();
        field(sha, "screening-content-v1");
        field(sha, screening.getId());
        field(sha, screening.getPatientId());
        field(sha, screening.getEpisodeId());
        field(sha, v.getId());
        field(sha, v.getVersionNo());
        field(sha, v.getStatus());
        field(sha, v.getSupersedesVersionId());
        field(sha, v.getChangeReason());
        field(sha, canonicalJson(v.getMeasurements()));
        field(sha, canonicalJson(v.getSnapshot()));
        field(sha, v.getRuleSetId());
        field(sha, v.getRulesVersion());
        field(sha, v.getEngineVersion());
        field(sha, v.getSuggestedShoulderBand());
        field(sha, v.getSuggestedLumbopelvicBand());
        field(sha, v.getShoulderBand());
        field(sha, v.getShoulderOverrideReason());
        field(sha, v.getLumbopelvicBand());
        field(sha, v.getLumbopelvicOverrideReason());
        field(sha, v.isRedFlagsOpen());
        field(sha, v.getCreatedBy());
        field(sha, micros(v.getCreatedAt()));
        field(sha, v.getSignedBy());
        field(sha, micros(v.getSignedAt()));
        return sha.digest();
    }

    /** A JSON document with every object's keys sorted and no insignificant whitespace. */
    static String canonicalJson(String json) {
        if (json == null) {
            return null;
        }
        return JSON.writeValueAsString(sorted(JSON.readTree(json)));
    }

    private static JsonNode sorted(JsonNode node) {
        if (node.isObject()) {
            Map<String, JsonNode> entries = new TreeMap<>();
            node.properties().forEach(e -> entries.put(e.getKey(), sorted(e.getValue())));
            ObjectNode copy = JsonNodeFactory.instance.objectNode();
            entries.forEach(copy::set);
            return copy;
        }
        if (node.isArray()) {
            var copy = JsonNodeFactory.instance.arrayNode();
            node.forEach(child -> copy.add(sorted(child)));
            return copy;
        }
        return node;
    }

    private static Long micros(Instant t) {
        return t == null ? null : LengthPrefixed.epochMicros(t);
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
