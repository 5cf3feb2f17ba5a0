package org.swingclearance.training;

import java.time.LocalDate;
import java.util.List;

/**
 * The load monitoring of an episode up to a day, as the load engine computed it: the daily series, the latest
 * acute and chronic loads and ratios (null while not shown), the last 7 days' load, monotony and strain (null
 * when the week is incomplete or the loads do not vary), the mechanical dose, adherence to the current plan, and
 * the conventions applied.
 */
public record LoadView(LocalDate asOf, List<LoadDay> days, double weeklyLoad, Double acute, Double chronic,
                       Double ratioEwma, Double ratioCoupled, Double ratioUncoupled, Double monotony, Double strain,
                       double mechanicalDose, int sessionsWithoutDose, int sessionsPlanned, int sessionsDone,
                       int sessionsAsPlanned, int sessionsLighter, int sessionsHeavier, int sessionsDifferent,
                       List<ConventionLine> conventions) {

    /** The view before any session is logged. */
    static LoadView empty(LocalDate asOf, List<ConventionLine> conventions) {
        return new LoadView(asOf, List.of(), 0, null, null, null, null, null, null, null, 0, 0, 0, 0, 0, 0, 0, 0,
                conventions);
    }

    public boolean empty() {
        return days.isEmpty();
    }

    /** Sessions done with a configuration other than the step's (lighter, heavier or different at equal D). */
    public int sessionsNotAsPlanned() {
        return sessionsLighter + sessionsHeavier + sessionsDifferent;
    }

    /**
     * One convention the numbers follow, as a message of the training bundle ({@code key} with {@code args}) and
     * the source the engine names for it.
     */
    public record ConventionLine(String key, Object[] args, String source) {
    }
}
