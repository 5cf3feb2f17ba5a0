package org.swingclearance.audit;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assumptions.assumeThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.UUID;
import javax.sql.DataSource;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.core.env.Environment;
import org.springframework.jdbc.core.JdbcTemplate;
import org.springframework.transaction.support.TransactionTemplate;
import org.swingclearance.support.IntegrationTest;
import org.swingclearance.support.PostgresTestBase;
import org.swingclearance.support.TestData;
import org.swingclearance.support.TestData.TestClinic;

/**
 * The application's own database role may read and append audit rows, never change them (security-audit-interop.md
 * B.8 test 6: SQLSTATE 42501). The privilege check comes before any trigger, so it holds even when the table's
 * owner switches the append-only trigger off; the triggers themselves are tested by refusing the same statements
 * while the privilege is there.
 */
@IntegrationTest
class AuditRoleTests extends PostgresTestBase {

    private static final String PERMISSION_DENIED = "42501";

    @Autowired
    DataSource dataSource;
    @Autowired
    JdbcTemplate jdbc;
    @Autowired
    TestData data;
    @Autowired
    AuditLog audit;
    @Autowired
    AuditCheckpoints checkpoints;
    @Autowired
    TransactionTemplate tx;
    @Autowired
    Environment env;

    UUID chain;

    @BeforeEach
    void setUp() {
        TestClinic clinic = data.clinic();
        chain = clinic.id();
        new ChainFixture(audit, tx, jdbc).reads(clinic.clinician(), UUID.randomUUID(), 3);
        tx.executeWithoutResult(s -> checkpoints.checkpoint(chain));
    }

    @Test
    void theApplicationRoleCannotUpdateDeleteOrTruncateAuditRows() throws SQLException {
        try (Connection app = dataSource.getConnection()) {
            assumeThat(isSuperuser(app)).as("the datasource role must not be a superuser (Testcontainers' is)")
                    .isFalse();
            app.setAutoCommit(false);
            try (Statement st = app.createStatement()) {
                assertRefused(st, "update audit_event set detail = 'x' where chain_id = '" + chain + "' and seq = 2");
                assertRefused(st, "delete from audit_event where chain_id = '" + chain + "' and seq = 2");
                assertRefused(st, "truncate audit_event");
                assertRefused(st, "update audit_checkpoint set seq = 99 where chain_id = '" + chain + "'");
                assertRefused(st, "delete from audit_checkpoint where chain_id = '" + chain + "'");
                // The owner may switch its own trigger off; the missing privilege still stops the change.
                st.execute("alter table audit_event disable trigger audit_event_append_only");
                assertRefused(st, "update audit_event set detail = 'x' where chain_id = '" + chain + "' and seq = 2");
            } finally {
                app.rollback();
            }
            try (Statement st = app.createStatement()) {
                assertThat(count(st, "select count(*) from audit_event where chain_id = '" + chain + "'")).isEqualTo(3);
            }
            app.rollback();
        }
    }

    @Test
    void theTriggersRefuseChangesEvenToARoleWithThePrivilege() throws SQLException {
        try (Superuser su = Superuser.connect(env); Statement st = su.connection().createStatement()) {
            st.execute("set session_replication_role = origin");
            su.connection().setAutoCommit(false);
            assertThatThrownBy(() -> st.executeUpdate(
                    "update audit_event set detail = 'x' where chain_id = '" + chain + "' and seq = 2"))
                    .hasMessageContaining("append-only");
            su.connection().rollback();
            assertThatThrownBy(() -> st.executeUpdate("truncate audit_event")).hasMessageContaining("append-only");
            su.connection().rollback();
        }
    }

    /** The DBA script shipped in db/admin: its NOLOGIN role may read and append, and is refused any change. */
    @Test
    void theRuntimeGroupRoleMayOnlyReadAndAppend() throws Exception {
        String script = Files.readString(Path.of("src", "main", "resources", "db", "admin", "audit-runtime-role.sql"));
        try (Superuser su = Superuser.connect(env); Statement st = su.connection().createStatement()) {
            st.execute(script);
            su.connection().setAutoCommit(false);
            st.execute("set local role clearance_audit_append");
            assertThat(count(st, "select count(*) from audit_event where chain_id = '" + chain + "'")).isEqualTo(3);
            assertRefused(st, "update audit_event set detail = 'x' where chain_id = '" + chain + "' and seq = 2");
            su.connection().rollback();
            st.execute("set local role clearance_audit_append");
            assertRefused(st, "delete from audit_checkpoint where chain_id = '" + chain + "'");
            su.connection().rollback();
        }
    }

    private static void assertRefused(Statement st, String sql) throws SQLException {
        st.execute("savepoint attempt");
        assertThatThrownBy(() -> st.execute(sql))
                .isInstanceOf(SQLException.class)
                .satisfies(e -> assertThat(((SQLException) e).getSQLState()).as(sql).isEqualTo(PERMISSION_DENIED));
        st.execute("rollback to savepoint attempt");
    }

    private static boolean isSuperuser(Connection connection) throws SQLException {
        try (Statement st = connection.createStatement();
             var rs = st.executeQuery("select rolsuper from pg_roles where rolname = current_user")) {
            rs.next();
            return rs.getBoolean(1);
        }
    }

    private static long count(Statement st, String sql) throws SQLException {
        try (var rs = st.executeQuery(sql)) {
            rs.next();
            return rs.getLong(1);
        }
    }
}
