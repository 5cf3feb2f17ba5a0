package org.swingclearance.audit;

import java.time.Clock;
import java.util.UUID;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OperationsPerInvocation;
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
 * What an audit event adds to a request (issue 6: under 2 ms). Four kinds of request transaction on one clinic:
 * a read without and with {@link AuditLog#record}, a change (one row updated) without and with it, and a read
 * with the event that is rolled back instead of committed. The change pair gives the cost an event adds to a
 * request that writes anyway; the rolled-back read isolates the event's own work (chain-head lock, hash, insert)
 * from the commit's WAL flush, which a read that gets audited now has to pay. The four-thread case writes to one
 * clinic from four request threads at once, so it includes waiting for the chain lock.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Fork(1)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 10, time = 2)
public class AuditWriteBenchmark {

    private BenchDatabase db;
    private AuditLog audit;
    private CurrentStaff clinician;
    private UUID patient;

    @Setup
    public void setUp() {
        db = new BenchDatabase(8);
        audit = new AuditLog(db.jdbc, Clock.systemUTC(), db.transactions);
        UUID clinic = UUID.randomUUID();
        db.jdbc.update("insert into clinic (id, name, created_at) values (?, 'Bench clinic', now())", clinic);
        clinician = new CurrentStaff(UUID.randomUUID(), clinic, StaffRole.CLINICIAN, "bench@bench.local",
                "Bench Clinician", UnitSystem.METRIC);
        patient = UUID.randomUUID();
    }

    @TearDown
    public void tearDown() {
        db.close();
    }

    @Benchmark
    public Long readWithoutAudit() {
        return db.tx.execute(s -> read());
    }

    @Benchmark
    public Long readWithAuditEvent() {
        return db.tx.execute(s -> {
            Long found = read();
            audit.record(clinician, "PATIENT_READ", "Patient", patient, patient, null);
            return found;
        });
    }

    @Benchmark
    public Long readWithAuditEventRolledBack() {
        return db.tx.execute(s -> {
            Long found = read();
            audit.record(clinician, "PATIENT_READ", "Patient", patient, patient, null);
            s.setRollbackOnly();
            return found;
        });
    }

    /** 100 events appended in one transaction that is rolled back: the event's own work, per event. */
    @Benchmark
    @OperationsPerInvocation(100)
    public Long hundredEventsInOneTransactionRolledBack() {
        return db.tx.execute(s -> {
            for (int i = 0; i < 100; i++) {
                audit.record(clinician, "PATIENT_READ", "Patient", patient, patient, null);
            }
            s.setRollbackOnly();
            return 100L;
        });
    }

    @Benchmark
    public Integer changeWithoutAudit() {
        return db.tx.execute(s -> change());
    }

    @Benchmark
    public Integer changeWithAuditEvent() {
        return db.tx.execute(s -> {
            int changed = change();
            audit.record(clinician, "PATIENT_UPDATE", "Patient", patient, patient, null);
            return changed;
        });
    }

    @Benchmark
    @Threads(4)
    public Integer changeWithAuditEventFourThreadsOneClinic() {
        return changeWithAuditEvent();
    }

    private Long read() {
        return db.jdbc.queryForObject("select count(*) from clinic where id = ?", Long.class, clinician.clinicId());
    }

    /** Stands for the request's own change: one row rewritten (its WAL record forces a flush at commit). */
    private int change() {
        return db.jdbc.update("update clinic set name = name where id = ?", clinician.clinicId());
    }
}
