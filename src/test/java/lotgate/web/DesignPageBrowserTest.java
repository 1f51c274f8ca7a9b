package lotgate.web;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.openqa.selenium.By;
import org.openqa.selenium.Keys;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.interactions.Actions;
import org.openqa.selenium.support.ui.Select;

/** The plan design page's inputs for double, sequential, variables and classed plans, in a real browser. */
class DesignPageBrowserTest {
    @TempDir
    Path folder;

    private static String tile(Browser browser, String key) {
        return WorkbenchBrowserTest.tile(browser, key);
    }

    private static String errorBeside(Browser browser, String field) {
        Object text = browser.driver.executeScript("var shown = Array.prototype.filter.call("
                + "document.querySelectorAll(arguments[0]), function (e) { return !e.closest('.hidden'); });"
                + " return shown.length ? shown[0].innerText.trim() : '';", "[data-error-for='" + field + "']");
        return String.valueOf(text);
    }

    private static void type(WebElement field, String text) {
        field.sendKeys(Keys.chord(Keys.CONTROL, "a"), text);
    }

    private static Browser designPage(Served served) throws Exception {
        Browser browser = Browser.open(1280, 800);
        browser.driver.get(served.uri("/").toString());
        browser.waiting().until(d -> !d.findElements(By.cssSelector("#tiles [data-key='n']")).isEmpty());
        return browser;
    }

    /** What the design command prints on stderr for these options: its one line without the help hint. */
    private static String commandSays(String... options) {
        StringWriter err = new StringWriter();
        String[] args = new String[options.length + 1];
        args[0] = "design";
        System.arraycopy(options, 0, args, 1, options.length);
        lotgate.cli.Main.run(new PrintWriter(java.io.Writer.nullWriter()), new PrintWriter(err, true), args);
        return err.toString().strip().replaceFirst("^lotgate: ", "").replaceFirst(" \\(see 'lotgate design --help'\\)$", "");
    }

    @Test
    void aLargerSecondSampleChangesTheDoublePlan() throws Exception {
        try (Served served = Served.start(folder); Browser browser = designPage(served)) {
            new Select(browser.driver.findElement(By.id("f-scheme"))).selectByValue("double");
            // AQL 1%, LTPD 5%, alpha 5%, beta 10%, n2 = n1, r1 = c2 + 1: the smallest ASN at the AQL is
            // n1 = n2 = 69, c1 = 0, r1 = 4, c2 = 3; with n2 = 2 n1 it is n1 = 79, c1 = 1, r1 = 6, n2 = 158, c2 = 5
            // (SciPy 1.10.1, binom.cdf and binom.pmf, brute force over every n1 < 400, c2 < 20 and c1 < c2).
            browser.waiting().until(d -> tile(browser, "n2").equals("69"));
            assertEquals("69", tile(browser, "n1"));
            assertEquals("3", tile(browser, "c2"));
            WebElement ratio = browser.driver.findElement(By.id("f-second-ratio"));
            assertTrue(ratio.isDisplayed());
            type(ratio, "2");
            browser.waiting().until(d -> tile(browser, "n2").equals("158"));
            assertEquals("79", tile(browser, "n1"));
            assertEquals("1", tile(browser, "c1"));
            assertEquals("6", tile(browser, "r1"));
            assertEquals("5", tile(browser, "c2"));
            assertTrue(browser.driver.findElement(By.id("answer")).getText().contains("n2 = 2 x n1"));
            browser.screenshot(WorkbenchBrowserTest.SHOTS.resolve("design-double.png"));
        }
    }

    @Test
    void aSequentialPlanIsTruncatedWhereTheUserSays() throws Exception {
        try (Served served = Served.start(folder); Browser browser = designPage(served)) {
            new Select(browser.driver.findElement(By.id("f-scheme"))).selectByValue("sequential");
            // The default truncation is 3 times the single plan's n = 132 (the design command's help).
            browser.waiting().until(d -> tile(browser, "most units").equals("396"));
            type(browser.driver.findElement(By.id("f-truncate-at")), "300");
            browser.waiting().until(d -> tile(browser, "most units").equals("300"));
            // The truncated plan's exact risks for its lines (h1, h2 and s as the JSON output gives them): a walk
            // over every unit and count in exact rationals (Python 3.11 fractions) gives P(reject | 1%) =
            // 0.029920359 and P(accept | 5%) = 0.097605469.
            assertEquals("2.992%", tile(browser, "producer's risk"));
            assertEquals("9.761%", tile(browser, "consumer's risk"));
            assertTrue(browser.driver.findElement(By.id("answer")).getText().contains("truncated at 300 units"));
            // Keeping Wald's lines as asked is folded away until wanted.
            WebElement plainWald = browser.driver.findElement(By.id("f-plain-wald"));
            assertFalse(plainWald.isDisplayed());
            browser.driver.findElement(By.cssSelector("[data-for-scheme='sequential'] details summary")).click();
            assertTrue(plainWald.isDisplayed());
        }
    }

    @Test
    void aPlanPerDefectClassDrawsOneCurvePerClass() throws Exception {
        try (Served served = Served.start(folder); Browser browser = designPage(served)) {
            type(browser.driver.findElement(By.id("f-classes")), "critical:c=0,aql=0.1%,ltpd=2%");
            browser.driver.findElement(By.id("f-classes")).sendKeys(Keys.ENTER, "major:aql=1%,ltpd=5%", Keys.ENTER,
                    "minor:aql=2.5%,ltpd=10%");
            // critical: n = 114, c = 0 (0.98^114 = 0.09995 is the first power of 0.98 at most 10%); major: n = 132,
            // c = 3 (the README's worked example); minor: n = 78, c = 4 (SciPy 1.10.1, binom.sf and binom.cdf: the
            // smallest n with a c that meets both risks at 2.5% and 10%).
            browser.waiting().until(d -> tile(browser, "minor").equals("n 78, c 4"));
            assertEquals("n 114, c 0", tile(browser, "critical"));
            assertEquals("n 132, c 3", tile(browser, "major"));
            assertEquals("132", tile(browser, "n"));
            browser.waiting().until(d -> d.findElements(By.cssSelector("#curve svg path[data-series]")).size() == 3);
            List<String> legend = browser.driver.findElements(By.cssSelector("#curve .legend span:not(.note)")).stream()
                    .map(WebElement::getText).toList();
            assertEquals(List.of("critical: n = 114, c = 0", "major: n = 132, c = 3", "minor: n = 78, c = 4"), legend);
            // Each line has its own dash pattern, so that the classes stay apart in greyscale.
            List<String> dashes = browser.driver.findElements(By.cssSelector("#curve svg path[data-series]")).stream()
                    .map(p -> String.valueOf(p.getAttribute("stroke-dasharray"))).distinct().toList();
            assertEquals(3, dashes.size());
            // Each class's AQL and LTPD are marked on its own curve.
            assertEquals(6, browser.driver.findElements(By.cssSelector("#curve svg [data-point]")).size());
            assertEquals("large hollow marks: each class's AQL and LTPD",
                    browser.driver.findElement(By.cssSelector("#curve .legend .note")).getText());

            new Actions(browser.driver).moveToElement(browser.driver.findElement(By.cssSelector("#curve svg")), -150, 0)
                    .perform();
            browser.waiting().until(d -> d.findElement(By.cssSelector("#curve .readout")).getText().contains("P(accept)"));
            String readout = browser.driver.findElement(By.cssSelector("#curve .readout")).getText();
            for (String name : List.of("(critical: n = 114, c = 0)", "(major: n = 132, c = 3)", "(minor: n = 78, c = 4)")) {
                assertTrue(readout.contains(name), readout);
            }
            browser.screenshot(WorkbenchBrowserTest.SHOTS.resolve("design-classes.png"));
        }
    }

    @Test
    void aRefusedValueIsShownBesideItsFieldInTheCommandsWords() throws Exception {
        try (Served served = Served.start(folder); Browser browser = designPage(served)) {
            new Select(browser.driver.findElement(By.id("f-scheme"))).selectByValue("sequential");
            // Each wait is for the command's own line: a reply to a value half typed may come first.
            String truncation = commandSays("--scheme", "sequential", "--aql", "1%", "--ltpd", "5%", "--truncate-at", "0");
            assertEquals("Invalid value for option '--truncate-at': '0' must be a whole number of 1 or more", truncation);
            type(browser.driver.findElement(By.id("f-truncate-at")), "0");
            browser.waiting().until(d -> errorBeside(browser, "truncate-at").equals(truncation));

            new Select(browser.driver.findElement(By.id("f-scheme"))).selectByValue("double");
            String ratio = commandSays("--scheme", "double", "--aql", "1%", "--ltpd", "5%", "--second-ratio", "twice");
            assertEquals("--second-ratio twice: give a number such as 1 or 2, or 'free'", ratio);
            type(browser.driver.findElement(By.id("f-second-ratio")), "twice");
            browser.waiting().until(d -> errorBeside(browser, "second-ratio").equals(ratio));
            type(browser.driver.findElement(By.id("f-second-ratio")), "1");
            browser.waiting().until(d -> tile(browser, "n2").equals("69"));

            // An error about a folded-away input unfolds it.
            browser.driver.findElement(By.cssSelector("[data-for-scheme='double'] details summary")).click();
            type(browser.driver.findElement(By.id("f-double-stages")), "50:1:4 100:3");
            browser.driver.findElement(By.cssSelector("[data-for-scheme='double'] details summary")).click();
            String given = commandSays("--scheme", "double", "--aql", "1%", "--ltpd", "5%", "--stage", "50:1:4", "--stage",
                    "100:3", "--asn-at", "2%");
            type(browser.driver.findElement(By.id("f-asn-at")), "2%");
            browser.waiting().until(d -> errorBeside(browser, "stages").equals(given));
            assertTrue(browser.driver.findElement(By.id("f-double-stages")).isDisplayed());

            new Select(browser.driver.findElement(By.id("f-scheme"))).selectByValue("variables");
            String limits = commandSays("--scheme", "variables", "--aql", "1%", "--ltpd", "5%", "--lower", "9.95",
                    "--upper", "9.9");
            assertEquals("--lower 9.95 must be below --upper 9.9", limits);
            type(browser.driver.findElement(By.id("f-lower")), "9.95");
            type(browser.driver.findElement(By.id("f-upper")), "9.9");
            browser.waiting().until(d -> errorBeside(browser, "lower").equals(limits));
            type(browser.driver.findElement(By.id("f-upper")), "10.05");
            type(browser.driver.findElement(By.id("f-characteristic")), "bore diameter");
            type(browser.driver.findElement(By.id("f-unit")), "mm");
            browser.waiting().until(d -> browser.driver.findElement(By.id("answer")).getText()
                    .contains("bore diameter, limits 9.95 to 10.05 mm"));
            assertEquals("", errorBeside(browser, "lower"));
        }
    }
}
