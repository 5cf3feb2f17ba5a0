package org.swingclearance.engine.plan;

/**
 * The mechanics behind the plan search: judges one configuration against the patient's capacity and load band.
 * The plan feature adapts the mechanics engine (demand, constraints C1–C5, engine.md §4–5) to this interface for a
 * fixed patient, swing pattern, current band and next band. Implementations must be pure: the same arguments always
 * give the same evaluation.
 */
@FunctionalInterface
public interface StateEvaluator {

    /**
     * @param club       the club, as listed in the plan space
     * @param gripMarkM  distance of the centre of the hand from the knob end, metres
     * @param cycleTimeS seconds for one full out-and-back swing
     */
    Evaluation evaluate(ClubOption club, double gripMarkM, double cycleTimeS);
}
