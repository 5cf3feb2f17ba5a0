package org.swingclearance.audit;

import java.io.StringReader;
import java.time.Clock;
import java.time.Duration;
import java.time.Instant;
import java.time.YearMonth;
import java.time.ZoneOffset;
import java.time.temporal.ChronoUnit;
import java.util.HexFormat;
import java.util.List;
import java.util.Random;
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
import org.openjdk.jmh.annotations.Warmup;
import org.postgresql.PGConnection;

/**
 * One clinic with 1,000,000 audit events (issue 6: verify under 20 s, filtered browser under 300 ms). The chain is
 * seeded once, with valid hashes computed in Java and loaded by COPY, and reused by later runs (a fixed clinic id;
 * the tests' Flyway clean removes it).
 * The events spread over the past 365 days: 20 accounts, 2,000 patients, 12 actions, one event in 200 denied.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Fork(value = 1, jvmArgs = {"-Xmx1g"})
@Warmup(iterations = 2, time = 2)
@Measurement(iterations = 5, time = 2)
public class AuditMillionBenchmark {

    static final UUID CLINIC = UUID.fromString("00000000-0000-4000-8000-0000000b0001");
    static final int EVENTS = 1_000_000;
    static final String[] ACTIONS = {"PATIENT_READ", "PATIENT_SEARCH", "PATIENT_UPDATE", "EPISODE_CREATE",
            "SCREENING_CREATE", "SCREENING_SIGN", "BAND_OVERRIDE", "PLAN_ISSUE", "PLAN_SHARE", "PLAN_READ",
            "SESSION_LOG", "SIGN_IN"};

    private BenchDatabase db;
    private AuditVerifier verifier;
    private AuditEventQueries queries;
    private MonthlyActivitySummaries summaries;
    private UUID somePatient;
    private UUID someActor;
    private Instant lastMonth;
    private Instant monthBefore;
    private LogCursor middle;

    @Setup
    public void setUp() throws Exception {
        db = new BenchDatabase(4);
        verifier = new AuditVerifier(db.jdbc, new CheckpointSigner(new AuditSettings(null, null, null)));
        queries = new AuditEventQueries(db.jdbc);
        summaries = new MonthlyActivitySummaries(db.jdbc, queries, Clock.systemUTC());
        Long present = db.jdbc.queryForObject("select coalesce(max(last_seq), 0) from audit_chain where chain_id = ?",
                Long.class, CLINIC);
        if (present == null || present == 0) {
            seed();
        } else if (present != EVENTS) {
            // Audit rows cannot be deleted, not even by the benchmark: start from a freshly migrated database.
            throw new IllegalStateException("bench chain " + CLINIC + " holds " + present + " events; run the tests "
                    + "once (Flyway clean + migrate) or use another database");
        }
        somePatient = patient(new Random(7).nextInt(2_000));
        someActor = actor(3);
        Instant newest = db.jdbc.queryForObject(
                "select occurred_at from audit_event where chain_id = ? and seq = ?",
                (rs, n) -> rs.getObject(1, java.time.OffsetDateTime.class).toInstant(), CLINIC, (long) EVENTS);
        lastMonth = newest.minus(30, ChronoUnit.DAYS);
        monthBefore = newest.minus(60, ChronoUnit.DAYS);
        middle = db.jdbc.queryForObject("select occurred_at, seq from audit_event where chain_id = ? and seq = ?",
                (rs, n) -> new LogCursor(rs.getObject(1, java.time.OffsetDateTime.class).toInstant(), rs.getLong(2)),
                CLINIC, (long) EVENTS / 2);
    }

    @TearDown
    public void tearDown() {
        db.close();
    }

    /** The whole chain, one walk per invocation. */
    @Benchmark
    @BenchmarkMode(Mode.SingleShotTime)
    @OutputTimeUnit(TimeUnit.SECONDS)
    @Warmup(iterations = 1)
    @Measurement(iterations = 3)
    public VerificationReport verifyMillion() {
        VerificationReport report = verifier.verify(CLINIC);
        if (!report.intact() || report.rowsChecked() != EVENTS) {
            throw new IllegalStateException(report.describe());
        }
        return report;
    }

    @Benchmark
    public EventPage browseNewestUnfiltered() {
        return queries.page(CLINIC, AuditFilter.none(), null, 50);
    }

    @Benchmark
    public EventPage browseOnePatient() {
        return queries.page(CLINIC, new AuditFilter(somePatient, null, null, null, null, null), null, 50);
    }

    @Benchmark
    public EventPage browseActorInAMonthTwoMonthsAgo() {
        return queries.page(CLINIC, new AuditFilter(null, someActor, null, null, monthBefore, lastMonth), null, 50);
    }

    @Benchmark
    public EventPage browseDeniedOnly() {
        return queries.page(CLINIC, new AuditFilter(null, null, null, AuditOutcome.DENIED, null, null), null, 50);
    }

    @Benchmark
    public EventPage browseActionAndPatient() {
        return queries.page(CLINIC, new AuditFilter(somePatient, null, "PATIENT_READ", null, null, null), null, 50);
    }

    @Benchmark
    public EventPage browseHalfAMillionPagesDeep() {
        return queries.page(CLINIC, AuditFilter.none(), middle, 50);
    }

    @Benchmark
    public List<String> actionsForTheFilter() {
        return queries.actions(CLINIC);
    }

    /** The overview's chart: closed months from audit_month_summary (computed on the first call), this month live. */
    @Benchmark
    public List<MonthlyActivity> activityChartOfAYear() {
        YearMonth now = YearMonth.now(ZoneOffset.UTC);
        return summaries.months(CLINIC, now.minusMonths(11), now);
    }

    /** The activity report over a year, counted from the events themselves. */
    @Benchmark
    public List<MonthlyActivity> activityPerMonthOfAYear() {
        Instant until = Instant.now().plus(1, ChronoUnit.DAYS);
        return queries.monthlyActivity(CLINIC, until.minus(366, ChronoUnit.DAYS), until);
    }

    private static UUID patient(int i) {
        return new UUID(0x0000_0000_0000_4000L, 0x8000_0000_0001_0000L + i);
    }

    private static UUID actor(int i) {
        return new UUID(0x0000_0000_0000_4000L, 0x8000_0000_0002_0000L + i);
    }

    /** Writes the chain exactly as AuditLog would, row by row, and loads it with COPY in blocks. */
    private void seed() throws Exception {
        long started = System.nanoTime();
        Random random = new Random(42);
        Instant first = Instant.now().minus(365, ChronoUnit.DAYS).truncatedTo(ChronoUnit.MICROS);
        long stepMicros = Duration.ofDays(365).toNanos() / 1_000 / EVENTS;
        byte[] prev = AuditHashing.GENESIS;
        HexFormat hex = HexFormat.of();
        StringBuilder block = new StringBuilder();
        try (var connection = db.dataSource.getConnection()) {
            var copy = connection.unwrap(PGConnection.class).getCopyAPI();
            for (int seq = 1; seq <= EVENTS; seq++) {
                int a = random.nextInt(20);
                String action = ACTIONS[random.nextInt(ACTIONS.length)];
                UUID patient = action.equals("SIGN_IN") ? null : patient(random.nextInt(2_000));
                AuditOutcome outcome = random.nextInt(200) == 0 ? AuditOutcome.DENIED : AuditOutcome.SUCCESS;
                AuditRecord r = new AuditRecord(CLINIC, seq, new UUID(random.nextLong(), random.nextLong()),
                        first.plus(stepMicros * seq, ChronoUnit.MICROS), CLINIC, actor(a), "staff" + a + "@bench.local",
                        a < 12 ? "CLINICIAN" : a < 18 ? "TRAINER" : "MANAGER", action, "Patient",
                        patient == null ? null : patient.toString(), patient, outcome, "10.0.0." + a,
                        UUID.randomUUID().toString(), "n=" + seq, prev);
                byte[] hash = AuditHashing.hash(r);
                block.append(r.chainId()).append('\t').append(r.seq()).append('\t').append(r.eventId()).append('\t')
                        .append(r.occurredAt()).append('\t').append(r.clinicId()).append('\t').append(r.actorId())
                        .append('\t').append(r.actorName()).append('\t').append(r.actorRole()).append('\t')
                        .append(r.action()).append('\t').append(r.objectType()).append('\t')
                        .append(r.objectId() == null ? "\\N" : r.objectId()).append('\t')
                        .append(r.patientId() == null ? "\\N" : r.patientId()).append('\t').append(r.outcome())
                        .append('\t').append(r.clientAddress()).append('\t').append(r.requestId()).append('\t')
                        .append(r.detail()).append('\t').append("\\\\x").append(hex.formatHex(prev)).append('\t')
                        .append("\\\\x").append(hex.formatHex(hash)).append('\n');
                prev = hash;
                if (seq % 50_000 == 0) {
                    copy.copyIn("""
                            copy audit_event (chain_id, seq, event_id, occurred_at, clinic_id, actor_id, actor_name,
                                actor_role, action, object_type, object_id, patient_id, outcome, client_address,
                                request_id, detail, prev_hash, row_hash) from stdin""", new StringReader(block.toString()));
                    block.setLength(0);
                }
            }
        }
        db.jdbc.update("insert into audit_chain (chain_id, last_seq, last_hash) values (?, ?, ?)", CLINIC,
                (long) EVENTS, prev);
        db.jdbc.execute("vacuum analyze audit_event");
        System.out.printf("seeded %,d events in %d s%n", EVENTS, (System.nanoTime() - started) / 1_000_000_000L);
    }
}
