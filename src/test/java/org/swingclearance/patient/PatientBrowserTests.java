package org.swingclearance.patient;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;
import org.openqa.selenium.By;
import org.openqa.selenium.support.ui.ExpectedConditions;
import org.openqa.selenium.support.ui.Select;
import org.springframework.beans.factory.annotation.Autowired;
import org.swingclearance.identity.StaffRole;
import org.swingclearance.support.BrowserTestBase;
import org.swingclearance.support.TestData;
import org.swingclearance.support.TestData.TestClinic;

/** A clinician signs in, records a patient and an episode, finds the patient in the list, and signs out. */
class PatientBrowserTests extends BrowserTestBase {

    @Autowired
    TestData data;

    @Test
    void clinicianRecordsAPatientWithAnEpisode() {
        TestClinic clinic = data.clinic();
        signIn(clinic.email(StaffRole.CLINICIAN), TestData.PASSWORD);

        open("/patients/new");
        type("code", "BRW-001");
        type("fullName", "Browser Example");
        field("dateOfBirth").sendKeys("01021984");
        new Select(field("sex")).selectByValue("FEMALE");
        type("statureCm", "300");
        type("bodyMassKg", "61");
        new Select(field("dominantHand")).selectByValue("RIGHT");
        browser.findElement(By.cssSelector("main form button[type=submit]")).click();
        // Stature of 3 m is refused with a message next to the field, and nothing is saved.
        assertThat(field("statureCm-error").getText()).contains("at most");
        type("statureCm", "166");
        browser.findElement(By.cssSelector("main form button[type=submit]")).click();
        await.until(ExpectedConditions.urlMatches(".*/patients/[0-9a-f-]{36}$"));
        assertThat(pageText()).contains("Browser Example").contains("1.66 m");

        browser.findElement(By.linkText("New episode")).click();
        new Select(field("region")).selectByValue("SHOULDER");
        new Select(field("shoulderSide")).selectByValue("LEFT");
        field("injuryDate").sendKeys("03152026");
        type("goal", "Two-hand swings again by summer");
        browser.findElement(By.cssSelector("main form button[type=submit]")).click();
        await.until(ExpectedConditions.urlMatches(".*/patients/[0-9a-f-]{36}$"));
        assertThat(pageText()).contains("Two-hand swings again by summer").contains("Episode opened");
        screenshot("patient-page");

        open("/patients");
        assertThat(pageText()).contains("BRW-001");
        signOut();
        assertThat(pageText()).contains("You are signed out");
    }
}
