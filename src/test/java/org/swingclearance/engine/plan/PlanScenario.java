package org.swingclearance.engine.plan;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Random;
import java.util.Set;

/**
 * A random but physically shaped plan problem for the properties: an inventory, a ladder, the {@link LeverTestModel}
 * with allowances set at a chosen quantile of the demands (so every scenario mixes permitted and excluded states),
 * scattered categorical exclusions, and a clinician's request (target, pin, removed states, provisional
 * continuation, explicit start) drawn from a seed.
 */
record PlanScenario(List<ClubOption> clubs, List<Double> balancePointsM, List<Double> rungsS, double torqueQuantile,
                    double pullQuantile, double nextBandScale, double exclusionRate, double stepLimit, long seed) {

    /** Shoulder-to-grip distance of the test model (about 0.36 × stature for a 1.75 m adult, engine.md §1). */
    static final double REACH_M = 0.63;
    /** Half-arc of the test model's rhythmic swing, 60°. */
    static final double HALF_ARC_RAD = Math.PI / 3;

    PlanSpace space() {
        return new PlanSpace(clubs, new CycleTimeLadder(rungsS));
    }

    LeverTestModel evaluator() {
        Map<String, Double> balancePoints = new HashMap<>();
        for (int i = 0; i < clubs.size(); i++) {
            balancePoints.put(clubs.get(i).id(), balancePointsM.get(i));
        }
        LeverTestModel unit = new LeverTestModel(REACH_M, balancePoints, HALF_ARC_RAD, 1, 1, 1, Set.of());
        PlanSpace space = space();
        List<Double> torques = new ArrayList<>();
        List<Double> pulls = new ArrayList<>();
        Set<String> excluded = new HashSet<>();
        Random random = new Random(seed);
        for (PlanState s : space.states()) {
            ClubOption club = space.club(s.club());
            double grip = space.gripMarkM(s.gripMark());
            double t = space.cycleTimeS(s.cycleRung());
            torques.add(unit.torqueNm(club, grip, t));
            pulls.add(unit.pullN(club, grip, t));
            if (random.nextDouble() < exclusionRate) {
                excluded.add(LeverTestModel.key(club.id(), grip, t));
            }
        }
        return new LeverTestModel(REACH_M, balancePoints, HALF_ARC_RAD, quantile(torques, torqueQuantile),
                quantile(pulls, pullQuantile), nextBandScale, excluded);
    }

    PlanRules rules() {
        return new PlanRules(stepLimit, new PainRule(PainRule.SILBERNAGEL_LIMIT), new Dosage(3, 10, 4),
                new Dosage(2, 8, 3));
    }

    /** A request drawn from the seed: each part present with a fixed chance. */
    PlanRequest request() {
        Random random = new Random(~seed);
        List<PlanState> all = space().states();
        Optional<PlanState> start = random.nextInt(5) == 0 ? Optional.of(pick(all, random)) : Optional.empty();
        Optional<PlanState> target = random.nextBoolean() ? Optional.of(pick(all, random)) : Optional.empty();
        List<PlanState> pinned = new ArrayList<>();
        if (random.nextInt(3) == 0) {
            pinned.add(pick(all, random));
        }
        Set<PlanState> removed = new HashSet<>();
        if (random.nextInt(3) == 0) {
            for (int i = random.nextInt(2); i < 2; i++) {
                PlanState s = pick(all, random);
                if (!pinned.contains(s)) {
                    removed.add(s);
                }
            }
        }
        return new PlanRequest(start, target, random.nextBoolean(), pinned, removed);
    }

    private static PlanState pick(List<PlanState> states, Random random) {
        return states.get(random.nextInt(states.size()));
    }

    private static double quantile(List<Double> values, double q) {
        List<Double> sorted = new ArrayList<>(values);
        sorted.sort(null);
        return sorted.get((int) Math.min(sorted.size() - 1, Math.floor(q * sorted.size())));
    }
}
