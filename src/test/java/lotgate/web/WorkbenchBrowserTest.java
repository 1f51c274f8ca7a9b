package lotgate.web;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.openqa.selenium.By;
import org.openqa.selenium.Keys;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.interactions.Actions;

/** The workbench in a real browser: what a person at the screen sees and does. */
class WorkbenchBrowserTest {
    static final Path SHOTS = Path.of("target", "workbench-screenshots");

    @TempDir
    Path folder;

    /** A tile's text, read in one step in the page so that a redraw between finding and reading cannot intervene. */
    static String tile(Browser browser, String key) {
        Object text = browser.driver.executeScript("var e = document.querySelector(arguments[0]);"
                + " return e == null ? '' : e.innerText.trim();", "#tiles [data-key=\"" + key + "\"] .v");
        return String.valueOf(text);
    }

    @Test
    void designAPlanChangeTheAqlAndSaveIt() throws Exception {
        try (Served served = Served.start(folder); Browser browser = Browser.open(1280, 800)) {
            browser.driver.get(served.uri("/").toString());
            // The page designs the plan for its first values: AQL 1%, LTPD 5%, alpha 5%, beta 10%.
            browser.waiting().until(d -> !d.findElements(By.cssSelector("#tiles [data-key='n']")).isEmpty());
            // n = 132, c = 3 for AQL 1%, LTPD 5% (the README's worked example, checked against SciPy 1.10.1 in
            // SinglePlanDesignerTest).
            assertEquals("132", tile(browser, "n"));
            assertEquals("3", tile(browser, "c"));
            assertTrue(browser.driver.findElement(By.id("answer")).getText().contains("Inspect n = 132 units"));
            browser.waiting().until(d -> !d.findElements(By.cssSelector("#curve svg[data-chart='oc'] path")).isEmpty());

            // Hovering over the OC curve reads P(accept) at that quality.
            WebElement chart = browser.driver.findElement(By.cssSelector("#curve svg"));
            new Actions(browser.driver).moveToElement(chart, -100, 0).perform();
            browser.waiting().until(d -> d.findElement(By.cssSelector("#curve .readout")).getText().contains("P(accept)"));

            WebElement aql = browser.driver.findElement(By.id("f-aql"));
            aql.sendKeys(Keys.chord(Keys.CONTROL, "a"), "0.5%");
            // AQL 0.5%, LTPD 5%: n = 105, c = 2 (SciPy 1.10.1, brute force over every n and c of binom.sf and
            // binom.cdf: the smallest n with a c that meets both risks).
            browser.waiting().until(d -> tile(browser, "n").equals("105"));
            assertEquals("2", tile(browser, "c"));

            aql.sendKeys(Keys.chord(Keys.CONTROL, "a"), "1");
            browser.waiting().until(d -> !d.findElement(By.cssSelector("[data-error-for='aql']")).getText().isEmpty());
            assertEquals("Invalid value for option '--aql': '1' is not a fraction below 1; did you mean 1%?",
                    browser.driver.findElement(By.cssSelector("[data-error-for='aql']")).getText());
            aql.sendKeys(Keys.chord(Keys.CONTROL, "a"), "0.5%");
            browser.waiting().until(d -> d.findElement(By.cssSelector("[data-error-for='aql']")).getText().isEmpty());

            browser.driver.findElement(By.id("pin")).click();
            aql.sendKeys(Keys.chord(Keys.CONTROL, "a"), "1%");
            browser.waiting().until(d -> tile(browser, "n").equals("132"));
            browser.waiting().until(d -> d.findElements(By.cssSelector("#curve svg path[data-series]")).size() == 2);

            browser.driver.findElement(By.id("f-name")).sendKeys("m8-bolts");
            browser.driver.findElement(By.id("f-description")).sendKeys("M8 flange bolts (invented)");
            browser.driver.findElement(By.id("save-button")).click();
            browser.waiting().until(d -> d.findElement(By.id("save-status")).getText().startsWith("Saved"));
            assertTrue(Files.exists(served.plans.resolve("m8-bolts.json")));
            browser.waiting().until(d -> !d.findElements(By.cssSelector("[data-open='m8-bolts']")).isEmpty());
            new Actions(browser.driver).moveToElement(browser.driver.findElement(By.cssSelector("#curve svg")), -150, 0)
                    .perform();
            browser.waiting().until(d -> d.findElement(By.cssSelector("#curve .readout")).getText().contains("P(accept)"));
            browser.screenshot(SHOTS.resolve("design.png"));
            // A tablet held upright: one column, nothing cut at the edge.
            browser.driver.manage().window().setSize(new org.openqa.selenium.Dimension(768, 1024));
            browser.screenshot(SHOTS.resolve("design-tablet.png"));
            Object wide = browser.driver.executeScript("return document.documentElement.scrollWidth;");
            assertTrue(((Number) wide).intValue() <= 768, "page wider than the tablet: " + wide);
            browser.driver.manage().window().setSize(new org.openqa.selenium.Dimension(1280, 800));

            browser.driver.findElement(By.cssSelector("[data-open='m8-bolts']")).click();
            browser.waiting().until(d -> d.findElement(By.id("design-status")).getText().startsWith("Opened"));
            assertTrue(browser.driver.findElement(By.id("answer")).getText().contains("fingerprint"));
        }
    }

    @Test
    void sentenceADemoLotByUploadingItsSheet() throws Exception {
        try (Served served = Served.start(folder); Browser browser = Browser.open(1280, 800)) {
            assertEquals(200, served.post("/api/plans", "scheme=single&aql=1%25&ltpd=5%25&alpha=5%25&beta=10%25"
                    + "&model=binomial&name=arnwick-m8&description=M8+flange+bolts+(invented)").statusCode());
            browser.driver.get(served.uri("/sentence").toString());
            browser.waiting().until(d -> !d.findElements(By.cssSelector("#f-plan option[value='arnwick-m8']")).isEmpty());
            Path sheet = Path.of("demo-data", "arnwick-af2611.xlsx").toAbsolutePath();
            browser.driver.findElement(By.id("f-sheet-file")).sendKeys(sheet.toString());
            browser.driver.findElement(By.id("sentence-button")).click();
            browser.waiting().until(d -> !d.findElements(By.id("decision")).isEmpty());
            // The demo's lot AF-2611: 2 nonconforming units in 132, within c = 3 (DemoDataTest checks the same).
            assertEquals("Lot AF-2611: ACCEPT", browser.driver.findElement(By.id("decision")).getText());
            String verdict = browser.driver.findElement(By.id("verdict")).getText();
            assertTrue(verdict.contains("sequence number\n1"), verdict);
            assertTrue(verdict.contains("chain hash"), verdict);
            assertTrue(browser.driver.findElement(By.id("evidence")).getText()
                    .contains("2 nonconforming units found in 132 units"));
            assertEquals(2, browser.driver.findElements(By.cssSelector("#reports a")).size());

            browser.driver.findElement(By.id("unit-good")).click();
            browser.waiting().until(d -> !d.findElements(By.id("bench-decision")).isEmpty());
            assertEquals("Go on", browser.driver.findElement(By.id("bench-decision")).getText());
            browser.driver.findElement(By.id("unit-bad")).click();
            browser.waiting().until(d -> d.findElements(By.cssSelector("#bench-units span")).size() == 2);
            browser.screenshot(SHOTS.resolve("sentence.png"));
            // Printed, the verdict keeps its evidence and loses the controls.
            Files.write(SHOTS.resolve("sentence-print.pdf"), java.util.Base64.getDecoder().decode(
                    browser.driver.print(new org.openqa.selenium.print.PrintOptions()).getContent()));

            // The lot's printable report is written when its link is followed.
            String report = browser.driver.findElements(By.cssSelector("#reports a")).get(1).getAttribute("href");
            browser.driver.get(report);
            browser.waiting().until(d -> d.getPageSource().contains("AF-2611"));
        }
    }

    @Test
    void readASuppliersRecordAndFindItsPChart() throws Exception {
        try (Served served = Served.start(folder); Browser browser = Browser.open(1280, 800)) {
            // The demo's invented year of lots, imported as the demo does.
            assertEquals(0, lotgate.cli.Main.run(new java.io.PrintWriter(java.io.Writer.nullWriter()),
                    new java.io.PrintWriter(java.io.Writer.nullWriter()), "import", "demo-data/lots-2025.csv",
                    "--store", served.store));
            // A lot of a supplier whose name is markup: it must come back as text, never as a script.
            assertEquals(200, served.post("/api/plans", "scheme=single&aql=1%25&ltpd=5%25&name=m8").statusCode());
            String hostile = "<script>alert(1)</script>";
            var recorded = served.upload("/api/sentence?plan=m8&file=arnwick-af2611.xlsx&record=yes&lot=X-1&part=P-1"
                    + "&supplier=" + java.net.URLEncoder.encode(hostile, java.nio.charset.StandardCharsets.UTF_8),
                    Path.of("demo-data", "arnwick-af2611.xlsx"));
            assertEquals(200, recorded.statusCode(), recorded.body());

            browser.driver.get(served.uri("/suppliers").toString());
            browser.waiting().until(d -> !d.findElements(By.cssSelector("#ranking table")).isEmpty());
            browser.waiting().until(d -> !d.findElements(By.id("store-state")).isEmpty());
            assertTrue(browser.driver.findElement(By.id("store-state")).getText().startsWith("Chain intact"));
            assertEquals(1, browser.driver.findElements(By.linkText(hostile)).size());
            assertEquals(0, browser.driver.findElements(By.cssSelector("#ranking script")).size());
            browser.screenshot(SHOTS.resolve("suppliers.png"));

            browser.driver.findElement(By.linkText("Arnwick Fasteners (invented)")).click();
            browser.waiting().until(d -> !d.findElements(By.cssSelector("#p-chart svg[data-chart='p-chart']")).isEmpty());
            assertEquals("Arnwick Fasteners (invented)", browser.driver.findElement(By.id("supplier-name")).getText());
            assertTrue(browser.driver.findElements(By.cssSelector("#p-chart svg path[data-series='lot']")).size() == 1);
            assertEquals(2, browser.driver.findElements(By.cssSelector("#downloads a")).size());
            browser.screenshot(SHOTS.resolve("supplier.png"));

            browser.driver.get(served.uri("/supplier?name=" + java.net.URLEncoder.encode(hostile,
                    java.nio.charset.StandardCharsets.UTF_8)).toString());
            browser.waiting().until(d -> !d.findElement(By.id("supplier-facts")).getText().isEmpty());
            assertEquals(hostile, browser.driver.findElement(By.id("supplier-name")).getText());
            assertEquals(0, browser.driver.findElements(By.cssSelector("main script")).size());
            assertTrue(browser.driver.getTitle().startsWith(hostile));
        }
    }
}
