package org.swingclearance.engine.plan;

import java.util.Map;
import java.util.Set;

/**
 * TEST MODEL ONLY — physically shaped, but not the product's mechanics (that is engine.mechanics, engine.md §4–5).
 * The club is a point mass m at moment arm r = R + x_cm − x_g from the shoulder, swung rhythmically through ±A about
 * hanging vertical with cycle time T (ω = 2π/T); the arm's own mass is ignored.
 * <ul>
 * <li>C1 peak shoulder torque, taken as m·r·(g·sin A + r·A·ω²): the gravity lever and the angular acceleration
 *     A·ω² both peak at the ends of the arc, so their sum bounds the true peak;</li>
 * <li>C3 peak grip pull, taken as m·(g + r·(A·ω)²): weight plus the centripetal pull at the bottom of the arc.</li>
 * </ul>
 * D = the larger of torque / torque allowance and pull / pull allowance (allowance = band fraction × capacity).
 * States listed in {@code excluded} fail a categorical constraint ("C4") at every band. A state is permitted at the
 * next band when D / nextBandScale ≤ 1 (nextBandScale = f_next / f_current).
 */
record LeverTestModel(double reachM, Map<String, Double> balancePointM, double halfArcRad, double torqueAllowanceNm,
                      double pullAllowanceN, double nextBandScale, Set<String> excluded) implements StateEvaluator {

    static final double G = 9.80665;

    static String key(String clubId, double gripMarkM, double cycleTimeS) {
        return clubId + "@" + Math.round(gripMarkM * 1000) + "mm@" + cycleTimeS + "s";
    }

    double torqueNm(ClubOption club, double gripMarkM, double cycleTimeS) {
        double r = momentArmM(club, gripMarkM);
        double omega = 2 * Math.PI / cycleTimeS;
        return club.massKg() * r * (G * Math.sin(halfArcRad) + r * halfArcRad * omega * omega);
    }

    double pullN(ClubOption club, double gripMarkM, double cycleTimeS) {
        double r = momentArmM(club, gripMarkM);
        double omega = 2 * Math.PI / cycleTimeS;
        return club.massKg() * (G + r * Math.pow(halfArcRad * omega, 2));
    }

    private double momentArmM(ClubOption club, double gripMarkM) {
        return reachM + balancePointM.get(club.id()) - gripMarkM;
    }

    @Override
    public Evaluation evaluate(ClubOption club, double gripMarkM, double cycleTimeS) {
        double torqueRatio = torqueNm(club, gripMarkM, cycleTimeS) / torqueAllowanceNm;
        double pullRatio = pullN(club, gripMarkM, cycleTimeS) / pullAllowanceN;
        double d = Math.max(torqueRatio, pullRatio);
        String binding = torqueRatio >= pullRatio ? "C1" : "C3";
        if (excluded.contains(key(club.id(), gripMarkM, cycleTimeS))) {
            return Evaluation.outsideEnvelope(d, "C4");
        }
        if (d <= 1) {
            return Evaluation.withinBand(d, binding);
        }
        return d / nextBandScale <= 1 ? Evaluation.withinNextBand(d, binding) : Evaluation.outsideEnvelope(d, binding);
    }
}
