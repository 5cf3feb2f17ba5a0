package org.swingclearance.audit;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import java.util.Map;
import java.util.UUID;
import org.junit.jupiter.api.Test;
import org.openqa.selenium.By;
import org.openqa.selenium.JavascriptExecutor;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.support.ui.ExpectedConditions;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.jdbc.core.JdbcTemplate;
import org.springframework.transaction.support.TransactionTemplate;
import org.swingclearance.identity.StaffRole;
import org.swingclearance.support.BrowserTestBase;
import org.swingclearance.support.TestData;
import org.swingclearance.support.TestData.TestClinic;

/**
 * A manager in a real browser: opens the audit trail (the activity chart draws), filters the log for one
 * patient by code, sees only that patient's events, and exports them; the download is fetched with the page's
 * own form and session, exactly as the button sends it.
 */
class AuditBrowserTests extends BrowserTestBase {

    @Autowired
    TestData data;
    @Autowired
    AuditLog audit;
    @Autowired
    JdbcTemplate jdbc;
    @Autowired
    TransactionTemplate tx;

    @Test
    void theManagerFiltersTheLogForOnePatientAndExportsIt() {
        TestClinic clinic = data.clinic();
        UUID patient = data.patient(clinic);
        UUID other = data.patient(clinic);
        String code = jdbc.queryForObject("select code from patient where id = ?", String.class, patient);
        String otherCode = jdbc.queryForObject("select code from patient where id = ?", String.class, other);
        ChainFixture fixture = new ChainFixture(audit, tx, jdbc);
        fixture.reads(clinic.clinician(), patient, 3);
        fixture.reads(clinic.clinician(), other, 2);

        signIn(clinic.email(StaffRole.MANAGER), TestData.PASSWORD);
        browser.findElement(By.linkText("Audit trail")).click();
        await.until(ExpectedConditions.urlMatches(".*/audit$"));
        Object months = ((JavascriptExecutor) browser).executeScript(
                "const c = document.getElementById('audit-activity-chart').auditChart;"
                        + " return c ? c.data.labels.length : -1;");
        assertThat(months).isEqualTo(12L);
        screenshot("audit-overview");

        browser.findElement(By.linkText("Browse the log")).click();
        type("patient", code);
        browser.findElement(By.id("apply-filter")).click();
        await.until(ExpectedConditions.presenceOfElementLocated(By.id("audit-export")));
        List<WebElement> rows = browser.findElements(By.cssSelector("table.audit-events tbody tr"));
        // The intake, three reads, and the manager's own look at the log filtered for this patient.
        assertThat(rows).hasSize(5);
        assertThat(pageText()).contains(code).doesNotContain(otherCode);
        screenshot("audit-log-filtered");

        @SuppressWarnings("unchecked")
        Map<String, Object> download = (Map<String, Object>) ((JavascriptExecutor) browser).executeAsyncScript("""
                const done = arguments[arguments.length - 1];
                const form = document.getElementById('audit-export');
                // getAttribute: the form's field named "action" hides the form.action property.
                fetch(form.getAttribute('action'), {method: 'POST', body: new URLSearchParams(new FormData(form)),
                                    credentials: 'same-origin'})
                  .then(r => r.text().then(body => done({status: r.status, body: body,
                        disposition: r.headers.get('Content-Disposition'), type: r.headers.get('Content-Type')})))
                  .catch(e => done({status: -1, body: String(e)}));""");
        assertThat(download.get("status")).isEqualTo(200L);
        assertThat((String) download.get("type")).startsWith("text/csv");
        assertThat((String) download.get("disposition")).matches("attachment; filename=\"audit-log-\\d{8}-\\d{6}Z\\.csv\"");
        String csv = (String) download.get("body");
        List<String> lines = csv.lines().toList();
        assertThat(lines.get(0)).contains("occurred_at_utc,seq,event_id");
        // Header, the export's own event, the look at the filtered log, three reads, the intake.
        assertThat(lines).hasSize(7);
        assertThat(lines.subList(1, lines.size())).allSatisfy(line -> assertThat(line).contains(patient.toString()));
        assertThat(csv).doesNotContain(other.toString());
        assertThat(jdbc.queryForObject("select count(*) from audit_event where clinic_id = ? and action = 'AUDIT_EXPORT'",
                Long.class, clinic.id())).isEqualTo(1);
    }
}
