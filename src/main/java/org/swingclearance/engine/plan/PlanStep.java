package org.swingclearance.engine.plan;

import java.util.Optional;
import java.util.OptionalInt;

/**
 * One step of a graded plan: the configuration, what changed from the previous step, its demand ratio and binding
 * constraint, whether it is provisional (beyond the current band), the gate before it, the dosage and the
 * pain-monitoring rule.
 *
 * @param number      1-based position in the plan
 * @param changedDial the dial this step changed; empty for the first step
 * @param rise        relative change of D from the previous step (0.08 = +8 %, negative when D falls); 0 for the
 *                    first step
 */
public record PlanStep(int number, PlanState state, ClubOption club, double gripMarkM, double cycleTimeS,
                       Optional<Dial> changedDial, double demandRatio, double rise, String bindingConstraint,
                       boolean provisional, StepGate gate, boolean pinned, Dosage dosage, PainRule painRule) {

    public double gripMarkCm() {
        return gripMarkM * 100;
    }

    public double swingsPerMinute() {
        return 60 / cycleTimeS;
    }

    /** Message key of the pain-monitoring rule for this step; argument {0} is {@code painRule().painDuringLimit()}. */
    public String painRuleKey() {
        return painRule.messageKey(number == 1);
    }

    /** The step to go back to when the pain rule is broken; empty for the first step (stop and contact the clinician). */
    public OptionalInt regressToStep() {
        return number == 1 ? OptionalInt.empty() : OptionalInt.of(number - 1);
    }
}
