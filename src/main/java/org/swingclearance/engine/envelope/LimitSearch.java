package org.swingclearance.engine.envelope;

import java.util.function.DoubleUnaryOperator;

/**
 * Finds the permitted value nearest the demanding end of a range: the demand ratio D(x) is scanned on a grid
 * from that end, each dip of the scanned D below its neighbours is searched for a permitted point (so a permitted
 * island between grid points is not missed), and the first edge found is bisected. The returned value is always
 * on the permitted side of the bisection, so it is itself permitted.
 */
final class LimitSearch {

    /** Grid steps over the range. */
    static final int GRID = 32;
    /** Bisection stops when the bracket is below this fraction of the limit (engine.md §6 asks for 1e-4). */
    static final double RELATIVE_TOLERANCE = 1e-6;
    /** …or below this fraction of the range, for limits at or near zero. */
    static final double RANGE_TOLERANCE = 1e-9;
    private static final int DIP_ITERATIONS = 30;
    private static final double INVERSE_GOLDEN_RATIO = (Math.sqrt(5.0) - 1.0) / 2.0;

    private LimitSearch() {
    }

    /**
     * The permitted x nearest {@code demanding}, searching toward {@code lenient}; NaN when no x in the range is
     * permitted. Permitted means D(x) ≤ 1.
     *
     * @param ratio     D(x), continuous on the range
     * @param demanding the end of the range where demand is highest (e.g. grip mark 0, cycle time 0.6 s)
     * @param lenient   the other end
     */
    static double nearestPermitted(DoubleUnaryOperator ratio, double demanding, double lenient) {
        double range = Math.abs(lenient - demanding);
        double r0 = ratio.applyAsDouble(demanding);
        if (r0 <= 1.0) {
            return demanding;
        }
        double r1 = ratio.applyAsDouble(point(demanding, lenient, 1));
        if (r1 > 1.0 && r0 < r1) {
            double dip = dipBelowOne(ratio, demanding, point(demanding, lenient, 1));
            if (!Double.isNaN(dip)) {
                return bisect(ratio, demanding, dip, range);
            }
        }
        double beforePrevious = r0;
        double previous = r1;
        for (int i = 1; i <= GRID; i++) {
            double before = point(demanding, lenient, i - 1);
            double x = point(demanding, lenient, i);
            if (previous <= 1.0) {
                return bisect(ratio, before, x, range);
            }
            if (i == GRID) {
                if (previous < beforePrevious) {
                    double dip = dipBelowOne(ratio, before, x);
                    if (!Double.isNaN(dip)) {
                        return bisect(ratio, before, dip, range);
                    }
                }
                break;
            }
            double after = point(demanding, lenient, i + 1);
            double next = ratio.applyAsDouble(after);
            // A strict dip on at least one side: a flat stretch (a load that does not change along the range) hides
            // nothing below its level.
            if (next > 1.0 && previous <= beforePrevious && previous <= next
                    && (previous < beforePrevious || previous < next)) {
                double dip = dipBelowOne(ratio, before, after);
                if (!Double.isNaN(dip)) {
                    return bisect(ratio, before, dip, range);
                }
            }
            beforePrevious = previous;
            previous = next;
        }
        return Double.NaN;
    }

    /** Grid point i of GRID; the last is exactly the lenient end, never a rounding step past it. */
    private static double point(double demanding, double lenient, int i) {
        return i == GRID ? lenient : demanding + (lenient - demanding) * i / GRID;
    }

    /** Bisects between a not-permitted point and a permitted one; returns the permitted end of the final bracket. */
    private static double bisect(DoubleUnaryOperator ratio, double notPermitted, double permitted, double range) {
        double bad = notPermitted;
        double good = permitted;
        while (Math.abs(good - bad) > Math.max(RELATIVE_TOLERANCE * Math.abs(good), RANGE_TOLERANCE * range)) {
            double middle = 0.5 * (bad + good);
            if (ratio.applyAsDouble(middle) <= 1.0) {
                good = middle;
            } else {
                bad = middle;
            }
        }
        return good;
    }

    /** Golden-section search for a point with D ≤ 1 near a scanned minimum of D in [a, b]; NaN when none. */
    private static double dipBelowOne(DoubleUnaryOperator ratio, double a, double b) {
        double low = Math.min(a, b);
        double high = Math.max(a, b);
        double x1 = high - INVERSE_GOLDEN_RATIO * (high - low);
        double x2 = low + INVERSE_GOLDEN_RATIO * (high - low);
        double f1 = ratio.applyAsDouble(x1);
        double f2 = ratio.applyAsDouble(x2);
        for (int i = 0; i < DIP_ITERATIONS; i++) {
            if (f1 <= 1.0) {
                return x1;
            }
            if (f2 <= 1.0) {
                return x2;
            }
            if (f1 > f2) {
                low = x1;
                x1 = x2;
                f1 = f2;
                x2 = low + INVERSE_GOLDEN_RATIO * (high - low);
                f2 = ratio.applyAsDouble(x2);
            } else {
                high = x2;
                x2 = x1;
                f2 = f1;
                x1 = high - INVERSE_GOLDEN_RATIO * (high - low);
                f1 = ratio.applyAsDouble(x1);
            }
        }
        return Double.NaN;
    }
}
