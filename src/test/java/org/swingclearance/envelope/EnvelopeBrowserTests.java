package org.swingclearance.envelope;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.UUID;
import org.junit.jupiter.api.Test;
import org.openqa.selenium.By;
import org.openqa.selenium.JavascriptExecutor;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.support.ui.ExpectedConditions;
import org.openqa.selenium.support.ui.Select;
import org.springframework.beans.factory.annotation.Autowired;
import org.swingclearance.engine.mechanics.Assessor;
import org.swingclearance.engine.mechanics.Body;
import org.swingclearance.engine.mechanics.Capacity;
import org.swingclearance.engine.mechanics.Club;
import org.swingclearance.engine.mechanics.ClubInertia;
import org.swingclearance.engine.mechanics.Configuration;
import org.swingclearance.engine.mechanics.Constraint;
import org.swingclearance.engine.mechanics.Gravity;
import org.swingclearance.engine.rules.LoadBand;
import org.swingclearance.engine.mechanics.LoadRules;
import org.swingclearance.engine.mechanics.PendulumTiming;
import org.swingclearance.engine.mechanics.SwingKind;
import org.swingclearance.engine.mechanics.SwingPattern;
import org.swingclearance.identity.StaffRole;
import org.swingclearance.screening.Screenings;
import org.swingclearance.screening.SignedScreeningFacts;
import org.swingclearance.support.BrowserTestBase;
import org.swingclearance.support.TestData;
import org.swingclearance.support.TestData.TestClinic;

/**
 * In Chromium: the clinician adds a club by the pendulum method (computing the inertia first), opens the patient's
 * envelope, and moves the what-if grip mark; the binding constraint shown changes as the engine says it should.
 */
class EnvelopeBrowserTests extends BrowserTestBase {

    private static final String PATTERN = "One-hand front arc to shoulder height, controlled";

    @Autowired
    TestData data;
    @Autowired
    Screenings screenings;

    @Test
    void clinicianAddsAPendulumClubAndExploresTheEnvelope() {
        TestClinic clinic = data.clinic();
        UUID patient = data.patient(clinic);
        UUID episode = data.shoulderEpisode(clinic, patient);
        SignedScreeningFixture.sign(screenings, clinic.clinician(), episode);
        signIn(clinic.email(StaffRole.CLINICIAN), TestData.PASSWORD);

        // The biomechanics.md CASE-M80 club timed as in §3.2: 20 full swings in 28.0 s about the knob.
        open("/clubs/new");
        type("name", "Club 6 kg, timed");
        type("mass", "6");
        type("length", "60");
        type("balancePoint", "45");
        type("handleLength", "22");
        type("pendulumPivot", "45");
        type("pendulumSwings", "20");
        type("pendulumSeconds", "28");
        browser.findElement(By.cssSelector("button[name=compute]")).click();
        await.until(ExpectedConditions.presenceOfElementLocated(By.id("inertia-estimate")));
        assertThat(field("inertia-estimate").getText()).contains("Plausible");
        screenshot("club-pendulum-computed");
        double expected = new PendulumTiming(0.45, 20, 28.0).inertiaAboutBalancePointKgM2(6, Gravity.STANDARD);
        assertThat(field("estimate-value").getText()).startsWith(String.format(java.util.Locale.ROOT, "%.4f", expected));
        browser.findElement(By.cssSelector("main form button[type=submit]:not([name])")).click();
        await.until(ExpectedConditions.urlMatches(".*/clubs/[0-9a-f-]{36}$"));
        assertThat(pageText()).contains("Club 6 kg, timed").contains("measured").contains("Club added");

        open("/episodes/" + episode + "/envelope");
        assertThat(pageText()).contains("Permitted envelope").contains("Club 6 kg, timed")
                .contains("mechanical estimates from population tables");
        screenshot("envelope-page");
        new Select(field("club")).selectByVisibleText("Club 6 kg, timed");
        new Select(field("pattern")).selectByVisibleText(PATTERN);
        slide("tempo", "1.6");

        // What the engine says for this patient at the knob end and at the end of the handle, at 1.6 s.
        SignedScreeningFacts facts = screenings.latestSigned(clinic.clinician(), episode).orElseThrow();
        Constraint atKnob = bindingAt(facts, expected, 0.0);
        Constraint atHandleEnd = bindingAt(facts, expected, 0.22);
        assertThat(atKnob).isNotEqualTo(atHandleEnd);

        slide("grip", "0");
        awaitBinding(atKnob);
        screenshot("envelope-what-if-knob");
        slide("grip", "22");
        awaitBinding(atHandleEnd);
        assertThat(field("grip-value").getText()).isEqualTo("22.0 cm");
        // The charts were drawn by Chart.js from the server's numbers; their table alternative follows the panel.
        assertThat(((JavascriptExecutor) browser).executeScript(
                "return Chart.getChart(document.getElementById('chart-grip')).data.datasets[0].data.length"))
                .isEqualTo(41L);
        ((JavascriptExecutor) browser).executeScript("arguments[0].scrollIntoView()", field("chart-grip"));
        screenshot("envelope-what-if-handle-end");
    }

    /** Sets a range input the way a drag does: a new value, then an input event. */
    private void slide(String id, String value) {
        WebElement input = field(id);
        ((JavascriptExecutor) browser).executeScript(
                "arguments[0].value = arguments[1]; arguments[0].dispatchEvent(new Event('input', {bubbles: true}));",
                input, value);
    }

    private void awaitBinding(Constraint constraint) {
        await.until(ExpectedConditions.textToBePresentInElementLocated(By.id("whatif-binding"),
                "(" + constraint.code() + ")"));
    }

    /** The binding constraint by the engine, called directly with the signed facts (one hand: involved side). */
    private static Constraint bindingAt(SignedScreeningFacts facts, double inertia, double gripMarkM) {
        Body body = new Body(1.78, 80, facts.shoulderToGripMeasuredM());
        Club club = new Club(6, 0.60, 0.45, 0.22, ClubInertia.measured(inertia));
        Capacity capacity = new Capacity(facts.shoulderFlexionTorqueInvolvedNm(), facts.gripStrengthInvolvedKg(), null,
                LoadBand.valueOf(facts.lumbopelvicBand())).withShoulderFlexionRangeDeg(facts.activeFlexionInvolvedDeg());
        SwingPattern pattern = SwingPattern.ofDegrees(45, 45, 1, 1.0, SwingKind.RHYTHMIC, false);
        return Assessor.verdict(new Configuration(body, club, gripMarkM, pattern, 1.6, Gravity.STANDARD), capacity,
                new LoadRules(facts.shoulderBandFraction(), null, true, Math.toRadians(10), LoadBand.BAND_2)).binding();
    }
}
