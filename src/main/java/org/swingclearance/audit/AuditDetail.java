package org.swingclearance.audit;

import java.util.LinkedHashMap;
import java.util.Map;

/**
 * The text format of an event's detail: {@code key=value} pairs joined by commas, as in {@code role=MANAGER}.
 * Values may hold any text (an override reason); a backslash escapes a comma, an equals sign or itself, so
 * the reports can read the pairs back exactly. Details carry identifiers, counts and reasons, never clinical values.
 */
public final class AuditDetail {

    private AuditDetail() {
    }

    /** Pairs of key and value; a null value leaves its pair out. */
    public static String of(Object... keysAndValues) {
        if (keysAndValues.length % 2 != 0) {
            throw new IllegalArgumentException("keys and values come in pairs");
        }
        StringBuilder text = new StringBuilder();
        for (int i = 0; i < keysAndValues.length; i += 2) {
            Object value = keysAndValues[i + 1];
            if (value == null) {
                continue;
            }
            if (!text.isEmpty()) {
                text.append(',');
            }
            text.append(escape(keysAndValues[i].toString())).append('=').append(escape(value.toString()));
        }
        return text.isEmpty() ? null : text.toString();
    }

    /** The pairs of a detail in their order; text without an equals sign becomes the value of key "text". */
    public static Map<String, String> parse(String detail) {
        Map<String, String> pairs = new LinkedHashMap<>();
        if (detail == null || detail.isEmpty()) {
            return pairs;
        }
        StringBuilder key = new StringBuilder();
        StringBuilder value = new StringBuilder();
        StringBuilder current = key;
        boolean inValue = false;
        for (int i = 0; i < detail.length(); i++) {
            char c = detail.charAt(i);
            if (c == '\\' && i + 1 < detail.length()) {
                current.append(detail.charAt(++i));
            } else if (c == '=' && !inValue) {
                inValue = true;
                current = value;
            } else if (c == ',') {
                put(pairs, key, value, inValue);
                key.setLength(0);
                value.setLength(0);
                inValue = false;
                current = key;
            } else {
                current.append(c);
            }
        }
        put(pairs, key, value, inValue);
        return pairs;
    }

    private static void put(Map<String, String> pairs, StringBuilder key, StringBuilder value, boolean inValue) {
        if (inValue) {
            pairs.put(key.toString().trim(), value.toString());
        } else if (!key.toString().isBlank()) {
            pairs.merge("text", key.toString().trim(), (a, b) -> a + "," + b);
        }
    }

    private static String escape(String text) {
        return text.replace("\\", "\\\\").replace(",", "\\,").replace("=", "\\=");
    }
}
