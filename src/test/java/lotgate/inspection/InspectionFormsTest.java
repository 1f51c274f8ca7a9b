package lotgate.inspection;

import static lotgate.demo.DemoData.row;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.zip.ZipEntry;
import java.util.zip.ZipFile;
import lotgate.demo.DemoData;
import lotgate.plan.DefectClass;
import org.apache.poi.hssf.usermodel.HSSFWorkbook;
import org.apache.poi.ss.usermodel.CellStyle;
import org.apache.poi.ss.usermodel.Workbook;
import org.apache.poi.ss.util.CellRangeAddress;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Inspection sheets as real forms are made (a title block above the header, merged cells, a site's own result
 * words, numbers in odd formats, CSV separators), and broken or hostile files, each refused in one line.
 */
class InspectionFormsTest {
    @TempDir
    Path folder;

    /** A receiving-inspection form of an invented part: title block, blank row, then the table. */
    static List<List<Object>> form(int units, int... failing) {
        List<List<Object>> rows = new ArrayList<>();
        rows.add(row("Receiving inspection (invented form)"));
        rows.add(row("Part", "QP-4711 clip (invented)", null, "Date", "2026-03-14"));
        rows.add(row("Supplier", "Arnwick Fasteners (invented)"));
        rows.add(row());
        rows.addAll(InspectionSheetTest.passFail(units, failing));
        return rows;
    }

    private Path xlsx(String name, List<List<Object>> rows) throws IOException {
        Path file = folder.resolve(name);
        DemoData.workbook(file, "Sample", rows, null);
        return file;
    }

    private static SampleReader reader(Path file) {
        return reader(file, Columns.standard());
    }

    private static SampleReader reader(Path file, Columns columns) {
        return new SampleReader(SheetSource.open(file), null, columns, new int[] {1}, 0, 0);
    }

    private static String refused(Path file) {
        return assertThrows(SheetException.class, () -> reader(file).read()).getMessage();
    }

    @Test
    void aTitleBlockAboveTheHeaderIsPassedOver() throws IOException {
        InspectionSample sample = reader(xlsx("form.xlsx", form(12, 5))).read();
        assertEquals(5, sample.headerRow());
        assertEquals(12, sample.units());
        assertEquals(6, sample.firstRow());
        assertEquals(1, sample.all().nonconformingUnits(DefectClass.ANY));
        Path csv = folder.resolve("form.csv");
        DemoData.csv(csv, ';', false, form(12, 5, 6));
        assertEquals(2, reader(csv).read().all().nonconformingUnits(DefectClass.ANY));
    }

    @Test
    void theHeaderRowMayBeGivenAndMustHoldTheColumns() throws IOException {
        Path file = xlsx("given.xlsx", form(3));
        assertEquals(3, reader(file, Columns.standard().withHeaderRow(5)).read().units());
        assertEquals(file + ": the header row, sheet 'Sample' row 2, has no 'result' column or defect class count"
                + " columns (critical, major, minor); the headers found are Part, QP-4711 clip (invented), Date,"
                + " 2026-03-14 (name your own with --columns, e.g. result=Outcome)",
                assertThrows(SheetException.class, () -> reader(file, Columns.standard().withHeaderRow(2)).read()).getMessage());
        assertEquals(file + ": sheet 'Sample' row 4, given as the header row, is empty",
                assertThrows(SheetException.class, () -> reader(file, Columns.standard().withHeaderRow(4)).read()).getMessage());
    }

    @Test
    void noHeaderInTheFirstFiftyRowsListsTheRowsLookedAt() throws IOException {
        List<List<Object>> rows = new ArrayList<>();
        for (int r = 1; r <= 60; r++) {
            rows.add(row("Remark " + r, "x"));
        }
        Path file = xlsx("noheader.xlsx", rows);
        assertEquals(file + ": no header row: none of rows 1 to 50 of sheet 'Sample' has a 'result' column or defect"
                + " class count columns (critical, major, minor); the rows looked at are row 1: Remark 1, x; row 2:"
                + " Remark 2, x; row 3: Remark 3, x; row 4: Remark 4, x; row 5: Remark 5, x; row 6: Remark 6, x;"
                + " and 44 more (name your own headers with --columns, e.g. result=Outcome, or give the header row"
                + " with --header-row)", refused(file));
    }

    @Test
    void aMergedResultIsRefusedNamingItsRange() throws IOException {
        // Rows 12 to 14 share one merged "pass", as a hand-made form might.
        for (boolean old : new boolean[] {false, true}) {
            Path file = folder.resolve(old ? "merged.xls" : "merged.xlsx");
            try (Workbook workbook = old ? new HSSFWorkbook() : new XSSFWorkbook();
                    OutputStream out = Files.newOutputStream(file)) {
                var sheet = workbook.createSheet("Sample");
                List<List<Object>> rows = form(15);
                rows.set(12, row("U8", null, null));
                rows.set(13, row("U9", null, null));
                DemoData.fill(sheet, rows);
                sheet.addMergedRegion(CellRangeAddress.valueOf("B12:B14"));
                sheet.addMergedRegion(CellRangeAddress.valueOf("A1:E1"));
                workbook.write(out);
            }
            assertEquals(file + ": sheet 'Sample' cell B13 is part of the merged range B12:B14, so it holds no result"
                    + " of its own; unmerge the cells and give every unit its own value on its own row", refused(file));
        }
    }

    @Test
    void resultWordsAreOneCaseInsensitiveVocabularyWithASitesOwnAdded() throws IOException {
        List<List<Object>> rows = new ArrayList<>(List.of(row("unit", "result"), row("A", "OK"), row("B", "NG"),
                row("C", "Pass"), row("D", "nc")));
        assertEquals(2, reader(xlsx("okng.xlsx", rows)).read().all().nonconformingUnits(DefectClass.ANY));
        rows.add(row("E", "GO"));
        rows.add(row("F", "No go"));
        Path site = xlsx("site.xlsx", rows);
        assertEquals(site + ": sheet 'Sample' cell B6: result 'GO' is not a result word; the words are pass, p, ok,"
                + " good (pass) or fail, f, nc, ng, bad (fail) (add your own with --result-words)", refused(site));
        ResultWords words = ResultWords.standard().with("pass=GO;fail=no  GO,scrap");
        assertEquals(3, reader(site, Columns.standard().withResultWords(words)).read().all().nonconformingUnits(DefectClass.ANY));
        assertEquals("'ok' cannot mean fail: it already means pass",
                assertThrows(IllegalArgumentException.class, () -> ResultWords.standard().with("fail=ok"))
                        .getMessage());
        assertEquals("'GO' is not pass=WORD,WORD or fail=WORD,WORD, as in pass=GO,OK;fail=NOGO",
                assertThrows(IllegalArgumentException.class, () -> ResultWords.standard().with("GO")).getMessage());
    }

    /** A workbook whose cell B2 is styled with the format given. */
    private Path styled(String name, List<List<Object>> rows, String format, int row, int column) throws IOException {
        Path file = folder.resolve(name);
        try (Workbook workbook = name.endsWith(".xls") ? new HSSFWorkbook() : new XSSFWorkbook();
                OutputStream out = Files.newOutputStream(file)) {
            var sheet = workbook.createSheet("Sample");
            DemoData.fill(sheet, rows);
            CellStyle style = workbook.createCellStyle();
            style.setDataFormat(workbook.getCreationHelper().createDataFormat().getFormat(format));
            sheet.getRow(row).getCell(column).setCellStyle(style);
            workbook.write(out);
        }
        return file;
    }

    @Test
    void numbersThatAreNotWhatTheySeemAreRefusedByTheirCell() throws IOException {
        List<List<Object>> rows = List.of(row("unit", "major"), row("A", 46023), row("B", 0));
        for (String name : new String[] {"datecount.xlsx", "datecount.xls"}) {
            Path file = styled(name, rows, "yyyy-mm-dd", 1, 1);
            assertEquals(file + ": sheet 'Sample' cell B2: major count cell is formatted as a date (it holds 46023);"
                    + " a count is a plain whole number: format the cell as a number", refused(file));
        }
        Path huge = xlsx("huge.xlsx", List.of(row("unit", "major"), row("A", 3_000_000_000L)));
        assertEquals(huge + ": sheet 'Sample' cell B2: major count '3000000000' is more than 1,000,000"
                + " nonconformities in one unit", refused(huge));
        String rowsXml = "<row r=\"1\"><c r=\"A1\" t=\"inlineStr\"><is><t>unit</t></is></c><c r=\"B1\" t=\"inlineStr\">"
                + "<is><t>major</t></is></c></row><row r=\"2\"><c r=\"A2\" t=\"inlineStr\"><is><t>U1</t></is></c>"
                + "<c r=\"B2\"><f>C2*2</f><v></v></c></row>";
        Path formula = withSheet(xlsx("f.xlsx", rows), sheetXml(rowsXml, ""), "emptyvalue.xlsx");
        assertEquals(formula + ": sheet 'Sample' cell B2: the formula =C2*2 has no saved value; open the sheet in a"
                + " spreadsheet program, let it calculate, and save it", refused(formula));
    }

    @Test
    void aReceivedDayMustBeADateCell() throws IOException {
        Path plain = folder.resolve("plain.xlsx");
        DemoData.workbook(plain, "Sample", InspectionSheetTest.passFail(2), java.util.Map.of("received", 46023));
        assertEquals(plain + ": sheet 'lot' cell B1: received '46023' is a plain number, not a date; write the date as"
                + " 2026-03-14 or format the cell as a date", assertThrows(SheetException.class,
                        () -> LotDetails.read(SheetSource.open(plain), null)).getMessage());
        for (double day : new double[] {-5, 1e9}) {
            Path file = folder.resolve("received" + (int) day + ".xlsx");
            try (XSSFWorkbook workbook = new XSSFWorkbook(); OutputStream out = Files.newOutputStream(file)) {
                DemoData.fill(workbook.createSheet("Sample"), InspectionSheetTest.passFail(2));
                var lot = workbook.createSheet("lot");
                DemoData.fill(lot, List.of(row("received", day)));
                CellStyle date = workbook.createCellStyle();
                date.setDataFormat(workbook.getCreationHelper().createDataFormat().getFormat("yyyy-mm-dd"));
                lot.getRow(0).getCell(1).setCellStyle(date);
                workbook.write(out);
            }
            String expected = "received '" + (day < 0 ? "-5" : "1000000000") + "' is not a day from 1900-01-01 to"
                    + " 2199-12-31; write the date as 2026-03-14";
            String message = assertThrows(SheetException.class, () -> LotDetails.read(SheetSource.open(file), null))
                    .getMessage();
            assertEquals(file + ": sheet 'lot' cell B1: " + expected, message);
        }
        Path good = folder.resolve("good.xlsx");
        DemoData.workbook(good, "Sample", InspectionSheetTest.passFail(2),
                java.util.Map.of("received", LocalDate.of(2026, 3, 14)));
        assertEquals(LocalDate.of(2026, 3, 14), LotDetails.read(SheetSource.open(good), null).received());
    }

    @Test
    void theCsvSeparatorIsDecidedFromTheHeaderRowOrGiven() throws IOException {
        // Semicolons inside quoted values and a title line with more commas than the table has: the header decides.
        Path file = folder.resolve("quoted.csv");
        Files.writeString(file, "\"Receiving inspection, lot 17, dock 3, invented\"\nunit,result,note\n"
                + "A,pass,\"thread; checked twice; ok\"\nB,fail,\"burr; scratch; dent\"\nC,pass,\n");
        InspectionSample sample = reader(file).read();
        assertEquals(3, sample.units());
        assertEquals(1, sample.all().nonconformingUnits(DefectClass.ANY));
        Path semicolons = folder.resolve("semi.csv");
        Files.writeString(semicolons, "unit;result;note\nA;pass;\"a, b, c, d, e\"\nB;fail;x\n");
        assertEquals(2, reader(semicolons).read().units());
        Path tabs = folder.resolve("tabs.csv");
        Files.writeString(tabs, "unit\tresult\nA\tpass\nB\tfail\n");
        assertEquals(1, reader(tabs).read().all().nonconformingUnits(DefectClass.ANY));
        String message = assertThrows(SheetException.class, () -> reader(semicolons,
                Columns.standard().withDelimiter(',')).read()).getMessage();
        assertEquals(semicolons + ": no header row: none of rows 1 to 3 of the file has a 'result' column or defect"
                + " class count columns (critical, major, minor); the rows looked at are row 1: unit;result;note;"
                + " row 2: A;pass;\"a, b, c, d, …; row 3: B;fail;x (name your own headers with --columns, e.g."
                + " result=Outcome, or give the header row with --header-row)", message);
    }

    @Test
    void emptyFilesOfEveryKindAreRefusedByName() throws IOException {
        for (String name : new String[] {"empty.xlsx", "empty.xlsm", "empty.xls", "empty.csv"}) {
            Path file = folder.resolve(name);
            Files.write(file, new byte[0]);
            assertEquals(file + ": the file is empty",
                    assertThrows(SheetException.class, () -> SheetSource.open(file)).getMessage());
        }
    }

    @Test
    void aWorkbookWithoutSheetsIsRefused() throws IOException {
        Path file = folder.resolve("nosheets.xlsx");
        Path good = xlsx("one.xlsx", InspectionSheetTest.passFail(2));
        String workbook;
        try (ZipFile zip = new ZipFile(good.toFile())) {
            workbook = new String(zip.getInputStream(zip.getEntry("xl/workbook.xml")).readAllBytes(),
                    StandardCharsets.UTF_8);
        }
        workbook = workbook.replaceAll("<sheets>.*</sheets>", "<sheets/>");
        Files.copy(withEntry(good, "xl/workbook.xml", workbook.getBytes(StandardCharsets.UTF_8), "tmp.xlsx"), file);
        assertEquals(file + ": the workbook has no sheets", refused(file));
    }

    @Test
    void textBeyondWhatACellHoldsIsRefused() throws IOException {
        String big = "x".repeat(Cell.MAX_TEXT + 1);
        String rowsXml = "<row r=\"1\"><c r=\"A1\" t=\"inlineStr\"><is><t>unit</t></is></c><c r=\"B1\" t=\"inlineStr\">"
                + "<is><t>result</t></is></c></row><row r=\"2\"><c r=\"A2\" t=\"inlineStr\"><is><t>" + big
                + "</t></is></c></row>";
        Path file = withSheet(xlsx("t.xlsx", InspectionSheetTest.passFail(1)), sheetXml(rowsXml, ""), "longcell.xlsx");
        assertEquals(file + ": refused: sheet 'Sample' cell A2 holds more than 32,767 characters, more than a spreadsheet cell holds",
                refused(file));
        String strings = "<?xml version=\"1.0\"?><sst xmlns=\"http://schemas.openxmlformats.org/spreadsheetml/2006/"
                + "main\"><si><t>unit</t></si><si><t>" + big + "</t></si></sst>";
        Path shared = withEntry(xlsx("u.xlsx", InspectionSheetTest.passFail(1)), "xl/sharedStrings.xml",
                strings.getBytes(StandardCharsets.UTF_8), "longshared.xlsx");
        assertEquals(shared + ": refused: shared string 2 holds more than 32,767 characters, more than a spreadsheet"
                + " cell holds", refused(shared));
        String wide = "<row r=\"1\"><c r=\"XFE1\"><v>1</v></c></row>";
        Path columns = withSheet(xlsx("v.xlsx", InspectionSheetTest.passFail(1)), sheetXml(wide, ""), "wide.xlsx");
        assertEquals(columns + ": refused: sheet 'Sample' row 1 has cells beyond column XFD, the last a sheet has", refused(columns));
        String deep = "<row r=\"1048577\"><c><v>1</v></c></row>";
        Path rows = withSheet(xlsx("w.xlsx", InspectionSheetTest.passFail(1)), sheetXml(deep, ""), "deep.xlsx");
        assertEquals(rows + ": refused: sheet 'Sample' has a row numbered 1048577, beyond the 1048576 rows a sheet has", refused(rows));
    }

    static String sheetXml(String rows, String after) {
        return "<?xml version=\"1.0\" encoding=\"UTF-8\" standalone=\"yes\"?>\n<worksheet xmlns=\"http://schemas"
                + ".openxmlformats.org/spreadsheetml/2006/main\"><sheetData>" + rows + "</sheetData>" + after
                + "</worksheet>";
    }

    private Path withSheet(Path xlsx, String sheet, String name) throws IOException {
        return withEntry(xlsx, "xl/worksheets/sheet1.xml", sheet.getBytes(StandardCharsets.UTF_8), name);
    }

    /** Rewrites one entry of an .xlsx package (or adds it), keeping the others. */
    private Path withEntry(Path xlsx, String entry, byte[] content, String name) throws IOException {
        return Packages.withEntry(xlsx, entry, content, folder.resolve(name));
    }
}
