package org.swingclearance.support;

import java.io.File;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.TestInstance;
import org.openqa.selenium.By;
import org.openqa.selenium.OutputType;
import org.openqa.selenium.TakesScreenshot;
import org.openqa.selenium.WebDriver;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.chrome.ChromeDriver;
import org.openqa.selenium.chrome.ChromeDriverService;
import org.openqa.selenium.chrome.ChromeOptions;
import org.openqa.selenium.support.ui.ExpectedConditions;
import org.openqa.selenium.support.ui.WebDriverWait;
import org.springframework.boot.test.web.server.LocalServerPort;

/**
 * Real headless Chromium against the application on its random port. The browser and driver paths are explicit
 * (Debian's chromium and chromium-driver, installed by .ci/run) so Selenium never downloads anything. The tests are
 * not skipped when the binaries are missing: a missing browser fails the build instead of passing silently.
 */
@IntegrationTest
@TestInstance(TestInstance.Lifecycle.PER_CLASS)
public abstract class BrowserTestBase extends PostgresTestBase {

    private static final String CHROMIUM = System.getProperty("clearance.chromium", "/usr/bin/chromium");
    private static final String CHROMEDRIVER = System.getProperty("clearance.chromedriver", "/usr/bin/chromedriver");

    @LocalServerPort
    protected int port;

    protected WebDriver browser;
    protected WebDriverWait await;

    @BeforeAll
    void startBrowser() throws IOException {
        ChromeOptions options = new ChromeOptions();
        options.setBinary(CHROMIUM);
        options.addArguments("--headless=new", "--no-sandbox", "--disable-gpu", "--disable-dev-shm-usage",
                "--disable-quic", "--no-first-run", "--disable-background-networking", "--disable-component-update",
                "--disable-sync", "--window-size=1280,1000",
                "--user-data-dir=" + Files.createTempDirectory("chromium-profile"));
        ChromeDriverService service = new ChromeDriverService.Builder()
                .usingDriverExecutable(new File(CHROMEDRIVER)).usingAnyFreePort().build();
        browser = new ChromeDriver(service, options);
        await = new WebDriverWait(browser, Duration.ofSeconds(15));
    }

    @AfterAll
    void stopBrowser() {
        if (browser != null) {
            browser.quit();
        }
    }

    protected String url(String path) {
        return "http://127.0.0.1:" + port + path;
    }

    protected void open(String path) {
        browser.get(url(path));
    }

    protected void signIn(String email, String password) {
        open("/login");
        browser.findElement(By.id("username")).sendKeys(email);
        browser.findElement(By.id("password")).sendKeys(password);
        browser.findElement(By.cssSelector("form button[type=submit]")).click();
        await.until(ExpectedConditions.not(ExpectedConditions.urlContains("/login")));
    }

    protected void signOut() {
        browser.findElement(By.cssSelector("header .who form button")).click();
        await.until(ExpectedConditions.urlContains("/login?logout"));
    }

    protected WebElement field(String id) {
        return browser.findElement(By.id(id));
    }

    protected void type(String id, String text) {
        WebElement element = field(id);
        element.clear();
        element.sendKeys(text);
    }

    protected String pageText() {
        return browser.findElement(By.tagName("body")).getText();
    }

    /** Saves a screenshot under target/screenshots for a person to look at; never asserted on. */
    protected void screenshot(String name) {
        try {
            Path dir = Path.of("target", "screenshots");
            Files.createDirectories(dir);
            byte[] png = ((TakesScreenshot) browser).getScreenshotAs(OutputType.BYTES);
            Files.write(dir.resolve(name + ".png"), png);
        } catch (IOException e) {
            throw new IllegalStateException("could not save screenshot " + name, e);
        }
    }
}
