package org.swingclearance.training;

import static org.assertj.core.api.Assertions.assertThat;

import java.time.LocalDate;
import java.time.ZoneOffset;
import org.junit.jupiter.api.Test;
import org.openqa.selenium.By;
import org.openqa.selenium.JavascriptExecutor;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.support.ui.ExpectedConditions;
import org.openqa.selenium.support.ui.Select;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.jdbc.core.JdbcTemplate;
import org.springframework.transaction.support.TransactionTemplate;
import org.swingclearance.identity.StaffRole;
import org.swingclearance.patient.Patients;
import org.swingclearance.plan.Plans;
import org.swingclearance.support.BrowserTestBase;
import org.swingclearance.support.TestData;
import org.swingclearance.support.TestData.TestClinic;
import org.swingclearance.training.TrainingFixtures.SharedPlan;

/**
 * In Chromium: a trainer logs three sessions with rising pain during (2, 4, then 7 of 10, above the limit of 5),
 * is told to go back a step, and sees the charts; the clinician finds the alert on the home page and acknowledges it.
 */
class TrainingBrowserTests extends BrowserTestBase {

    @Autowired
    TestData data;
    @Autowired
    JdbcTemplate jdbc;
    @Autowired
    Patients patients;
    @Autowired
    Plans plans;
    @Autowired
    TransactionTemplate tx;

    @Test
    void trainerLogsRisingPainIsToldToRegressAndTheClinicianAcknowledges() {
        TestClinic clinic = data.clinic();
        SharedPlan plan = new TrainingFixtures(data, jdbc, patients, plans, tx).sharedPlan(clinic, clinic.trainer());
        LocalDate today = LocalDate.now(ZoneOffset.UTC);

        signIn(clinic.email(StaffRole.TRAINER), TestData.PASSWORD);
        assertThat(pageText()).contains("Training logs of the plans shared with you");
        logSession(plan, today.minusDays(3), "2");
        assertThat(pageText()).contains("Session saved.").doesNotContain("Go back to step");
        logSession(plan, today.minusDays(2), "4");
        assertThat(pageText()).doesNotContain("Go back to step");
        logSession(plan, today.minusDays(1), "7");
        // The plan schedules step 3 now; pain during 7/10 is above the limit, so: back to step 2.
        assertThat(field("advice").getText()).contains("Go back to step 2");
        assertThat(browser.findElements(By.cssSelector("#sessions tbody tr"))).hasSize(3);
        // The charts drew from the JSON block (Chart.js attached to each canvas), with the tables beside them.
        Object charts = ((JavascriptExecutor) browser).executeScript(
                "return ['chart-daily','chart-ratio','chart-pain','chart-demand']"
                        + ".filter(id => window.Chart && Chart.getChart(document.getElementById(id))).length");
        assertThat(((Number) charts).intValue()).isEqualTo(4);
        screenshot("training-trainer-regress");
        ((JavascriptExecutor) browser).executeScript("document.querySelector('.chart-grid').scrollIntoView()");
        screenshot("training-charts");
        signOut();

        signIn(clinic.email(StaffRole.CLINICIAN), TestData.PASSWORD);
        WebElement panel = field("open-alerts");
        assertThat(panel.getText()).contains("Pain during the session above the limit").contains("go back to step 2");
        screenshot("training-clinician-alert");
        panel.findElement(By.cssSelector("form.ack input[name=note]")).sendKeys("Spoke with the trainer");
        panel.findElement(By.cssSelector("form.ack button[type=submit]")).click();
        await.until(ExpectedConditions.textToBePresentInElementLocated(By.cssSelector(".flash"), "Alert acknowledged."));
        assertThat(field("open-alerts").getText()).contains("No open training alerts.");
        open("/training/episodes/" + plan.episodeId());
        assertThat(pageText()).contains("acknowledged").contains("Spoke with the trainer");
    }

    /** Opens the log form, sets the date (step and configuration stay as the plan schedules) and saves. */
    private void logSession(SharedPlan plan, LocalDate day, String painDuring) {
        open("/training/episodes/" + plan.episodeId() + "/sessions/new");
        ((JavascriptExecutor) browser).executeScript("arguments[0].value = arguments[1]", field("sessionDate"),
                day.toString());
        assertThat(new Select(field("stepNumber")).getFirstSelectedOption().getText()).startsWith("Step 3");
        // Done as planned: the "what was actually done" fields are hidden until the box is unticked.
        assertThat(field("different").isDisplayed()).isFalse();
        type("durationMin", "40");
        type("rpe", "5");
        type("painBefore", "1");
        type("painDuring", painDuring);
        browser.findElement(By.cssSelector("main form.session-form button[type=submit]")).click();
        await.until(ExpectedConditions.urlMatches(".*/training/episodes/[0-9a-f-]{36}$"));
    }
}
