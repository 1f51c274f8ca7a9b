package lotgate.cli;

import static lotgate.demo.DemoData.row;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import lotgate.demo.DemoData;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Sentencing real forms from the command line: title blocks, a site's result words, separators, bad options. */
class SheetFormsCommandTest {
    private static final String BOLTS = "plans/arnwick-af-m8-40.json";

    @TempDir
    Path folder;

    /** An invented receiving-inspection form of 132 units (the bolts plan's n) with a title block above the table. */
    private static List<List<Object>> form(String pass, String fail, int failing) {
        List<List<Object>> rows = new ArrayList<>();
        rows.add(row("Receiving inspection (invented form)"));
        rows.add(row("Part", "AF-M8-40 (invented)", "Date", "2026-03-14"));
        rows.add(row());
        rows.add(row("Serial", "Outcome", "Defect"));
        for (int i = 1; i <= 132; i++) {
            rows.add(row("S" + i, i <= failing ? fail : pass, i <= failing ? "thread damage" : null));
        }
        return rows;
    }

    private Path xlsx(String name, List<List<Object>> rows) throws IOException {
        Path file = folder.resolve(name);
        DemoData.workbook(file, "Sample", rows, null);
        return file;
    }

    private static Cli.Result sentence(String... more) {
        List<String> args = new ArrayList<>(List.of("sentence", "--no-record", "--lot", "L-1", BOLTS));
        args.addAll(List.of(more));
        return Cli.run(args.toArray(String[]::new));
    }

    @Test
    void aFormWithATitleBlockAndItsOwnWordsIsSentenced() throws IOException {
        Path file = xlsx("form.xlsx", form("GO", "NOGO", 2));
        Cli.Result words = sentence(file.toString(), "--columns", "unit=Serial,result=Outcome,defect=Defect");
        assertEquals(ExitCode.BAD_INPUT, words.exitCode());
        assertEquals("lotgate: " + file + ": sheet 'Sample' cell B5: Outcome 'NOGO' is not a result word; the words are"
                + " pass, p, ok, good (pass) or fail, f, nc, ng, bad (fail) (add your own with --result-words)\n",
                words.err());
        Cli.Result accepted = sentence(file.toString(), "--columns", "unit=Serial,result=Outcome,defect=Defect",
                "--result-words", "pass=GO;fail=NOGO");
        assertEquals(ExitCode.OK, accepted.exitCode(), accepted.err());
        assertTrue(accepted.out().contains("2 nonconforming"), accepted.out());
        Cli.Result given = sentence(file.toString(), "--columns", "unit=Serial,result=Outcome",
                "--result-words", "pass=GO;fail=NOGO", "--header-row", "4");
        assertEquals(ExitCode.OK, given.exitCode(), given.err());
    }

    @Test
    void aSiteSetsItsResultWordsOnceForEveryCommand() throws Exception {
        Path file = xlsx("form.xlsx", form("GO", "NOGO", 2));
        Cli.Result site = Cli.process(java.util.Map.of("LOTGATE_RESULT_WORDS", "pass=GO;fail=NOGO"), "sentence",
                "--no-record", "--lot", "L-1", BOLTS, file.toString(), "--columns", "unit=Serial,result=Outcome");
        assertEquals(ExitCode.OK, site.exitCode(), site.out());
        assertTrue(site.out().contains("2 nonconforming"), site.out());
        Cli.Result bad = Cli.process(java.util.Map.of("LOTGATE_RESULT_WORDS", "maybe"), "sentence", "--no-record",
                "--lot", "L-1", BOLTS, file.toString(), "--columns", "unit=Serial,result=Outcome");
        assertEquals(ExitCode.USAGE, bad.exitCode(), bad.out());
        assertTrue(bad.out().startsWith("lotgate: LOTGATE_RESULT_WORDS: 'maybe' is not pass=WORD,WORD or"
                + " fail=WORD,WORD"), bad.out());
    }

    @Test
    void sheetOptionsOutsideTheirRangeAreRefused() throws IOException {
        Path file = xlsx("form.xlsx", form("ok", "ng", 0));
        String[][] cases = {
            {"--rows", "-5-10", "--rows -5-10: give the first and last sheet row of the sample, as in 2-126 (rows 1 to"
                    + " 1048576, the first no later than the last)"},
            {"--rows", "0-10", "--rows 0-10: give the first and last sheet row of the sample, as in 2-126 (rows 1 to"
                    + " 1048576, the first no later than the last)"},
            {"--header-row", "2000000", "Invalid value for option '--header-row': '2000000' is past the last row a"
                    + " sheet has, 1048576"},
            {"--header-row", "0", "Invalid value for option '--header-row': '0' must be a whole number of 1 or more"},
            {"--delimiter", "pipe", "--delimiter pipe: give comma, semicolon or tab"},
            {"--result-words", "maybe", "--result-words: 'maybe' is not pass=WORD,WORD or fail=WORD,WORD, as in"
                    + " pass=GO,OK;fail=NOGO"},
        };
        for (String[] c : cases) {
            Cli.Result result = sentence(file.toString(), c[0] + "=" + c[1]);
            assertEquals(ExitCode.USAGE, result.exitCode(), c[0]);
            assertTrue(result.err().startsWith("lotgate: " + c[2] + " (see 'lotgate sentence --help')\n"), result.err());
        }
    }

    @Test
    void aCsvSeparatorMayBeGiven() throws IOException {
        Path file = folder.resolve("form.csv");
        DemoData.csv(file, ';', false, form("pass", "fail", 1));
        assertEquals(ExitCode.OK, sentence(file.toString(), "--columns", "unit=Serial,result=Outcome").exitCode());
        Cli.Result wrong = sentence(file.toString(), "--columns", "unit=Serial,result=Outcome", "--delimiter", "tab");
        assertEquals(ExitCode.BAD_INPUT, wrong.exitCode());
        assertTrue(wrong.err().startsWith("lotgate: " + file + ": no header row: none of rows 1 to 50 of the file"),
                wrong.err());
    }

    @Test
    void emptyAndBrokenFilesAreRefusedInOneLineWithExitThree() throws IOException {
        for (String name : new String[] {"empty.xlsx", "empty.xls", "empty.csv", "empty.xlsm"}) {
            Path file = folder.resolve(name);
            Files.write(file, new byte[0]);
            Cli.Result result = sentence(file.toString());
            assertEquals(ExitCode.BAD_INPUT, result.exitCode(), name);
            assertEquals("lotgate: " + file + ": the file is empty\n", result.err());
        }
        Path plan = folder.resolve("empty.json");
        Files.write(plan, new byte[0]);
        Cli.Result result = Cli.run("sentence", "--no-record", "--lot", "L-1", plan.toString(),
                xlsx("f.xlsx", form("ok", "ng", 0)).toString());
        assertEquals(ExitCode.BAD_INPUT, result.exitCode());
        assertEquals(1, result.err().lines().count(), result.err());
        assertTrue(result.err().startsWith("lotgate: " + plan + ": "), result.err());
    }

    @Test
    void aPlanFileWithAByteOrderMarkIsRead() throws IOException {
        Path plan = folder.resolve("bom.json");
        Files.writeString(plan, "\uFEFF" + Files.readString(Path.of(BOLTS)), StandardCharsets.UTF_8);
        Cli.Result result = Cli.run("sentence", "--no-record", "--lot", "L-1", plan.toString(),
                xlsx("f.xlsx", form("ok", "ng", 1)).toString(), "--columns", "unit=Serial,result=Outcome");
        assertEquals(ExitCode.OK, result.exitCode(), result.err());
    }

    @Test
    void importRefusesNumbersThatAreNotWhatTheySeem() throws IOException {
        List<Object> header = row("lot", "supplier", "part", "received", "sample size", "nonconforming", "verdict",
                "defects");
        Object[][] cases = {
            {-5, "burr:1", "cell D2: received '-5' is a plain number, not a date; write the date as 2026-03-14 or"
                    + " format the cell as a date"},
            {"2026-03-14", "burr:3000000000", "cell H2: defects 'burr:3000000000': more than 1,000,000 of one type in"
                    + " a lot"},
            {"2026-03-14", "burr:600000; burr:600000", "cell H2: defects 'burr:600000': more than 1,000,000 of one"
                    + " type in a lot"},
        };
        int i = 0;
        for (Object[] c : cases) {
            Path file = xlsx("past" + i++ + ".xlsx", List.of(header, row("L-1", "Arnwick Fasteners (invented)",
                    "AF-M8-40", c[0], 132, 1, "accept", c[1])));
            Cli.Result result = Cli.run("import", file.toString(), "--store", folder.resolve("h.sqlite").toString());
            assertEquals(ExitCode.BAD_INPUT, result.exitCode(), result.err());
            assertEquals("lotgate: " + file + ": sheet 'Sample' " + c[2] + "\n", result.err());
        }
    }

    @Test
    void importFindsTheHeaderBelowATitleBlockAndSaysWhichRowCameClosest() throws IOException {
        List<Object> header = row("Lot", "Supplier", "Part", "Received", "Sample size", "Nonconforming", "Verdict");
        List<Object> lot = row("L-1", "Arnwick Fasteners (invented)", "AF-M8-40", "2026-03-14", 132, 1, "accept");
        Path titled = xlsx("titled.xlsx", List.of(row("Past lots, Arnwick Fasteners (invented)"), row(),
                row("Exported", "2026-11-30"), header, lot));
        String store = folder.resolve("h.sqlite").toString();
        Cli.Result imported = Cli.run("import", titled.toString(), "--store", store, "--create-store");
        assertEquals(ExitCode.OK, imported.exitCode(), imported.err());
        assertTrue(imported.out().startsWith("Imported 1 lots") || imported.out().startsWith("Imported 1 lot"),
                imported.out());
        Path headless = xlsx("headless.xlsx", List.of(row("Past lots"), row("Lot", "Supplier", "Part", "Received",
                "Sample", "Verdict"), lot));
        Cli.Result refused = Cli.run("import", headless.toString(), "--store", store);
        assertEquals(ExitCode.BAD_INPUT, refused.exitCode(), refused.err());
        assertEquals("lotgate: " + headless + ": no header row: none of the first 3 non-empty rows (up to 50 are"
                + " looked at) names every column a list of past lots needs (lot, supplier, part, received, sample"
                + " size, nonconforming, verdict); the closest, sheet 'Sample' row 2, lacks 'sample size',"
                + " 'nonconforming'\n", refused.err());
    }
}
