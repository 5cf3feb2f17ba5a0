package org.swingclearance.screening;

import java.util.ArrayList;
import java.util.Collections;
import java.util.EnumSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.swingclearance.patient.RedFlag;
import org.swingclearance.patient.Side;

/**
 * What a clinician recorded in one screening: values by catalogue key (a missing key means "not tested", never 0)
 * and the red-flag checklist of this screening. Every value is inside its field's range.
 */
public final class Measurements {

    private final Map<String, Double> values;
    private final Set<RedFlag> redFlags;

    /**
     * @throws IllegalArgumentException for a key outside the catalogue or a value outside its range
     */
    public Measurements(Map<String, Double> values, Set<RedFlag> redFlags) {
        Map<String, Double> ordered = new LinkedHashMap<>();
        for (MeasurementField field : MeasurementCatalog.fields()) {
            Double value = values.get(field.key());
            if (value != null) {
                field.check(value).ifPresent(p -> {
                    throw new IllegalArgumentException(field.key() + ": " + p.code());
                });
                ordered.put(field.key(), value);
            }
        }
        for (String key : values.keySet()) {
            if (MeasurementCatalog.field(key).isEmpty()) {
                throw new IllegalArgumentException("unknown measurement " + key);
            }
        }
        this.values = Collections.unmodifiableMap(ordered);
        this.redFlags = redFlags.isEmpty() ? Collections.unmodifiableSet(EnumSet.noneOf(RedFlag.class))
                : Collections.unmodifiableSet(EnumSet.copyOf(redFlags));
    }

    /** Recorded values by key, in catalogue order; keys of untested fields are absent. */
    public Map<String, Double> values() {
        return values;
    }

    public Set<RedFlag> redFlags() {
        return redFlags;
    }

    /** A side-less measurement, null when not tested. */
    public Double get(Measurement measurement) {
        return values.get(MeasurementField.key(measurement, null));
    }

    /** A sided measurement, null when not tested. */
    public Double get(Measurement measurement, Side side) {
        return values.get(MeasurementField.key(measurement, side));
    }

    /** The item responses of a questionnaire in item order, null for unanswered items. */
    public List<Integer> items(Questionnaire questionnaire) {
        List<Integer> items = new ArrayList<>();
        for (int i = 1; i <= questionnaire.items(); i++) {
            Double v = values.get(questionnaire.itemKey(i));
            items.add(v == null ? null : v.intValue());
        }
        return items;
    }

    /** True when at least one item of the questionnaire was answered. */
    public boolean answered(Questionnaire questionnaire) {
        return items(questionnaire).stream().anyMatch(java.util.Objects::nonNull);
    }

    /**
     * The names of the engine measures with at least one recorded value (grip and CKCUEST trials count for the
     * engine's GRIP and CKCUEST_TRIALS, a questionnaire for its instrument); patient facts are not included.
     */
    public Set<String> recordedEngineMeasures() {
        Set<String> names = new java.util.TreeSet<>();
        for (String key : values.keySet()) {
            MeasurementField field = MeasurementCatalog.field(key).orElseThrow();
            if (field.questionnaire() != null) {
                names.add(field.questionnaire().name());
            } else {
                names.add(field.measurement().engineName());
            }
        }
        return names;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Measurements m && m.values.equals(values) && m.redFlags.equals(redFlags);
    }

    @Override
    public int hashCode() {
        return values.hashCode() * 31 + redFlags.hashCode();
    }
}
