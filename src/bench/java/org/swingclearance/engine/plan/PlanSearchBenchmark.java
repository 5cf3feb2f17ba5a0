package org.swingclearance.engine.plan;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.TimeUnit;

import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/**
 * Plan search over 30 clubs × 20 grip marks × 20 cycle-time rungs = 12,000 states (issue 5: under 200 ms), with the
 * synthetic {@link LeverTestModel} evaluator (test model, not the product's mechanics). Clubs 2–12 kg in equal
 * mass ratios, handles 47.5 cm, cycle times 3.0 s down to 1.1 s in 0.1 s rungs, step limit +10 %, allowances at the median demand so about
 * half the states are permitted, next band 1.5 × the current one.
 *
 * <p>The fork, warm-up and measurement settings are fixed here (as {@code -f 1 -wi 2 -i 3 -bm avgt -tu ms}) because
 * the bench profile passes {@code bench.args} to JMH as a single argument, so only the name pattern reaches it.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Fork(1)
@Warmup(iterations = 2)
@Measurement(iterations = 3)
public class PlanSearchBenchmark {

    private PlanSpace space;
    private LeverTestModel evaluator;
    private PlanRules rules;
    private PlanSearch prepared;
    private PlanRequest replan;
    private PlanRequest unreachableTarget;

    @Setup
    public void setUp() {
        List<ClubOption> clubs = new ArrayList<>();
        Map<String, Double> balancePoints = new HashMap<>();
        for (int i = 0; i < 30; i++) {
            String id = "club-" + i;
            clubs.add(new ClubOption(id, 2.0 * Math.pow(6.0, i / 29.0), 0.475)); // 2–12 kg, +6.4 % per club
            balancePoints.put(id, 0.50 + (i % 3 - 1) * 0.005);
        }
        space = new PlanSpace(clubs, CycleTimeLadder.evenlySpaced(3.0, 1.1, 0.1));
        if (space.stateCount() != 12_000) {
            throw new IllegalStateException("Expected 12,000 states, got " + space.stateCount());
        }
        LeverTestModel unit = new LeverTestModel(0.63, balancePoints, Math.PI / 3, 1, 1, 1, Set.of());
        List<Double> torques = new ArrayList<>();
        List<Double> pulls = new ArrayList<>();
        for (PlanState s : space.states()) {
            ClubOption club = space.club(s.club());
            torques.add(unit.torqueNm(club, space.gripMarkM(s.gripMark()), space.cycleTimeS(s.cycleRung())));
            pulls.add(unit.pullN(club, space.gripMarkM(s.gripMark()), space.cycleTimeS(s.cycleRung())));
        }
        torques.sort(null);
        pulls.sort(null);
        evaluator = new LeverTestModel(0.63, balancePoints, Math.PI / 3, torques.get(6_000), pulls.get(9_000), 1.5,
                Set.of());
        rules = PlanRules.withDefaults(new Dosage(3, 10, 4), new Dosage(2, 8, 3));
        prepared = new PlanSearch(space, evaluator);
        Plan base = prepared.plan(rules, PlanRequest.toHighestPermitted());
        List<PlanStep> steps = base.steps();
        replan = PlanRequest.toHighestPermitted().withProvisionalContinuation()
                .pinning(steps.get(steps.size() / 3).state())
                .removing(steps.get(2 * steps.size() / 3).state());
        unreachableTarget = PlanRequest.toTarget(new PlanState(29, 0, 19)); // heaviest, longest arm, fastest
    }

    /** Evaluate all 12,000 states and plan to the highest permitted state, continuing provisionally. */
    @Benchmark
    public Plan planFromScratch() {
        return new PlanSearch(space, evaluator)
                .plan(rules, PlanRequest.toHighestPermitted().withProvisionalContinuation());
    }

    /** Re-plan after the clinician pins one step and removes another (evaluations already cached). */
    @Benchmark
    public Plan replanWithPinAndRemovedStep() {
        return prepared.plan(rules, replan);
    }

    /** A target outside the envelope: the search also walks the whole reachable frontier for the explanation. */
    @Benchmark
    public Plan planFromScratchToUnreachableTarget() {
        return new PlanSearch(space, evaluator).plan(rules, unreachableTarget);
    }
}
