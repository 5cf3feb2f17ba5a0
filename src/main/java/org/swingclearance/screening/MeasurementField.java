package org.swingclearance.screening;

import java.util.Optional;
import java.util.regex.Pattern;
import org.swingclearance.patient.Side;

/**
 * One input of the screening form: a measurement on one side, a side-less measurement, or one questionnaire item.
 * Knows its storage key and checks a typed value against the measurement's range or the item's scale.
 *
 * @param key           storage and form key, e.g. {@code ACTIVE_FLEXION_LEFT} or {@code QUICKDASH_3}
 * @param measurement   the measurement, null for a questionnaire item
 * @param side          the side, null for side-less measurements and items
 * @param questionnaire the questionnaire, null for measurements
 * @param item          1-based item number, 0 for measurements
 */
public record MeasurementField(String key, Measurement measurement, Side side, Questionnaire questionnaire, int item) {

    private static final Pattern NUMBER = Pattern.compile("-?(\\d+(\\.\\d*)?|\\.\\d+)");

    static MeasurementField of(Measurement measurement, Side side) {
        return new MeasurementField(key(measurement, side), measurement, side, null, 0);
    }

    static MeasurementField item(Questionnaire questionnaire, int item) {
        return new MeasurementField(questionnaire.itemKey(item), null, null, questionnaire, item);
    }

    /** The storage key of a measurement on a side (side null for side-less measurements). */
    public static String key(Measurement measurement, Side side) {
        if (measurement.sided() != (side != null)) {
            throw new IllegalArgumentException(measurement + (measurement.sided() ? " needs a side" : " has no side"));
        }
        return side == null ? measurement.name() : measurement.name() + "_" + side.name();
    }

    public MeasureUnit unit() {
        return measurement == null ? MeasureUnit.ITEM_POINTS : measurement.unit();
    }

    public double min() {
        return measurement == null ? questionnaire.minResponse() : measurement.min();
    }

    public double max() {
        return measurement == null ? questionnaire.maxResponse() : measurement.max();
    }

    public Measurement.Kind kind() {
        return measurement == null ? Measurement.Kind.WHOLE : measurement.kind();
    }

    /**
     * Reads what was typed: blank means "not tested" (empty result, distinct from 0); anything else must be a
     * plain decimal number inside the range, else the problem names the rule it broke.
     */
    public Reading read(String typed) {
        if (typed == null || typed.isBlank()) {
            return Reading.notTested();
        }
        String text = typed.trim();
        if (!NUMBER.matcher(text).matches()) {
            return Reading.problem(new FieldProblem("screening.value.notNumber"));
        }
        double value = Double.parseDouble(text);
        return check(value).map(Reading::problem).orElseGet(() -> Reading.of(value));
    }

    /** The problem with a value, if any; the service checks stored values with this too. */
    public Optional<FieldProblem> check(double value) {
        if (!Double.isFinite(value)) {
            return Optional.of(new FieldProblem("screening.value.notNumber"));
        }
        Measurement.Kind kind = kind();
        if ((kind == Measurement.Kind.WHOLE || kind == Measurement.Kind.YES_NO) && value != Math.rint(value)) {
            return Optional.of(new FieldProblem("screening.value.notWhole"));
        }
        if (questionnaire != null && (value < min() || value > max())) {
            return Optional.of(new FieldProblem("screening.value.scale", fmt(min()), fmt(max())));
        }
        if (kind == Measurement.Kind.POSITIVE && value <= 0) {
            return Optional.of(new FieldProblem("screening.value.notPositive"));
        }
        if (value < min()) {
            return Optional.of(new FieldProblem(min() == 0 ? "screening.value.negative" : "screening.value.belowMin",
                    fmt(min())));
        }
        if (value > max()) {
            return Optional.of(new FieldProblem("screening.value.aboveMax", fmt(max())));
        }
        return Optional.empty();
    }

    private static String fmt(double bound) {
        return bound == Math.rint(bound) ? String.valueOf((long) bound) : String.valueOf(bound);
    }

    /** A typed value: a number, "not tested", or a problem. */
    public record Reading(Double value, FieldProblem problem) {

        static Reading notTested() {
            return new Reading(null, null);
        }

        static Reading of(double value) {
            return new Reading(value, null);
        }

        static Reading problem(FieldProblem problem) {
            return new Reading(null, problem);
        }
    }
}
