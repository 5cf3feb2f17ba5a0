package org.swingclearance.engine.scoring;

import java.util.ArrayList;
import java.util.List;

/** Argument checks shared by the scoring functions; a failed check is a caller error, never "not tested". */
final class Inputs {

    private Inputs() {
    }

    static double nonNegative(double value, String name) {
        if (!Double.isFinite(value) || value < 0) {
            throw new IllegalArgumentException(name + " must be a finite number ≥ 0, was " + value);
        }
        return value;
    }

    static double positive(double value, String name) {
        if (!Double.isFinite(value) || value <= 0) {
            throw new IllegalArgumentException(name + " must be a finite number > 0, was " + value);
        }
        return value;
    }

    static double inRange(double value, double min, double max, String name) {
        if (!Double.isFinite(value) || value < min || value > max) {
            throw new IllegalArgumentException(name + " must be within " + min + "–" + max + ", was " + value);
        }
        return value;
    }

    /** Names of the inputs that are null, in order; {@code namesAndValues} alternates name, value. */
    static List<String> missing(Object... namesAndValues) {
        List<String> missing = new ArrayList<>();
        for (int i = 0; i < namesAndValues.length; i += 2) {
            if (namesAndValues[i + 1] == null) {
                missing.add((String) namesAndValues[i]);
            }
        }
        return missing;
    }

    /** The rule text of a not-tested score: what the formula needs, then which inputs were not tested. */
    static String notTestedRule(String needs, List<String> missing) {
        return needs + "; not tested: " + String.join(", ", missing);
    }

    /**
     * Checks a questionnaire response list: exactly {@code items} entries, each null (unanswered) or an integer in
     * {@code min..max}.
     */
    static void items(List<Integer> responses, int items, int min, int max, String instrument) {
        if (responses == null) {
            throw new IllegalArgumentException(instrument + " responses must not be null (use a list of nulls)");
        }
        if (responses.size() != items) {
            throw new IllegalArgumentException(instrument + " has " + items + " items, got " + responses.size());
        }
        for (int i = 0; i < responses.size(); i++) {
            Integer response = responses.get(i);
            if (response != null && (response < min || response > max)) {
                throw new IllegalArgumentException(
                        instrument + " item " + (i + 1) + " must be " + min + "–" + max + ", was " + response);
            }
        }
    }

    static int answered(List<Integer> responses) {
        int answered = 0;
        for (Integer response : responses) {
            if (response != null) {
                answered++;
            }
        }
        return answered;
    }

    static int sum(List<Integer> responses) {
        int sum = 0;
        for (Integer response : responses) {
            if (response != null) {
                sum += response;
            }
        }
        return sum;
    }
}
