package org.swingclearance.audit;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;

import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.UUID;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.jdbc.core.JdbcTemplate;
import org.springframework.transaction.support.TransactionTemplate;
import org.swingclearance.support.IntegrationTest;
import org.swingclearance.support.PostgresTestBase;
import org.swingclearance.support.TestData;
import org.swingclearance.support.TestData.TestClinic;

/**
 * Concurrent writers never fork a chain (security-audit-interop.md B.8 test 1): 8 threads append to two clinics
 * at once, each chain stays one gap-free, verifiable sequence. And a denial recorded after a read in the same
 * transaction neither waits for ever on the chain lock nor disappears with the rollback.
 */
@IntegrationTest
class AuditConcurrencyTests extends PostgresTestBase {

    private static final int THREADS = 8;
    private static final int EVENTS_PER_THREAD = 40;

    @Autowired
    TestData data;
    @Autowired
    AuditLog audit;
    @Autowired
    AuditVerifier verifier;
    @Autowired
    JdbcTemplate jdbc;
    @Autowired
    TransactionTemplate tx;

    @Test
    void eightThreadsLeaveOneUnbrokenChainPerClinic() throws Exception {
        TestClinic first = data.clinic();
        TestClinic second = data.clinic();
        ExecutorService pool = Executors.newFixedThreadPool(THREADS);
        CountDownLatch start = new CountDownLatch(1);
        List<Future<?>> writers = new ArrayList<>();
        for (int t = 0; t < THREADS; t++) {
            TestClinic clinic = t % 2 == 0 ? first : second;
            writers.add(pool.submit(() -> {
                start.await();
                for (int i = 0; i < EVENTS_PER_THREAD; i++) {
                    // Alternate clinics inside each thread too, so both chains see interleaved writers.
                    TestClinic target = i % 4 == 0 ? (clinic == first ? second : first) : clinic;
                    tx.executeWithoutResult(s -> audit.record(target.clinician(), "PATIENT_READ", "Patient",
                            UUID.randomUUID(), null, null));
                }
                return null;
            }));
        }
        start.countDown();
        for (Future<?> writer : writers) {
            writer.get();
        }
        pool.shutdown();

        long total = 0;
        for (TestClinic clinic : List.of(first, second)) {
            VerificationReport report = verifier.verify(clinic.id());
            assertThat(report.intact()).as(report.describe()).isTrue();
            List<Long> seqs = jdbc.queryForList("select seq from audit_event where chain_id = ? order by seq",
                    Long.class, clinic.id());
            assertThat(seqs).first().isEqualTo(1L);
            assertThat(seqs.get(seqs.size() - 1)).isEqualTo(seqs.size());
            total += seqs.size();
        }
        assertThat(total).isEqualTo((long) THREADS * EVENTS_PER_THREAD);
    }

    @Test
    void aDenialAfterARecordInTheSameTransactionIsKeptAndDoesNotDeadlock() {
        TestClinic clinic = data.clinic();
        assertTimeoutPreemptively(Duration.ofSeconds(20), () ->
                assertThatThrownBy(() -> tx.executeWithoutResult(s -> {
                    audit.record(clinic.clinician(), "PATIENT_READ", "Patient", UUID.randomUUID(), null, null);
                    audit.recordDenied(clinic.clinician(), "PLAN_READ", "Plan", UUID.randomUUID(), "not shared");
                    throw new IllegalStateException("the request fails after the denial");
                })).hasMessageContaining("request fails"));

        assertThat(jdbc.queryForList("select action || ':' || outcome from audit_event where chain_id = ? order by seq",
                String.class, clinic.id())).containsExactly("PLAN_READ:DENIED");
        assertThat(verifier.verify(clinic.id()).intact()).isTrue();
    }
}
