package org.swingclearance.engine.mechanics;

import java.util.ArrayList;
import java.util.List;

/**
 * Judges configurations against a capacity and practice rules (constraints C1–C5 of engine.md §5). The
 * {@code verdict} and {@code demandRatio} methods are the fast entry points for callers that judge many states
 * (plan search, envelope inversions): they skip work, provenance and sentences. Stateless and thread-safe.
 */
public final class Assessor {

    static final String GRIP_NOT_MEASURED = "Grip strength was not measured, so grip pull (C3) was not checked:"
            + " measure grip strength.";
    static final String RANGE_NOT_MEASURED = "Active shoulder flexion was not measured, so the arc was not checked"
            + " against the range of motion (C4).";
    static final String RANGE_EXCLUDES = "The arc reaches higher than the measured shoulder flexion minus the"
            + " margin (C4): this pattern is excluded; a smaller half-arc may be permitted.";
    static final String HIP_DRIVE_EXCLUDED = "Hip-driven patterns need the lumbopelvic band the practice rules"
            + " name (C5): this pattern is excluded.";
    static final String CONTROLLED_STOP_OFF = "The controlled-stop rule is off: holding the club still in the arc"
            + " (C2) was not checked.";

    private Assessor() {
    }

    /**
     * The verdict for one plan-search state at standard gravity.
     *
     * @throws IllegalArgumentException when the configuration is invalid (see {@link Configuration})
     */
    public static Verdict verdict(Body body, Capacity capacity, LoadRules rules, Club club, double gripMarkM,
                                  SwingPattern pattern, double cycleTimeS) {
        return verdict(new Configuration(body, club, gripMarkM, pattern, cycleTimeS, Gravity.STANDARD), capacity,
                rules);
    }

    /** The verdict for a configuration: permitted, demand ratio D and binding constraint. */
    public static Verdict verdict(Configuration c, Capacity capacity, LoadRules rules) {
        double allowance = shoulderAllowance(capacity, rules);
        return judge(failedGate(c.pattern(), capacity, rules),
                ratio(DemandCalculator.peakShoulderTorqueNm(c), allowance),
                rules.controlledStop() ? ratio(DemandCalculator.holdTorqueNm(c), allowance) : Double.NaN,
                capacity.gripStrengthKg() != null
                        ? ratio(DemandCalculator.peakGripPullN(c), gripAllowance(capacity, rules, c.gravity()))
                        : Double.NaN);
    }

    /**
     * D alone: the largest ratio of the load constraints C1–C3 that apply; the gates C4 and C5 do not change it.
     * The margin function of the envelope inversions.
     */
    public static double demandRatio(Configuration c, Capacity capacity, LoadRules rules) {
        return verdict(c, capacity, rules).demandRatio();
    }

    /**
     * The largest ratio of the load constraints that can only grow with moment arm and club mass and only shrink
     * with a slower cycle time: C2 (hold torque, when the controlled-stop rule is on) and C3 (grip pull, when
     * grip strength was measured); 0 when neither applies. A floor under {@link #demandRatio}: when it exceeds 1
     * at the lenient end of an envelope range, nothing in the range is permitted.
     */
    public static double monotoneRatio(Configuration c, Capacity capacity, LoadRules rules) {
        double worst = 0.0;
        if (rules.controlledStop()) {
            worst = ratio(DemandCalculator.holdTorqueNm(c), shoulderAllowance(capacity, rules));
        }
        if (capacity.gripStrengthKg() != null) {
            worst = Math.max(worst, ratio(DemandCalculator.peakGripPullN(c), gripAllowance(capacity, rules,
                    c.gravity())));
        }
        return worst;
    }

    /** Whether the pattern passes the gates C4 (range of motion) and C5 (hip drive). */
    public static boolean patternAllowed(SwingPattern pattern, Capacity capacity, LoadRules rules) {
        return failedGate(pattern, capacity, rules) == null;
    }

    /** The full assessment with demand, every ratio, the largest permitted half-arc and what was not checked. */
    public static Assessment assess(Configuration c, Capacity capacity, LoadRules rules) {
        Demand demand = DemandCalculator.calculate(c);
        double allowance = shoulderAllowance(capacity, rules);
        double torque = ratio(demand.peakShoulderTorqueNm(), allowance);
        Double hold = rules.controlledStop() ? ratio(demand.holdTorqueNm(), allowance) : null;
        Double grip = capacity.gripStrengthKg() != null
                ? ratio(demand.peakGripPullN(), gripAllowance(capacity, rules, c.gravity())) : null;
        List<String> notes = new ArrayList<>(4);
        if (!rules.controlledStop()) {
            notes.add(CONTROLLED_STOP_OFF);
        }
        if (grip == null) {
            notes.add(GRIP_NOT_MEASURED);
        }
        Double maxHalfArc = null;
        if (capacity.shoulderFlexionRangeRad() == null) {
            notes.add(RANGE_NOT_MEASURED);
        } else if (!withinRange(c.pattern(), capacity, rules)) {
            notes.add(RANGE_EXCLUDES);
            maxHalfArc = largestHalfArcRad(c.pattern(), capacity, rules);
        }
        Constraint gate = failedGate(c.pattern(), capacity, rules);
        if (gate == Constraint.HIP_DRIVE) {
            notes.add(HIP_DRIVE_EXCLUDED);
        }
        Verdict verdict = judge(gate, torque, hold != null ? hold : Double.NaN, grip != null ? grip : Double.NaN);
        return new Assessment(demand, capacity, rules, verdict, torque, hold, grip, maxHalfArc, notes,
                EngineVersion.ENGINE_VERSION);
    }

    /**
     * The largest half-arc, rad in [0, π], that keeps θ_c + A within the measured range minus the margin; null
     * when the range was not measured.
     */
    public static Double largestHalfArcRad(SwingPattern pattern, Capacity capacity, LoadRules rules) {
        if (capacity.shoulderFlexionRangeRad() == null) {
            return null;
        }
        double allowed = capacity.shoulderFlexionRangeRad() - rules.rangeMarginRad() - pattern.centreRad();
        return Math.max(0.0, Math.min(Math.PI, allowed));
    }

    /**
     * D is the largest load ratio that applies (NaN marks one that does not); a failed gate decides the binding
     * constraint and refuses the configuration whatever D is.
     */
    private static Verdict judge(Constraint gate, double torque, double hold, double grip) {
        double worst = torque;
        Constraint binding = Constraint.SHOULDER_TORQUE;
        if (hold > worst) {
            worst = hold;
            binding = Constraint.HOLD_TORQUE;
        }
        if (grip > worst) {
            worst = grip;
            binding = Constraint.GRIP_PULL;
        }
        return gate != null ? new Verdict(false, worst, gate) : new Verdict(worst <= 1.0, worst, binding);
    }

    private static Constraint failedGate(SwingPattern pattern, Capacity capacity, LoadRules rules) {
        if (!withinRange(pattern, capacity, rules)) {
            return Constraint.RANGE_OF_MOTION;
        }
        if (pattern.hipDriven() && (capacity.lumbopelvicBand() == null
                || capacity.lumbopelvicBand().isMoreRestrictiveThan(rules.hipDriveMinimumBand()))) {
            return Constraint.HIP_DRIVE;
        }
        return null;
    }

    private static boolean withinRange(SwingPattern pattern, Capacity capacity, LoadRules rules) {
        Double range = capacity.shoulderFlexionRangeRad();
        return range == null || pattern.highestAngleRad() <= range - rules.rangeMarginRad();
    }

    private static double shoulderAllowance(Capacity capacity, LoadRules rules) {
        return rules.bandFraction() * capacity.shoulderFlexionTorqueNm();
    }

    private static double gripAllowance(Capacity capacity, LoadRules rules, double gravity) {
        return rules.effectiveGripFraction() * capacity.gripStrengthKg() * gravity;
    }

    /** demand / allowance; +∞ for a positive demand against no allowance, 0 for no demand. */
    private static double ratio(double demand, double allowance) {
        if (allowance > 0.0) {
            return demand / allowance;
        }
        return demand > 0.0 ? Double.POSITIVE_INFINITY : 0.0;
    }
}
