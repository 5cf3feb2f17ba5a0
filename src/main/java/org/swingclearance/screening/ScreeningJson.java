package org.swingclearance.screening;

import java.util.EnumSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.swingclearance.patient.RedFlag;
import tools.jackson.databind.DeserializationFeature;
import tools.jackson.databind.json.JsonMapper;

/**
 * The stored JSON forms of measurements and snapshots. A mapper of its own, independent of the web's settings,
 * so what is stored never changes with application configuration.
 */
final class ScreeningJson {

    private static final JsonMapper JSON = JsonMapper.builder()
            .disable(DeserializationFeature.FAIL_ON_UNKNOWN_PROPERTIES).build();

    private ScreeningJson() {
    }

    /** Stored form of {@link Measurements}: values by key and the red-flag names. */
    record StoredMeasurements(Map<String, Double> values, List<String> redFlags) {
    }

    static String write(Measurements m) {
        return JSON.writeValueAsString(new StoredMeasurements(new LinkedHashMap<>(m.values()),
                m.redFlags().stream().map(Enum::name).sorted().toList()));
    }

    static Measurements readMeasurements(String json) {
        StoredMeasurements stored = JSON.readValue(json, StoredMeasurements.class);
        Set<RedFlag> flags = EnumSet.noneOf(RedFlag.class);
        if (stored.redFlags() != null) {
            stored.redFlags().forEach(f -> flags.add(RedFlag.valueOf(f)));
        }
        return new Measurements(stored.values() == null ? Map.of() : stored.values(), flags);
    }

    static String write(ScreeningSnapshot snapshot) {
        return JSON.writeValueAsString(snapshot);
    }

    static ScreeningSnapshot readSnapshot(String json) {
        return JSON.readValue(json, ScreeningSnapshot.class);
    }
}
