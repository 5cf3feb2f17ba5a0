package org.swingclearance.envelope;

import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.UUID;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.test.web.servlet.MockMvc;
import org.swingclearance.equipment.ClubDetails;
import org.swingclearance.equipment.Clubs;
import org.swingclearance.equipment.InertiaMethod;
import org.swingclearance.equipment.SwingPatterns;
import org.swingclearance.screening.Screenings;
import org.swingclearance.support.IntegrationTest;
import org.swingclearance.support.PostgresTestBase;
import org.swingclearance.support.TestData;
import org.swingclearance.support.TestData.TestClinic;

/**
 * Plain timing harness (bench profile only, never part of the test suite, asserts no time): the whole envelope page
 * through MockMvc, with the real database, security, service, engine and Thymeleaf, for 20 clubs × the 6 built-in
 * patterns. Prints the first view, warm views that reuse the stored snapshot, and warm views that must compute a
 * new snapshot (each at a new cycle time). Run:
 * {@code TEST_DB_URL=... ./mvnw -o -Pbench test -Dtest=EnvelopePageTiming -Dsurefire.failIfNoSpecifiedTests=false}.
 */
@IntegrationTest
class EnvelopePageTiming extends PostgresTestBase {

    private static final int WARM_UP = 40;
    private static final int SAMPLES = 60;

    @Autowired
    MockMvc mvc;
    @Autowired
    TestData data;
    @Autowired
    Clubs clubs;
    @Autowired
    SwingPatterns patterns;
    @Autowired
    Screenings screenings;
    @Autowired
    Envelopes envelopes;

    @Test
    void envelopePageForTwentyClubsAndSixPatterns() throws Exception {
        TestClinic clinic = data.clinic();
        UUID episode = data.shoulderEpisode(clinic, data.patient(clinic));
        for (int i = 0; i < 20; i++) {
            // Invented clubs from 2 to 11.5 kg, alternately modelled (head centre) and at the safe bound.
            double mass = 2.0 + 0.5 * i;
            double length = 0.55 + 0.05 * (i % 3);
            double balance = 0.75 * length;
            clubs.create(clinic.clinician(), new ClubDetails("Club " + (i + 1), mass, length, balance, 0.22,
                    i % 2 == 0 ? 0.9 * length : null, i % 2 == 0 ? InertiaMethod.HEAD_MODEL : InertiaMethod.BOUND,
                    null));
        }
        if (patterns.all(clinic.clinician()).size() != 6) {
            throw new IllegalStateException("expected the 6 built-in patterns");
        }
        SignedScreeningFixture.sign(screenings, clinic.clinician(), episode);

        long first = time(episode, clinic, null);
        for (int i = 0; i < WARM_UP; i++) {
            time(episode, clinic, null);
            time(episode, clinic, 1.0 + 0.005 * i);
        }
        // MockMvc runs the whole request on this thread; only a new snapshot's rows run on the common pool too.
        java.lang.management.ThreadMXBean threads = java.lang.management.ManagementFactory.getThreadMXBean();
        long cpuReuse = threads.getCurrentThreadCpuTime();
        for (int i = 0; i < SAMPLES; i++) {
            time(episode, clinic, null);
        }
        cpuReuse = threads.getCurrentThreadCpuTime() - cpuReuse;
        List<Long> reuse = new ArrayList<>();
        List<Long> compute = new ArrayList<>();
        List<Long> service = new ArrayList<>();
        for (int i = 0; i < SAMPLES; i++) {
            reuse.add(time(episode, clinic, null));
            compute.add(time(episode, clinic, 3.0 + 0.005 * i));
            long start = System.nanoTime();
            EnvelopePage page = envelopes.page(clinic.clinician(), episode, null);
            envelopes.tryOn(page, null, null, null, null);
            service.add(System.nanoTime() - start);
        }
        String report = String.format(Locale.ROOT, """
                envelope page, 20 clubs x 6 patterns, %d cores, load average at end %.2f
                first view (cold JVM paths, computes and stores): %.1f ms
                warm, snapshot reused:   median %.1f ms, p90 %.1f ms, max %.1f ms (n=%d)
                warm, snapshot computed: median %.1f ms, p90 %.1f ms, max %.1f ms (n=%d)
                of which the service alone (snapshot reused, what-if series; no security, no template): median %.1f ms
                CPU time of the request thread per page, snapshot reused: %.1f ms
                """, Runtime.getRuntime().availableProcessors(),
                java.lang.management.ManagementFactory.getOperatingSystemMXBean().getSystemLoadAverage(),
                first / 1e6, pct(reuse, 50), pct(reuse, 90), pct(reuse, 100), SAMPLES,
                pct(compute, 50), pct(compute, 90), pct(compute, 100), SAMPLES, pct(service, 50),
                cpuReuse / 1e6 / SAMPLES);
        System.out.println(report);
        java.nio.file.Path out = java.nio.file.Path.of("target", "benchmarks", "envelope-page.txt");
        java.nio.file.Files.createDirectories(out.getParent());
        java.nio.file.Files.writeString(out, report);
    }

    private long time(UUID episode, TestClinic clinic, Double cycleTime) throws Exception {
        long start = System.nanoTime();
        var request = get("/episodes/{id}/envelope", episode).with(data.as(clinic.clinician()));
        if (cycleTime != null) {
            request.param("cycleTime", String.format(Locale.ROOT, "%.3f", cycleTime));
        }
        mvc.perform(request).andExpect(status().isOk());
        return System.nanoTime() - start;
    }

    private static double pct(List<Long> nanos, int percentile) {
        List<Long> sorted = nanos.stream().sorted().toList();
        int index = Math.min(sorted.size() - 1, (int) Math.ceil(percentile / 100.0 * sorted.size()) - 1);
        return sorted.get(Math.max(0, index)) / 1e6;
    }
}
