package org.swingclearance.engine.scoring;

import java.util.ArrayList;
import java.util.Collections;
import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;

/**
 * The raw inputs of one screening. A slot that is absent was not tested; zero is a value. Every value is checked
 * against its {@link Measure}'s kind and range on construction, so an instance only holds possible values.
 *
 * @param involvedSide the involved shoulder (for throwers the dominant one); null when there is none, e.g. a
 *                     lumbopelvic-only episode — side-to-side comparisons are then not scorable
 * @param numbers      values of {@link Measure.Kind#NUMBER} and {@link Measure.Kind#WHOLE_NUMBER} measures; never null
 * @param yesNo        answers of {@link Measure.Kind#YES_NO} measures; never null
 * @param series       trials and questionnaire responses in item order (unanswered items null); never null
 */
public record ScreeningInput(Side involvedSide, Map<MeasureKey, Double> numbers, Map<MeasureKey, Boolean> yesNo,
        Map<Measure, List<Integer>> series) {

    public ScreeningInput {
        numbers = Collections.unmodifiableMap(new LinkedHashMap<>(Objects.requireNonNull(numbers, "numbers")));
        yesNo = Collections.unmodifiableMap(new LinkedHashMap<>(Objects.requireNonNull(yesNo, "yesNo")));
        Map<Measure, List<Integer>> seriesCopy = new EnumMap<>(Measure.class);
        Objects.requireNonNull(series, "series").forEach((measure, values) -> seriesCopy.put(measure,
                Collections.unmodifiableList(new ArrayList<>(Objects.requireNonNull(values, "series values")))));
        series = Collections.unmodifiableMap(seriesCopy);
        numbers.forEach((key, value) -> {
            Measure.require(key.measure(), Measure.Kind.NUMBER, Measure.Kind.WHOLE_NUMBER);
            key.measure().check(Objects.requireNonNull(value, () -> key + " value"));
        });
        yesNo.forEach((key, value) -> {
            Measure.require(key.measure(), Measure.Kind.YES_NO);
            Objects.requireNonNull(value, () -> key + " answer");
        });
        series.forEach(ScreeningInput::checkSeries);
    }

    private static void checkSeries(Measure measure, List<Integer> values) {
        Measure.require(measure, Measure.Kind.TRIALS, Measure.Kind.ITEMS);
        if (measure.kind() == Measure.Kind.ITEMS && values.size() != measure.items()) {
            throw new IllegalArgumentException(measure + " has " + measure.items() + " items, got " + values.size());
        }
        for (Integer value : values) {
            if (value == null) {
                if (measure.kind() == Measure.Kind.TRIALS) {
                    throw new IllegalArgumentException(measure + " trials must all have a value");
                }
            } else {
                measure.check(value);
            }
        }
    }

    /** Starts an input with the given involved side (null for none). */
    public static Builder builder(Side involvedSide) {
        return new Builder(involvedSide);
    }

    /** Value of an unsided number measure, or null when not tested. */
    public Double number(Measure measure) {
        return numbers.get(measure.key());
    }

    /** Value of a sided number measure on a side, or null when not tested or {@code side} is null. */
    public Double number(Measure measure, Side side) {
        return side == null ? null : numbers.get(measure.on(side));
    }

    /** Value on the involved side, or null when not tested or no involved side was given. */
    public Double involved(Measure measure) {
        return number(measure, involvedSide);
    }

    /** Value on the uninvolved side, or null when not tested or no involved side was given. */
    public Double uninvolved(Measure measure) {
        return involvedSide == null ? null : number(measure, involvedSide.opposite());
    }

    /** Answer of a yes/no measure, or null when not tested. */
    public Boolean answer(Measure measure) {
        return yesNo.get(measure.key());
    }

    /** Trials or item responses, or null when not tested. */
    public List<Integer> seriesOf(Measure measure) {
        return series.get(measure);
    }

    /** True when the slot holds a value (a questionnaire counts as present when any item is answered). */
    public boolean has(MeasureKey key) {
        return switch (key.measure().kind()) {
            case NUMBER, WHOLE_NUMBER -> numbers.containsKey(key);
            case YES_NO -> yesNo.containsKey(key);
            case TRIALS -> series.containsKey(key.measure()) && !series.get(key.measure()).isEmpty();
            case ITEMS -> series.containsKey(key.measure())
                    && series.get(key.measure()).stream().anyMatch(Objects::nonNull);
        };
    }

    /** Collects the inputs of a screening; every setter checks the measure's kind and range. */
    public static final class Builder {

        private final Side involvedSide;
        private final Map<MeasureKey, Double> numbers = new LinkedHashMap<>();
        private final Map<MeasureKey, Boolean> yesNo = new LinkedHashMap<>();
        private final Map<Measure, List<Integer>> series = new EnumMap<>(Measure.class);

        private Builder(Side involvedSide) {
            this.involvedSide = involvedSide;
        }

        /** Sets an unsided number; a null value leaves the slot not tested. */
        public Builder number(Measure measure, Double value) {
            return number(measure.key(), value);
        }

        /** Sets a sided number; a null value leaves the slot not tested. */
        public Builder number(Measure measure, Side side, Double value) {
            return number(measure.on(side), value);
        }

        /** Sets both sides of a sided number; null values leave those slots not tested. */
        public Builder sides(Measure measure, Double left, Double right) {
            return number(measure, Side.LEFT, left).number(measure, Side.RIGHT, right);
        }

        private Builder number(MeasureKey key, Double value) {
            if (value != null) {
                Measure.require(key.measure(), Measure.Kind.NUMBER, Measure.Kind.WHOLE_NUMBER);
                numbers.put(key, key.measure().check(value));
            }
            return this;
        }

        /** Sets a yes/no answer; null leaves it not tested. */
        public Builder answer(Measure measure, Boolean value) {
            if (value != null) {
                Measure.require(measure, Measure.Kind.YES_NO);
                yesNo.put(measure.key(), value);
            }
            return this;
        }

        /** Sets trials or item responses (items in order, unanswered null); null leaves it not tested. */
        public Builder series(Measure measure, List<Integer> values) {
            if (values != null) {
                checkSeries(measure, values);
                series.put(measure, values);
            }
            return this;
        }

        /** The checked input. */
        public ScreeningInput build() {
            return new ScreeningInput(involvedSide, numbers, yesNo, series);
        }
    }
}
