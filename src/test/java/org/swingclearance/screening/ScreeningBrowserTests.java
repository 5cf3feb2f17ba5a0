package org.swingclearance.screening;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Map;
import java.util.UUID;
import org.junit.jupiter.api.Test;
import org.openqa.selenium.By;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.support.ui.ExpectedConditions;
import org.openqa.selenium.support.ui.Select;
import org.springframework.beans.factory.annotation.Autowired;
import org.swingclearance.identity.StaffRole;
import org.swingclearance.support.BrowserTestBase;
import org.swingclearance.support.TestData;
import org.swingclearance.support.TestData.TestClinic;

/**
 * The clinician's screening in a real browser: enters a full screening, watches the live results (findings and
 * suggested bands computed by the server), overrides the shoulder band with a reason, signs, then corrects the
 * signed screening as a new version while the original stays visible and verifiable.
 */
class ScreeningBrowserTests extends BrowserTestBase {

    @Autowired
    TestData data;

    @Test
    void clinicianScreensOverridesSignsAndAmends() {
        TestClinic clinic = data.clinic();
        UUID patient = data.patient(clinic);
        data.shoulderEpisode(clinic, patient);
        signIn(clinic.email(StaffRole.CLINICIAN), TestData.PASSWORD);

        open("/patients/" + patient);
        browser.findElement(By.cssSelector("#screenings form button[type=submit]")).click();
        await.until(ExpectedConditions.urlMatches(".*/screenings/[0-9a-f-]{36}$"));
        String screeningUrl = browser.getCurrentUrl();

        for (Map.Entry<String, String> value : FullScreening.typed().entrySet()) {
            WebElement input = field("m-" + value.getKey());
            if (input.getTagName().equals("select")) {
                new Select(input).selectByValue(value.getValue());
            } else {
                input.sendKeys(value.getValue());
            }
        }
        // The live preview: the server's findings and suggested bands appear without a page load.
        await.until(ExpectedConditions.textToBePresentInElementLocated(By.id("findings-list"),
                "caps the shoulder band at Band 1"));
        await.until(ExpectedConditions.textToBePresentInElementLocated(By.id("suggested-SHOULDER"), "Band 1"));
        String findings = field("findings-list").getText();
        assertThat(findings).contains("25 ° (≥ 20 °): caps the shoulder band at Band 2.") // GIRD, Wilk 2011
                .contains("Wilk et al. 2011").contains("Verified")
                .contains("40.91 points (> 40 points): caps the shoulder band at Band 1."); // QuickDASH 40.91
        assertThat(field("suggested-LUMBOPELVIC").getText()).isEqualTo("Band 2");
        assertThat(browser.findElement(By.cssSelector("#findings-derived tr[data-key=FLEXION_ROM_LSI]")).getText())
                .contains("88.24 %");

        // A value that cannot be right gets its message at once, and the results wait for a correction.
        WebElement flexion = field("m-SHOULDER_FLEXION_ACTIVE_LEFT");
        flexion.clear();
        flexion.sendKeys("210");
        await.until(ExpectedConditions.textToBePresentInElementLocated(By.id("m-SHOULDER_FLEXION_ACTIVE_LEFT-error"),
                "at most 200"));
        flexion.clear();
        flexion.sendKeys("170");
        await.until(ExpectedConditions.textToBe(By.id("m-SHOULDER_FLEXION_ACTIVE_LEFT-error"), ""));
        screenshot("screening-draft");

        new Select(field("shoulderBand")).selectByValue("BAND_2");
        type("shoulderOverrideReason", "Loaded carries tolerated well for two weeks");
        field("sign").click();
        browser.switchTo().alert().accept();
        await.until(ExpectedConditions.presenceOfElementLocated(By.id("signature")));
        assertThat(browser.getCurrentUrl()).isEqualTo(screeningUrl);
        assertThat(field("decided-SHOULDER").getText()).isEqualTo("Band 2");
        assertThat(field("signature").getText()).contains("Loaded carries tolerated well for two weeks")
                .contains("verifies");
        screenshot("screening-signed");

        type("reason", "Pain during movement re-rated after warm-up");
        field("start-amendment").click();
        await.until(ExpectedConditions.presenceOfElementLocated(By.id("screening-form")));
        assertThat(pageText()).contains("Correction of version 1:").contains("Pain during movement re-rated after warm-up");
        assertThat(field("m-QUICKDASH_1").getAttribute("value")).isEqualTo("3");
        type("m-PAIN_DURING_MOVEMENT", "3");
        field("sign").click();
        browser.switchTo().alert().accept();
        await.until(ExpectedConditions.presenceOfElementLocated(By.id("signature")));
        assertThat(pageText()).contains("Version 2").contains("Signed correction");
        assertThat(field("versions").getText()).contains("Version 1").contains("Version 2");
        screenshot("screening-amended");

        browser.findElement(By.linkText("Version 1")).click();
        await.until(ExpectedConditions.urlContains("/versions/1"));
        assertThat(pageText()).contains("This is an older version").contains("verifies");
        assertThat(field("decided-SHOULDER").getText()).isEqualTo("Band 2");

        open("/patients/" + patient);
        assertThat(field("screenings").getText()).contains("Band 2").contains("Signed correction");
        assertThat(browser.findElements(By.cssSelector("#screening-trends canvas"))).isNotEmpty();
    }
}
