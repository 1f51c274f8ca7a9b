package lotgate.cli;

import static lotgate.demo.DemoData.row;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import lotgate.demo.DemoData;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Sentencing from the command line: verdicts, evidence, exit codes, records and reports. */
class SentenceCommandTest {
    private static final ObjectMapper JSON = new ObjectMapper();
    private static final String BOLTS = "plans/arnwick-af-m8-40.json";

    @TempDir
    Path folder;

    @BeforeEach
    void demoData() throws IOException {
        DemoData.main(new String[] {folder.resolve("demo").toString()});
    }

    private String demo(String name) {
        return folder.resolve("demo").resolve(name).toString();
    }

    private static JsonNode json(Cli.Result result) throws IOException {
        return JSON.readTree(result.out());
    }

    @Test
    void anAcceptedLotGivesItsVerdictAndExactEvidence() throws Exception {
        Cli.Result result = Cli.run("sentence", "--no-record", BOLTS, demo("arnwick-af2611.xlsx"), "--format", "json");
        assertEquals(ExitCode.OK, result.exitCode(), result.err());
        JsonNode decision = json(result);
        assertEquals("accept", decision.get("verdict").asText());
        assertEquals(132, decision.get("unitsOnSheet").asInt());
        assertEquals("AF-2611", decision.get("lot").get("lot").asText());
        JsonNode any = decision.get("classes").get(0);
        assertEquals("any", any.get("class").asText());
        assertEquals(2, any.get("nonconforming").asInt());
        assertEquals(3, any.get("acceptanceNumber").asInt());
        assertEquals(4, any.get("rejectionNumber").asInt());
        assertEquals("accept", any.get("verdict").asText());
        JsonNode evidence = any.get("evidence");
        // SciPy 1.10.1: binom.sf(1, 132, 0.01); beta.ppf(0.025, 2, 131) and beta.ppf(0.975, 3, 130);
        // binom.cdf(3, 132, 2/132).
        assertEquals(0.3808120839220205, evidence.get("pValueAtAql").asDouble(), 1e-13);
        assertEquals(0.001840214768615166, evidence.get("lowerBound").asDouble(), 1e-12);
        assertEquals(0.05365993123526044, evidence.get("upperBound").asDouble(), 1e-12);
        assertEquals(0.8585097083657082, evidence.get("acceptanceAtObserved").asDouble(), 1e-12);
        // Exact rational arithmetic: the largest D with P(X <= 2 | N = 5000, D, n = 132) > 5% is 232.
        assertEquals(232, evidence.get("lotUpperBound").asInt());
        assertTrue(decision.get("plan").get("fingerprint").asText().startsWith("sha256:"));
        assertEquals(64, decision.get("sheet").get("sha256").asText().length());
        assertEquals(Version.number(), decision.get("tool").get("version").asText());
        assertEquals(Map.of("head burr", 1, "thread damage", 1),
                JSON.convertValue(decision.get("defectTypes"), Map.class));
    }

    @Test
    void aRejectedLotExitsWithCode1() throws Exception {
        Cli.Result result = Cli.run("sentence", "--no-record", BOLTS, demo("arnwick-af2618.csv"));
        assertEquals(ExitCode.REJECTED, result.exitCode());
        assertTrue(result.out().startsWith("REJECT lot AF-2618"), result.out());
        assertTrue(result.out().contains("6 nonconforming units found in 132 units, at or above the rejection number 4"));
        assertEquals("", result.err());
    }

    @Test
    void aCriticalNonconformityRejectsAndPrintsTheQuarantineNotice() throws Exception {
        Cli.Result result = Cli.run("sentence", "--no-record", "plans/kestrune-kc-114-classes.json", demo("kestrune-kc0907.xlsx"));
        assertEquals(ExitCode.REJECTED, result.exitCode());
        assertTrue(result.out().startsWith("!! CRITICAL NONCONFORMITY FOUND"), result.out());
        assertTrue(result.out().contains("Quarantine this lot now"));
        JsonNode decision = json(Cli.run("sentence", "--no-record", "plans/kestrune-kc-114-classes.json",
                demo("kestrune-kc0907.xlsx"), "--format", "json"));
        assertTrue(decision.get("criticalFound").asBoolean());
        // Each class is judged on its own first n units: critical 175, major 82, minor 50.
        assertEquals(175, decision.get("classes").get(0).get("inspected").asInt());
        assertEquals(82, decision.get("classes").get(1).get("inspected").asInt());
        assertEquals(50, decision.get("classes").get(2).get("inspected").asInt());
        assertEquals("reject", decision.get("classes").get(0).get("verdict").asText());
        assertEquals("accept", decision.get("classes").get(1).get("verdict").asText());
    }

    @Test
    void aPoissonPlanCountsNonconformitiesNotUnits() throws Exception {
        JsonNode decision = json(Cli.run("sentence", "--no-record", "plans/mirelle-ms-22.json", demo("mirelle-ms1130.csv"),
                "--format", "json"));
        JsonNode any = decision.get("classes").get(0);
        assertEquals(3, any.get("nonconforming").asInt(), "2 + 1 surface blemishes on 2 rings");
        assertEquals("nonconformities", decision.get("counting").asText());
        // SciPy 1.10.1: poisson.sf(2, 84 * 0.015); chi2.ppf(0.025, 6)/168 and chi2.ppf(0.975, 8)/168 (Garwood).
        assertEquals(0.1337773338750012, any.get("evidence").get("pValueAtAql").asDouble(), 1e-13);
        assertEquals(0.007365144320185731, any.get("evidence").get("lowerBound").asDouble(), 1e-12);
        assertEquals(0.10437229844931337, any.get("evidence").get("upperBound").asDouble(), 1e-12);
    }

    @Test
    void aMalformedSheetNamesTheCell() {
        Cli.Result result = Cli.run("sentence", "--no-record", "plans/mirelle-ms-22.json", demo("mirelle-ms1204-malformed.xlsx"));
        assertEquals(ExitCode.BAD_INPUT, result.exitCode());
        assertEquals("lotgate: " + demo("mirelle-ms1204-malformed.xlsx") + ": sheet 'Sample' cell B9: minor count"
                + " 'two' is not a whole number of 0 or more" + System.lineSeparator(), result.err());
        assertEquals("", result.out());
    }

    private Path sheet(String name, int units, int... failing) throws IOException {
        Path file = folder.resolve(name);
        List<List<Object>> rows = new ArrayList<>();
        rows.add(row("unit", "result"));
        for (int i = 1; i <= units; i++) {
            final int unit = i;
            rows.add(row("U" + i, java.util.Arrays.stream(failing).anyMatch(f -> f == unit) ? "fail" : "pass"));
        }
        DemoData.workbook(file, "Sample", rows, null);
        return file;
    }

    @Test
    void anIncompleteSampleIsRefusedAndNothingIsRecorded() throws Exception {
        Path record = folder.resolve("out/record.json");
        Cli.Result result = Cli.run("sentence", "--no-record", BOLTS, sheet("short.xlsx", 117).toString(), "--lot", "L-1",
                "--record", record.toString());
        assertEquals(ExitCode.INCOMPLETE_SAMPLE, result.exitCode());
        assertTrue(result.err().startsWith("lotgate: incomplete sample: 117 of 132 units in "), result.err());
        assertFalse(Files.exists(record));
    }

    @Test
    void withNoLotSizeTheEvidenceLeavesOutTheBoundOnTheLot() throws Exception {
        // The plan was designed for lots of 5000, but this lot's size is not given: no bound "of 0" units.
        Path file = sheet("unsized.xlsx", 132);
        Cli.Result text = Cli.run("sentence", "--no-record", BOLTS, file.toString(), "--lot", "L-6");
        assertEquals(ExitCode.OK, text.exitCode(), text.err());
        assertFalse(text.out().contains("in the lot: at most"), text.out());
        Cli.Result sized = Cli.run("sentence", "--no-record", BOLTS, file.toString(), "--lot", "L-6", "--lot-size",
                "5000");
        assertTrue(sized.out().contains("nonconforming units in the lot: at most "), sized.out());
        assertTrue(sized.out().contains(" of 5000 ("), sized.out());
    }

    @Test
    void theEvidenceGivesTheAqlAsThePlanWasDesignedFor() throws Exception {
        Path plan = folder.resolve("clips.json");
        assertEquals(0, Cli.run("design", "--aql", "0.65%", "--ltpd", "5%", "--save", plan.toString()).exitCode());
        Path file = sheet("clips.xlsx", 105, 7);
        Cli.Result result = Cli.run("sentence", "--no-record", plan.toString(), file.toString(), "--lot", "C-1");
        assertEquals(ExitCode.OK, result.exitCode(), result.err());
        assertTrue(result.out().contains("p-value against the AQL 0.65%: "), result.out());
    }

    @Test
    void aSheetFarLargerThanTheSampleIsRefusedWithoutReadingItAll() throws Exception {
        Path file = folder.resolve("huge.csv");
        StringBuilder text = new StringBuilder("unit,result\n");
        for (int i = 1; i <= 20_000; i++) {
            // A bad word far past the plan's sample: refused if it were read.
            text.append("U").append(i).append(i == 19_000 ? ",maybe\n" : ",pass\n");
        }
        Files.writeString(file, text);
        Cli.Result result = Cli.run("sentence", "--no-record", BOLTS, file.toString(), "--lot", "L-2");
        assertEquals(ExitCode.INCOMPLETE_SAMPLE, result.exitCode(), result.err());
        assertEquals("lotgate: " + file + " holds more than 364 units (reading stopped there), but plan"
                + " arnwick-af-m8-40 samples at most 132; name the sample's rows with --rows FIRST-LAST (nothing was"
                + " recorded)\n", result.err());
    }

    @Test
    void moreUnitsThanThePlanSamplesNeedTheRowsOfTheSample() throws Exception {
        Path file = sheet("long.xlsx", 140, 135);
        Cli.Result result = Cli.run("sentence", "--no-record", BOLTS, file.toString(), "--lot", "L-2");
        assertEquals(ExitCode.INCOMPLETE_SAMPLE, result.exitCode());
        assertTrue(result.err().contains("holds 140 units but plan arnwick-af-m8-40 samples 132; name the sample's rows"
                + " with --rows FIRST-LAST"), result.err());
        Cli.Result chosen = Cli.run("sentence", "--no-record", BOLTS, file.toString(), "--lot", "L-2", "--rows", "2-133");
        assertEquals(ExitCode.OK, chosen.exitCode(), chosen.err());
    }

    @Test
    void optionsWinOverTheLotSheet() throws Exception {
        JsonNode decision = json(Cli.run("sentence", "--no-record", BOLTS, demo("arnwick-af2611.xlsx"), "--lot", "AF-2611-B",
                "--inspector", "Q. Invented", "--format", "json"));
        assertEquals("AF-2611-B", decision.get("lot").get("lot").asText());
        assertEquals("Q. Invented", decision.get("lot").get("inspector").asText());
        assertEquals("Arnwick Fasteners (invented)", decision.get("lot").get("supplier").asText());
    }

    @Test
    void aLotWithoutAnIdIsRefused() throws Exception {
        Cli.Result result = Cli.run("sentence", "--no-record", BOLTS, sheet("anon.xlsx", 132).toString());
        assertEquals(ExitCode.USAGE, result.exitCode());
        assertTrue(result.err().startsWith("lotgate: name the lot: give --lot ID"), result.err());
    }

    @Test
    void aPlanIsNotUsedOnAClassItWasNotDesignedFor() throws Exception {
        Path plan = folder.resolve("majors.json");
        assertEquals(0, Cli.run("design", "--class", "major:aql=1%,ltpd=5%", "--save", plan.toString()).exitCode());
        List<List<Object>> rows = new ArrayList<>();
        rows.add(row("unit", "critical", "major"));
        for (int i = 1; i <= 132; i++) {
            rows.add(row("U" + i, i == 5 ? 1 : 0, 0));
        }
        Path file = folder.resolve("classes.xlsx");
        DemoData.workbook(file, "Sample", rows, null);
        Cli.Result result = Cli.run("sentence", "--no-record", plan.toString(), file.toString(), "--lot", "L-3");
        assertEquals(ExitCode.BAD_INPUT, result.exitCode());
        assertTrue(result.err().contains("the sheet records critical nonconformities (1 units) but plan majors has no"
                + " criteria for critical"), result.err());
    }

    @Test
    void theRecordHoldsThePlanTheSheetAndTheEvidence() throws Exception {
        Path record = folder.resolve("records/af2611.json");
        Cli.Result result = Cli.run("sentence", "--no-record", BOLTS, demo("arnwick-af2611.xlsx"), "--record", record.toString());
        assertEquals(0, result.exitCode(), result.err());
        JsonNode saved = JSON.readTree(record.toFile());
        assertEquals("lotgate-decision", saved.get("format").asText());
        assertEquals(132, saved.get("plan").get("content").get("classes").get(0).get("plan").get("n").asInt());
        assertEquals("accept", saved.get("verdict").asText());
        try (Stream<Path> files = Files.list(record.getParent())) {
            assertEquals(1, files.count(), "no temporary file is left beside the record");
        }
    }

    @Test
    void reportsAreWrittenAndTextFromTheSheetIsInert() throws Exception {
        List<List<Object>> rows = new ArrayList<>();
        rows.add(row("unit", "result", "defect", "note"));
        for (int i = 1; i <= 132; i++) {
            rows.add(i == 3 ? row("=cmd|' /C calc'!A0", "fail", "<script>alert(1)</script>", "+SUM(1)")
                    : row("U" + i, "pass", null, null));
        }
        Path file = folder.resolve("hostile.xlsx");
        DemoData.workbook(file, "Sample", rows, Map.of("lot", "L-<b>4</b>", "supplier", "@Evil \"Quotes\" & Co \u00e9"));
        Path xlsx = folder.resolve("report.xlsx");
        Path html = folder.resolve("report.html");
        Cli.Result result = Cli.run("sentence", "--no-record", BOLTS, file.toString(), "--report", xlsx.toString(), "--report",
                html.toString());
        assertEquals(0, result.exitCode(), result.err());
        String page = Files.readString(html);
        assertFalse(page.contains("<script>alert"), "HTML must be escaped");
        assertTrue(page.contains("&lt;script&gt;alert(1)&lt;/script&gt;"));
        assertTrue(page.contains("L-&lt;b&gt;4&lt;/b&gt;"));
        try (InputStream in = Files.newInputStream(xlsx); XSSFWorkbook workbook = new XSSFWorkbook(in)) {
            assertEquals(List.of("Summary", "Sample", "OC chart"),
                    List.of(workbook.getSheetName(0), workbook.getSheetName(1), workbook.getSheetName(2)));
            Sheet sample = workbook.getSheet("Sample");
            var hostile = sample.getRow(3).getCell(1);
            assertEquals("=cmd|' /C calc'!A0", hostile.getStringCellValue());
            assertTrue(hostile.getCellStyle().getQuotePrefixed(), "formula-like text is quote-prefixed");
            assertEquals(org.apache.poi.ss.usermodel.CellType.STRING, hostile.getCellType());
            assertEquals(org.apache.poi.ss.usermodel.FillPatternType.SOLID_FOREGROUND,
                    sample.getRow(3).getCell(2).getCellStyle().getFillPattern(), "the nonconforming unit is highlighted");
            assertEquals(1, workbook.getSheet("OC chart").getDrawingPatriarch().getCharts().size(),
                    "the OC chart, a native chart");
        }
        Cli.Result csv = Cli.run("sentence", "--no-record", BOLTS, file.toString(), "--format", "csv");
        assertTrue(csv.out().contains("'L-<b>4</b>") || csv.out().contains("L-<b>4</b>"));
    }

    @Test
    void badOutputNamesAreRefusedBeforeAnythingIsRead() {
        Cli.Result result = Cli.run("sentence", "--no-record", BOLTS, "missing.xlsx", "--report", "out.pdf");
        assertEquals(ExitCode.USAGE, result.exitCode());
        assertTrue(result.err().startsWith("lotgate: --report out.pdf: a lot report is a .xlsx or .html file"));
    }

    @Test
    void aMissingSheetFileIsNamed() {
        Cli.Result result = Cli.run("sentence", "--no-record", BOLTS, "missing.xlsx", "--lot", "L-5");
        assertEquals(ExitCode.BAD_INPUT, result.exitCode());
        assertEquals("lotgate: missing.xlsx: no such file" + System.lineSeparator(), result.err());
    }
}
