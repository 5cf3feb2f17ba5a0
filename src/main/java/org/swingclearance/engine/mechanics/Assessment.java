package org.swingclearance.engine.mechanics;

import java.util.List;

/**
 * The full judgement of one configuration against a capacity and the practice rules (engine.md §5).
 *
 * @param demand              the demand it was judged on (carries the inputs, provenance and model assumptions)
 * @param capacity            the capacity used
 * @param rules               the rules used
 * @param verdict             permitted, demand ratio D and binding constraint
 * @param shoulderTorqueRatio C1 ratio, peak torque / (f·τ_cap)
 * @param holdTorqueRatio     C2 ratio, or null when the controlled-stop rule is off
 * @param gripPullRatio       C3 ratio, or null when grip strength was not measured
 * @param maxHalfArcRad       when C4 excludes the pattern: the largest half-arc the range permits, rad (0 when
 *                            none); otherwise null
 * @param notes               what was not checked and why, as plain sentences (empty when everything was)
 * @param engineVersion       {@link EngineVersion#ENGINE_VERSION}
 */
public record Assessment(Demand demand, Capacity capacity, LoadRules rules, Verdict verdict,
                         double shoulderTorqueRatio, Double holdTorqueRatio, Double gripPullRatio,
                         Double maxHalfArcRad, List<String> notes, String engineVersion) {

    public Assessment {
        notes = List.copyOf(notes);
    }

    public boolean permitted() {
        return verdict.permitted();
    }

    public double demandRatio() {
        return verdict.demandRatio();
    }

    public Constraint binding() {
        return verdict.binding();
    }
}
