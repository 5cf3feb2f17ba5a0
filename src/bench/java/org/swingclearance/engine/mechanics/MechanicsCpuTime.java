package org.swingclearance.engine.mechanics;

import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.util.function.Supplier;

/**
 * Companion to {@link MechanicsBenchmark} for a shared machine: the CPU time the measuring thread itself spends per
 * operation (ThreadMXBean), which other processes' load inflates far less than wall-clock time. Same
 * configurations as the benchmark; the last of four rounds is the warmed-up one. Run after
 * {@code ./mvnw -o -Pbench test-compile} with
 * {@code java -cp target/test-classes:target/classes org.swingclearance.engine.mechanics.MechanicsCpuTime}.
 */
public final class MechanicsCpuTime {

    private static final int ROUNDS = 4;
    private static Object sink;

    private MechanicsCpuTime() {
    }

    public static void main(String[] args) {
        MechanicsBenchmark cases = new MechanicsBenchmark();
        ThreadMXBean threads = ManagementFactory.getThreadMXBean();
        for (int round = 1; round <= ROUNDS; round++) {
            boolean report = round == ROUNDS;
            measure(threads, report, "demandRhythmic", cases::demandRhythmic, 200_000);
            measure(threads, report, "demandSingleArc", cases::demandSingleArc, 50_000);
            measure(threads, report, "verdictRhythmic", cases::verdictRhythmic, 200_000);
            measure(threads, report, "envelopeRhythmic", cases::envelopeRhythmic, 2_000);
            measure(threads, report, "envelopeSingleArc", cases::envelopeSingleArc, 1_000);
        }
        System.out.println("engine " + EngineVersion.ENGINE_VERSION + "; last result " + sink.getClass().getSimpleName());
    }

    private static void measure(ThreadMXBean threads, boolean report, String name, Supplier<Object> operation,
                                int count) {
        long cpuStart = threads.getCurrentThreadCpuTime();
        long wallStart = System.nanoTime();
        for (int i = 0; i < count; i++) {
            sink = operation.get();
        }
        long cpu = threads.getCurrentThreadCpuTime() - cpuStart;
        long wall = System.nanoTime() - wallStart;
        if (report) {
            System.out.printf("%-18s cpu %9.2f us/op   wall %9.2f us/op%n", name, cpu / 1e3 / count, wall / 1e3 / count);
        }
    }
}
