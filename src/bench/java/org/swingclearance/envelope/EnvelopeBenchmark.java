package org.swingclearance.envelope;

import java.util.ArrayList;
import java.util.List;
import java.util.UUID;
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
import org.swingclearance.engine.mechanics.EngineVersion;
import org.swingclearance.equipment.ClubView;
import org.swingclearance.equipment.SwingPatternView;
import tools.jackson.databind.json.JsonMapper;

/**
 * The envelope page's work for 20 clubs × 6 patterns (issue 4 speed target: under 300 ms after warm-up):
 * {@code compute} is the first view after a screening or an input changed (every club × pattern through the
 * engine: verdict, furthest grip, shortest cycle time, heaviest mass); {@code reuse} is every later view (the stored
 * snapshot's JSON read back). Run: {@code ./mvnw -o -Pbench test-compile exec:exec
 * -Dbench.args='EnvelopeBenchmark -f 1 -wi 3 -i 5'}.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(1)
public class EnvelopeBenchmark {

    private EnvelopeInputs inputs;
    private String inputsJson;
    private String outputsJson;
    private final JsonMapper json = JsonMapper.builder().build();

    @Setup
    public void setUp() {
        List<ClubView> clubs = new ArrayList<>();
        for (int i = 0; i < 20; i++) {
            // Invented clubs from 2 to 11.5 kg of three shapes, half modelled, half at the safe bound.
            double mass = 2.0 + 0.5 * i;
            double length = 0.55 + 0.01 * (i % 3) * 5;
            double balance = length * 0.75;
            double inertia = i % 2 == 0 ? mass * balance * (length - balance) * 0.25
                    : mass * balance * (length - balance);
            clubs.add(new ClubView(UUID.randomUUID(), "Club " + i, mass, length, balance, 0.22, null, inertia,
                    i % 2 == 0 ? "MEASURED" : "BOUND", false));
        }
        List<SwingPatternView> patterns = List.of(
                new SwingPatternView(UUID.randomUUID(), "two-hand front pendulum, hip-driven", 30, 60, 2, 1.0,
                        "RHYTHMIC", true, "BAND_2", true),
                new SwingPatternView(UUID.randomUUID(), "two-hand front pendulum, low", 0, 45, 2, 1.0, "RHYTHMIC",
                        false, null, true),
                new SwingPatternView(UUID.randomUUID(), "one-hand front arc to shoulder height", 45, 45, 1, 1.0,
                        "RHYTHMIC", false, null, true),
                new SwingPatternView(UUID.randomUUID(), "one-hand raise to overhead", 65, 65, 1, 1.0, "SINGLE_ARC",
                        false, null, true),
                new SwingPatternView(UUID.randomUUID(), "one-hand overhead arc behind the head", 130, 30, 1, 0.8,
                        "SINGLE_ARC", false, null, true),
                new SwingPatternView(UUID.randomUUID(), "two-hand side-to-side arc", 0, 35, 2, 1.0, "RHYTHMIC",
                        false, null, true));
        inputs = new EnvelopeInputs(UUID.randomUUID(), 1, new EnvelopeInputs.BodyInput(1.78, 80, null),
                new EnvelopeInputs.CapacityInput("BAND_2", 0.40, "BAND_2", 60.0, 55.0, 45.0, 42.0, 175.0),
                new EnvelopeInputs.RulesInput(1, null, true, 10, "BAND_2"), 2.0, clubs, patterns,
                EngineVersion.ENGINE_VERSION);
        inputsJson = json.writeValueAsString(inputs);
        outputsJson = json.writeValueAsString(EnvelopeComputation.compute(inputs));
    }

    @Benchmark
    public EnvelopeOutputs compute() {
        return EnvelopeComputation.compute(inputs);
    }

    @Benchmark
    public EnvelopeOutputs reuse() {
        json.readValue(inputsJson, EnvelopeInputs.class);
        return json.readValue(outputsJson, EnvelopeOutputs.class);
    }
}
