package lotgate.web;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.openqa.selenium.By;
import org.openqa.selenium.Keys;
import org.openqa.selenium.WebElement;

/** The sentencing page in a real browser: the folded fields that say where the sample is, and their errors. */
class SentencingBrowserTest {
    @TempDir
    Path folder;

    private static WebElement field(Browser browser, String name) {
        return browser.driver.findElement(By.cssSelector("#lot [name='" + name + "']"));
    }

    private static void type(Browser browser, String name, String text) {
        field(browser, name).sendKeys(Keys.chord(Keys.CONTROL, "a"), text);
    }

    private static String errorBeside(Browser browser, String name) {
        return browser.driver.findElement(By.cssSelector("#lot [data-error-for='" + name + "']")).getText();
    }

    @Test
    void chooseTheSheetByNameAndItsRowsAndSeeAMissingSheetBesideItsField() throws Exception {
        Path sheet = SentencingFieldsTest.nightShift(folder);
        try (Served served = Served.start(folder); Browser browser = Browser.open(1280, 800)) {
            Files.copy(Path.of("plans", "arnwick-af-m8-40.json"), served.plans.resolve("arnwick.json"));
            browser.driver.get(served.uri("/sentence").toString());
            browser.waiting().until(d -> !d.findElements(By.cssSelector("#f-plan option[value='arnwick']")).isEmpty());
            browser.driver.findElement(By.id("f-sheet-file")).sendKeys(sheet.toString());
            type(browser, "lot", "NS-1");
            field(browser, "record").click();
            WebElement more = browser.driver.findElement(By.id("more-sheet"));
            assertFalse(field(browser, "sheet").isDisplayed(), "the sheet's layout starts folded away");
            more.findElement(By.tagName("summary")).click();
            type(browser, "sheet", "Night");
            type(browser, "rows", "4-135");
            type(browser, "header-row", "3");
            type(browser, "columns", "unit=Serial,result=Outcome");
            type(browser, "result-words", "pass=GO;fail=SCRAP");
            more.findElement(By.tagName("summary")).click();
            assertFalse(field(browser, "sheet").isDisplayed());

            // A tab that is not there: the command's words beside the field, its part of the form opened again.
            browser.driver.findElement(By.id("sentence-button")).click();
            browser.waiting().until(d -> !errorBeside(browser, "sheet").isEmpty());
            assertEquals("night-shift.xlsx: no sheet named 'Night'; the sheets are 'Cover', 'Night shift'",
                    errorBeside(browser, "sheet"));
            assertTrue(field(browser, "sheet").isDisplayed());
            assertTrue(field(browser, "sheet").getAttribute("class").contains("bad"));
            assertTrue(browser.driver.findElement(By.id("verdict")).getText().startsWith("Choose a plan"));

            type(browser, "sheet", "Night shift");
            type(browser, "rows", "4-2");
            browser.driver.findElement(By.id("sentence-button")).click();
            browser.waiting().until(d -> !errorBeside(browser, "rows").isEmpty());
            assertEquals("", errorBeside(browser, "sheet"));
            assertEquals("--rows 4-2: give the first and last sheet row of the sample, as in 2-126 (rows 1 to 1048576,"
                    + " the first no later than the last)", errorBeside(browser, "rows"));

            type(browser, "rows", "4-135");
            browser.driver.findElement(By.id("sentence-button")).click();
            browser.waiting().until(d -> !d.findElements(By.id("decision")).isEmpty());
            assertEquals("", errorBeside(browser, "rows"));
            // Plan arnwick-af-m8-40 (n = 132, c = 3, its plan file) on rows 4-135 of tab 'Night shift': the 2 units
            // the invented workbook scraps there.
            assertEquals("Lot NS-1: ACCEPT", browser.driver.findElement(By.id("decision")).getText());
            assertTrue(browser.driver.findElement(By.id("evidence")).getText()
                    .contains("2 nonconforming units found in 132 units"));
            browser.screenshot(WorkbenchBrowserTest.SHOTS.resolve("sentence-sheet-layout.png"));
        }
    }

    @Test
    void aCsvSheetGetsItsLotDetailsFromAFileSentBesideIt() throws Exception {
        try (Served served = Served.start(folder); Browser browser = Browser.open(1280, 800)) {
            Files.copy(Path.of("plans", "arnwick-af-m8-40.json"), served.plans.resolve("arnwick.json"));
            browser.driver.get(served.uri("/sentence").toString());
            browser.waiting().until(d -> !d.findElements(By.cssSelector("#f-plan option[value='arnwick']")).isEmpty());
            browser.driver.findElement(By.id("f-sheet-file"))
                    .sendKeys(Path.of("demo-data", "arnwick-af2618.csv").toAbsolutePath().toString());
            browser.driver.findElement(By.cssSelector("#more-record summary")).click();
            browser.driver.findElement(By.id("f-lot-file"))
                    .sendKeys(Path.of("demo-data", "arnwick-af2618.lot.csv").toAbsolutePath().toString());
            browser.driver.findElement(By.id("sentence-button")).click();
            browser.waiting().until(d -> !d.findElements(By.id("decision")).isEmpty());
            // The demo's lot AF-2618, named with its supplier by its lot details file (DemoDataTest checks its verdict).
            assertTrue(browser.driver.findElement(By.id("decision")).getText().startsWith("Lot AF-2618: "));
            assertTrue(browser.driver.findElement(By.id("verdict")).getText().contains("Arnwick Fasteners (invented)"));
        }
    }
}
