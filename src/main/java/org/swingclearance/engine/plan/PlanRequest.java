package org.swingclearance.engine.plan;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;

/**
 * What the clinician asks of one plan: where to start (default: the permitted state with the lowest D), the target
 * (default: the permitted state with the highest D in the current band), whether to continue provisionally into the
 * next band, steps pinned in plan order (the plan must pass through them) and states removed (the plan must avoid
 * them).
 */
public record PlanRequest(Optional<PlanState> start, Optional<PlanState> target, boolean provisionalContinuation,
                          List<PlanState> pinned, Set<PlanState> removed) {

    public PlanRequest {
        if (start == null || target == null || pinned == null || removed == null) {
            throw new IllegalArgumentException("Plan request parts must not be null.");
        }
        pinned = List.copyOf(pinned);
        removed = Set.copyOf(removed);
        for (PlanState pin : pinned) {
            if (removed.contains(pin)) {
                throw new IllegalArgumentException("State " + pin + " is both pinned and removed.");
            }
        }
    }

    /** From the easiest permitted state to the highest permitted state of the current band. */
    public static PlanRequest toHighestPermitted() {
        return new PlanRequest(Optional.empty(), Optional.empty(), false, List.of(), Set.of());
    }

    /** From the easiest permitted state to the clinician's target. */
    public static PlanRequest toTarget(PlanState target) {
        return new PlanRequest(Optional.empty(), Optional.of(target), false, List.of(), Set.of());
    }

    public PlanRequest from(PlanState startState) {
        return new PlanRequest(Optional.of(startState), target, provisionalContinuation, pinned, removed);
    }

    /** Continue beyond the current band, up to the next band, with provisional steps behind a re-screen gate. */
    public PlanRequest withProvisionalContinuation() {
        return new PlanRequest(start, target, true, pinned, removed);
    }

    /** Re-plan so that the plan passes through {@code state} after the states pinned so far. */
    public PlanRequest pinning(PlanState state) {
        List<PlanState> pins = new ArrayList<>(pinned);
        pins.add(state);
        Set<PlanState> rest = new LinkedHashSet<>(removed);
        rest.remove(state);
        return new PlanRequest(start, target, provisionalContinuation, pins, rest);
    }

    /** Re-plan around {@code state}: the plan will not use it (and it stops being pinned). */
    public PlanRequest removing(PlanState state) {
        List<PlanState> pins = new ArrayList<>(pinned);
        pins.remove(state);
        Set<PlanState> rest = new LinkedHashSet<>(removed);
        rest.add(state);
        return new PlanRequest(start, target, provisionalContinuation, pins, rest);
    }
}
