package org.swingclearance.screening;

import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Set;
import org.swingclearance.patient.RedFlag;

/**
 * Reads a whole typed form: the measurements when every field is acceptable, and the problem of each field that
 * is not. Blank fields are "not tested". Keys outside the catalogue are ignored.
 */
public record MeasurementReading(Measurements measurements, Map<String, FieldProblem> problems) {

    public static MeasurementReading of(Map<String, String> typed, Set<RedFlag> redFlags) {
        Map<String, Double> values = new LinkedHashMap<>();
        Map<String, FieldProblem> problems = new LinkedHashMap<>();
        for (MeasurementField field : MeasurementCatalog.fields()) {
            MeasurementField.Reading reading = field.read(typed == null ? null : typed.get(field.key()));
            if (reading.problem() != null) {
                problems.put(field.key(), reading.problem());
            } else if (reading.value() != null) {
                values.put(field.key(), reading.value());
            }
        }
        Measurements measurements = problems.isEmpty() ? new Measurements(values, redFlags) : null;
        return new MeasurementReading(measurements, problems);
    }

    public boolean valid() {
        return problems.isEmpty();
    }
}
