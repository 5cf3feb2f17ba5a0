package org.swingclearance.audit;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.header;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.nio.charset.StandardCharsets;
import java.time.Clock;
import java.time.LocalDate;
import java.time.YearMonth;
import java.time.ZoneOffset;
import java.util.List;
import java.util.UUID;
import org.hamcrest.Matchers;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.jdbc.core.JdbcTemplate;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.transaction.PlatformTransactionManager;
import org.springframework.transaction.support.TransactionTemplate;
import org.swingclearance.identity.CurrentStaff;
import org.swingclearance.identity.StaffRole;
import org.swingclearance.support.IntegrationTest;
import org.swingclearance.support.PostgresTestBase;
import org.swingclearance.support.TestData;
import org.swingclearance.support.TestData.TestClinic;

/**
 * The manager's reports, computed from audit events as the screening and plan features record them
 * (AuditActions). Events in the past are written through an AuditLog on a fixed clock, so they land in the
 * chain exactly as they would have on that day. The expected rows are worked out by hand from the events below.
 */
@IntegrationTest
class AuditReportTests extends PostgresTestBase {

    @Autowired
    MockMvc mvc;
    @Autowired
    TestData data;
    @Autowired
    JdbcTemplate jdbc;
    @Autowired
    PlatformTransactionManager transactions;
    @Autowired
    TransactionTemplate tx;

    TestClinic clinic;
    CurrentStaff secondClinician;
    UUID patient;
    String patientCode;
    LocalDate today = LocalDate.now(ZoneOffset.UTC);

    @BeforeEach
    void setUp() {
        clinic = data.clinic();
        secondClinician = data.account(clinic.id(), StaffRole.CLINICIAN, "second-" + UUID.randomUUID() + "@test.local");
        patient = data.patient(clinic);
        patientCode = jdbc.queryForObject("select code from patient where id = ?", String.class, patient);
    }

    /** Records an event as it would have been recorded on {@code day} at 10:00 UTC. */
    private void on(LocalDate day, CurrentStaff staff, String action, String type, Object id, String detail) {
        Clock then = Clock.fixed(day.atTime(10, 0).toInstant(ZoneOffset.UTC), ZoneOffset.UTC);
        AuditLog log = new AuditLog(jdbc, then, transactions);
        tx.executeWithoutResult(s -> log.record(staff, action, type, id, patient, detail));
    }

    private Report report(String slug, String... params) throws Exception {
        var request = get("/audit/reports/" + slug).with(data.as(clinic.manager()));
        for (int i = 0; i < params.length; i += 2) {
            request.param(params[i], params[i + 1]);
        }
        return (Report) mvc.perform(request).andExpect(status().isOk()).andReturn().getModelAndView().getModel()
                .get("report");
    }

    @Test
    void screeningsAreCountedPerClinicianAndMonth() throws Exception {
        LocalDate lastMonth = today.withDayOfMonth(1).minusMonths(1);
        on(lastMonth.plusDays(2), clinic.clinician(), AuditActions.SCREENING_CREATE, "Screening", UUID.randomUUID(), null);
        on(lastMonth.plusDays(3), clinic.clinician(), AuditActions.SCREENING_SIGN, "Screening", UUID.randomUUID(), null);
        on(lastMonth.plusDays(4), clinic.clinician(), AuditActions.SCREENING_SIGN, "Screening", UUID.randomUUID(), null);
        on(today, clinic.clinician(), AuditActions.SCREENING_SIGN, "Screening", UUID.randomUUID(), null);
        on(today, secondClinician, AuditActions.SCREENING_SIGN, "Screening", UUID.randomUUID(), null);

        Report report = report("screenings-per-clinician");

        String name = clinic.clinician().displayName();
        assertThat(report.rows()).containsExactlyInAnyOrder(
                List.of(YearMonth.from(lastMonth).toString(), name, "CLINICIAN", "2", "1"),
                List.of(YearMonth.from(today).toString(), name, "CLINICIAN", "1", "0"),
                List.of(YearMonth.from(today).toString(), secondClinician.displayName(), "CLINICIAN", "1", "0"));
        // A period that ends before this month leaves this month's screenings out.
        assertThat(report("screenings-per-clinician", "from", lastMonth.toString(), "to",
                lastMonth.plusDays(20).toString()).rows()).hasSize(1);
    }

    @Test
    void bandOverridesKeepTheirWholeReason() throws Exception {
        UUID screening = UUID.randomUUID();
        String reason = "Pain 6/10 on the overhead arc, keep at Band 1; review=next week \\ physio";
        on(today, clinic.clinician(), AuditActions.BAND_OVERRIDE, "Screening", screening,
                AuditDetail.of("region", "SHOULDER", "reason", reason));

        assertThat(report("band-overrides").rows()).singleElement().satisfies(row -> {
            assertThat(row.subList(1, 6)).containsExactly(clinic.clinician().displayName(), patientCode,
                    screening.toString(), "SHOULDER", reason);
        });
    }

    /**
     * Episode A: plan issued 30 days ago, re-screen due 10 days ago, no screening signed since: overdue by 10.
     * Episode B: same plan dates, but a screening of B signed 5 days ago: not overdue.
     * Episode C: re-screen due in 7 days: not yet. Episode D: an older plan overdue, replaced by a newer one
     * whose gate is in the future: not overdue.
     */
    @Test
    void overdueRescreensAreIssuedPlansPastTheirGateWithoutASignedScreening() throws Exception {
        UUID a = UUID.randomUUID();
        UUID b = UUID.randomUUID();
        UUID c = UUID.randomUUID();
        UUID d = UUID.randomUUID();
        UUID planA = UUID.randomUUID();
        on(today.minusDays(30), clinic.clinician(), AuditActions.PLAN_ISSUE, "Plan", planA,
                AuditDetail.of("episode", a, "rescreenDue", today.minusDays(10)));
        on(today.minusDays(30), clinic.clinician(), AuditActions.PLAN_ISSUE, "Plan", UUID.randomUUID(),
                AuditDetail.of("episode", b, "rescreenDue", today.minusDays(10)));
        on(today.minusDays(5), clinic.clinician(), AuditActions.SCREENING_SIGN, "Screening", UUID.randomUUID(),
                AuditDetail.of("episode", b, "version", 2));
        on(today.minusDays(3), clinic.clinician(), AuditActions.PLAN_ISSUE, "Plan", UUID.randomUUID(),
                AuditDetail.of("episode", c, "rescreenDue", today.plusDays(7)));
        on(today.minusDays(40), clinic.clinician(), AuditActions.PLAN_ISSUE, "Plan", UUID.randomUUID(),
                AuditDetail.of("episode", d, "rescreenDue", today.minusDays(20)));
        on(today.minusDays(2), clinic.clinician(), AuditActions.PLAN_ISSUE, "Plan", UUID.randomUUID(),
                AuditDetail.of("episode", d, "rescreenDue", today.plusDays(20)));

        assertThat(report("overdue-rescreens").rows()).singleElement().satisfies(row -> {
            assertThat(row.get(0)).isEqualTo(patientCode);
            assertThat(row.get(1)).isEqualTo(a.toString());
            assertThat(row.get(2)).isEqualTo(planA.toString());
            assertThat(row.get(4)).isEqualTo(today.minusDays(10).toString());
            assertThat(row.get(5)).isEqualTo("10");
        });
    }

    /**
     * Drafts older than 14 days and not signed nor discarded since; a younger draft and finished ones do not
     * count, a correction left open does.
     */
    @Test
    void staleDraftsAreOldUnfinishedScreenings() throws Exception {
        UUID stale = UUID.randomUUID();
        UUID signed = UUID.randomUUID();
        UUID discarded = UUID.randomUUID();
        on(today.minusDays(20), clinic.clinician(), AuditActions.SCREENING_CREATE, "Screening", stale, null);
        on(today.minusDays(20), clinic.clinician(), AuditActions.SCREENING_CREATE, "Screening", signed, null);
        on(today.minusDays(18), clinic.clinician(), AuditActions.SCREENING_SIGN, "Screening", signed, null);
        on(today.minusDays(20), clinic.clinician(), AuditActions.SCREENING_CREATE, "Screening", discarded, null);
        on(today.minusDays(19), clinic.clinician(), AuditActions.SCREENING_DISCARD, "Screening", discarded, null);
        on(today.minusDays(3), clinic.clinician(), AuditActions.SCREENING_CREATE, "Screening", UUID.randomUUID(), null);
        // Signed, then reopened for a correction 16 days ago and left open: the amendment is an open draft.
        UUID amended = UUID.randomUUID();
        on(today.minusDays(30), clinic.clinician(), AuditActions.SCREENING_CREATE, "Screening", amended, null);
        on(today.minusDays(29), clinic.clinician(), AuditActions.SCREENING_SIGN, "Screening", amended, null);
        on(today.minusDays(16), clinic.clinician(), AuditActions.SCREENING_AMEND, "Screening", amended, null);

        assertThat(report("stale-drafts").rows()).hasSize(2).satisfiesExactly(
                row -> assertThat(row.subList(1, 5)).containsExactly(clinic.clinician().displayName(), patientCode,
                        stale.toString(), "20"),
                row -> assertThat(row.subList(3, 5)).containsExactly(amended.toString(), "16"));
        assertThat(report("stale-drafts", "days", "2").rows()).hasSize(3);
        assertThat(report("stale-drafts", "days", "30").rows()).isEmpty();
    }

    @Test
    void sharesAreCountedPerTrainer() throws Exception {
        UUID first = UUID.randomUUID();
        UUID second = UUID.randomUUID();
        String trainer = clinic.trainer().staffId().toString();
        on(today.minusDays(10), clinic.clinician(), AuditActions.PLAN_SHARE, "Plan", first, AuditDetail.of("trainer", trainer));
        on(today.minusDays(9), clinic.clinician(), AuditActions.PLAN_SHARE, "Plan", second, AuditDetail.of("trainer", trainer));
        on(today.minusDays(1), clinic.clinician(), AuditActions.PLAN_UNSHARE, "Plan", second, AuditDetail.of("trainer", trainer));

        assertThat(report("shares-per-trainer").rows())
                .containsExactly(List.of(clinic.trainer().displayName(), "2", "1", "1", "1"));
    }

    @Test
    void aReportExportsAsAnAuditedCsvAttachment() throws Exception {
        on(today, clinic.clinician(), AuditActions.BAND_OVERRIDE, "Screening", UUID.randomUUID(),
                AuditDetail.of("region", "LUMBOPELVIC", "reason", "=1+1 looks like a formula"));

        String csv = mvc.perform(post("/audit/reports/band-overrides/export").with(csrf())
                        .with(data.as(clinic.manager())))
                .andExpect(status().isOk())
                .andExpect(header().string("Content-Disposition", Matchers.matchesPattern(
                        "attachment; filename=\"audit-report-band-overrides-\\d{8}-\\d{6}Z\\.csv\"")))
                .andReturn().getResponse().getContentAsString(StandardCharsets.UTF_8);

        assertThat(csv).startsWith("\uFEFFTime,Clinician,Patient,Screening,Region,Reason given\r\n")
                .contains(",LUMBOPELVIC,'=1+1 looks like a formula\r\n");
        assertThat(jdbc.queryForObject("""
                select count(*) from audit_event where clinic_id = ? and action = 'AUDIT_EXPORT'
                  and object_id = 'band-overrides'""", Long.class, clinic.id())).isEqualTo(1);
    }
}
