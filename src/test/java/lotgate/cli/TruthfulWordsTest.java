package lotgate.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Path;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** What lotgate says around its numbers is true: defaults, diagnoses and labels agree with the values. */
class TruthfulWordsTest {
    private static final ObjectMapper JSON = new ObjectMapper();

    @TempDir
    Path folder;

    // The smallest single plans of the published attribute tables (n = 2, 3, 5, 8, 13 with their usual
    // acceptance numbers, from memory): P(accept) is still above 1% beyond 50% nonconforming.
    @ParameterizedTest
    @CsvSource({"2, 0", "3, 0", "5, 1", "8, 1", "13, 2"})
    void curveOfASmallPlanHasAValidDefaultRangeThatReachesOnePercentAcceptance(int n, int c) throws Exception {
        Cli.Result result = Cli.run("curve", "--sample-size", Integer.toString(n), "--acceptance",
                Integer.toString(c), "--aql", "6.5%", "--format", "json");
        assertEquals(0, result.exitCode(), result.err());
        JsonNode points = JSON.readTree(result.out()).get("points");
        JsonNode last = points.get(points.size() - 1);
        assertTrue(last.get("quality").asDouble() <= 1.0, "at most every unit nonconforming");
        assertTrue(last.get("acceptance").asDouble() <= 0.01, "the default range reaches P(accept) = 1%");
        assertTrue(last.get("quality").asDouble() > 0.5, "these plans still accept 1% of lots past 50%");
    }

    @ParameterizedTest
    @CsvSource({"2, 0", "13, 2"})
    void curveOfASmallSavedPlanAndItsChartUseTheDefaultRange(int n, int c) {
        Path plan = folder.resolve("small.json");
        Cli.Result saved = Cli.run("design", "--aql", "6.5%", "--ltpd", "60%", "--sample-size", Integer.toString(n),
                "--acceptance", Integer.toString(c), "--save", plan.toString());
        assertEquals(0, saved.exitCode(), saved.err());
        Cli.Result curve = Cli.run("curve", plan.toString(), "--curves-chart", folder.resolve("oc.svg").toString());
        assertEquals(0, curve.exitCode(), curve.err());
        assertTrue(curve.out().contains("        100%"), curve.out());
    }

    @ParameterizedTest
    @CsvSource({"101%, 'option ''--up-to'': a fraction nonconforming cannot exceed 100%, got 101%'"})
    void anUpToBeyondEveryUnitIsRefused(String upTo, String message) {
        Cli.Result result = Cli.run("curve", "--sample-size", "2", "--acceptance", "0", "--up-to", upTo);
        assertEquals(ExitCode.USAGE, result.exitCode());
        assertTrue(result.err().contains(message), result.err());
    }

    @ParameterizedTest
    @CsvSource({"80, 2, 0.12"})
    void curveRangeEndsJustPastWhereAcceptanceFallsToOnePercent(int n, int c, double top) throws Exception {
        // P(accept) of n = 80, c = 2 falls to 1% near 10.1% nonconforming (SciPy 1.17.1: brentq on
        // binom.cdf(2, 80, p) = 0.01 gives p = 0.10095); the next round level is 12%, not 20%.
        JsonNode points = JSON.readTree(Cli.run("curve", "-n", Integer.toString(n), "-c", Integer.toString(c),
                "--format", "json").out()).get("points");
        assertEquals(top, points.get(points.size() - 1).get("quality").asDouble(), 1e-12);
    }

    @org.junit.jupiter.api.Test
    void aDoublePlanThatCannotExistIsDiagnosedWithItsBoundNotAsAStoppedSearch() {
        Cli.Result result = Cli.run("design", "--scheme", "double", "--aql", "1%", "--ltpd", "5%",
                "--first-rejection", "3");
        assertEquals(ExitCode.NO_PLAN, result.exitCode());
        // SciPy 1.10.1: binom.sf(2, 83, 0.01) = 0.050947 and binom.sf(2, 82, 0.01) = 0.049461, so with r1 = 3
        // no first sample above 82 keeps the producer's risk within 5%.
        assertTrue(result.out().startsWith("No sampling plan meets the request: no double plan with r1 = 3 and"
                + " n2 = 1 x n1 meets both risks: a first sample larger than 82 alone rejects more than 5% of lots"
                + " at the AQL (P(reject) = 5.095% at n1 = 83), and none with n1 up to 82 meets both risks."),
                result.out());
        assertTrue(!result.out().contains("stopped"), result.out());
    }

    @org.junit.jupiter.api.Test
    void aDoublePlanRuledOutAtTheLtpdNamesTheStrictestPlanAndItsAcceptance() {
        Cli.Result result = Cli.run("design", "--scheme", "double", "--aql", "1%", "--ltpd", "5%",
                "--first-rejection", "2");
        assertEquals(ExitCode.NO_PLAN, result.exitCode());
        // SciPy 1.10.1: binom.sf(1, 36, 0.01) = 0.050346; the plan (35, 0, 2, 35, 1) accepts at p = 5% with
        // binom.pmf(0, 35, 0.05) + binom.pmf(1, 35, 0.05) * binom.pmf(0, 35, 0.05) = 0.216895.
        assertTrue(result.out().contains("a first sample larger than 35 alone rejects more than 5% of lots at the"
                + " AQL (P(reject) = 5.035% at n1 = 36), and every plan with n1 up to 35 accepts more than 10% of"
                + " lots at the LTPD (the strictest, n1 = 35, c1 = 0, r1 = 2, n2 = 35, c2 = 1, accepts 21.69%)"),
                result.out());
    }

    @org.junit.jupiter.api.Test
    void aSequentialTruncationTooEarlyForTheRequestIsRefusedUpFrontWithTheSmallestThatWorks() throws Exception {
        Cli.Result result = Cli.run("design", "--scheme", "sequential", "--aql", "1%", "--ltpd", "4%", "--model",
                "poisson", "--truncate-at", "200", "--alpha", "2.5%");
        assertEquals(ExitCode.NO_PLAN, result.exitCode());
        // SciPy 1.10.1, Neyman-Pearson on a Poisson count with means 2 (AQL) and 8 (LTPD) over 200 units: reject
        // above 5, and at 5 with chance (0.025 - poisson.sf(5, 2)) / poisson.pmf(5, 2) = 0.23376; the consumer's
        // risk is then poisson.cdf(5, 8) - 0.23376 * poisson.pmf(5, 8) = 0.169822.
        assertTrue(result.out().startsWith("No sampling plan meets the request: no sequential plan truncated at 200"
                + " units can meet producer's risk 2.5% and consumer's risk 10%: even the best test of any kind on 200"
                + " units (Neyman-Pearson on the count) has a consumer's risk of 16.98% when its producer's risk is"
                + " 2.5%; the smallest truncation at which lotgate's redrawn lines meet both is 278 units"
                + " (--truncate-at 278)."), result.out());
        assertTrue(!result.out().contains("exactly"), "no claim that the numbers contradict");
        JsonNode at = JSON.readTree(Cli.run("design", "--scheme", "sequential", "--aql", "1%", "--ltpd", "4%",
                "--model", "poisson", "--truncate-at", "278", "--alpha", "2.5%", "--format", "json").out());
        assertTrue(at.get("producerRisk").asDouble() <= 0.025 && at.get("consumerRisk").asDouble() <= 0.10,
                at.toString());
        assertEquals(ExitCode.NO_PLAN, Cli.run("design", "--scheme", "sequential", "--aql", "1%", "--ltpd", "4%",
                "--model", "poisson", "--truncate-at", "277", "--alpha", "2.5%").exitCode());
    }
}
