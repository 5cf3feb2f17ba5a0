package org.swingclearance.plan;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.UUID;
import org.junit.jupiter.api.Test;
import org.openqa.selenium.By;
import org.openqa.selenium.JavascriptExecutor;
import org.openqa.selenium.support.ui.ExpectedConditions;
import org.openqa.selenium.support.ui.Select;
import org.springframework.beans.factory.annotation.Autowired;
import org.swingclearance.equipment.Clubs;
import org.swingclearance.patient.Patients;
import org.swingclearance.screening.Screenings;
import org.swingclearance.support.BrowserTestBase;
import org.swingclearance.support.TestData;

/**
 * A clinician generates a plan from the signed screening, issues it and shares it with the trainer the patient's
 * consent names; the trainer signs in, sees this week's step on the home page and downloads the handout.
 */
class PlanBrowserTests extends BrowserTestBase {

    @Autowired
    TestData data;
    @Autowired
    Clubs clubs;
    @Autowired
    Screenings screenings;
    @Autowired
    Patients patients;

    @Test
    void clinicianIssuesAndSharesThePlanAndTheTrainerDownloadsTheHandout() {
        PlanScenario s = PlanScenario.create(data, clubs, screenings);
        s.consentForTrainer(patients);

        signIn(s.clinician().email(), TestData.PASSWORD);
        open("/episodes/" + s.episodeId + "/plan");
        assertThat(pageText()).contains("Decision support only");
        new Select(field("patternId")).selectByValue(PlanScenario.TWO_HAND_LOW_PENDULUM.toString());
        browser.findElement(By.cssSelector(".plan-settings button[type=submit]")).click();
        await.until(ExpectedConditions.presenceOfElementLocated(By.id("issue-plan")));
        assertThat(pageText()).contains("Draft version 1").contains("The plan reaches");
        assertThat(browser.findElements(By.cssSelector("table.steps tbody tr"))).isNotEmpty();
        // Chart.js drew the demand line into the canvas from the JSON data block.
        await.until(d -> (Boolean) ((JavascriptExecutor) d).executeScript(
                "return typeof Chart !== 'undefined' && Chart.getChart('plan-chart') !== undefined"));
        screenshot("plan-draft");

        browser.findElement(By.id("issue-plan")).click();
        await.until(ExpectedConditions.alertIsPresent()).accept();
        await.until(ExpectedConditions.presenceOfElementLocated(By.id("share-plan")));
        assertThat(pageText()).contains("Issued version 1").contains("The plan was issued");

        new Select(field("trainerId")).selectByValue(s.trainer().staffId().toString());
        browser.findElement(By.id("share-plan")).click();
        await.until(ExpectedConditions.textToBePresentInElementLocated(By.tagName("body"), "The plan was shared"));
        assertThat(browser.findElement(By.cssSelector("table.shares")).getText()).contains("active");
        screenshot("plan-issued-shared");
        signOut();

        signIn(s.trainer().email(), TestData.PASSWORD);
        assertThat(pageText()).contains("Plans shared with me").contains("This week").contains("Step 1")
                .contains("Club 4.0 kg");
        String handout = browser.findElement(By.cssSelector(".shared-plan .handout-link")).getAttribute("href");
        Object fetched = ((JavascriptExecutor) browser).executeAsyncScript(
                "const done = arguments[arguments.length - 1];"
                        + "fetch(arguments[0]).then(r => r.arrayBuffer().then(b => done(r.status + '|'"
                        + " + r.headers.get('content-type') + '|' + String.fromCharCode(...new Uint8Array(b.slice(0, 5))))))"
                        + ".catch(e => done('error ' + e));", handout);
        assertThat(fetched).isEqualTo("200|application/pdf|%PDF-");

        browser.findElement(By.cssSelector(".shared-plan h3 a")).click();
        await.until(ExpectedConditions.urlMatches(".*/plans/[0-9a-f-]{36}$"));
        assertThat(pageText()).contains("This week's step").contains("How to progress, when to stop");
        screenshot("plan-trainer");
        assertThat(UUID.fromString(browser.getCurrentUrl().replaceAll(".*/plans/", ""))).isNotNull();
    }
}
