package org.swingclearance.engine.mechanics;

import java.util.Arrays;
import java.util.function.DoubleUnaryOperator;

/**
 * Peak loads over one swing cycle from plain numbers: the hot path shared by the demand, the verdicts of the plan
 * search and the envelope inversions. Closed form where it exists (rhythmic torque and wrist moment), dense
 * sampling with golden-section refinement of the sampled local peaks that could be the largest elsewhere (error
 * far below 0.1 %, checked against brute force in SamplingAccuracyProperties).
 *
 * <p>Both torque-like loads have the form L(t) = K·θ̈ + Q·sin θ: the shoulder torque with K = I_tot, Q = g·S,
 * the wrist moment with K = s·(I_cm + m_c·d·r_c), Q = s·m_c·g·d.
 */
final class SwingLoads {

    /**
     * Samples per sampled profile. Between samples a peak can hide at most ½·|f''|·(h/2)², under 2 % for every
     * profile here; refinement then brings the error far below 0.1 % (checked against closed forms in the tests).
     */
    private static final int SAMPLES = 32;
    /**
     * Samples for the energy turning points of the single-arc work: denser than the peaks, because a turning point
     * missed between two samples loses its rise (the work is computed only for the full demand, never in searches).
     */
    private static final int WORK_SAMPLES = 64;
    /** Sampled local peaks this close to the best sample (relative) are refined: they might be the true maximum. */
    private static final double CONTENDER_WINDOW = 0.05;
    private static final int GOLDEN_ITERATIONS = 14;
    private static final double INVERSE_GOLDEN_RATIO = (Math.sqrt(5.0) - 1.0) / 2.0;
    private static final double TWO_PI = 2.0 * Math.PI;
    private static final double HALF_PI = Math.PI / 2.0;
    /** Peak velocity and acceleration factors of the minimum-jerk profile: 1.875 and 10/√3 (Flash &amp; Hogan). */
    static final double MIN_JERK_PEAK_VELOCITY = 1.875;
    static final double MIN_JERK_PEAK_ACCELERATION = 10.0 / Math.sqrt(3.0);

    private SwingLoads() {
    }

    /** Largest |sin θ| over [θ_c − A, θ_c + A]: 1 when the arc passes the horizontal. */
    static double maxAbsSine(double centre, double halfArc) {
        double low = centre - halfArc;
        double high = centre + halfArc;
        double firstPeak = HALF_PI + Math.ceil((low - HALF_PI) / Math.PI) * Math.PI;
        if (firstPeak <= high) {
            return 1.0;
        }
        return Math.max(Math.abs(Math.sin(low)), Math.abs(Math.sin(high)));
    }

    /** Peak angular velocity of the pattern, rad/s. */
    static double peakAngularVelocity(SwingKind kind, double halfArc, double cycleTime) {
        if (kind == SwingKind.RHYTHMIC) {
            return halfArc * TWO_PI / cycleTime;
        }
        return MIN_JERK_PEAK_VELOCITY * 2.0 * halfArc / (cycleTime / 2.0);
    }

    /** Peak angular acceleration of the pattern, rad/s². */
    static double peakAngularAcceleration(SwingKind kind, double halfArc, double cycleTime) {
        if (kind == SwingKind.RHYTHMIC) {
            double omega = TWO_PI / cycleTime;
            return halfArc * omega * omega;
        }
        double duration = cycleTime / 2.0;
        return MIN_JERK_PEAK_ACCELERATION * 2.0 * halfArc / (duration * duration);
    }

    /** Peak |K·θ̈ + Q·sin θ| over the cycle. */
    static double peakTorqueLike(SwingKind kind, double centre, double halfArc, double cycleTime, double k,
                                 double q) {
        if (kind == SwingKind.RHYTHMIC) {
            double omega = TWO_PI / cycleTime;
            // θ = θ_c + A·σ with σ = sin ωt, θ̈ = −A·ω²·σ: L(σ) = p·σ + Q·sin(θ_c + A·σ), σ ∈ [−1, 1].
            return peakLinearPlusSine(-k * halfArc * omega * omega, q, centre, halfArc);
        }
        double duration = cycleTime / 2.0;
        double start = centre - halfArc;
        double sweep = 2.0 * halfArc;
        double accelerationScale = sweep / (duration * duration);
        // The return arc retraces the same (θ, θ̈) pairs in reverse time, so the outward arc holds every peak.
        return maxOver(u -> Math.abs(k * accelerationScale * minJerkAcceleration(u)
                + q * Math.sin(start + sweep * minJerkPosition(u))), 0.0, 1.0);
    }

    /**
     * Peak pull along the arm at the grip, F = s·m_c·(θ̇²·r_c + g·cos θ), N; 0 when the club only ever pushes
     * into the hand.
     */
    static double peakGripPull(SwingKind kind, double centre, double halfArc, double cycleTime, double gripMass,
                               double momentArm, double gravity) {
        double peak;
        if (kind == SwingKind.RHYTHMIC) {
            double omega = TWO_PI / cycleTime;
            double velocityScale = halfArc * halfArc * omega * omega * momentArm;
            // θ̇² = A²ω²(1 − σ²) with σ = sin ωt.
            peak = maxOver(s -> velocityScale * (1.0 - s * s) + gravity * Math.cos(centre + halfArc * s), -1.0, 1.0);
        } else {
            double duration = cycleTime / 2.0;
            double start = centre - halfArc;
            double sweep = 2.0 * halfArc;
            double velocityScale = sweep / duration;
            peak = maxOver(u -> {
                double velocity = velocityScale * minJerkVelocity(u);
                return velocity * velocity * momentArm + gravity * Math.cos(start + sweep * minJerkPosition(u));
            }, 0.0, 1.0);
        }
        return Math.max(0.0, gripMass * peak);
    }

    /**
     * Positive work per cycle, ∫max(τ·θ̇, 0)dt, J. Since τ·θ̇ is the rate of change of E = ½·I·θ̇² + g·S·(1 − cos θ),
     * the positive work is the total rise of E between its turning points, which are located by sampling and
     * golden-section refinement; no quadrature of the kinked integrand is needed.
     */
    static double positiveWork(SwingKind kind, double centre, double halfArc, double cycleTime, double inertia,
                               double gravityMoment) {
        if (kind == SwingKind.RHYTHMIC) {
            return rhythmicPositiveWork(centre, halfArc, TWO_PI / cycleTime, inertia, gravityMoment);
        }
        double duration = cycleTime / 2.0;
        double start = centre - halfArc;
        double sweep = 2.0 * halfArc;
        double velocityScale = sweep / duration;
        DoubleUnaryOperator energy = u -> {
            double velocity = velocityScale * minJerkVelocity(u);
            return 0.5 * inertia * velocity * velocity - gravityMoment * Math.cos(start + sweep * minJerkPosition(u));
        };
        // The return arc is the outward arc run backwards with θ̇ reversed, so its positive work is the outward
        // arc's negative work: the cycle's positive work is the outward arc's total variation of E.
        return totalVariation(energy, 0.0, 1.0, false);
    }

    /**
     * Rhythmic positive work, exactly. With σ = sin ωt, θ̇² = A²ω²(1 − σ²), so E depends on σ alone:
     * E(σ) = ½·I·A²ω²·(1 − σ²) − g·S·cos(θ_c + A·σ), and dE/dσ = A·τ(σ). Each cycle runs σ from −1 to 1 and back,
     * so its rise of E is the total variation of E(σ) on [−1, 1]: the sum of |ΔE| between the zeros of τ, which lie
     * one at most in each stretch between τ's stationary points (known in closed form).
     */
    static double rhythmicPositiveWork(double centre, double halfArc, double omega, double inertia,
                                       double gravityMoment) {
        double p = -inertia * halfArc * omega * omega;
        double q = gravityMoment;
        double[] bounds = new double[8];
        int boundCount = 0;
        bounds[boundCount++] = -1.0;
        if (q != 0.0) {
            double cosine = -p / (q * halfArc);
            if (cosine >= -1.0 && cosine <= 1.0) {
                double angle = Math.acos(cosine);
                for (int turn = -1; turn <= 1; turn++) {
                    for (int sign = -1; sign <= 1; sign += 2) {
                        double sigma = (turn * TWO_PI + sign * angle - centre) / halfArc;
                        if (sigma > -1.0 && sigma < 1.0) {
                            bounds[boundCount++] = sigma;
                        }
                    }
                }
            }
        }
        bounds[boundCount++] = 1.0;
        Arrays.sort(bounds, 0, boundCount);
        double kinetic = 0.5 * inertia * halfArc * halfArc * omega * omega;
        double previousEnergy = -q * Math.cos(centre - halfArc); // σ = −1: the arm at rest at θ_c − A
        double variation = 0.0;
        for (int i = 0; i + 1 < boundCount; i++) {
            double root = torqueZero(p, q, centre, halfArc, bounds[i], bounds[i + 1]);
            if (!Double.isNaN(root)) {
                double energy = kinetic * (1.0 - root * root) - q * Math.cos(centre + halfArc * root);
                variation += Math.abs(energy - previousEnergy);
                previousEnergy = energy;
            }
        }
        return variation + Math.abs(-q * Math.cos(centre + halfArc) - previousEnergy); // σ = 1: at rest at θ_c + A
    }

    /** The zero of τ(σ) = p·σ + q·sin(θ_c + A·σ) strictly inside [a, b], where τ is monotone; NaN when none. */
    private static double torqueZero(double p, double q, double centre, double halfArc, double a, double b) {
        double low = a;
        double high = b;
        double atLow = p * low + q * Math.sin(centre + halfArc * low);
        double atHigh = p * high + q * Math.sin(centre + halfArc * high);
        if (atLow * atHigh >= 0.0) {
            return Double.NaN;
        }
        double tolerance = 1e-14 * (Math.abs(p) + Math.abs(q));
        double sigma = 0.5 * (low + high);
        for (int i = 0; i < 100 && high - low > 1e-12; i++) {
            double value = p * sigma + q * Math.sin(centre + halfArc * sigma);
            if (Math.abs(value) <= tolerance) {
                return sigma;
            }
            if ((value < 0.0) == (atLow < 0.0)) {
                low = sigma;
            } else {
                high = sigma;
            }
            double slope = p + q * halfArc * Math.cos(centre + halfArc * sigma);
            double newton = slope != 0.0 ? sigma - value / slope : Double.NaN;
            // Newton while it stays inside the bracket, bisection otherwise.
            sigma = newton > low && newton < high ? newton : 0.5 * (low + high);
        }
        return sigma;
    }

    /** Peak |p·σ + q·sin(c + A·σ)| over σ ∈ [−1, 1], exactly: the ends and every interior stationary point. */
    static double peakLinearPlusSine(double p, double q, double centre, double halfArc) {
        double low = centre - halfArc;
        double high = centre + halfArc;
        double best = Math.max(Math.abs(-p + q * Math.sin(low)), Math.abs(p + q * Math.sin(high)));
        if (q == 0.0) {
            return best;
        }
        // Stationary where p + q·A·cos θ = 0.
        double cosine = -p / (q * halfArc);
        if (cosine < -1.0 || cosine > 1.0) {
            return best;
        }
        double angle = Math.acos(cosine);
        for (int turn = -1; turn <= 1; turn++) {
            double base = turn * TWO_PI;
            best = Math.max(best, stationaryValue(base + angle, p, q, centre, halfArc, low, high));
            best = Math.max(best, stationaryValue(base - angle, p, q, centre, halfArc, low, high));
        }
        return best;
    }

    private static double stationaryValue(double theta, double p, double q, double centre, double halfArc,
                                          double low, double high) {
        if (theta <= low || theta >= high) {
            return 0.0;
        }
        return Math.abs(p * (theta - centre) / halfArc + q * Math.sin(theta));
    }

    /** Minimum-jerk position 10u³ − 15u⁴ + 6u⁵ on u ∈ [0, 1]. */
    static double minJerkPosition(double u) {
        return u * u * u * (10.0 + u * (-15.0 + 6.0 * u));
    }

    /** Its derivative 30u²(1 − u)². */
    static double minJerkVelocity(double u) {
        double v = u * (1.0 - u);
        return 30.0 * v * v;
    }

    /** Its second derivative 60u(1 − u)(1 − 2u). */
    static double minJerkAcceleration(double u) {
        return 60.0 * u * (1.0 - u) * (1.0 - 2.0 * u);
    }

    /**
     * Maximum of f on [a, b]: sampled, then each sampled local maximum that could still be the largest (within
     * {@link #CONTENDER_WINDOW} of the best sample, far more than the sampling error) refined by golden section.
     */
    static double maxOver(DoubleUnaryOperator f, double a, double b) {
        double step = (b - a) / SAMPLES;
        double[] values = new double[SAMPLES + 1];
        double best = Double.NEGATIVE_INFINITY;
        for (int i = 0; i <= SAMPLES; i++) {
            values[i] = f.applyAsDouble(i == SAMPLES ? b : a + i * step);
            best = Math.max(best, values[i]);
        }
        double contender = best - CONTENDER_WINDOW * Math.abs(best);
        double refined = best;
        for (int i = 0; i <= SAMPLES; i++) {
            double value = values[i];
            if (value < contender) {
                continue;
            }
            boolean peakBefore = i == 0 || value >= values[i - 1];
            boolean peakAfter = i == SAMPLES || value >= values[i + 1];
            if (peakBefore && peakAfter) {
                double low = i == 0 ? a : a + (i - 1) * step;
                double high = i == SAMPLES ? b : a + (i + 1) * step;
                refined = Math.max(refined, goldenMax(f, low, high));
            }
        }
        return refined;
    }

    /**
     * Total variation Σ|ΔE| of a smooth function over [a, b] (cyclic: over one period b − a): the sampled
     * sequence with each sampled turning point replaced by its refined extreme value.
     */
    static double totalVariation(DoubleUnaryOperator f, double a, double b, boolean cyclic) {
        int count = cyclic ? WORK_SAMPLES : WORK_SAMPLES + 1;
        double step = (b - a) / WORK_SAMPLES;
        double[] values = new double[count];
        for (int i = 0; i < count; i++) {
            values[i] = f.applyAsDouble(a + i * step);
        }
        double[] refined = values.clone();
        for (int i = 0; i < count; i++) {
            boolean hasBefore = cyclic || i > 0;
            boolean hasAfter = cyclic || i < count - 1;
            if (!hasBefore || !hasAfter) {
                continue;
            }
            double before = values[(i - 1 + count) % count];
            double after = values[(i + 1) % count];
            double x = a + i * step;
            if (values[i] >= before && values[i] >= after) {
                refined[i] = Math.max(values[i], goldenMax(f, x - step, x + step));
            } else if (values[i] <= before && values[i] <= after) {
                refined[i] = Math.min(values[i], -goldenMax(y -> -f.applyAsDouble(y), x - step, x + step));
            }
        }
        double variation = 0.0;
        int last = cyclic ? count : count - 1;
        for (int i = 0; i < last; i++) {
            variation += Math.abs(refined[(i + 1) % count] - refined[i]);
        }
        return variation;
    }

    /** Golden-section search for a maximum of a function unimodal on [a, b]; returns the best value seen. */
    private static double goldenMax(DoubleUnaryOperator f, double a, double b) {
        double low = a;
        double high = b;
        double x1 = high - INVERSE_GOLDEN_RATIO * (high - low);
        double x2 = low + INVERSE_GOLDEN_RATIO * (high - low);
        double f1 = f.applyAsDouble(x1);
        double f2 = f.applyAsDouble(x2);
        for (int i = 0; i < GOLDEN_ITERATIONS; i++) {
            if (f1 < f2) {
                low = x1;
                x1 = x2;
                f1 = f2;
                x2 = low + INVERSE_GOLDEN_RATIO * (high - low);
                f2 = f.applyAsDouble(x2);
            } else {
                high = x2;
                x2 = x1;
                f2 = f1;
                x1 = high - INVERSE_GOLDEN_RATIO * (high - low);
                f1 = f.applyAsDouble(x1);
            }
        }
        return Math.max(f1, f2);
    }
}
