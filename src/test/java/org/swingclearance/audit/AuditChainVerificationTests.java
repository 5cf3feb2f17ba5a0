package org.swingclearance.audit;

import static org.assertj.core.api.Assertions.assertThat;

import java.sql.ResultSet;
import java.sql.SQLException;
import java.time.OffsetDateTime;
import java.util.List;
import java.util.UUID;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.core.env.Environment;
import org.springframework.jdbc.core.JdbcTemplate;
import org.springframework.transaction.support.TransactionTemplate;
import org.swingclearance.support.IntegrationTest;
import org.swingclearance.support.PostgresTestBase;
import org.swingclearance.support.TestData;
import org.swingclearance.support.TestData.TestClinic;

/**
 * The verifier against real tampering on PostgreSQL (security-audit-interop.md B.8, tests 2 to 5 and 9): a
 * database superuser switches the append-only triggers off for its session and changes, deletes, reorders or
 * truncates rows, or rewrites the whole chain consistently; the verifier must name the first broken row and
 * say what differs.
 */
@IntegrationTest
class AuditChainVerificationTests extends PostgresTestBase {

    private static final int EVENTS = 20;

    @Autowired
    TestData data;
    @Autowired
    AuditLog audit;
    @Autowired
    AuditVerifier verifier;
    @Autowired
    AuditCheckpoints checkpoints;
    @Autowired
    JdbcTemplate jdbc;
    @Autowired
    TransactionTemplate tx;
    @Autowired
    Environment env;

    TestClinic clinic;
    UUID chain;
    ChainFixture fixture;

    @BeforeEach
    void writeChain() {
        clinic = data.clinic();
        chain = clinic.id();
        fixture = new ChainFixture(audit, tx, jdbc);
        fixture.reads(clinic.clinician(), UUID.randomUUID(), EVENTS);
    }

    @Test
    void anUntouchedChainIsIntact() {
        VerificationReport report = verifier.verify(chain);

        assertThat(report.intact()).as(report.describe()).isTrue();
        assertThat(report.rowsChecked()).isEqualTo(EVENTS);
        assertThat(report.lastSeq()).isEqualTo(EVENTS);
    }

    /** B.8 test 2: one field of one row changed behind the trigger's back; every hashed field counts. */
    @ParameterizedTest
    @ValueSource(strings = {"actor_role = 'MANAGER'", "detail = 'n=99'", "outcome = 'DENIED'",
            "patient_id = gen_random_uuid()", "occurred_at = occurred_at + interval '1 microsecond'",
            "action = 'PATIENT_UPDATE'", "client_address = '10.0.0.9'"})
    void aChangedFieldIsNamedWithItsRow(String change) throws SQLException {
        try (Superuser su = Superuser.connect(env)) {
            assertThat(su.update("update audit_event set " + change + " where chain_id = ? and seq = 7", chain))
                    .isEqualTo(1);
        }

        VerificationReport report = verifier.verify(chain);

        assertThat(report.intact()).isFalse();
        assertThat(report.firstBreak().kind()).isEqualTo(BreakKind.ROW_CONTENT_CHANGED);
        assertThat(report.firstBreak().seq()).isEqualTo(7);
        assertThat(report.firstBreak().eventId()).isEqualTo(fixture.eventAt(chain, 7));
        assertThat(report.firstBreak().explanation()).startsWith("row content changed");
        assertThat(report.rowsChecked()).isEqualTo(6);
    }

    /** B.8 test 3: a middle row deleted leaves a gap in seq; the gap is named. */
    @Test
    void aDeletedMiddleRowIsNamed() throws SQLException {
        try (Superuser su = Superuser.connect(env)) {
            su.update("delete from audit_event where chain_id = ? and seq = 10", chain);
        }

        VerificationReport report = verifier.verify(chain);

        assertThat(report.firstBreak().kind()).isEqualTo(BreakKind.ROW_MISSING);
        assertThat(report.firstBreak().seq()).isEqualTo(10);
        assertThat(report.firstBreak().explanation()).contains("gap at seq 10");
    }

    /** Two neighbours swap places: the first of them no longer links to its predecessor and is recognised as moved. */
    @Test
    void reorderedRowsAreNamed() throws SQLException {
        UUID fifth = fixture.eventAt(chain, 5);
        UUID sixth = fixture.eventAt(chain, 6);
        try (Superuser su = Superuser.connect(env)) {
            su.update("update audit_event set seq = -5 where chain_id = ? and seq = 5", chain);
            su.update("update audit_event set seq = 5 where chain_id = ? and seq = 6", chain);
            su.update("update audit_event set seq = 6 where chain_id = ? and seq = -5", chain);
        }

        VerificationReport report = verifier.verify(chain);

        assertThat(report.firstBreak().kind()).isEqualTo(BreakKind.LINK_BROKEN);
        assertThat(report.firstBreak().seq()).isEqualTo(5);
        assertThat(report.firstBreak().eventId()).isEqualTo(sixth).isNotEqualTo(fifth);
        assertThat(report.firstBreak().explanation()).contains("order/link broken").contains("written as seq 6");
    }

    /** B.8 test 4: the last rows deleted and the head set back to match; only the checkpoint still knows. */
    @Test
    void aTruncatedTailIsFoundThroughTheCheckpoint() throws SQLException {
        tx.executeWithoutResult(s -> checkpoints.checkpoint(chain));
        byte[] hashOf17 = jdbc.queryForObject("select row_hash from audit_event where chain_id = ? and seq = 17",
                byte[].class, chain);
        try (Superuser su = Superuser.connect(env)) {
            su.update("delete from audit_event where chain_id = ? and seq > 17", chain);
            su.update("update audit_chain set last_seq = 17, last_hash = ? where chain_id = ?", hashOf17, chain);
        }

        VerificationReport report = verifier.verify(chain);

        assertThat(report.rowsChecked()).isEqualTo(17);
        assertThat(report.firstBreak().kind()).isEqualTo(BreakKind.TAIL_TRUNCATED);
        assertThat(report.firstBreak().seq()).isEqualTo(18);
        assertThat(report.firstBreak().explanation()).contains("names seq 20").contains("ends at seq 17");
    }

    @Test
    void aTruncatedTailWithoutCheckpointIsFoundThroughTheHead() throws SQLException {
        try (Superuser su = Superuser.connect(env)) {
            su.update("delete from audit_event where chain_id = ? and seq > 17", chain);
        }

        VerificationReport report = verifier.verify(chain);

        assertThat(report.firstBreak().kind()).isEqualTo(BreakKind.HEAD_MISMATCH);
        assertThat(report.firstBreak().seq()).isEqualTo(18);
    }

    /**
     * B.8 test 5: an attacker who knows the hashing rewrites row 3 and re-hashes everything after it, so every
     * link holds again. The keyed checkpoint taken before is the only witness; forging it fails on the HMAC.
     */
    @Test
    void aConsistentlyRewrittenChainContradictsItsCheckpoint() throws SQLException {
        tx.executeWithoutResult(s -> checkpoints.checkpoint(chain));
        List<AuditRecord> rows = jdbc.query("""
                select seq, event_id, occurred_at, clinic_id, actor_id, actor_name, actor_role, action, object_type,
                       object_id, patient_id, outcome, client_address, request_id, detail, prev_hash
                from audit_event where chain_id = ? order by seq""", (rs, n) -> record(chain, rs), chain);
        byte[] newHead;
        try (Superuser su = Superuser.connect(env)) {
            byte[] prev = null;
            for (AuditRecord r : rows) {
                if (r.seq() < 3) {
                    continue;
                }
                AuditRecord rewritten = new AuditRecord(r.chainId(), r.seq(), r.eventId(), r.occurredAt(), r.clinicId(),
                        r.actorId(), r.actorName(), r.actorRole(), r.action(), r.objectType(), r.objectId(),
                        r.patientId(), r.outcome(), r.clientAddress(), r.requestId(),
                        r.seq() == 3 ? "n=rewritten" : r.detail(), prev == null ? r.prevHash() : prev);
                prev = AuditHashing.hash(rewritten);
                su.update("update audit_event set detail = ?, prev_hash = ?, row_hash = ? where chain_id = ? and seq = ?",
                        rewritten.detail(), rewritten.prevHash(), prev, chain, r.seq());
            }
            newHead = prev;
            su.update("update audit_chain set last_hash = ? where chain_id = ?", newHead, chain);
        }

        VerificationReport report = verifier.verify(chain);
        assertThat(report.firstBreak().kind()).isEqualTo(BreakKind.CHECKPOINT_MISMATCH);
        assertThat(report.firstBreak().seq()).isEqualTo(EVENTS);
        assertThat(report.rowsChecked()).isEqualTo(EVENTS - 1);

        try (Superuser su = Superuser.connect(env)) {
            su.update("update audit_checkpoint set row_hash = ? where chain_id = ?", newHead, chain);
        }
        VerificationReport forged = verifier.verify(chain);
        assertThat(forged.firstBreak().kind()).isEqualTo(BreakKind.CHECKPOINT_FORGED);
        assertThat(forged.firstBreak().seq()).isEqualTo(EVENTS);
    }

    /**
     * B.8 test 9: the hash covers time as epoch microseconds, never the session's text form of it, so a session
     * with an exotic time zone (UTC+14) and another day order reads every row to the same hash.
     */
    @Test
    void hashesDoNotDependOnTheSessionTimeZoneOrDateStyle() throws SQLException {
        try (Superuser su = Superuser.connect(env); var st = su.connection().createStatement()) {
            st.execute("set TimeZone = 'Pacific/Kiritimati'");
            st.execute("set DateStyle = 'ISO, DMY'"); // the JDBC driver insists on ISO first
            try (var ps = su.connection().prepareStatement("""
                    select seq, event_id, occurred_at, clinic_id, actor_id, actor_name, actor_role, action,
                           object_type, object_id, patient_id, outcome, client_address, request_id, detail, prev_hash,
                           row_hash
                    from audit_event where chain_id = ? order by seq""")) {
                ps.setObject(1, chain);
                try (ResultSet rs = ps.executeQuery()) {
                    int rows = 0;
                    while (rs.next()) {
                        assertThat(AuditHashing.hash(record(chain, rs))).isEqualTo(rs.getBytes(17));
                        rows++;
                    }
                    assertThat(rows).isEqualTo(EVENTS);
                }
            }
        }
    }

    private static AuditRecord record(UUID chainId, ResultSet rs) throws SQLException {
        return new AuditRecord(chainId, rs.getLong(1), rs.getObject(2, UUID.class),
                rs.getObject(3, OffsetDateTime.class).toInstant(), rs.getObject(4, UUID.class),
                rs.getObject(5, UUID.class), rs.getString(6), rs.getString(7), rs.getString(8), rs.getString(9),
                rs.getString(10), rs.getObject(11, UUID.class), AuditOutcome.valueOf(rs.getString(12)),
                rs.getString(13), rs.getString(14), rs.getString(15), rs.getBytes(16));
    }
}
