package lotgate.web;

import java.io.File;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.Comparator;
import java.util.stream.Stream;
import org.junit.jupiter.api.Assertions;
import org.junit.jupiter.api.Assumptions;
import org.openqa.selenium.Dimension;
import org.openqa.selenium.OutputType;
import org.openqa.selenium.chrome.ChromeDriver;
import org.openqa.selenium.chrome.ChromeDriverService;
import org.openqa.selenium.chrome.ChromeOptions;
import org.openqa.selenium.support.ui.WebDriverWait;

/**
 * Debian's Chromium, headless, driven through Debian's chromium-driver: both named by path so that
 * Selenium never looks for or downloads a browser of its own. Without them the browser tests are
 * skipped with a message, except under CI, where they fail.
 */
final class Browser implements AutoCloseable {
    static final Path CHROMIUM = Path.of("/usr/bin/chromium");
    static final Path DRIVER = Path.of("/usr/bin/chromedriver");

    final ChromeDriver driver;
    private final Path profile;

    private Browser(ChromeDriver driver, Path profile) {
        this.driver = driver;
        this.profile = profile;
    }

    /** Skips the calling test where Chromium is absent locally; fails under CI=true. */
    static void requireChromium() {
        boolean present = Files.isExecutable(CHROMIUM) && Files.isExecutable(DRIVER);
        if (!present) {
            String message = "browser tests need Debian's chromium and chromium-driver (" + CHROMIUM + ", " + DRIVER
                    + "): apt-get install chromium chromium-driver";
            if ("true".equals(System.getenv("CI"))) {
                Assertions.fail(message);
            }
            System.err.println("SKIPPED: " + message);
            Assumptions.abort(message);
        }
    }

    static Browser open(int width, int height) throws IOException {
        requireChromium();
        // Selenium must not ask its manager for a driver or a browser: both are given by path.
        System.setProperty("webdriver.chrome.driver", DRIVER.toString());
        System.setProperty("SE_AVOID_STATS", "true");
        Path profile = Files.createTempDirectory("lotgate-chromium-");
        ChromeOptions options = new ChromeOptions();
        options.setBinary(CHROMIUM.toFile());
        options.addArguments("--headless", "--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run",
                "--disable-background-networking", "--disable-component-update", "--disable-sync",
                "--disable-dev-shm-usage", "--hide-scrollbars", "--force-device-scale-factor=1",
                "--window-size=" + width + "," + height, "--user-data-dir=" + profile);
        ChromeDriverService service = new ChromeDriverService.Builder().usingDriverExecutable(DRIVER.toFile())
                .usingAnyFreePort().withLogOutput(java.io.OutputStream.nullOutputStream()).build();
        ChromeDriver driver = new ChromeDriver(service, options);
        driver.manage().window().setSize(new Dimension(width, height));
        return new Browser(driver, profile);
    }

    WebDriverWait waiting() {
        // A bound for a hung page, not a timer the test races: every wait is on a condition.
        // The page redraws as the user types: an element read during a redraw is stale, so read it again.
        return (WebDriverWait) new WebDriverWait(driver, Duration.ofSeconds(120))
                .ignoring(org.openqa.selenium.StaleElementReferenceException.class);
    }

    /** Saves the whole page as PNG (the window grown to the page's height) and returns the file. */
    Path screenshot(Path file) throws IOException {
        Object height = driver.executeScript("return Math.max(document.body.scrollHeight, document.documentElement.scrollHeight);");
        Dimension size = driver.manage().window().getSize();
        int pageHeight = ((Number) height).intValue();
        if (pageHeight > size.getHeight()) {
            driver.manage().window().setSize(new Dimension(size.getWidth(), Math.min(pageHeight + 20, 4000)));
        }
        driver.executeScript("window.scrollTo(0, 0);");
        File shot = driver.getScreenshotAs(OutputType.FILE);
        Files.createDirectories(file.getParent());
        Files.copy(shot.toPath(), file, java.nio.file.StandardCopyOption.REPLACE_EXISTING);
        driver.manage().window().setSize(size);
        return file;
    }

    @Override
    public void close() throws IOException {
        try {
            driver.quit();
        } finally {
            try (Stream<Path> files = Files.walk(profile)) {
                for (Path path : files.sorted(Comparator.reverseOrder()).toList()) {
                    Files.deleteIfExists(path);
                }
            } catch (IOException e) {
                // A profile file still held by a closing browser: left to the temporary folder's cleaner.
            }
        }
    }
}
