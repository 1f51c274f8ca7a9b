package lotgate.cli;

import static lotgate.demo.DemoData.row;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.List;
import lotgate.demo.DemoData;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The lot history through the command line: recording, switching, families, import, audit and ranking. */
class HistoryCommandsTest {
    private static final ObjectMapper JSON = new ObjectMapper();
    private static final String BOLTS = "plans/arnwick-af-m8-40.json";

    @TempDir
    Path folder;
    private String store;

    @BeforeEach
    void freshStore() {
        store = folder.resolve("history.sqlite").toString();
    }

    /** A pass/fail sheet of n units with the given number failing, for an invented lot. */
    private Path sheet(String lot, int units, int failing) throws Exception {
        List<List<Object>> rows = new ArrayList<>();
        rows.add(row("unit", "result"));
        for (int i = 1; i <= units; i++) {
            rows.add(row(lot + "-" + i, i <= failing ? "fail" : "pass"));
        }
        Path file = folder.resolve(lot + ".xlsx");
        DemoData.workbook(file, "Sample", rows, null);
        return file;
    }

    private Cli.Result sentence(String plan, String lot, int units, int failing, String... extra) throws Exception {
        List<String> args = new ArrayList<>(List.of("sentence", plan, sheet(lot, units, failing).toString(), "--lot", lot,
                "--supplier", "Invented Works", "--part", "IW-1", "--store", store, "--create-store", "--format", "json"));
        args.addAll(List.of(extra));
        return Cli.run(args.toArray(String[]::new));
    }

    private static JsonNode history(Cli.Result result) throws Exception {
        return JSON.readTree(result.out()).get("history");
    }

    @Test
    void aSentencedLotIsRecordedAndTheSecondRejectionInFiveTightens() throws Exception {
        assertEquals(1, history(sentence(BOLTS, "L1", 132, 5)).get("seq").asInt());
        JsonNode second = history(sentence(BOLTS, "L2", 132, 4));
        assertEquals("normal", second.get("severityApplied").asText());
        assertEquals("tightened", second.get("severityNext").asText());
        assertEquals("2 of the last 2 lots not accepted (L1, L2)", second.get("switchReason").asText());
        Cli.Result verified = Cli.run("verify", "--store", store);
        assertEquals(0, verified.exitCode());
        assertTrue(verified.out().contains("2 records, chain intact"));
    }

    @Test
    void programsReadOneVocabularyFromSentenceHistoryVerifyAndCorrectiveAction() throws Exception {
        JsonNode decision = JSON.readTree(sentence(BOLTS, "V1", 132, 2).out());
        JsonNode verdict = decision.get("classes").get(0);
        assertEquals(132, verdict.get("inspected").asInt());
        assertEquals(2, verdict.get("nonconforming").asInt());
        JsonNode listed = JSON.readTree(Cli.run("history", "--store", store, "--format", "json").out())
                .get("records").get(0);
        assertEquals(132, listed.get("inspected").asInt());
        assertEquals(2, listed.get("nonconforming").asInt());
        assertTrue(listed.get("supersedes").isNull(), "a record that corrects none supersedes null, not 0");
        Cli.Result action = Cli.run("corrective-action", "--supplier", "Invented Works", "--part", "IW-1", "--reason",
                "new heading die (invented)", "--store", store, "--format", "json");
        assertEquals(0, action.exitCode(), action.err());
        assertEquals(2, JSON.readTree(action.out()).get("seq").asInt());
        Cli.Result verified = Cli.run("verify", "--store", store, "--format", "csv");
        assertEquals(0, verified.exitCode(), verified.err());
        assertTrue(verified.out().startsWith("store,storeId,intact,records,head,problem"), verified.out());
        assertTrue(verified.out().contains(",true,2,2:"), verified.out());
    }

    @Test
    void aFamilyAppliesTheVariantTheHistoryCallsFor() throws Exception {
        Path tightened = folder.resolve("tightened.json");
        assertEquals(0, Cli.run("design", "--aql", "0.65%", "--ltpd", "4%", "--save", tightened.toString()).exitCode());
        Path family = folder.resolve("family.json");
        assertEquals(0, Cli.run("family", family.toString(), "--normal", Path.of(BOLTS).toAbsolutePath().toString(),
                "--tightened", tightened.toString()).exitCode());
        sentence(family.toString(), "F1", 132, 6);
        sentence(family.toString(), "F2", 132, 6);
        Cli.Result wrongSize = sentence(family.toString(), "F3", 132, 0);
        assertEquals(ExitCode.INCOMPLETE_SAMPLE, wrongSize.exitCode(), "tightened inspection samples 166 units");
        Cli.Result third = sentence(family.toString(), "F3", 166, 0);
        assertEquals(0, third.exitCode(), third.err());
        JsonNode decision = JSON.readTree(third.out());
        assertEquals("tightened", decision.get("history").get("severityApplied").asText());
        assertEquals(166, decision.get("unitsOnSheet").asInt());
    }

    @Test
    void aLotAlreadyRecordedIsRefusedUnlessItIsACorrection() throws Exception {
        sentence(BOLTS, "D1", 132, 5);
        Cli.Result again = sentence(BOLTS, "D1", 132, 1);
        assertEquals(ExitCode.USAGE, again.exitCode());
        assertTrue(again.err().contains("lot D1 of Invented Works, part IW-1 is already recorded as #1"), again.err());
        Cli.Result corrected = sentence(BOLTS, "D1", 132, 1, "--supersedes", "1", "--reason",
                "two units were another lot's (invented)");
        assertEquals(0, corrected.exitCode(), corrected.err());
        JsonNode audit = JSON.readTree(Cli.run("supplier", "Invented Works", "--store", store, "--format", "json").out());
        assertEquals(1, audit.get("lots").asInt(), "the correction replaces the record it supersedes");
        assertEquals(0, audit.get("rejected").asInt());
        Cli.Result missingReason = sentence(BOLTS, "D1", 132, 1, "--supersedes", "1");
        assertEquals(ExitCode.USAGE, missingReason.exitCode());
    }

    @Test
    void noRecordLeavesTheStoreUntouched() throws Exception {
        Cli.Result trial = sentence(BOLTS, "T1", 132, 0, "--no-record");
        assertEquals(0, trial.exitCode(), trial.err());
        assertFalse(JSON.readTree(trial.out()).has("history"), "a plain plan with --no-record opens no store");
        assertFalse(Files.exists(Path.of(store)));
    }

    @Test
    void fiveRejectionsOnTightenedDiscontinueUntilACorrectiveAction() throws Exception {
        Path tightened = folder.resolve("t.json");
        Cli.run("design", "--aql", "0.65%", "--ltpd", "4%", "--save", tightened.toString());
        Path family = folder.resolve("f.json");
        Cli.run("family", family.toString(), "--normal", Path.of(BOLTS).toAbsolutePath().toString(), "--tightened",
                tightened.toString());
        sentence(family.toString(), "R1", 132, 9);
        sentence(family.toString(), "R2", 132, 9);
        for (int i = 3; i <= 7; i++) {
            sentence(family.toString(), "R" + i, 166, 9);
        }
        Cli.Result refused = sentence(family.toString(), "R8", 166, 0);
        assertEquals(ExitCode.DISCONTINUED, refused.exitCode());
        assertTrue(refused.err().contains("is discontinued since lot R7 (5 lots not accepted while on tightened"
                + " inspection"), refused.err());
        assertEquals(0, Cli.run("corrective-action", "--supplier", "Invented Works", "--part", "IW-1", "--reason",
                "new heading die (invented)", "--store", store).exitCode());
        Cli.Result resumed = sentence(family.toString(), "R8", 166, 0);
        assertEquals(0, resumed.exitCode(), resumed.err());
        assertEquals("tightened", history(resumed).get("severityApplied").asText());
    }

    private Path pastLots(List<List<Object>> lots) throws Exception {
        List<List<Object>> rows = new ArrayList<>();
        rows.add(row("lot", "supplier", "part", "received", "sample size", "nonconforming", "verdict", "defects"));
        rows.addAll(lots);
        Path file = folder.resolve("past.csv");
        DemoData.csv(file, ',', false, rows);
        return file;
    }

    @Test
    void importIsAllOrNothing() throws Exception {
        Path bad = pastLots(List.of(row("P1", "Invented Works", "IW-1", "2026-01-05", 80, 2, "accept", "burr:2"),
                row("P2", "Invented Works", "IW-1", "2026-01-12", 80, "lots", "accept", "")));
        Cli.Result refused = Cli.run("import", bad.toString(), "--store", store, "--create-store");
        assertEquals(ExitCode.BAD_INPUT, refused.exitCode());
        assertTrue(refused.err().endsWith("past.csv: row 3, column F: nonconforming 'lots' is not a whole number of 0 or"
                + " more" + System.lineSeparator()), refused.err());
        Cli.Result history = Cli.run("history", "--store", store);
        assertEquals(ExitCode.BAD_INPUT, history.exitCode(), "nothing was imported, not even a store was created");
        assertEquals("lotgate: history store " + store + " does not exist" + System.lineSeparator(), history.err());
    }

    @Test
    void importedLotsCarryTheSeverityAReplayOfTheWholeHistoryGives() throws Exception {
        // Two rejections in five lots on normal inspection switch to tightened, five accepted on tightened back
        // to normal (the switching rules); split over two imports, the second must continue the first's state.
        List<List<Object>> first = new ArrayList<>();
        List<List<Object>> second = new ArrayList<>();
        String[] verdicts = {"accept", "reject", "accept", "reject", "accept", "accept", "accept", "accept", "accept",
                "accept", "reject", "accept"};
        for (int i = 0; i < verdicts.length; i++) {
            boolean rejected = verdicts[i].equals("reject");
            List<Object> lot = row("C" + i, "Invented Carry", "C-1", "2026-04-" + (10 + i), 80, rejected ? 4 : 0,
                    verdicts[i], rejected ? "burr:4" : "");
            (i < 3 ? first : second).add(lot);
        }
        second.add(0, row("D0", "Invented Carry", "D-1", "2026-04-01", 80, 4, "reject", "burr:4"));
        Path one = pastLots(first);
        assertEquals(0, Cli.run("import", one.toString(), "--store", store, "--create-store").exitCode());
        Path two = pastLots(second);
        assertEquals(0, Cli.run("import", two.toString(), "--store", store).exitCode());
        try (lotgate.history.HistoryStore opened = lotgate.history.HistoryStore.open(store)) {
            List<lotgate.history.LotRow> rows = opened.rows("Invented Carry", "C-1");
            assertEquals(verdicts.length, rows.size());
            var replay = new lotgate.history.SupplierHistory(rows, lotgate.history.SwitchingRules.CURRENT);
            List<String> recorded = new ArrayList<>();
            List<String> replayed = new ArrayList<>();
            for (var entry : replay.entries()) {
                recorded.add(entry.row().severity());
                replayed.add(entry.inspectedUnder().label());
            }
            assertEquals(replayed, recorded);
            assertTrue(recorded.contains("tightened"), recorded.toString());
        }
    }

    @Test
    void theAuditGivesTheProcessAverageWithItsExactIntervalAndThePChart() throws Exception {
        Path past = pastLots(List.of(row("P1", "Invented Works", "IW-1", "2026-01-05", 80, 2, "accept", "burr:2"),
                row("P2", "Invented Works", "IW-1", "2026-01-12", 80, 0, "accept", ""),
                row("P3", "Invented Works", "IW-1", "2026-01-19", 80, 5, "reject", "burr:1; crack:4")));
        assertEquals(0, Cli.run("import", past.toString(), "--store", store, "--create-store").exitCode());
        JsonNode audit = JSON.readTree(Cli.run("supplier", "Invented Works", "--store", store, "--format", "json").out());
        JsonNode average = audit.get("processAverage");
        assertEquals(7.0 / 240, average.get("estimate").asDouble(), 1e-15);
        // SciPy 1.10.1: beta.ppf(0.025, 7, 234) and beta.ppf(0.975, 8, 233), the Clopper-Pearson bounds of 7 in 240.
        assertEquals(0.011805285518544031, average.get("lowerBound").asDouble(), 1e-12);
        assertEquals(0.05916855454550887, average.get("upperBound").asDouble(), 1e-12);
        // p-chart (common practice): UCL = p + 3 sqrt(p (1 - p) / n) with p = 7/240, n = 80: 0.08560731580361405.
        assertEquals(0.08560731580361405, audit.get("pChart").get(0).get("upperLimit").asDouble(), 1e-15);
        assertEquals("crack", audit.get("defectTypes").get(0).get("defect").asText());
        assertEquals(4, audit.get("defectTypes").get(0).get("count").asInt());
        assertEquals(1, audit.get("rejectedLots").size());
    }

    @Test
    void aSupplierWithFewLotsDoesNotRankAsIfItHadMany() throws Exception {
        List<List<Object>> lots = new ArrayList<>();
        for (int i = 1; i <= 3; i++) {
            lots.add(row("S" + i, "Small Invented", "S-1", "2026-02-0" + i, 80, 0, "accept", ""));
        }
        for (int i = 1; i <= 30; i++) {
            lots.add(row("B" + i, "Big Invented", "B-1", "2026-02-01", 100, 1, "accept", "burr:1"));
        }
        assertEquals(0, Cli.run("import", pastLots(lots).toString(), "--store", store, "--create-store").exitCode());
        JsonNode ranking = JSON.readTree(Cli.run("suppliers", "--store", store, "--format", "json").out());
        // Upper 95% bounds, SciPy 1.10.1: 0 in 240 gives beta.ppf(0.975, 1, 240) = 0.015252810401278714;
        // 30 in 3000 gives beta.ppf(0.975, 31, 2970) = 0.014245074173757966, so the larger record ranks first.
        assertEquals("Big Invented", ranking.get("suppliers").get(0).get("supplier").asText());
        assertEquals(0.014245074173757966, ranking.get("suppliers").get(0).get("processAverageUpper").asDouble(), 1e-12);
        assertEquals(0.015252810401278714, ranking.get("suppliers").get(1).get("processAverageUpper").asDouble(), 1e-12);
    }

    @Test
    void hostileNamesComeOutInertInEveryReport() throws Exception {
        String evil = "=cmd|' /C calc'!A0 <script>alert(1)</script> \"Qu\u00f6tes\"";
        Path past = pastLots(List.of(row("H1", evil, "@P-1", "2026-03-02", 80, 3, "reject", "<b>burr</b>:3")));
        assertEquals(0, Cli.run("import", past.toString(), "--store", store, "--create-store").exitCode());
        Path html = folder.resolve("audit.html");
        Path xlsx = folder.resolve("audit.xlsx");
        Path ranking = folder.resolve("ranking.html");
        Cli.Result audit = Cli.run("supplier", evil, "--store", store, "--report", html.toString(), "--report",
                xlsx.toString());
        assertEquals(0, audit.exitCode(), audit.err());
        assertTrue(audit.out().endsWith("\n\n  report written to " + html + "\n  report written to " + xlsx + "\n"),
                audit.out());
        Cli.Result ranked = Cli.run("suppliers", "--store", store, "--report", ranking.toString());
        assertEquals(0, ranked.exitCode(), ranked.err());
        assertTrue(ranked.out().endsWith("\n\n  report written to " + ranking + "\n"), ranked.out());
        for (Path page : List.of(html, ranking)) {
            String text = Files.readString(page);
            assertFalse(text.contains("<script>alert"), page.toString());
            assertTrue(text.contains("&lt;script&gt;"), page.toString());
        }
        try (InputStream in = Files.newInputStream(xlsx); XSSFWorkbook workbook = new XSSFWorkbook(in)) {
            var title = workbook.getSheet("Summary").getRow(0).getCell(0);
            assertTrue(title.getStringCellValue().contains(evil));
            var part = workbook.getSheet("Lots").getRow(1).getCell(2);
            assertEquals("@P-1", part.getStringCellValue());
            assertTrue(part.getCellStyle().getQuotePrefixed());
            assertEquals(1, workbook.getSheet("p-chart").getDrawingPatriarch().getCharts().size(), "a native chart");
        }
        String csv = Cli.run("suppliers", "--store", store, "--format", "csv").out();
        assertTrue(csv.contains("\"'=cmd"), csv);
    }

    @Test
    void aTamperedStoreFailsVerificationWithExitCode7() throws Exception {
        sentence(BOLTS, "V1", 132, 0);
        sentence(BOLTS, "V2", 132, 0);
        try (Connection connection = DriverManager.getConnection("jdbc:sqlite:" + store);
                Statement statement = connection.createStatement()) {
            statement.execute("UPDATE lot_record SET nonconforming = 0, content = REPLACE(content, 'V1', 'X1')"
                    + " WHERE seq = 1");
        }
        Cli.Result result = Cli.run("verify", "--store", store);
        assertEquals(ExitCode.STORE, result.exitCode());
        assertTrue(result.err().contains("record 1 was altered: its content no longer matches its hash"), result.err());
    }

    @Test
    void anUnreachableStoreIsNamed() throws Exception {
        Cli.Result result = Cli.run("history", "--store", "jdbc:postgresql://127.0.0.1:1/none?connectTimeout=2");
        assertEquals(ExitCode.STORE, result.exitCode());
        assertTrue(result.err().startsWith("lotgate: cannot open the history store jdbc:postgresql://127.0.0.1:1/none"),
                result.err());
    }
}
