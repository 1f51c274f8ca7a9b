package lotgate.web;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Function;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.openqa.selenium.By;
import org.openqa.selenium.support.ui.Select;

/**
 * Bench mode in a real browser for double, multiple and sequential plans: units said one at a time, and after each
 * the page's go on, accept or reject held to the plan's own rule, worked out here from the saved plan's numbers.
 */
class BenchBrowserTest {
    @TempDir
    Path folder;

    /** What the page should say after the units so far: "Go on", "ACCEPT the lot" or "REJECT the lot". */
    private static final String GO_ON = "Go on";
    private static final String ACCEPT = "ACCEPT the lot";
    private static final String REJECT = "REJECT the lot";

    private static void design(Path plan, String... options) {
        List<String> args = new ArrayList<>(List.of("design"));
        args.addAll(List.of(options));
        args.addAll(List.of("--save", plan.toString()));
        assertEquals(0, lotgate.cli.Main.run(new java.io.PrintWriter(java.io.Writer.nullWriter()),
                new java.io.PrintWriter(java.io.Writer.nullWriter()), args.toArray(String[]::new)));
    }

    /**
     * Says the units (true: nonconforming) one at a time and, after each, reads the page's answer, which must be
     * the expected one for the units said so far; stops at the first decision and returns the units said.
     */
    private static int sayUnits(Browser browser, boolean[] units, Function<boolean[], String> expected) {
        browser.driver.findElement(By.id("unit-reset")).click();
        browser.waiting().until(d -> d.findElements(By.cssSelector("#bench-units span")).isEmpty());
        for (int m = 1; m <= units.length; m++) {
            browser.driver.findElement(By.id(units[m - 1] ? "unit-bad" : "unit-good")).click();
            String said = String.valueOf(m);
            browser.waiting().until(d -> said.equals(d.findElement(By.id("bench-state")).getAttribute("data-units")));
            String wanted = expected.apply(java.util.Arrays.copyOf(units, m));
            String headline = browser.driver.findElement(By.id("bench-decision")).getText();
            assertEquals(wanted, headline, "after unit " + m);
            if (!wanted.equals(GO_ON)) {
                String say = browser.driver.findElement(By.id("bench-say")).getText();
                assertTrue(say.startsWith("Unit " + m + ":"), say);
                return m;
            }
        }
        return units.length;
    }

    private static boolean[] units(String pattern) {
        boolean[] units = new boolean[pattern.length()];
        for (int i = 0; i < units.length; i++) {
            units[i] = pattern.charAt(i) == 'x';
        }
        return units;
    }

    /**
     * The rule of a plan in stages, double or multiple (common practice for double and multiple sampling): each
     * stage is {n, c, r} on the count over all units so far (c = -1 where the stage cannot accept). At a stage's
     * end, accept at c or fewer found, reject at r or more, else take the next stage. A count that reaches the
     * stage's rejection number before the stage ends rejects at once (it can only grow).
     */
    private static String stagesRule(boolean[] units, int[]... stages) {
        int m = units.length;
        int found = 0;
        for (boolean unit : units) {
            found += unit ? 1 : 0;
        }
        int end = 0;
        for (int[] stage : stages) {
            end += stage[0];
            if (m <= end) {
                if (found >= stage[2]) {
                    return REJECT;
                }
                return m == end && found <= stage[1] ? ACCEPT : GO_ON;
            }
        }
        throw new AssertionError("more units than the plan inspects");
    }

    @Test
    void aDoublePlanAtTheBenchSaysGoOnAcceptOrRejectAfterEachUnit() throws Exception {
        try (Served served = Served.start(folder); Browser browser = Browser.open(1280, 800)) {
            // n1 = 5, c1 = 0, r1 = 2; n2 = 5, c2 = 1 (given stages, so the rule below holds them as they are).
            design(served.plans.resolve("clip-double.json"), "--scheme", "double", "--stage", "5:0:2", "--stage", "5:1:2",
                    "--aql", "1%", "--ltpd", "20%", "--description", "Snap clips (invented)");
            browser.driver.get(served.uri("/sentence").toString());
            browser.waiting().until(d -> !d.findElements(By.cssSelector("#f-plan option[value='clip-double']")).isEmpty());
            new Select(browser.driver.findElement(By.id("f-plan"))).selectByValue("clip-double");
            Function<boolean[], String> rule = u -> stagesRule(u, new int[] {5, 0, 2}, new int[] {5, 1, 2});

            // One found in the first sample: the second is needed, and a clean one accepts after 10 units.
            assertEquals(10, sayUnits(browser, units("-x---" + "-----"), rule));
            assertEquals(ACCEPT, browser.driver.findElement(By.id("bench-decision")).getText());
            // A clean first sample accepts after 5.
            assertEquals(5, sayUnits(browser, units("-----" + "-----"), rule));
            // Two found in the first three units: rejected at once, at unit 3.
            assertEquals(3, sayUnits(browser, units("x-x--"), rule));
            assertEquals(REJECT, browser.driver.findElement(By.id("bench-decision")).getText());
            // One in each sample: rejected at the second one found, unit 7.
            assertEquals(7, sayUnits(browser, units("x----" + "-x---"), rule));
            browser.screenshot(WorkbenchBrowserTest.SHOTS.resolve("bench-double.png"));
        }
    }

    @Test
    void aMultiplePlanAtTheBenchSaysGoOnAcceptOrRejectAfterEachUnit() throws Exception {
        try (Served served = Served.start(folder); Browser browser = Browser.open(1280, 800)) {
            // Three stages of 3: the first cannot accept, r = 2 throughout; c = 0, then 1.
            design(served.plans.resolve("clip-multiple.json"), "--scheme", "multiple", "--stage", "3:-:2", "--stage",
                    "3:0:2", "--stage", "3:1:2", "--aql", "1%", "--ltpd", "20%");
            browser.driver.get(served.uri("/sentence").toString());
            browser.waiting().until(d -> !d.findElements(By.cssSelector("#f-plan option[value='clip-multiple']"))
                    .isEmpty());
            new Select(browser.driver.findElement(By.id("f-plan"))).selectByValue("clip-multiple");
            Function<boolean[], String> rule = u -> stagesRule(u, new int[] {3, -1, 2}, new int[] {3, 0, 2},
                    new int[] {3, 1, 2});

            // A clean first stage cannot accept, and the page says so; a clean second accepts after 6.
            browser.driver.findElement(By.id("unit-good")).click();
            browser.waiting().until(d -> "1".equals(d.findElement(By.id("bench-state")).getAttribute("data-units")));
            assertEquals("Unit 1: 0 found; inspect on: this sample ends at unit 3 (it cannot accept; reject at 2)",
                    browser.driver.findElement(By.id("bench-say")).getText());
            assertEquals(6, sayUnits(browser, units("---" + "---" + "---"), rule));
            assertEquals(ACCEPT, browser.driver.findElement(By.id("bench-decision")).getText());
            // One found in the first stage: the third stage decides, after 9.
            assertEquals(9, sayUnits(browser, units("-x-" + "---" + "---"), rule));
            assertEquals(ACCEPT, browser.driver.findElement(By.id("bench-decision")).getText());
            // A second found in the third stage rejects there.
            assertEquals(8, sayUnits(browser, units("-x-" + "---" + "-x-"), rule));
            assertEquals(REJECT, browser.driver.findElement(By.id("bench-decision")).getText());
        }
    }

    @Test
    void aSequentialPlanAtTheBenchSaysGoOnAcceptOrRejectAfterEachUnit() throws Exception {
        try (Served served = Served.start(folder); Browser browser = Browser.open(1280, 800)) {
            Path planFile = served.plans.resolve("clip-sequential.json");
            design(planFile, "--scheme", "sequential", "--aql", "1%", "--ltpd", "20%", "--truncate-at", "30",
                    "--description", "Snap clips (invented)");
            JsonNode plan = new ObjectMapper().readTree(Files.readString(planFile)).get("classes").get(0).get("plan");
            double h1 = plan.get("h1").asDouble();
            double h2 = plan.get("h2").asDouble();
            double s = plan.get("s").asDouble();
            // Wald's sequential test as lines (from memory): after m units with d found, accept when
            // d <= -h1 + s m, reject when d >= h2 + s m, otherwise inspect the next unit.
            Function<boolean[], String> rule = u -> {
                int m = u.length;
                int d = 0;
                for (boolean unit : u) {
                    d += unit ? 1 : 0;
                }
                return d <= -h1 + s * m ? ACCEPT : d >= h2 + s * m ? REJECT : GO_ON;
            };
            browser.driver.get(served.uri("/sentence").toString());
            browser.waiting().until(d -> !d.findElements(By.cssSelector("#f-plan option[value='clip-sequential']"))
                    .isEmpty());
            new Select(browser.driver.findElement(By.id("f-plan"))).selectByValue("clip-sequential");

            int clean = sayUnits(browser, units("-".repeat(29)), rule);
            assertEquals(ACCEPT, browser.driver.findElement(By.id("bench-decision")).getText());
            int afterOne = sayUnits(browser, units("-x" + "-".repeat(27)), rule);
            assertEquals(ACCEPT, browser.driver.findElement(By.id("bench-decision")).getText());
            assertTrue(afterOne > clean, afterOne + " units after one found, " + clean + " clean");
            int rejected = sayUnits(browser, units("-x-x" + "-".repeat(25)), rule);
            assertEquals(REJECT, browser.driver.findElement(By.id("bench-decision")).getText());
            assertEquals(4, rejected);
            browser.screenshot(WorkbenchBrowserTest.SHOTS.resolve("bench-sequential.png"));
        }
    }
}
