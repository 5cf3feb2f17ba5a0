package org.swingclearance.engine.load;

import java.util.List;
import java.util.Objects;
import java.util.OptionalDouble;

/**
 * Adherence to the plan over a period.
 *
 * @param planned           sessions the plan asked for, ≥ 0
 * @param done              sessions logged, ≥ 0
 * @param completionPercent done ÷ planned × 100 (may exceed 100); empty when nothing was planned
 * @param asPlanned         sessions done as prescribed
 * @param lighter           sessions done lighter than the step
 * @param heavier           sessions done heavier than the step
 * @param different         sessions done differently at the same demand
 * @param asPlannedPercent  as planned ÷ done × 100; empty when nothing was done
 */
public record Adherence(int planned, int done, OptionalDouble completionPercent, int asPlanned, int lighter,
        int heavier, int different, OptionalDouble asPlannedPercent) {

    public Adherence {
        Objects.requireNonNull(completionPercent, "completionPercent");
        Objects.requireNonNull(asPlannedPercent, "asPlannedPercent");
    }

    /**
     * Counts adherence.
     *
     * @param plannedSessions sessions the plan asked for in the period, ≥ 0
     * @param logged          the configuration match of each logged session in the period; never null
     */
    public static Adherence of(int plannedSessions, List<ConfigurationMatch> logged) {
        Objects.requireNonNull(logged, "logged");
        if (plannedSessions < 0) {
            throw new IllegalArgumentException("planned sessions must be ≥ 0, was " + plannedSessions);
        }
        int[] counts = new int[ConfigurationMatch.values().length];
        for (ConfigurationMatch match : logged) {
            counts[Objects.requireNonNull(match, "match").ordinal()]++;
        }
        int done = logged.size();
        int asPlanned = counts[ConfigurationMatch.AS_PLANNED.ordinal()];
        return new Adherence(plannedSessions, done,
                plannedSessions == 0 ? OptionalDouble.empty() : OptionalDouble.of(100.0 * done / plannedSessions),
                asPlanned, counts[ConfigurationMatch.LIGHTER.ordinal()], counts[ConfigurationMatch.HEAVIER.ordinal()],
                counts[ConfigurationMatch.DIFFERENT.ordinal()],
                done == 0 ? OptionalDouble.empty() : OptionalDouble.of(100.0 * asPlanned / done));
    }
}
