package lotgate.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import lotgate.demo.DemoData;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Variables plans from the command line: design, plan files, sentencing from measurements and the supplier's
 * mean and s charts. Reference values: SciPy 1.10.1 (Debian's python3-scipy 1.10.1-2), from
 * src/test/python/variables_reference.py; measurements are invented.
 */
class VariablesCommandsTest {
    private static final ObjectMapper JSON = new ObjectMapper();

    @TempDir
    Path folder;

    private static JsonNode json(Cli.Result result) throws IOException {
        assertEquals(0, result.exitCode(), result.err());
        return JSON.readTree(result.out());
    }

    private Path plan(String... extra) {
        Path file = folder.resolve("bore.json");
        List<String> args = new ArrayList<>(List.of("design", "--scheme", "variables", "--aql", "1%", "--ltpd", "6%",
                "--unit", "mm", "--characteristic", "bore diameter", "--save", file.toString(), "--replace"));
        args.addAll(List.of(extra));
        Cli.Result result = Cli.run(args.toArray(String[]::new));
        assertEquals(0, result.exitCode(), result.err());
        return file;
    }

    private Path sheet(String name, double... values) throws IOException {
        List<List<Object>> rows = new ArrayList<>();
        rows.add(DemoData.row("unit", "value"));
        for (int i = 0; i < values.length; i++) {
            rows.add(DemoData.row("B-" + (i + 1), values[i]));
        }
        Path file = folder.resolve(name);
        DemoData.csv(file, ',', false, rows);
        return file;
    }

    /** n values spread like a normal sample around a centre (invented): normal scores times a spread. */
    private static double[] normalSample(int n, double centre, double spread) {
        double[] values = new double[n];
        org.apache.commons.math3.distribution.NormalDistribution normal =
                new org.apache.commons.math3.distribution.NormalDistribution(null, 0, 1);
        for (int i = 0; i < n; i++) {
            // Interleaved normal scores, so that the order of inspection has no trend.
            int rank = i % 2 == 0 ? i / 2 : n - 1 - i / 2;
            values[i] = centre + spread * normal.inverseCumulativeProbability((rank + 0.5) / n);
        }
        return values;
    }

    @Test
    void unknownSigmaDesignGivesTheExactPlanAndWallisBesideIt() throws Exception {
        JsonNode design = json(Cli.run("design", "--scheme", "variables", "--aql", "1%", "--ltpd", "6%", "--upper",
                "10.05", "--format", "json"));
        assertEquals(42, design.get("n").asInt());
        assertFalse(design.get("sigmaKnown").asBoolean());
        // SciPy 1.10.1: the k range at n = 42 and the producer's and consumer's risks at its middle.
        assertEquals((1.8975622710155622 + 1.905285051640105) / 2, design.get("k").asDouble(), 1e-9);
        assertEquals(0.048324570812693805, design.get("producerRisk").asDouble(), 1e-10);
        assertEquals(0.097661975454225031, design.get("consumerRisk").asDouble(), 1e-10);
        assertEquals(41, design.get("wallis").get("nRounded").asInt());
        assertEquals(15, design.get("knownSigma").get("n").asInt());
        assertEquals(110, design.get("attribute").get("n").asInt());
        assertEquals(68, design.get("attribute").get("unitsSaved").asInt());
    }

    @Test
    void knownSigmaDesignIsTheClosedForm() throws Exception {
        JsonNode design = json(Cli.run("design", "--scheme", "variables", "--aql", "1%", "--ltpd", "6%", "--lower",
                "9.95", "--sigma", "0.012", "--format", "json"));
        assertEquals(15, design.get("n").asInt());
        assertEquals(1.89, design.get("k").asDouble(), 0.005);
        assertEquals(14.385118161012466, design.get("knownSigma").get("exactN").asDouble(), 1e-9);
        assertTrue(design.get("sigmaKnown").asBoolean());
    }

    @Test
    void separateLimitsMayHaveTheirOwnAqlsAndShareTheLargerSample() throws Exception {
        JsonNode design = json(Cli.run("design", "--scheme", "variables", "--aql", "1%", "--ltpd", "6%", "--lower",
                "9.9", "--upper", "10.1", "--limits", "separate", "--lower-aql", "0.25%", "--lower-ltpd", "2%",
                "--format", "json"));
        // SciPy 1.10.1: the lower limit alone (0.25%/5% against 2%/10%) needs n = 60 with k from 2.38852 to 2.39346;
        // the upper limit alone needs 42, so both share 60.
        assertEquals(60, design.get("n").asInt());
        JsonNode lower = design.get("lowerLimit");
        assertEquals(2.3885230939880588, lower.get("kLowest").asDouble(), 1e-9);
        assertEquals(2.3934601510985858, lower.get("kHighest").asDouble(), 1e-9);
        assertTrue(lower.get("risksMet").asBoolean());
        assertTrue(design.get("risksMet").asBoolean());
        assertEquals(0.0025, design.get("measurement").get("lowerDesign").get("aql").asDouble());
        // A lot whose mean sits nearer the lower limit passes the upper k but not the stricter lower one.
        Path file = plan("--lower", "9.9", "--upper", "10.1", "--limits", "separate", "--lower-aql", "0.25%",
                "--lower-ltpd", "2%");
        Cli.Result result = Cli.run("sentence", "--no-record", file.toString(),
                sheet("low.csv", normalSample(60, 9.97, 0.03)).toString(), "--lot", "L1");
        assertEquals(ExitCode.REJECTED, result.exitCode(), result.out() + result.err());
        assertTrue(result.out().contains(": below its k at a limit"), result.out());
    }

    @Test
    void aGivenVariablesPlanIsEvaluated() throws Exception {
        JsonNode given = json(Cli.run("design", "--scheme", "variables", "--aql", "1%", "--ltpd", "6%", "--upper",
                "10.05", "--sample-size", "42", "--k", "1.9014236613278582", "--format", "json"));
        assertEquals("given", given.get("method").asText());
        // The designed plan's own risks (SciPy 1.10.1, above), reached from n and k alone.
        assertEquals(0.048324570812693805, given.get("producerRisk").asDouble(), 1e-9);
        assertEquals(0.097661975454225031, given.get("consumerRisk").asDouble(), 1e-9);
        assertFalse(given.has("kLowest"));
        assertEquals(15, given.get("knownSigma").get("n").asInt());
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', value = {
            "--scheme variables --aql 1% --ltpd 6% | --scheme variables needs a specification limit: give --lower,"
                    + " --upper or both",
            "--scheme variables --aql 1% --ltpd 6% --lower 2 --upper 1 | --lower 2.0 must be below --upper 1.0",
            "--scheme variables --aql 1% --ltpd 6% --upper 1 --sigma -3 | --sigma -3.0: the known process standard"
                    + " deviation must be above 0",
            "--scheme variables --aql 1% --ltpd 6% --upper 1 --limits combined | --limits is for plans with both"
                    + " --lower and --upper",
            "--scheme variables --aql 1% --ltpd 6% --lower 0 --upper 1 --limits both | --limits both: give combined"
                    + " or separate",
            "--scheme variables --aql 1% --ltpd 6% --upper 1 --model poisson | --model poisson: a variables plan"
                    + " judges the fraction of a steady process beyond its limits (type B); leave out --model",
            "--aql 1% --ltpd 6% --upper 1 | --sigma, --lower, --upper, --limits, --unit, --characteristic, --lower-aql,"
                    + " --lower-ltpd and --k are for --scheme variables",
            "--scheme variables --aql 1% --ltpd 6% --lower 0 --upper 1 --lower-aql 0.5% | --lower-aql and --lower-ltpd"
                    + " give the lower limit a design of its own: add --limits separate (with both --lower and --upper)",
    })
    void badVariablesOptionsAreNamed(String options, String message) {
        List<String> args = new ArrayList<>(List.of("design"));
        args.addAll(List.of(options.trim().split(" ")));
        Cli.Result result = Cli.run(args.toArray(String[]::new));
        assertEquals(ExitCode.USAGE, result.exitCode(), result.out());
        assertEquals("lotgate: " + message.trim() + " (see 'lotgate design --help')", result.err().strip());
    }

    @Test
    void theSavedPlanHoldsWhatItMeasuresAndRefusesAnAlteredLimit() throws Exception {
        Path file = plan("--lower", "41.95", "--upper", "42.05");
        JsonNode saved = JSON.readTree(Files.readString(file));
        assertEquals(3, saved.get("formatVersion").asInt());
        assertEquals("combined", saved.get("measurement").get("limits").asText());
        assertEquals("variables", saved.get("classes").get(0).get("plan").get("scheme").asText());
        Cli.Result shown = Cli.run("show", file.toString());
        assertEquals(0, shown.exitCode(), shown.err());
        Files.writeString(file, Files.readString(file).replace("42.05", "42.08"));
        Cli.Result altered = Cli.run("show", file.toString());
        assertEquals(ExitCode.BAD_INPUT, altered.exitCode());
        assertTrue(altered.err().contains("the fingerprint does not match the content"), altered.err());
    }

    @Test
    void aVariablesPlanFileWithAnAttributeModelIsRefused() throws Exception {
        Path file = plan("--upper", "10.05");
        com.fasterxml.jackson.databind.node.ObjectNode root = (com.fasterxml.jackson.databind.node.ObjectNode)
                JSON.readTree(Files.readString(file));
        root.put("model", "poisson");
        root.remove("fingerprint");
        root.put("fingerprint", "sha256:" + lotgate.files.CanonicalJson.sha256(lotgate.files.CanonicalJson.text(root
                .deepCopy().without("fingerprint"))));
        Files.writeString(file, JSON.writeValueAsString(root));
        Cli.Result result = Cli.run("show", file.toString());
        assertEquals(ExitCode.BAD_INPUT, result.exitCode(), result.err());
        assertEquals("lotgate: " + file + ": field 'model' must be binomial for a variables plan (a steady process),"
                + " got \"poisson\"", result.err().strip());
    }

    @Test
    void aCentredLotIsAcceptedWithItsStatisticsAndAShiftedOneRejected() throws Exception {
        Path file = plan("--upper", "10.05");
        JsonNode accepted = json(Cli.run("sentence", "--no-record", file.toString(),
                sheet("good.csv", normalSample(42, 10.00, 0.01)).toString(), "--lot", "G1", "--format", "json"));
        assertEquals("accept", accepted.get("verdict").asText());
        JsonNode measured = accepted.get("measurement");
        assertEquals(10.00, measured.get("mean").asDouble(), 1e-9);
        // (U - mean)/s = 0.05 / s, with s of the normal scores about 0.01: far above k = 1.90.
        assertTrue(measured.get("statisticUpper").asDouble() > 4);
        assertEquals("measurements", accepted.get("sheet").get("recording").asText());
        Cli.Result rejected = Cli.run("sentence", "--no-record", file.toString(),
                sheet("shifted.csv", normalSample(42, 10.035, 0.01)).toString(), "--lot", "S1", "--format", "json");
        assertEquals(ExitCode.REJECTED, rejected.exitCode(), rejected.err());
        JsonNode decision = JSON.readTree(rejected.out());
        assertTrue(decision.get("measurement").get("statisticUpper").asDouble() < 1.9);
    }

    @Test
    void anIncompleteSampleAndABadValueAreRefusedByTheirPlace() throws Exception {
        Path file = plan("--upper", "10.05");
        Cli.Result few = Cli.run("sentence", "--no-record", file.toString(),
                sheet("few.csv", normalSample(30, 10.0, 0.01)).toString(), "--lot", "F1");
        assertEquals(ExitCode.INCOMPLETE_SAMPLE, few.exitCode());
        assertTrue(few.err().startsWith("lotgate: incomplete sample: 30 of 42 measurements in "), few.err());
        Path bad = folder.resolve("bad.csv");
        Files.writeString(bad, "unit,value\nB-1,10.01\nB-2,ten\n");
        Cli.Result refused = Cli.run("sentence", "--no-record", file.toString(), bad.toString(), "--lot", "F2");
        assertEquals(ExitCode.BAD_INPUT, refused.exitCode());
        assertEquals("lotgate: " + bad + ": row 3, column B: value 'ten' is not a number", refused.err().strip());
        Path none = folder.resolve("none.csv");
        Files.writeString(none, "unit,result\nB-1,pass\n");
        Cli.Result noValue = Cli.run("sentence", "--no-record", file.toString(), none.toString(), "--lot", "F3");
        assertEquals(ExitCode.BAD_INPUT, noValue.exitCode());
        assertEquals("lotgate: " + none + ": no header row: none of rows 1 to 2 of the file has a 'value' column; the"
                + " rows looked at are row 1: unit, result; row 2: B-1, pass (name your own headers with --columns,"
                + " e.g. value=Diameter, or give the header row with --header-row)", noValue.err().strip());
    }

    @Test
    void theSupplierAuditDrawsMeanAndSChartsOfMeasuredLots() throws Exception {
        Path file = plan("--lower", "9.95", "--upper", "10.05");
        String store = folder.resolve("history.sqlite").toString();
        for (int lot = 1; lot <= 3; lot++) {
            Cli.Result result = Cli.run("sentence", file.toString(), sheet("lot" + lot + ".csv",
                    normalSample(42, 10.0 + 0.002 * lot, 0.01)).toString(), "--lot", "M" + lot, "--supplier",
                    "Invented Test Supplier", "--part", "P-1", "--store", store, "--create-store");
            assertEquals(0, result.exitCode(), result.err());
        }
        Path html = folder.resolve("audit.html");
        Path xlsx = folder.resolve("audit.xlsx");
        Cli.Result audit = Cli.run("supplier", "Invented Test Supplier", "--store", store, "--report", html.toString(),
                "--report", xlsx.toString());
        assertEquals(0, audit.exitCode(), audit.err());
        assertTrue(audit.out().contains("3 lots judged on measurements of bore diameter: grand mean 10.004 mm"),
                audit.out());
        assertTrue(Files.readString(html).contains("Means of bore diameter"));
        try (var workbook = new org.apache.poi.xssf.usermodel.XSSFWorkbook(xlsx.toFile())) {
            var sheet = workbook.getSheet("Measurements");
            assertEquals(3, sheet.getLastRowNum());
            assertEquals(10.004, sheet.getRow(2).getCell(3).getNumericCellValue(), 1e-9);
        }
    }

    @Test
    void aMeasuredLotsBoundIsNamedByItsMethodAndTheAuditDescribesItByItsOwnCriterion() throws Exception {
        Path file = plan("--upper", "10.05");
        Path store = folder.resolve("history.sqlite");
        Cli.Result rejected = Cli.run("sentence", "--store", store.toString(), "--create-store", file.toString(),
                sheet("shifted.csv", normalSample(42, 10.035, 0.01)).toString(), "--lot", "S1", "--supplier",
                "Invented Supplier", "--part", "P-1", "--format", "json");
        assertEquals(ExitCode.REJECTED, rejected.exitCode(), rejected.err());
        JsonNode evidence = JSON.readTree(rejected.out()).get("classes").get(0).get("evidence");
        // The bound on a measured lot's fraction beyond the limit comes from the noncentral t (sigma unknown), and
        // it is one-sided: no lower bound, and never the Clopper-Pearson name of a count's interval.
        assertEquals("noncentral t", evidence.get("interval").asText());
        assertEquals("one-sided upper", evidence.get("intervalSides").asText());
        assertTrue(evidence.get("lowerBound").isNull());
        String audit = Cli.run("supplier", "Invented Supplier", "--store", store.toString()).out();
        String line = audit.lines().filter(l -> l.contains(" S1 ")).findFirst().orElseThrow();
        assertTrue(line.contains("(P-1, receipt date not recorded): measured bore diameter: mean "), line);
        assertTrue(line.contains("(noncentral t, 95% one-sided upper bound)"), line);
        assertFalse(line.contains("Clopper-Pearson") || line.contains("reject at") || line.contains("null"), line);
        String text = Cli.run("sentence", "--no-record", file.toString(), sheet("shifted.csv", normalSample(42,
                10.035, 0.01)).toString(), "--lot", "S2").out();
        assertTrue(text.contains("one-sided upper bound, exact, noncentral t)"), text);
    }
}
