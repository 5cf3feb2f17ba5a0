package org.swingclearance.engine.plan;

import java.util.List;
import java.util.Optional;

/**
 * Why a plan ends before its goal ("cannot reach the target because …"): the waypoint it was heading for, the
 * reason, and the blocked steps on the way. A blocked step leads from a state the plan can reach to a position it
 * cannot reach that lies nearer the wanted state (in dial steps) than any reachable state does; every way to the
 * wanted state passes through one of them. They are ordered nearest to the wanted state first, then by reason
 * (constraints, then the step limit, then removed states, then missing grip marks).
 */
public record Shortfall(WaypointKind waypoint, PlanState wanted, ShortfallReason reason, Evaluation wantedEvaluation,
                        List<Blocker> blockers) {

    public Shortfall {
        blockers = List.copyOf(blockers);
    }

    /** Message key; see engine.properties for its arguments. */
    public String messageKey() {
        return "engine.plan.shortfall." + reason.name();
    }

    public Optional<Blocker> primaryBlocker() {
        return blockers.stream().findFirst();
    }

    /**
     * The constraint that blocks: the wanted state's own binding constraint when it lies outside the band the plan
     * may use, else that of the first blocked neighbour that a constraint excludes. Empty when only the step limit,
     * removed states or the handle length stand in the way.
     */
    public Optional<String> bindingConstraint() {
        if (reason == ShortfallReason.OUTSIDE_ENVELOPE || reason == ShortfallReason.NEEDS_RESCREEN) {
            return Optional.of(wantedEvaluation.bindingConstraint());
        }
        return blockers.stream().map(Blocker::bindingConstraint).flatMap(Optional::stream).findFirst();
    }
}
