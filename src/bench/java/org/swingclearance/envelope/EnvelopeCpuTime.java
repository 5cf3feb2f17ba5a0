package org.swingclearance.envelope;

import java.lang.management.ManagementFactory;
import java.util.function.Supplier;

/**
 * Companion to {@link EnvelopeBenchmark} for a shared machine: the CPU time the whole process spends per envelope
 * (all threads, since the rows are computed in parallel), which other processes' load inflates far less than
 * wall-clock time; on an idle 2-core machine the wall clock of {@code compute} is about half its CPU time. The last
 * of four rounds is the warmed-up one. Run after {@code ./mvnw -o -Pbench test-compile} with
 * {@code java -cp "target/test-classes:target/classes:$(cat target/bench.classpath)"
 * org.swingclearance.envelope.EnvelopeCpuTime} (the classpath file from {@code dependency:build-classpath}).
 */
public final class EnvelopeCpuTime {

    private static final int ROUNDS = 4;
    private static Object sink;

    private EnvelopeCpuTime() {
    }

    public static void main(String[] args) {
        EnvelopeBenchmark cases = new EnvelopeBenchmark();
        cases.setUp();
        com.sun.management.OperatingSystemMXBean os =
                (com.sun.management.OperatingSystemMXBean) ManagementFactory.getOperatingSystemMXBean();
        for (int round = 1; round <= ROUNDS; round++) {
            boolean report = round == ROUNDS;
            measure(os, report, "compute (20 x 6)", cases::compute, 20);
            measure(os, report, "reuse (JSON read)", cases::reuse, 200);
        }
        System.out.printf("cores %d, load average %.2f; last result %s%n", Runtime.getRuntime().availableProcessors(),
                os.getSystemLoadAverage(), sink.getClass().getSimpleName());
    }

    private static void measure(com.sun.management.OperatingSystemMXBean os, boolean report, String name,
                                Supplier<Object> operation, int count) {
        long cpuStart = os.getProcessCpuTime();
        long wallStart = System.nanoTime();
        for (int i = 0; i < count; i++) {
            sink = operation.get();
        }
        long cpu = os.getProcessCpuTime() - cpuStart;
        long wall = System.nanoTime() - wallStart;
        if (report) {
            System.out.printf("%-18s process cpu %9.2f ms/op   wall %9.2f ms/op%n", name, cpu / 1e6 / count,
                    wall / 1e6 / count);
        }
    }
}
