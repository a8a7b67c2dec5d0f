package org.telltale.report.html;

import static org.junit.jupiter.api.Assertions.fail;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.time.Duration;
import java.util.List;
import java.util.Map;
import java.util.logging.Level;
import org.openqa.selenium.OutputType;
import org.openqa.selenium.chrome.ChromeDriver;
import org.openqa.selenium.chrome.ChromeDriverService;
import org.openqa.selenium.chrome.ChromeOptions;
import org.openqa.selenium.logging.LogEntry;
import org.openqa.selenium.logging.LogType;

/**
 * Debian's headless Chromium driven through its own ChromeDriver, with a fresh profile and no
 * background network. When the browser is missing the tests are skipped, except under CI, where a
 * missing browser is a failure (.ci/run installs it).
 */
final class HeadlessChromium implements AutoCloseable {
    static final Path CHROMIUM = Path.of("/usr/bin/chromium");
    static final Path DRIVER = Path.of("/usr/bin/chromedriver");

    private final Path profile;
    private final ChromeDriverService service;
    final ChromeDriver driver;

    private HeadlessChromium(int width, int height) throws IOException {
        profile = Files.createTempDirectory("telltale-chromium");
        service = new ChromeDriverService.Builder().usingDriverExecutable(DRIVER.toFile()).usingAnyFreePort().build();
        ChromeOptions options = new ChromeOptions();
        options.setBinary(CHROMIUM.toFile());
        options.addArguments("--headless", "--no-sandbox", "--disable-gpu", "--no-first-run",
                "--disable-background-networking", "--disable-component-update", "--disable-sync",
                "--disable-quic", "--user-data-dir=" + profile, "--window-size=" + width + "," + height,
                "--hide-scrollbars");
        options.setCapability("goog:loggingPrefs", Map.of(LogType.BROWSER, "ALL"));
        driver = new ChromeDriver(service, options);
        driver.manage().timeouts().pageLoadTimeout(Duration.ofSeconds(60));
        driver.manage().timeouts().scriptTimeout(Duration.ofSeconds(30));
    }

    /** Starts the browser, or skips the calling test (fails it under CI) when it is not installed. */
    static HeadlessChromium start(int width, int height) throws IOException {
        boolean present = Files.isExecutable(CHROMIUM) && Files.isExecutable(DRIVER);
        if (!present && System.getenv("CI") != null) {
            fail("CI is set but " + CHROMIUM + " or " + DRIVER + " is missing; .ci/run installs chromium and chromium-driver");
        }
        assumeTrue(present, "browser tests skipped: " + CHROMIUM + " and " + DRIVER
                + " are needed (apt-get install chromium chromium-driver)");
        return new HeadlessChromium(width, height);
    }

    void open(Path file) {
        driver.get(file.toUri().toString());
    }

    /** Console messages at SEVERE since the last call: script errors, refused resources, CSP violations. */
    List<String> consoleErrors() {
        return driver.manage().logs().get(LogType.BROWSER).getAll().stream()
                .filter(e -> e.getLevel().intValue() >= Level.SEVERE.intValue())
                .map(LogEntry::getMessage)
                .toList();
    }

    /** Saves a PNG of the viewport under {@code target/report-screens/}. */
    Path screenshot(String name) throws IOException {
        Path dir = Path.of("target", "report-screens");
        Files.createDirectories(dir);
        Path png = dir.resolve(name + ".png");
        Files.copy(driver.getScreenshotAs(OutputType.FILE).toPath(), png, StandardCopyOption.REPLACE_EXISTING);
        return png;
    }

    /**
     * The element once it is in the page: views open on a hashchange event, which the browser
     * may deliver after the click returns. Waits at most 10 s.
     */
    org.openqa.selenium.WebElement await(org.openqa.selenium.By locator) {
        return new org.openqa.selenium.support.ui.WebDriverWait(driver, Duration.ofSeconds(10))
                .until(org.openqa.selenium.support.ui.ExpectedConditions.presenceOfElementLocated(locator));
    }

    Object js(String script, Object... args) {
        return driver.executeScript(script, args);
    }

    @Override
    public void close() throws IOException {
        try {
            driver.quit();
        } finally {
            service.stop();
            try (var walk = Files.walk(profile)) {
                walk.sorted(java.util.Comparator.reverseOrder()).forEach(p -> p.toFile().delete());
            }
        }
    }
}
