package lotgate.web;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.openqa.selenium.By;

/** The workbench in a real browser: what a person at the screen sees and does. */
class WorkbenchBrowserTest {
    static final Path SHOTS = Path.of("target", "workbench-screenshots");

    @TempDir
    Path folder;

    @Test
    void theDesignPageOpensWithItsForm() throws Exception {
        try (Served served = Served.start(folder); Browser browser = Browser.open(1280, 800)) {
            browser.driver.get(served.uri("/").toString());
            browser.waiting().until(d -> d.findElement(By.id("f-aql")).isDisplayed());
            assertEquals("1%", browser.driver.findElement(By.id("f-aql")).getAttribute("value"));
            assertTrue(browser.driver.getTitle().startsWith("Plan design"));
            browser.screenshot(SHOTS.resolve("smoke.png"));
        }
    }
}
