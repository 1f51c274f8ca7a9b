package lotgate.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import lotgate.demo.DemoData;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Double, multiple and sequential plans from the command line: design, plan files, curves, comparison,
 * sentencing and the inspection bench. Reference values are SciPy 1.10.1 (Debian's python3-scipy 1.10.1-2),
 * from src/test/python/staged_reference.py.
 */
class StagedPlanCommandsTest {
    private static final ObjectMapper JSON = new ObjectMapper();
    private static final double RELATIVE = 1e-10;

    @TempDir
    Path folder;

    @AfterEach
    void standardInput() {
        InspectCommand.input = () -> System.in;
    }

    private static JsonNode json(Cli.Result result) throws IOException {
        assertEquals(0, result.exitCode(), result.err());
        return JSON.readTree(result.out());
    }

    private static void assertRelative(double expected, double actual) {
        assertEquals(expected, actual, Math.abs(expected) * RELATIVE);
    }

    private Path save(String name, String... args) {
        Path file = folder.resolve(name);
        List<String> all = new ArrayList<>(List.of("design", "--aql", "1%", "--ltpd", "5%"));
        all.addAll(List.of(args));
        all.addAll(List.of("--save", file.toString()));
        Cli.Result result = Cli.run(all.toArray(String[]::new));
        assertEquals(0, result.exitCode(), result.err());
        return file;
    }

    /** A pass/fail sheet of the given size with failures at the given units (invented). */
    private Path sheet(String name, int units, Set<Integer> failures) throws IOException {
        List<List<Object>> rows = new ArrayList<>();
        rows.add(DemoData.row("unit", "result"));
        for (int i = 1; i <= units; i++) {
            rows.add(DemoData.row("T-" + i, failures.contains(i) ? "fail" : "pass"));
        }
        Path file = folder.resolve(name);
        DemoData.csv(file, ',', false, rows);
        return file;
    }

    @Test
    void designedDoublePlanCarriesItsStagesRisksAndAsn() throws Exception {
        JsonNode design = json(Cli.run("design", "--aql", "1%", "--ltpd", "5%", "--scheme", "double", "--format",
                "json"));
        assertEquals("double", design.get("scheme").asText());
        assertEquals("smallest-asn", design.get("method").asText());
        JsonNode stages = design.get("stages");
        assertEquals(69, stages.get(0).get("n").asInt());
        assertEquals(0, stages.get(0).get("c").asInt());
        assertEquals(4, stages.get(0).get("r").asInt());
        assertEquals(69, stages.get(1).get("n").asInt());
        assertEquals(3, stages.get(1).get("c").asInt());
        assertEquals(4, stages.get(1).get("r").asInt());
        // SciPy 1.10.1: P(reject | 1%), P(accept | 5%), ASN at 1% and 5% of (69, 0, 4; 69, 3).
        assertRelative(0.048018970684879127, design.get("producerRisk").asDouble());
        assertRelative(0.094926990653710075, design.get("consumerRisk").asDouble());
        assertRelative(103.15527692898351, design.get("asnAtAql").asDouble());
        assertRelative(104.5990827749995, design.get("asnAtLtpd").asDouble());
        assertEquals(138, design.get("maxSampleSize").asInt());
        assertEquals(132, design.get("single").get("n").asInt());
        assertTrue(design.get("risksMet").asBoolean());
    }

    @Test
    void aFreeSecondSampleLowersTheAsnAtTheAql() throws Exception {
        JsonNode design = json(Cli.run("design", "--aql", "1%", "--ltpd", "5%", "--scheme", "double",
                "--second-ratio", "free", "--format", "json"));
        assertEquals(60, design.get("stages").get(0).get("n").asInt());
        assertEquals(82, design.get("stages").get(1).get("n").asInt());
        // SciPy 1.10.1: ASN at 1% of (60, 0, 4; 82, 3).
        assertRelative(96.877042331890067, design.get("asnAtAql").asDouble());
        assertEquals("free", design.get("search").get("secondRatio").asText());
    }

    @Test
    void sequentialDesignMeetsBothRisksExactlyAndShowsWaldsApproximation() throws Exception {
        JsonNode design = json(Cli.run("design", "--aql", "1%", "--ltpd", "6%", "--scheme", "sequential",
                "--format", "json"));
        assertEquals("sequential", design.get("scheme").asText());
        // The slope of Wald's lines for 1% and 6% (Montgomery, from memory: 0.0281; by hand 0.028111).
        assertEquals(0.028111034141301176, design.get("s").asDouble(), 1e-15);
        assertEquals(330, design.get("truncation").asInt(), "3 times the single plan's n = 110");
        assertTrue(design.get("producerRisk").asDouble() <= 0.05);
        assertTrue(design.get("consumerRisk").asDouble() <= 0.10);
        assertTrue(design.get("risksMet").asBoolean());
        assertTrue(design.get("wald").get("nominalBeta").asDouble() <= 0.10 + 1e-12);
        assertTrue(design.get("asnAtAql").asDouble() < 110);
    }

    @Test
    void plainWaldKeepsTheTextbookLines() throws Exception {
        JsonNode design = json(Cli.run("design", "--aql", "1%", "--alpha", "5%", "--ltpd", "6%", "--beta", "10%",
                "--scheme", "sequential", "--plain-wald", "--format", "json"));
        // Montgomery's example (from memory): h1 = 1.22, h2 = 1.57.
        assertEquals(1.2211492086806142, design.get("h1").asDouble(), 1e-15);
        assertEquals(1.5677999569546845, design.get("h2").asDouble(), 1e-15);
        assertEquals(0.05, design.get("wald").get("nominalAlpha").asDouble(), 1e-12);
    }

    @Test
    void aGivenMultiplePlanIsEvaluatedExactly() throws Exception {
        JsonNode design = json(Cli.run("design", "--aql", "1%", "--ltpd", "5%", "--scheme", "multiple",
                "--stage", "20:-:3", "--stage", "20:1:4", "--stage", "20:2:5", "--stage", "20:4", "--format", "json"));
        assertTrue(design.get("stages").get(0).get("c").isNull(), "the first stage cannot accept");
        // Exact rationals over the whole lattice (staged_reference.py, multi4).
        assertRelative(1 - 0.99780698220480868, design.get("producerRisk").asDouble());
        assertRelative(0.65983695831635736, design.get("consumerRisk").asDouble());
        assertRelative(41.47653462945636, design.get("asnAtAql").asDouble());
        assertFalse(design.get("risksMet").asBoolean());
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', value = {
            "--scheme triple | --scheme triple: give single, double, multiple, sequential or variables",
            "--scheme double --class major:aql=1%,ltpd=5% | --class: criteria per defect class are for single plans",
            "--scheme double --truncate-at 300 | --truncate-at does not apply to --scheme double",
            "--stage 50:1:4 | --stage, --truncate-at, --first-rejection, --asn-at, --second-ratio, --curtailed and"
                    + " --plain-wald are for --scheme double, multiple or sequential",
            "--scheme multiple --stage 50:1 | --scheme multiple needs its stages: give 2 to 7 --stage options",
            "--scheme multiple --stage 50:x:4 --stage 50:3 | --stage 50:x:4: N, C and R must be whole numbers",
            "--scheme multiple --stage 50:1:2 --stage 50:3 | --stage: stage 1 decides every lot (r = c + 1)",
            "--scheme double --second-ratio twice | --second-ratio twice: give a number such as 1 or 2, or 'free'",
            "--scheme double --stage 50:1:4 | --scheme double takes two --stage options",
    })
    void badSchemeOptionsAreNamed(String options, String message) {
        List<String> args = new ArrayList<>(List.of("design", "--aql", "1%", "--ltpd", "5%"));
        args.addAll(List.of(options.trim().split(" ")));
        Cli.Result result = Cli.run(args.toArray(String[]::new));
        assertEquals(ExitCode.USAGE, result.exitCode(), result.out());
        assertTrue(result.err().startsWith("lotgate: " + message.trim()), result.err());
        assertEquals(1, result.err().lines().count(), "one line: " + result.err());
    }

    @Test
    void plansOfNewKindsAreVersion3FilesAndSinglePlansStayVersion2() throws Exception {
        Path single = save("single.json");
        Path twice = save("double.json", "--scheme", "double");
        assertEquals(2, JSON.readTree(Files.readString(single)).get("formatVersion").asInt());
        JsonNode file = JSON.readTree(Files.readString(twice));
        assertEquals(3, file.get("formatVersion").asInt());
        assertEquals("double", file.get("classes").get(0).get("plan").get("scheme").asText());
        Cli.Result shown = Cli.run("show", twice.toString());
        assertEquals(0, shown.exitCode(), shown.err());
        assertTrue(shown.out().contains("double: n1 = 69, c1 = 0, r1 = 4; n2 = 69, c2 = 3"), shown.out());
    }

    @Test
    void anAlteredStageIsCaughtByTheFingerprint() throws Exception {
        Path twice = save("double.json", "--scheme", "double");
        Files.writeString(twice, Files.readString(twice).replaceFirst("\"n\" : 69", "\"n\" : 60"));
        Cli.Result result = Cli.run("show", twice.toString());
        assertEquals(ExitCode.BAD_INPUT, result.exitCode());
        assertTrue(result.err().contains("the fingerprint does not match the content"), result.err());
    }

    @Test
    void aNewSchemeInAVersion2FileIsRefused() throws Exception {
        Path twice = save("double.json", "--scheme", "double");
        Files.writeString(twice, Files.readString(twice).replace("\"formatVersion\" : 3", "\"formatVersion\" : 2"));
        Cli.Result result = Cli.run("show", twice.toString());
        assertEquals(ExitCode.BAD_INPUT, result.exitCode());
        assertEquals("lotgate: " + twice + ": field 'classes[0].plan.scheme' must be single in format version 2,"
                + " got \"double\"", result.err().strip());
    }

    @Test
    void curveAndCompareShowTheAsnAndDrawItsChart() throws Exception {
        Path single = save("single.json");
        Path twice = save("double.json", "--scheme", "double");
        Path sequential = save("sequential.json", "--scheme", "sequential");
        JsonNode compared = json(Cli.run("compare", single.toString(), twice.toString(), sequential.toString(),
                "--asn-chart", folder.resolve("asn.svg").toString(), "--format", "json"));
        JsonNode plans = compared.get("plans");
        assertEquals(132.0, plans.get(0).get("asnAtAql").asDouble());
        assertRelative(103.15527692898351, plans.get(1).get("asnAtAql").asDouble());
        assertEquals(138, plans.get(1).get("maxSampleSize").asInt());
        assertTrue(plans.get(2).get("asnAtAql").asDouble() < 100);
        assertTrue(Files.readString(folder.resolve("asn.svg")).contains("<svg"));
        JsonNode curve = json(Cli.run("curve", sequential.toString(), "--steps", "4", "--format", "json"));
        JsonNode first = curve.get("points").get(0);
        assertEquals(1.0, first.get("acceptance").asDouble());
        assertEquals(1.0, first.get("waldAcceptance").asDouble());
        assertTrue(first.has("waldAsn"));
    }

    @Test
    void aDoublePlanAsksForTheSecondSampleAndThenDecides() throws Exception {
        Path twice = save("double.json", "--scheme", "double");
        Path first = sheet("first.csv", 69, Set.of(23));
        Cli.Result pending = Cli.run("sentence", "--no-record", twice.toString(), first.toString(), "--lot", "T1");
        assertEquals(ExitCode.NOT_DECIDED, pending.exitCode(), pending.err());
        assertTrue(pending.out().contains("Next: inspect the second sample: 69 more units, then sentence again with"
                + " all 138 units on the sheet."), pending.out());
        JsonNode continuing = JSON.readTree(Cli.run("sentence", "--no-record", twice.toString(), first.toString(),
                "--lot", "T1", "--format", "json").out());
        assertEquals("continue", continuing.get("verdict").asText());
        assertEquals(138, continuing.get("nextTotal").asInt());
        Path both = sheet("both.csv", 138, Set.of(23, 97));
        Cli.Result decided = Cli.run("sentence", "--no-record", twice.toString(), both.toString(), "--lot", "T1",
                "--format", "json", "--sampling-chart", folder.resolve("chart.png").toString());
        JsonNode decision = json(decided);
        assertEquals("accept", decision.get("verdict").asText());
        assertEquals("second sample", decision.get("classes").get(0).get("decidedAt").asText());
        assertEquals(138, decision.get("classes").get(0).get("inspected").asInt());
        assertTrue(Files.size(folder.resolve("chart.png")) > 1000);
    }

    @Test
    void aSheetEndingInsideAStageIsRefusedUnlessTheRejectionIsCertain() throws Exception {
        Path twice = save("double.json", "--scheme", "double");
        Cli.Result partial = Cli.run("sentence", "--no-record", twice.toString(),
                sheet("partial.csv", 100, Set.of(5)).toString(), "--lot", "T2");
        assertEquals(ExitCode.INCOMPLETE_SAMPLE, partial.exitCode());
        assertTrue(partial.err().contains("but plan double's samples end at 69, 138 units"), partial.err());
        Cli.Result curtailed = Cli.run("sentence", "--no-record", twice.toString(),
                sheet("curtailed.csv", 30, Set.of(2, 9, 17, 30)).toString(), "--lot", "T3", "--format", "json");
        assertEquals(ExitCode.REJECTED, curtailed.exitCode(), curtailed.err());
        JsonNode decision = JSON.readTree(curtailed.out());
        assertEquals("first sample, curtailed", decision.get("classes").get(0).get("decidedAt").asText());
    }

    @Test
    void aSequentialPlanStopsAtTheUnitWhereTheCountCrossesALine() throws Exception {
        Path sequential = save("sequential.json", "--scheme", "sequential", "--plain-wald");
        // Two failures among the first 9 units reach the rejection line h2 + s m (h2 = 1.751, s = 0.02499).
        Cli.Result rejected = Cli.run("sentence", "--no-record", sequential.toString(),
                sheet("early.csv", 20, Set.of(3, 9)).toString(), "--lot", "T4", "--format", "json");
        assertEquals(ExitCode.REJECTED, rejected.exitCode(), rejected.err());
        JsonNode decision = JSON.readTree(rejected.out());
        assertEquals("unit 9", decision.get("classes").get(0).get("decidedAt").asText());
        assertEquals(9, decision.get("classes").get(0).get("inspected").asInt());
        assertTrue(decision.get("notices").get(0).asText().contains("the other 11 units on the sheet do not count"));
        Cli.Result pending = Cli.run("sentence", "--no-record", sequential.toString(),
                sheet("short.csv", 30, Set.of(12)).toString(), "--lot", "T5");
        assertEquals(ExitCode.NOT_DECIDED, pending.exitCode(), pending.err());
        assertTrue(pending.out().contains("the lot is accepted after unit 95"), pending.out());
    }

    @Test
    void theBenchSaysWhenToStopAndWritesASheetThatSentencesAlike() throws Exception {
        Path sequential = save("sequential.json", "--scheme", "sequential", "--plain-wald");
        StringBuilder lines = new StringBuilder("# lot T6 at bench 2\n");
        for (int i = 1; i <= 60; i++) {
            lines.append(i == 10 ? "fail\nundo\npass\n" : "pass\n");
        }
        InspectCommand.input = () -> new ByteArrayInputStream(lines.toString().getBytes(StandardCharsets.UTF_8));
        Path saved = folder.resolve("bench.csv");
        Cli.Result bench = Cli.run("inspect", sequential.toString(), "--save-sheet", saved.toString());
        assertEquals(ExitCode.OK, bench.exitCode(), bench.err());
        assertTrue(bench.out().contains("unit 10 taken back"), bench.out());
        assertTrue(bench.out().contains("unit 55    pass  found 0    ACCEPT the lot (unit 55: 0 is at most 0)"),
                bench.out());
        Cli.Result sentenced = Cli.run("sentence", "--no-record", sequential.toString(), saved.toString(), "--lot", "T6");
        assertEquals(ExitCode.OK, sentenced.exitCode(), sentenced.err());
        assertTrue(sentenced.out().contains("decided at unit 55"), sentenced.out());
    }

    @Test
    void aBadLineAtTheBenchFailsWhenTheInputIsNotATerminal() throws Exception {
        Path twice = save("double.json", "--scheme", "double");
        InspectCommand.input = () -> new ByteArrayInputStream("pass\npasss\n".getBytes(StandardCharsets.UTF_8));
        Cli.Result result = Cli.run("inspect", twice.toString());
        assertEquals(ExitCode.BAD_INPUT, result.exitCode());
        assertTrue(result.err().startsWith("lotgate: line 2: 'passs' is not a result word (pass, p, ok, good (pass) or"
                + " fail, f, nc, ng, bad (fail)), optionally followed by a defect type; the 1 units entered before it"
                + " are kept in "), result.err());
        InspectCommand.input = () -> new ByteArrayInputStream("pass\n".getBytes(StandardCharsets.UTF_8));
        assertEquals(ExitCode.NOT_DECIDED, Cli.run("inspect", twice.toString()).exitCode());
    }
}
