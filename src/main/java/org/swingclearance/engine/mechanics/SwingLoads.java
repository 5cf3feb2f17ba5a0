package org.swingclearance.engine.mechanics;

import java.util.function.DoubleUnaryOperator;

/**
 * Peak loads over one swing cycle from plain numbers: the hot path shared by the demand, the verdicts of the plan
 * search and the envelope inversions. Closed form where it exists (rhythmic torque and wrist moment), dense
 * sampling with golden-section refinement of every sampled local peak elsewhere (error far below 0.1 %).
 *
 * <p>Both torque-like loads have the form L(t) = K·θ̈ + Q·sin θ: the shoulder torque with K = I_tot, Q = g·S,
 * the wrist moment with K = s·(I_cm + m_c·d·r_c), Q = s·m_c·g·d.
 */
final class SwingLoads {

    /** Samples per sampled profile; with refinement of every local peak the error is below 1e-9 relative. */
    private static final int SAMPLES = 48;
    private static final int GOLDEN_ITERATIONS = 24;
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
            double omega = TWO_PI / cycleTime;
            double velocityAmplitude = halfArc * omega;
            DoubleUnaryOperator energy = phase -> {
                double velocity = velocityAmplitude * Math.cos(phase);
                return 0.5 * inertia * velocity * velocity
                        - gravityMoment * Math.cos(centre + halfArc * Math.sin(phase));
            };
            // Over a closed cycle E returns to its start: the rise is half the total variation.
            return 0.5 * totalVariation(energy, 0.0, TWO_PI, true);
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

    /** Maximum of f on [a, b]: sampled, then every sampled local maximum refined by golden section. */
    static double maxOver(DoubleUnaryOperator f, double a, double b) {
        double step = (b - a) / SAMPLES;
        double previous = f.applyAsDouble(a);
        double current = f.applyAsDouble(a + step);
        double best = Math.max(previous, current);
        if (previous >= current) {
            best = Math.max(best, goldenMax(f, a, a + step));
        }
        for (int i = 1; i < SAMPLES; i++) {
            double next = f.applyAsDouble(a + (i + 1) * step);
            best = Math.max(best, next);
            if (current >= previous && current >= next) {
                best = Math.max(best, goldenMax(f, a + (i - 1) * step, a + (i + 1) * step));
            }
            previous = current;
            current = next;
        }
        if (current >= previous) {
            best = Math.max(best, goldenMax(f, b - step, b));
        }
        return best;
    }

    /**
     * Total variation Σ|ΔE| of a smooth function over [a, b] (cyclic: over one period b − a): the sampled
     * sequence with each sampled turning point replaced by its refined extreme value.
     */
    static double totalVariation(DoubleUnaryOperator f, double a, double b, boolean cyclic) {
        int count = cyclic ? SAMPLES : SAMPLES + 1;
        double step = (b - a) / SAMPLES;
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
