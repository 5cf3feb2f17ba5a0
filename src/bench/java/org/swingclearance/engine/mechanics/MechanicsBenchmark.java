package org.swingclearance.engine.mechanics;

import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;
import org.swingclearance.engine.envelope.Envelope;
import org.swingclearance.engine.envelope.EnvelopeCalculator;

/**
 * Speed of the mechanics engine on one core (issue 8 targets: one demand evaluation under 20 µs, one full
 * envelope with three inversions under 2 ms). Run:
 * {@code ./mvnw -o -Pbench test-compile exec:exec -Dbench.args='Mechanics -f 1 -wi 3 -i 5 -tu us -bm avgt'}.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Fork(1)
@Warmup(iterations = 3, time = 3)
@Measurement(iterations = 5, time = 3)
public class MechanicsBenchmark {

    /**
     * CASE-M80 (biomechanics.md §0.1) at standard gravity, gripped at 0.20 m, rhythmic ±60° at 2 s. With 60 N·m
     * permitted every limit lies inside its range, so each inversion scans and bisects in full.
     */
    private final Configuration rhythmic = new Configuration(Body.of(1.78, 80.0),
            new Club(6.0, 0.60, 0.45, 0.30, ClubInertia.modelled(6.0, 0.60, 0.45, 0.50)), 0.20,
            SwingPattern.ofDegrees(0.0, 60.0, 1, 1.0, SwingKind.RHYTHMIC, false), 2.0, Gravity.STANDARD);
    /** The same club on a single minimum-jerk arc: every peak is sampled rather than closed-form. */
    private final Configuration singleArc = rhythmic.withPattern(
            SwingPattern.ofDegrees(0.0, 60.0, 1, 1.0, SwingKind.SINGLE_ARC, false));
    private final Capacity capacity = Capacity.of(100.0, 45.0);
    private final LoadRules rules = LoadRules.forFraction(0.6);

    @Benchmark
    public Demand demandRhythmic() {
        return DemandCalculator.calculate(rhythmic);
    }

    @Benchmark
    public Demand demandSingleArc() {
        return DemandCalculator.calculate(singleArc);
    }

    @Benchmark
    public Verdict verdictRhythmic() {
        return Assessor.verdict(rhythmic, capacity, rules);
    }

    @Benchmark
    public Envelope envelopeRhythmic() {
        return EnvelopeCalculator.envelope(rhythmic, capacity, rules);
    }

    @Benchmark
    public Envelope envelopeSingleArc() {
        return EnvelopeCalculator.envelope(singleArc, capacity, rules);
    }
}
