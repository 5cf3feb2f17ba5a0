package org.swingclearance.audit;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.content;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.flash;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.header;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.model;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.io.StringReader;
import java.nio.charset.StandardCharsets;
import java.time.Instant;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.UUID;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.hamcrest.Matchers;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.core.env.Environment;
import org.springframework.jdbc.core.JdbcTemplate;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.MvcResult;
import org.springframework.transaction.support.TransactionTemplate;
import org.swingclearance.support.IntegrationTest;
import org.swingclearance.support.PostgresTestBase;
import org.swingclearance.support.TestData;
import org.swingclearance.support.TestData.TestClinic;

/**
 * The manager's audit pages through MockMvc: own clinic only (404 for another clinic's events and patients),
 * filters with impossible input answer field messages, keyset paging, verification from the page, and the
 * CSV export (attachment, server-made name, formula neutralisation, audited, rows re-verifiable off-line).
 */
@IntegrationTest
class AuditWebTests extends PostgresTestBase {

    @Autowired
    MockMvc mvc;
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

    TestClinic clinic;
    ChainFixture fixture;
    UUID patient;
    String patientCode;

    @BeforeEach
    void setUp() {
        clinic = data.clinic();
        fixture = new ChainFixture(audit, tx, jdbc);
        patient = data.patient(clinic);
        patientCode = jdbc.queryForObject("select code from patient where id = ?", String.class, patient);
    }

    @Test
    void onlyManagersReachTheAuditPagesAndEveryLookIsAudited() throws Exception {
        mvc.perform(get("/audit").with(data.as(clinic.manager()))).andExpect(status().isOk())
                .andExpect(content().string(Matchers.containsString("Chain of this clinic")))
                .andExpect(content().string(Matchers.containsString("id=\"audit-activity-data\"")));
        for (var other : List.of(clinic.clinician(), clinic.trainer(), clinic.admin())) {
            mvc.perform(get("/audit").with(data.as(other))).andExpect(status().isForbidden());
            mvc.perform(get("/audit/log").with(data.as(other))).andExpect(status().isForbidden());
            mvc.perform(get("/audit/reports/band-overrides").with(data.as(other))).andExpect(status().isForbidden());
        }
        assertThat(fixture.actions(clinic.id())).contains("AUDIT_VIEW");
    }

    @Test
    void theLogFiltersByPatientCodeOrId() throws Exception {
        UUID otherPatient = data.patient(clinic);
        fixture.reads(clinic.clinician(), patient, 3);
        fixture.reads(clinic.clinician(), otherPatient, 2);

        for (String given : List.of(patientCode, patientCode.toLowerCase(), patient.toString())) {
            EventPage page = (EventPage) mvc.perform(get("/audit/log").param("patient", given)
                            .param("action", "PATIENT_READ").with(data.as(clinic.manager())))
                    .andExpect(status().isOk()).andReturn().getModelAndView().getModel().get("page");
            // The intake's PATIENT_CREATE is about the patient too; the action filter leaves only the reads.
            assertThat(page.rows()).hasSize(3).allSatisfy(row -> {
                assertThat(row.patientId()).isEqualTo(patient);
                assertThat(row.patientCode()).isEqualTo(patientCode);
            });
        }
    }

    @Test
    void impossibleFiltersAnswerFieldMessagesNotErrors() throws Exception {
        TestClinic other = data.clinic();
        UUID foreignPatient = data.patient(other);
        String foreignCode = jdbc.queryForObject("select code from patient where id = ?", String.class, foreignPatient);

        mvc.perform(get("/audit/log").param("from", "2026-05-01").param("to", "2026-04-01")
                        .with(data.as(clinic.manager())))
                .andExpect(status().isOk())
                .andExpect(model().attributeHasFieldErrorCode("filter", "to", "audit.filter.toBeforeFrom"))
                .andExpect(model().attributeDoesNotExist("page"))
                .andExpect(content().string(Matchers.containsString("Must be on or after the start day.")));
        mvc.perform(get("/audit/log").param("from", "2026-02-30").param("outcome", "MAYBE").param("actor", "x")
                        .with(data.as(clinic.manager())))
                .andExpect(status().isOk())
                .andExpect(model().attributeHasFieldErrorCode("filter", "from", "typeMismatch"))
                .andExpect(model().attributeHasFieldErrorCode("filter", "outcome", "typeMismatch"))
                .andExpect(model().attributeHasFieldErrorCode("filter", "actor", "typeMismatch"))
                .andExpect(content().string(Matchers.containsString("Enter a date as YYYY-MM-DD.")));
        // Another clinic's patient is as unknown as a code nobody has: the same message, no hint that it exists.
        for (String unknown : List.of(foreignCode, foreignPatient.toString(), "NO-SUCH-CODE")) {
            mvc.perform(get("/audit/log").param("patient", unknown).with(data.as(clinic.manager())))
                    .andExpect(status().isOk())
                    .andExpect(model().attributeHasFieldErrorCode("filter", "patient", "audit.filter.noSuchPatient"));
        }
        mvc.perform(get("/audit/log").param("action", "x'; drop table audit_event; --").with(data.as(clinic.manager())))
                .andExpect(status().isOk())
                .andExpect(model().attributeHasFieldErrorCode("filter", "action", "Pattern"));
        mvc.perform(get("/audit/log").param("after", "not-a-cursor").with(data.as(clinic.manager())))
                .andExpect(status().isOk()).andExpect(model().attributeExists("page"))
                .andExpect(content().string(Matchers.containsString("showing the newest events")));
        mvc.perform(get("/audit/reports/stale-drafts").param("from", "2026-05-01").param("to", "2026-04-01")
                        .param("days", "0").with(data.as(clinic.manager())))
                .andExpect(status().isOk())
                .andExpect(model().attributeHasFieldErrorCode("form", "to", "audit.filter.toBeforeFrom"))
                .andExpect(model().attributeHasFieldErrorCode("form", "days", "Min"))
                .andExpect(model().attributeDoesNotExist("report"));
        mvc.perform(get("/audit/reports/no-such-report").with(data.as(clinic.manager())))
                .andExpect(status().isNotFound());
    }

    /** Keyset paging walks every matching event exactly once, newest first, however many pages there are. */
    @Test
    void pagesFollowEachOtherWithoutGapsOrRepeats() throws Exception {
        fixture.reads(clinic.clinician(), patient, 120);
        List<EventRow> seen = new ArrayList<>();
        String after = null;
        int pages = 0;
        do {
            var request = get("/audit/log").param("patient", patient.toString()).param("action", "PATIENT_READ")
                    .with(data.as(clinic.manager()));
            if (after != null) {
                request.param("after", after);
            }
            EventPage page = (EventPage) mvc.perform(request).andReturn().getModelAndView().getModel().get("page");
            seen.addAll(page.rows());
            after = page.hasNext() ? page.next().token() : null;
            pages++;
        } while (after != null);

        assertThat(pages).isEqualTo(3);
        assertThat(seen).hasSize(120);
        Set<Long> seqs = new HashSet<>();
        seen.forEach(r -> seqs.add(r.seq()));
        assertThat(seqs).hasSize(120);
        for (int i = 1; i < seen.size(); i++) {
            assertThat(seen.get(i).occurredAt()).isBeforeOrEqualTo(seen.get(i - 1).occurredAt());
        }
    }

    @Test
    void anotherClinicsEventsAndPatientsAre404AndTheAttemptIsAudited() throws Exception {
        TestClinic other = data.clinic();
        UUID foreignPatient = data.patient(other);
        UUID foreignEvent = jdbc.queryForObject(
                "select event_id from audit_event where clinic_id = ? order by seq limit 1", UUID.class, other.id());

        mvc.perform(get("/audit/events/{id}", foreignEvent).with(data.as(clinic.manager())))
                .andExpect(status().isNotFound());
        mvc.perform(get("/audit/patients/{id}", foreignPatient).with(data.as(clinic.manager())))
                .andExpect(status().isNotFound());

        assertThat(jdbc.queryForList("""
                select object_type || ':' || object_id from audit_event
                where clinic_id = ? and outcome = 'DENIED' order by seq""", String.class, clinic.id()))
                .containsExactly("AuditEvent:" + foreignEvent, "Patient:" + foreignPatient);
        // The other clinic's own log shows nothing of this.
        assertThat(jdbc.queryForObject("select count(*) from audit_event where clinic_id = ? and actor_id = ?",
                Long.class, other.id(), clinic.manager().staffId())).isZero();
    }

    @Test
    void aPatientsAccessLogNamesWhoOpenedTheRecord() throws Exception {
        fixture.reads(clinic.clinician(), patient, 4);
        PatientAccessLog log = (PatientAccessLog) mvc.perform(get("/audit/patients/{id}", patient)
                        .with(data.as(clinic.manager())))
                .andExpect(status().isOk())
                .andExpect(content().string(Matchers.containsString(patientCode)))
                .andReturn().getModelAndView().getModel().get("log");

        // Newest contact first: the manager's own look at this log is itself a recorded access of the patient.
        assertThat(log.byActor()).hasSize(2);
        assertThat(log.byActor().get(0)).satisfies(a -> {
            assertThat(a.actorId()).isEqualTo(clinic.manager().staffId());
            assertThat(a.events()).isEqualTo(1);
        });
        assertThat(log.byActor().get(1)).satisfies(a -> {
            assertThat(a.actorId()).isEqualTo(clinic.clinician().staffId());
            assertThat(a.events()).isEqualTo(5); // the intake (PATIENT_CREATE) and four reads
            assertThat(a.reads()).isEqualTo(4);
        });
    }

    @Test
    void anEventPageShowsItsHashesAndTheOtherEventsOfTheRecord() throws Exception {
        fixture.reads(clinic.clinician(), patient, 2);
        UUID second = fixture.eventAt(clinic.id(), fixture.head(clinic.id()));
        EventDetail detail = (EventDetail) mvc.perform(get("/audit/events/{id}", second).with(data.as(clinic.manager())))
                .andExpect(status().isOk()).andReturn().getModelAndView().getModel().get("detail");
        assertThat(detail.event().rowHash()).hasSize(64);
        assertThat(detail.sameObject()).extracting(EventRow::action).containsExactly("PATIENT_CREATE", "PATIENT_READ",
                "PATIENT_READ");
    }

    @Test
    void verifyNowReportsTheChainStateOnTheOverview() throws Exception {
        fixture.reads(clinic.clinician(), patient, 5);
        mvc.perform(post("/audit/verify").with(csrf()).with(data.as(clinic.manager())))
                .andExpect(status().is3xxRedirection()).andExpect(flash().attribute("flash", "audit.verify.intact"));
        mvc.perform(get("/audit").with(data.as(clinic.manager())))
                .andExpect(content().string(Matchers.containsString("Intact")));

        long tampered = 3;
        try (Superuser su = Superuser.connect(env)) {
            su.update("update audit_event set actor_role = 'ADMIN' where chain_id = ? and seq = ?", clinic.id(), tampered);
        }
        mvc.perform(post("/audit/verify").with(csrf()).with(data.as(clinic.manager())))
                .andExpect(flash().attribute("flash", "audit.verify.broken"));
        mvc.perform(get("/audit").with(data.as(clinic.manager())))
                .andExpect(content().string(Matchers.containsString("Broken")))
                .andExpect(content().string(Matchers.containsString("First break at seq 3:")))
                .andExpect(content().string(Matchers.containsString("Row content changed")));
    }

    /**
     * The export is a POST, an attachment with a name the server makes, audited before its rows, and
     * neutralises cells a spreadsheet would run as formulas (OWASP CSV injection). Because it carries every
     * hashed field, each row's hash can be recomputed from the file alone.
     */
    @Test
    void theFilteredLogExportsAsSafeSelfVerifyingCsv() throws Exception {
        fixture.reads(clinic.clinician(), patient, 2);
        fixture.record(clinic.clinician(), "PATIENT_UPDATE", "Patient", "-2+3", patient, "=HYPERLINK(\"http://x\")");
        fixture.record(clinic.clinician(), "PATIENT_UPDATE", "Patient", "@SUM(A1)", patient, "\tcells=1");

        mvc.perform(get("/audit/log/export").param("patient", patient.toString()).with(data.as(clinic.manager())))
                .andExpect(status().isMethodNotAllowed());
        MvcResult result = mvc.perform(post("/audit/log/export").with(csrf()).param("patient", patientCode)
                        .with(data.as(clinic.manager())))
                .andExpect(status().isOk())
                .andExpect(header().string("Content-Type", Matchers.startsWith("text/csv")))
                .andExpect(header().string("Content-Disposition",
                        Matchers.matchesPattern("attachment; filename=\"audit-log-\\d{8}-\\d{6}Z\\.csv\"")))
                .andReturn();
        String body = result.getResponse().getContentAsString(StandardCharsets.UTF_8);
        assertThat(body).startsWith("\uFEFF");
        List<CSVRecord> rows = CSVFormat.RFC4180.builder().setHeader().setSkipHeaderRecord(true).get()
                .parse(new StringReader(body.substring(1))).getRecords();

        // Newest first: the export's own event (written before the first row), two updates, two reads, the intake.
        assertThat(rows).extracting(r -> r.get("action")).containsExactly("AUDIT_EXPORT", "PATIENT_UPDATE",
                "PATIENT_UPDATE", "PATIENT_READ", "PATIENT_READ", "PATIENT_CREATE");
        assertThat(rows.get(1).get("object_id")).isEqualTo("'@SUM(A1)");
        assertThat(rows.get(1).get("detail")).isEqualTo("'\tcells=1");
        assertThat(rows.get(2).get("object_id")).isEqualTo("'-2+3");
        assertThat(rows.get(2).get("detail")).isEqualTo("'=HYPERLINK(\"http://x\")");
        for (CSVRecord row : rows) {
            AuditRecord record = new AuditRecord(clinic.id(), Long.parseLong(row.get("seq")),
                    UUID.fromString(row.get("event_id")), Instant.parse(row.get("occurred_at_utc")), clinic.id(),
                    uuid(row.get("actor_id")), text(row.get("actor_name")), text(row.get("actor_role")),
                    row.get("action"), text(row.get("object_type")), text(row.get("object_id")),
                    uuid(row.get("patient_id")), AuditOutcome.valueOf(row.get("outcome")),
                    text(row.get("client_address")), text(row.get("request_id")), text(row.get("detail")),
                    java.util.HexFormat.of().parseHex(row.get("prev_hash")));
            assertThat(AuditHashing.hex(AuditHashing.hash(record))).as("seq " + row.get("seq"))
                    .isEqualTo(row.get("row_hash"));
        }
        assertThat(jdbc.queryForObject("""
                select count(*) from audit_event where clinic_id = ? and action = 'AUDIT_EXPORT' and patient_id = ?""",
                Long.class, clinic.id(), patient)).isEqualTo(1);
    }

    @Test
    void retentionIsSetWithinItsBoundsAndAudited() throws Exception {
        long version = jdbc.queryForObject("select version from clinic where id = ?", Long.class, clinic.id());
        mvc.perform(post("/audit/retention").with(csrf()).param("years", "3").param("version", "" + version)
                        .with(data.as(clinic.manager())))
                .andExpect(status().isOk()).andExpect(model().attributeHasFieldErrorCode("retentionForm", "years", "Min"));
        mvc.perform(post("/audit/retention").with(csrf()).param("years", "12").param("version", "" + version)
                        .with(data.as(clinic.manager())))
                .andExpect(status().is3xxRedirection());
        mvc.perform(post("/audit/retention").with(csrf()).param("years", "15").param("version", "" + version)
                        .with(data.as(clinic.manager())))
                .andExpect(status().isConflict());

        assertThat(jdbc.queryForObject("select retention_years from clinic where id = ?", Integer.class, clinic.id()))
                .isEqualTo(12);
        assertThat(jdbc.queryForObject("select detail from audit_event where clinic_id = ? and action = 'RETENTION_UPDATE'",
                String.class, clinic.id())).isEqualTo("from=10,to=12");
    }

    /** CSV cells undo their apostrophe only where the export added one. */
    private static String text(String cell) {
        if (cell.isEmpty()) {
            return null;
        }
        return cell.length() > 1 && cell.charAt(0) == '\'' && "=+-@\t\r".indexOf(cell.charAt(1)) >= 0
                ? cell.substring(1) : cell;
    }

    private static UUID uuid(String cell) {
        return cell.isEmpty() ? null : UUID.fromString(cell);
    }
}
