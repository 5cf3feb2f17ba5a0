package org.swingclearance.screening;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.swingclearance.patient.Side;

/** Every input of the screening form, in form order: measurements by section, then questionnaire items. */
public final class MeasurementCatalog {

    private static final List<MeasurementField> FIELDS;
    private static final Map<String, MeasurementField> BY_KEY;

    static {
        List<MeasurementField> fields = new ArrayList<>();
        for (Measurement measurement : Measurement.values()) {
            if (measurement.sided()) {
                fields.add(MeasurementField.of(measurement, Side.LEFT));
                fields.add(MeasurementField.of(measurement, Side.RIGHT));
            } else {
                fields.add(MeasurementField.of(measurement, null));
            }
        }
        for (Questionnaire questionnaire : Questionnaire.values()) {
            for (int item = 1; item <= questionnaire.items(); item++) {
                fields.add(MeasurementField.item(questionnaire, item));
            }
        }
        FIELDS = Collections.unmodifiableList(fields);
        Map<String, MeasurementField> byKey = new LinkedHashMap<>();
        fields.forEach(f -> byKey.put(f.key(), f));
        BY_KEY = Collections.unmodifiableMap(byKey);
    }

    private MeasurementCatalog() {
    }

    public static List<MeasurementField> fields() {
        return FIELDS;
    }

    public static Optional<MeasurementField> field(String key) {
        return Optional.ofNullable(BY_KEY.get(key));
    }

    /** The side-less measurements and sided pairs of a section, in form order. */
    public static List<Measurement> measures(ScreeningSection section) {
        List<Measurement> result = new ArrayList<>();
        for (Measurement m : Measurement.values()) {
            if (m.section() == section) {
                result.add(m);
            }
        }
        return result;
    }
}
