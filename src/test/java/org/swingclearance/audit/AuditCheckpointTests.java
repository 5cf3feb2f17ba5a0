package org.swingclearance.audit;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.ByteArrayOutputStream;
import java.nio.charset.StandardCharsets;
import java.sql.Connection;
import java.sql.Statement;
import java.util.HexFormat;
import java.util.List;
import java.util.UUID;
import javax.sql.DataSource;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.jdbc.core.JdbcTemplate;
import org.springframework.transaction.support.TransactionTemplate;
import org.swingclearance.support.IntegrationTest;
import org.swingclearance.support.PostgresTestBase;
import org.swingclearance.support.TestData;
import org.swingclearance.support.TestData.TestClinic;

/** The daily checkpoint job: one writer across nodes, only moved chains, a MAC that verifies, exports. */
@IntegrationTest
class AuditCheckpointTests extends PostgresTestBase {

    @Autowired
    TestData data;
    @Autowired
    AuditLog audit;
    @Autowired
    AuditCheckpoints checkpoints;
    @Autowired
    AuditOversight oversight;
    @Autowired
    CheckpointSigner signer;
    @Autowired
    DataSource dataSource;
    @Autowired
    JdbcTemplate jdbc;
    @Autowired
    TransactionTemplate tx;

    TestClinic clinic;
    ChainFixture fixture;

    @BeforeEach
    void setUp() {
        clinic = data.clinic();
        fixture = new ChainFixture(audit, tx, jdbc);
        fixture.reads(clinic.clinician(), UUID.randomUUID(), 5);
    }

    @Test
    void theJobFixesEveryMovedHeadOnceAndItsMacVerifies() {
        assertThat(checkpoints.checkpointAllChains()).isPositive();
        List<CheckpointView> made = checkpoints.all(clinic.id());
        assertThat(made).singleElement().satisfies(c -> {
            assertThat(c.seq()).isEqualTo(5);
            assertThat(c.rowHash()).isEqualTo(HexFormat.of().formatHex(jdbc.queryForObject(
                    "select row_hash from audit_event where chain_id = ? and seq = 5", byte[].class, clinic.id())));
            assertThat(signer.verifies(clinic.id(), c.seq(), HexFormat.of().parseHex(c.rowHash()), c.createdAt(),
                    HexFormat.of().parseHex(c.mac()))).isTrue();
            // A MAC over another seq must not verify: the fields are bound together.
            assertThat(signer.verifies(clinic.id(), c.seq() + 1, HexFormat.of().parseHex(c.rowHash()), c.createdAt(),
                    HexFormat.of().parseHex(c.mac()))).isFalse();
        });

        checkpoints.checkpointAllChains();
        assertThat(checkpoints.all(clinic.id())).hasSize(1);

        fixture.reads(clinic.clinician(), UUID.randomUUID(), 2);
        checkpoints.checkpointAllChains();
        assertThat(checkpoints.all(clinic.id())).extracting(CheckpointView::seq).containsExactly(5L, 7L);
    }

    /** A second node that finds the job's advisory lock taken skips the run and writes nothing. */
    @Test
    void anotherNodeHoldingTheLockMeansThisNodeSkips() throws Exception {
        try (Connection otherNode = dataSource.getConnection()) {
            otherNode.setAutoCommit(false);
            try (Statement st = otherNode.createStatement()) {
                st.execute("select pg_advisory_xact_lock(" + AuditCheckpoints.JOB_LOCK + ")");
                assertThat(checkpoints.checkpointAllChains()).isEqualTo(-1);
                assertThat(checkpoints.all(clinic.id())).isEmpty();
            } finally {
                otherNode.rollback();
            }
        }
        assertThat(checkpoints.checkpointAllChains()).isPositive();
        assertThat(checkpoints.all(clinic.id())).hasSize(1);
    }

    @Test
    void aManagerExportsCheckpointsAsCsvAndJsonAndTheExportIsAudited() {
        oversight.checkpointNow(clinic.manager());
        CheckpointView made = checkpoints.all(clinic.id()).get(0);

        ByteArrayOutputStream csv = new ByteArrayOutputStream();
        oversight.exportCheckpoints(clinic.manager(), ExportFormat.CSV, csv);
        String csvText = csv.toString(StandardCharsets.UTF_8);
        assertThat(csvText).startsWith("\uFEFFchain_id,seq,row_hash,created_at,created_at_micros,key_id,mac\r\n")
                .contains(clinic.id() + "," + made.seq() + "," + made.rowHash()).contains(made.mac());

        ByteArrayOutputStream json = new ByteArrayOutputStream();
        oversight.exportCheckpoints(clinic.manager(), ExportFormat.JSON, json);
        assertThat(json.toString(StandardCharsets.UTF_8)).contains("\"chainId\" : \"" + clinic.id() + "\"")
                .contains("\"mac\" : \"" + made.mac() + "\"").contains("\"seq\" : " + made.seq());

        assertThat(fixture.actions(clinic.id())).containsSubsequence("AUDIT_CHECKPOINT", "AUDIT_EXPORT",
                "AUDIT_EXPORT");
    }
}
