package org.swingclearance.audit;

import java.time.Clock;
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
import org.openjdk.jmh.annotations.TearDown;
import org.openjdk.jmh.annotations.Threads;
import org.openjdk.jmh.annotations.Warmup;
import org.swingclearance.identity.CurrentStaff;
import org.swingclearance.identity.StaffRole;
import org.swingclearance.identity.UnitSystem;

/**
 * What an audit event adds to a request (issue 6: under 2 ms): a transaction that reads one row, as the
 * smallest request does, with and without {@link AuditLog#record} for the same clinic. The difference of the two
 * scores is the cost of the event: the chain-head lock, the hash and the insert. The four-thread case writes to
 * one clinic from four request threads at once, so it includes waiting for the chain lock.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Fork(1)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
public class AuditWriteBenchmark {

    private BenchDatabase db;
    private AuditLog audit;
    private CurrentStaff clinician;
    private UUID patient;

    @Setup
    public void setUp() {
        db = new BenchDatabase(8);
        audit = new AuditLog(db.jdbc, Clock.systemUTC(), db.transactions);
        clinician = new CurrentStaff(UUID.randomUUID(), UUID.randomUUID(), StaffRole.CLINICIAN, "bench@bench.local",
                "Bench Clinician", UnitSystem.METRIC);
        patient = UUID.randomUUID();
    }

    @TearDown
    public void tearDown() {
        db.close();
    }

    @Benchmark
    public Long requestWithoutAudit() {
        return db.tx.execute(s -> db.jdbc.queryForObject("select count(*) from clinic where id = ?", Long.class,
                clinician.clinicId()));
    }

    @Benchmark
    public Long requestWithAuditEvent() {
        return db.tx.execute(s -> {
            Long found = db.jdbc.queryForObject("select count(*) from clinic where id = ?", Long.class,
                    clinician.clinicId());
            audit.record(clinician, "PATIENT_READ", "Patient", patient, patient, null);
            return found;
        });
    }

    @Benchmark
    @Threads(4)
    public Long requestWithAuditEventFourThreadsOneClinic() {
        return requestWithAuditEvent();
    }
}
