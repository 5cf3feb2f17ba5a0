package org.swingclearance.audit;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.UUID;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.core.env.Environment;
import org.springframework.jdbc.core.JdbcTemplate;
import org.springframework.transaction.support.TransactionTemplate;
import org.swingclearance.support.IntegrationTest;
import org.swingclearance.support.PostgresTestBase;
import org.swingclearance.support.TestData;
import org.swingclearance.support.TestData.TestClinic;

/** The verify-audit command line: report text, exit codes, and its run recorded in the chain. */
@IntegrationTest
class VerifyAuditCommandTests extends PostgresTestBase {

    @Autowired
    VerifyAuditCommand command;
    @Autowired
    TestData data;
    @Autowired
    AuditLog audit;
    @Autowired
    JdbcTemplate jdbc;
    @Autowired
    TransactionTemplate tx;
    @Autowired
    Environment env;

    @Test
    void exitsZeroOnAnIntactChainAndOneOnABrokenOne() throws Exception {
        TestClinic clinic = data.clinic();
        ChainFixture fixture = new ChainFixture(audit, tx, jdbc);
        fixture.reads(clinic.clinician(), UUID.randomUUID(), 6);

        ByteArrayOutputStream out = new ByteArrayOutputStream();
        assertThat(command.execute(List.of(clinic.id().toString()), new PrintStream(out, true, StandardCharsets.UTF_8)))
                .isZero();
        assertThat(out.toString(StandardCharsets.UTF_8)).contains("chain " + clinic.id() + ": INTACT")
                .contains("rows checked: 6").contains("ALL INTACT");
        assertThat(fixture.actions(clinic.id())).last().isEqualTo("AUDIT_VERIFY");

        try (Superuser su = Superuser.connect(env)) {
            su.update("update audit_event set actor_name = 'someone else' where chain_id = ? and seq = 4", clinic.id());
        }
        out.reset();
        assertThat(command.execute(List.of(clinic.id().toString()), new PrintStream(out, true, StandardCharsets.UTF_8)))
                .isEqualTo(1);
        assertThat(out.toString(StandardCharsets.UTF_8)).contains("BROKEN")
                .contains("first break: ROW_CONTENT_CHANGED at seq 4 (event " + fixture.eventAt(clinic.id(), 4) + ")")
                .contains("BROKEN CHAIN FOUND");
    }

    @Test
    void aBadArgumentExitsTwo() {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        assertThat(command.execute(List.of("not-a-clinic"), new PrintStream(out, true, StandardCharsets.UTF_8)))
                .isEqualTo(2);
        assertThat(out.toString(StandardCharsets.UTF_8)).contains("usage:");
    }
}
