package org.swingclearance.plan;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.UUID;
import org.springframework.context.MessageSourceResolvable;
import org.springframework.context.support.DefaultMessageSourceResolvable;
import org.swingclearance.engine.mechanics.EngineVersion;
import org.swingclearance.engine.plan.Blocker;
import org.swingclearance.engine.plan.ClubOption;
import org.swingclearance.engine.plan.CycleTimeLadder;
import org.swingclearance.engine.plan.Dosage;
import org.swingclearance.engine.plan.PainRule;
import org.swingclearance.engine.plan.Plan;
import org.swingclearance.engine.plan.PlanRequest;
import org.swingclearance.engine.plan.PlanRules;
import org.swingclearance.engine.plan.PlanSearch;
import org.swingclearance.engine.plan.PlanSpace;
import org.swingclearance.engine.plan.PlanState;
import org.swingclearance.engine.plan.PlanStep;
import org.swingclearance.engine.plan.Shortfall;
import org.swingclearance.engine.plan.ShortfallReason;
import org.swingclearance.engine.plan.StepGate;

/**
 * Computes the steps of a plan version with the engine: the plan space of the inventory's clubs × grip marks ×
 * the cycle-time ladder, each state judged by the mechanics engine through {@link MechanicsStateEvaluator}, the
 * engine's plan search for the clinician's request (target, provisional continuation, pins, removals), and the
 * step schedule. Says in words why a plan stops short of its goal.
 */
final class PlanComputation {

    /** Engine versions recorded with every computed version: the mechanics model and the plan search it drives. */
    static final String ENGINE_VERSION = EngineVersion.ENGINE_VERSION + "; plan-search 1";

    /**
     * The cycle-time ladder: 3.0 s down to 1.2 s in 0.1 s rungs (engine.md §7's example ladder; 20 to 50 swings a
     * minute). Targets must be on it: nothing is rounded to a neighbouring rung.
     */
    static final CycleTimeLadder LADDER = CycleTimeLadder.evenlySpaced(3.0, 1.2, 0.1);

    /** The result: steps, and the outcome as a message (resolved by the caller in the reader's language). */
    record Computed(List<PlannedStep> steps, String outcomeKey, MessageSourceResolvable outcome) {
    }

    private PlanComputation() {
    }

    static Computed compute(PlanningInputs inputs, PlanSettings settings, List<PlanAdjustment> adjustments,
                            double stepLimit, int painDuringLimit) {
        PlanSpace space = new PlanSpace(inputs.clubs().stream().map(MechanicsStateEvaluator::option).toList(),
                new CycleTimeLadder(inputs.cycleLadderS()));
        PlanSearch search = new PlanSearch(space, new MechanicsStateEvaluator(inputs));
        Dose within = settings.doses().get(inputs.band());
        Dose provisional = inputs.nextBand() == null ? within : settings.doses().get(inputs.nextBand());
        PlanRules rules = new PlanRules(stepLimit, new PainRule(painDuringLimit), dosage(within), dosage(provisional));
        Plan plan = search.plan(rules, request(space, settings, adjustments));

        StepSchedule schedule = new StepSchedule(settings.startsOn(), settings.stepUnit(), settings.stepLength(),
                settings.sessionsPerWeek());
        List<PlannedStep> steps = new ArrayList<>();
        for (PlanStep s : plan.steps()) {
            PlanningInputs.ClubInput club = club(inputs, s.club());
            steps.add(new PlannedStep(s.number(), club.id(), club.name(), club.massKg(), round6(s.gripMarkCm()),
                    round6(s.cycleTimeS()), s.changedDial().map(Enum::name).orElse(null), s.dosage().sets(),
                    s.dosage().reps(), s.dosage().effortCap(), s.demandRatio(), s.rise(), s.bindingConstraint(),
                    s.provisional(), s.gate() == StepGate.RESCREEN_BEFORE, s.pinned(),
                    schedule.startOf(s.number())));
        }
        return outcome(plan, steps, settings, stepLimit);
    }

    /** The ladder's rungs, for the target form. */
    static List<Double> ladder() {
        return LADDER.rungsS();
    }

    private static PlanRequest request(PlanSpace space, PlanSettings settings, List<PlanAdjustment> adjustments) {
        PlanRequest request = settings.target() == null ? PlanRequest.toHighestPermitted()
                : PlanRequest.toTarget(state(space, settings.target().clubId(), settings.target().gripMarkCm(),
                        settings.target().cycleTimeS()));
        if (settings.continueProvisionally()) {
            request = request.withProvisionalContinuation();
        }
        Set<PlanState> seen = new HashSet<>();
        for (PlanAdjustment a : adjustments) {
            PlanState state;
            try {
                state = state(space, a.getClubId(), a.getGripMarkCm(), a.getCycleTimeS());
            } catch (IllegalArgumentException clubGoneOrOffGrid) {
                continue; // a club retired since the pin: the pin no longer applies
            }
            if (!seen.add(state)) {
                continue;
            }
            request = a.getKind() == AdjustmentKind.PIN ? request.pinning(state) : request.removing(state);
        }
        return request;
    }

    static PlanState state(PlanSpace space, UUID clubId, double gripMarkCm, double cycleTimeS) {
        return space.stateAt(clubId.toString(), gripMarkCm / 100.0, cycleTimeS);
    }

    private static Computed outcome(Plan plan, List<PlannedStep> steps, PlanSettings settings, double stepLimit) {
        if (plan.shortfall().isEmpty()) {
            boolean provisional = steps.stream().anyMatch(PlannedStep::isProvisional);
            String key = settings.target() != null ? "plan.outcome.targetReached"
                    : provisional ? "plan.outcome.highestNextBandReached" : "plan.outcome.highestReached";
            return new Computed(steps, key, resolvable(key, steps.size()));
        }
        Shortfall shortfall = plan.shortfall().get();
        Object second;
        if (shortfall.reason() == ShortfallReason.UNREACHABLE) {
            second = shortfall.primaryBlocker().map(b -> blocker(b, stepLimit))
                    .orElse(resolvable("plan.outcome.noWay"));
        } else {
            second = resolvable("plan.binding." + shortfall.wantedEvaluation().bindingConstraint());
        }
        MessageSourceResolvable message = resolvable(shortfall.messageKey(),
                resolvable(shortfall.waypoint().messageKey()), second,
                String.format(Locale.ROOT, "%.2f", shortfall.wantedEvaluation().demandRatio()));
        return new Computed(steps, shortfall.messageKey(), message);
    }

    private static MessageSourceResolvable blocker(Blocker b, double stepLimit) {
        return resolvable(b.messageKey(), resolvable("engine.plan.dial." + b.dial().name()),
                b.bindingConstraint().map(c -> (Object) resolvable("plan.binding." + c)).orElse(""),
                Double.isNaN(b.rise()) ? "" : String.format(Locale.ROOT, "%.0f", b.rise() * 100),
                String.format(Locale.ROOT, "%.0f", stepLimit * 100),
                String.format(Locale.ROOT, "%.1f", b.position().gripMark() * PlanSpace.GRIP_STEP_M * 100));
    }

    private static MessageSourceResolvable resolvable(String code, Object... args) {
        return new DefaultMessageSourceResolvable(new String[] {code}, args);
    }

    private static Dosage dosage(Dose dose) {
        return new Dosage(dose.sets(), dose.reps(), dose.effortCap());
    }

    private static PlanningInputs.ClubInput club(PlanningInputs inputs, ClubOption option) {
        return inputs.clubs().stream().filter(c -> c.id().toString().equals(option.id())).findFirst()
                .orElseThrow(() -> new IllegalStateException("club of a step not in the inputs: " + option.id()));
    }

    /** To a millionth, so that 2.7 s and 12.5 cm are stored as those decimals, not as the sums of binary rungs. */
    private static double round6(double value) {
        return Math.round(value * 1e6) / 1e6;
    }
}
