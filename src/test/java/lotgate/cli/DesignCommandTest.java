package lotgate.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** The design command's JSON contract, value parsing and error paths. */
class DesignCommandTest {
    private static final ObjectMapper JSON = new ObjectMapper();

    private static JsonNode json(Cli.Result result) throws Exception {
        assertEquals("", result.err());
        return JSON.readTree(result.out());
    }

    @Test
    void jsonCarriesThePlanAndTheAchievedRisksAsFractions() throws Exception {
        Cli.Result result = Cli.run("design", "--aql", "1%", "--ltpd", "5%", "--format", "json");
        assertEquals(0, result.exitCode());
        JsonNode plan = json(result);
        // n = 132, c = 3 and both risks: SciPy 1.10.1 brute force (see SinglePlanDesignerTest).
        assertEquals("binomial", plan.get("model").asText());
        assertEquals(132, plan.get("n").asInt());
        assertEquals(3, plan.get("c").asInt());
        assertEquals(4, plan.get("rejectionNumber").asInt());
        assertEquals(0.04425250582596621, plan.get("producerRisk").asDouble(), 1e-12);
        assertEquals(0.0992283044257829, plan.get("consumerRisk").asDouble(), 1e-12);
        assertFalse(plan.has("lotSize"));
    }

    @Test
    void jsonWithALotSizeCarriesTheNonconformingCountsAtBothPoints() throws Exception {
        JsonNode plan = json(Cli.run("design", "--aql", "1%", "--ltpd", "5%", "--model", "hypergeometric",
                "--lot-size", "500", "--format", "json"));
        // n = 123, c = 3: SciPy 1.10.1 brute force with hypergeom (see SinglePlanDesignerTest).
        assertEquals(123, plan.get("n").asInt());
        assertEquals(500, plan.get("lotSize").asInt());
        assertEquals(5, plan.get("defectivesAtAql").asInt());
        assertEquals(25, plan.get("defectivesAtLtpd").asInt());
    }

    @ParameterizedTest
    @CsvSource({"1%, 0.01", "0.5%, 0.005", "0.01, 0.01", "0.065%, 0.00065", " 2.5 %, 0.025"})
    void qualityLevelsAreReadAsPercentOrFraction(String text, double fraction) {
        assertEquals(fraction, Values.fraction(text), 1e-18);
    }

    @Test
    void textShowsTheRuleAndBothRisks() {
        Cli.Result result = Cli.run("design", "--aql", "1%", "--ltpd", "5%");
        assertEquals(0, result.exitCode());
        assertTrue(result.out().contains("Inspect n = 132 units. Accept the lot with up to c = 3 nonconforming units;"
                + " reject it at 4 or more."), result.out());
        assertTrue(result.out().contains("producer's 4.425%"), result.out());
        assertTrue(result.out().contains("consumer's 9.923%"), result.out());
    }

    @Test
    void zeroAcceptanceDesignReportsTheProducersRiskAndTheCaution() throws Exception {
        Cli.Result text = Cli.run("design", "--aql", "1%", "--ltpd", "5%", "--acceptance", "0");
        assertTrue(text.out().contains("NOT MET"), text.out());
        assertTrue(text.out().contains("Caution: a zero-acceptance plan"), text.out());
        JsonNode plan = json(Cli.run("design", "--aql", "1%", "--ltpd", "5%", "-c", "0", "--format", "json"));
        assertEquals(45, plan.get("n").asInt());
        // 1 - 0.99^45 (by hand).
        assertEquals(1 - Math.pow(0.99, 45), plan.get("producerRisk").asDouble(), 1e-14);
        assertFalse(plan.get("risksMet").asBoolean());
    }

    @Test
    void aGivenPlanIsEvaluated() throws Exception {
        JsonNode plan = json(Cli.run("design", "--aql", "1%", "--ltpd", "5%", "-n", "89", "-c", "2", "--format", "json"));
        // P(accept | 1%) = 0.9397 for n = 89, c = 2 (Montgomery, from memory); SciPy 1.10.1 binom.sf(2, 89, 0.01).
        assertEquals(0.06031008168644052, plan.get("producerRisk").asDouble(), 1e-12);
        assertEquals("given", plan.get("method").asText());
    }

    @Test
    void noPlanForASmallLotRecommendsFullInspection() throws Exception {
        Cli.Result result = Cli.run("design", "--aql", "1%", "--ltpd", "5%", "--lot-size", "100", "--format", "json");
        assertEquals(ExitCode.NO_PLAN, result.exitCode());
        JsonNode answer = JSON.readTree(result.out());
        assertFalse(answer.get("planFound").asBoolean());
        assertTrue(answer.get("recommendation").asText().contains("100% inspection"));
        Cli.Result text = Cli.run("design", "--aql", "1%", "--ltpd", "5%", "--lot-size", "100");
        assertEquals(ExitCode.NO_PLAN, text.exitCode());
        assertTrue(text.out().startsWith("No sampling plan meets the request"), text.out());
        assertEquals("", text.err());
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', value = {
            "--aql 1 --ltpd 5%|lotgate: Invalid value for option '--aql': '1' is not a fraction below 1; did you mean"
                    + " 1%? (see 'lotgate design --help')",
            "--aql 1% --ltpd 5% --alpha 150%|lotgate: Invalid value for option '--alpha': '150%' is not a risk; give a"
                    + " value between 0% and 100%, such as 5% (see 'lotgate design --help')",
            "--aql 1% --ltpd 5% --beta 0|lotgate: Invalid value for option '--beta': '0' must be above 0 (see 'lotgate"
                    + " design --help')",
            "--aql 5% --ltpd 1%|lotgate: --aql 5% must be below --ltpd 1% (see 'lotgate design --help')",
            "--aql 1% --ltpd 5% --lot-size -5|lotgate: Invalid value for option '--lot-size': '-5' must be a whole"
                    + " number of 1 or more (see 'lotgate design --help')",
            "--aql 1% --ltpd 5% --model hypergeometric|lotgate: the hypergeometric model needs the lot size: add"
                    + " --lot-size N (see 'lotgate design --help')",
            "--aql 1% --ltpd 5% -n 200 -c 2 --lot-size 100|lotgate: --sample-size 200 exceeds --lot-size 100 (see"
                    + " 'lotgate design --help')",
            "--aql 1% --ltpd 5% -n 20|lotgate: --sample-size needs --acceptance to evaluate a plan (see 'lotgate"
                    + " design --help')",
            "--aql abc --ltpd 5%|lotgate: Invalid value for option '--aql': 'abc' is not a number; write a percent such"
                    + " as 1% or a fraction such as 0.01 (see 'lotgate design --help')",
            "--aql 120% --ltpd 150%|lotgate: option '--aql': a fraction nonconforming must be below 100%, got 120% (use"
                    + " --model poisson for nonconformities per unit) (see 'lotgate design --help')",
            "--aql 40% --ltpd 70% --alpha 50% --beta 50%|lotgate: --alpha plus --beta must be below 100% (see 'lotgate"
                    + " design --help')",
            "--aql 1% --ltpd 5% --save plan.txt|lotgate: --save plan.txt: a plan file name must end in .json (see"
                    + " 'lotgate design --help')",
    })
    void badValuesEndWithOneLineNamingTheOption(String args, String message) {
        Cli.Result result = Cli.run(("design " + args).split(" "));
        assertEquals(ExitCode.USAGE, result.exitCode());
        assertEquals(message + System.lineSeparator(), result.err());
        assertEquals("", result.out());
    }

    @Test
    void anUnknownCommandIsNamed() {
        Cli.Result result = Cli.run("frobnicate");
        assertEquals(ExitCode.USAGE, result.exitCode());
        assertTrue(result.err().startsWith("lotgate: unknown command 'frobnicate'; the commands are design, lookup,"),
                result.err());
    }

    @Test
    void poissonLevelsMayExceedOneHundredPercent() throws Exception {
        JsonNode plan = json(Cli.run("design", "--aql", "50%", "--ltpd", "150%", "--model", "poisson", "--format",
                "json"));
        assertTrue(plan.get("risksMet").asBoolean());
    }

    @Test
    void csvIsOneHeaderAndOneRow() {
        Cli.Result result = Cli.run("design", "--aql", "1%", "--ltpd", "5%", "--format", "csv");
        String[] lines = result.out().split("\n");
        assertEquals(2, lines.length);
        assertTrue(lines[0].startsWith("class,scheme,model,method,n,c,"));
        assertTrue(lines[1].startsWith("any,single,binomial,smallest-sample,132,3,4,"));
    }
}
