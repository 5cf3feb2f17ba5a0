package org.swingclearance.engine.plan;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

/**
 * The cycle times a plan may use, held slowest (easiest) first; neighbouring rungs are one step of the cycle-time
 * dial apart.
 */
public record CycleTimeLadder(List<Double> rungsS) {

    /** Rung values are rounded to this many seconds so that evenly spaced ladders hold exact decimal values. */
    private static final double ROUNDING_S = 1e-6;

    public CycleTimeLadder {
        if (rungsS == null || rungsS.isEmpty()) {
            throw new IllegalArgumentException("A cycle-time ladder needs at least one rung.");
        }
        List<Double> sorted = new ArrayList<>(rungsS);
        for (Double rung : sorted) {
            if (rung == null || !(rung > 0) || !Double.isFinite(rung)) {
                throw new IllegalArgumentException("Cycle times must be positive seconds, was " + rung);
            }
        }
        sorted.sort(Comparator.reverseOrder());
        for (int i = 1; i < sorted.size(); i++) {
            if (sorted.get(i).equals(sorted.get(i - 1))) {
                throw new IllegalArgumentException("The cycle-time ladder lists " + sorted.get(i) + " s twice.");
            }
        }
        rungsS = List.copyOf(sorted);
    }

    /** A ladder of the given cycle times in any order. */
    public static CycleTimeLadder of(double... cycleTimesS) {
        List<Double> rungs = new ArrayList<>();
        for (double t : cycleTimesS) {
            rungs.add(t);
        }
        return new CycleTimeLadder(rungs);
    }

    /**
     * Rungs from {@code slowestS} down in steps of {@code rungS} while they stay at or above {@code fastestS}
     * (e.g. 3.0 s down to 1.2 s in 0.1 s rungs gives 19 rungs); the fastest value is only included when the
     * spacing lands on it.
     */
    public static CycleTimeLadder evenlySpaced(double slowestS, double fastestS, double rungS) {
        if (!(rungS > 0) || !(fastestS > 0) || !(slowestS >= fastestS)) {
            throw new IllegalArgumentException("Need slowest ≥ fastest > 0 and a positive rung, was "
                    + slowestS + " s, " + fastestS + " s, " + rungS + " s");
        }
        List<Double> rungs = new ArrayList<>();
        for (int k = 0; ; k++) {
            double t = Math.round((slowestS - k * rungS) / ROUNDING_S) * ROUNDING_S;
            if (t < fastestS - ROUNDING_S / 2) {
                break;
            }
            rungs.add(t);
        }
        return new CycleTimeLadder(rungs);
    }

    public int size() {
        return rungsS.size();
    }

    /** Cycle time of rung {@code index}; rung 0 is the slowest. */
    public double rungS(int index) {
        return rungsS.get(index);
    }
}
