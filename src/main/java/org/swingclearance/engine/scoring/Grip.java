package org.swingclearance.engine.scoring;

import java.util.List;
import java.util.Objects;
import org.swingclearance.engine.evidence.Citations;

/** Grip strength: pound/kilogram conversion and the summary of a hand's trials (clinical.md §2.4). */
public final class Grip {

    /** Kilograms per pound, exact (international pound). */
    public static final double KILOGRAMS_PER_POUND = 0.45359237;

    /** How a hand's trials are summarised; the clinic fixes one protocol and stores it with the value. */
    public enum Protocol {
        /** Best of the trials (many cohorts in Dodds 2014). */
        BEST,
        /** Mean of the trials (Mathiowetz 1985). */
        MEAN
    }

    private Grip() {
    }

    /** Converts pounds to kilograms; {@code pounds} must be finite and ≥ 0. */
    public static double poundsToKilograms(double pounds) {
        return Inputs.nonNegative(pounds, "pounds") * KILOGRAMS_PER_POUND;
    }

    /** Converts kilograms to pounds; {@code kilograms} must be finite and ≥ 0. */
    public static double kilogramsToPounds(double kilograms) {
        return Inputs.nonNegative(kilograms, "kilograms") / KILOGRAMS_PER_POUND;
    }

    /**
     * Summarises one hand's trials.
     *
     * @param trialsKg trials in kg, each ≥ 0 or null (not done); the list itself may be null (not tested)
     * @param protocol best or mean; never null
     * @return grip strength in {@link Unit#KILOGRAM} over the trials done; not scorable when none was done
     */
    public static Score summarise(List<Double> trialsKg, Protocol protocol) {
        Objects.requireNonNull(protocol, "protocol");
        List<Double> done = trialsKg == null ? List.of() : trialsKg.stream().filter(Objects::nonNull).toList();
        if (done.isEmpty()) {
            return Score.notTested(Unit.KILOGRAM, Citations.MATHIOWETZ_1985, "grip strength needs at least one trial");
        }
        done.forEach(trial -> Inputs.nonNegative(trial, "grip trial"));
        double value = protocol == Protocol.BEST
                ? done.stream().mapToDouble(Double::doubleValue).max().orElseThrow()
                : done.stream().mapToDouble(Double::doubleValue).average().orElseThrow();
        return Score.of(value, Unit.KILOGRAM, Citations.MATHIOWETZ_1985);
    }
}
