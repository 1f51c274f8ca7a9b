package lotgate.inspection;

import static lotgate.demo.DemoData.row;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.zip.ZipEntry;
import java.util.zip.ZipFile;
import lotgate.demo.DemoData;
import lotgate.plan.DefectClass;
import org.apache.poi.poifs.crypt.EncryptionInfo;
import org.apache.poi.poifs.crypt.EncryptionMode;
import org.apache.poi.poifs.crypt.Encryptor;
import org.apache.poi.poifs.filesystem.POIFSFileSystem;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Reading inspection sheets: what they hold, and every bad or hostile input refused by name. */
class InspectionSheetTest {
    @TempDir
    Path folder;

    private Path xlsx(String name, List<List<Object>> rows) throws IOException {
        Path file = folder.resolve(name);
        DemoData.workbook(file, "Sample", rows, null);
        return file;
    }

    static List<List<Object>> passFail(int units, int... failing) {
        List<List<Object>> rows = new ArrayList<>();
        rows.add(row("Unit", " RESULT ", "defect"));
        for (int i = 1; i <= units; i++) {
            final int unit = i;
            boolean failed = java.util.Arrays.stream(failing).anyMatch(f -> f == unit);
            rows.add(row("U" + i, failed ? "fail" : "pass", failed ? "scratch" : null));
        }
        return rows;
    }

    private static InspectionSample read(Path file, int... cutoffs) {
        return new SampleReader(SheetSource.open(file), null, Columns.standard(), cutoffs, 0, 0).read();
    }

    private static String refused(Path file) {
        return assertThrows(SheetException.class, () -> read(file, 10)).getMessage();
    }

    @Test
    void passFailSheetsCountFailedUnitsWithHeadersMatchedLoosely() throws IOException {
        InspectionSample sample = read(xlsx("a.xlsx", passFail(20, 3, 7, 15)), 10, 20);
        assertEquals(20, sample.units());
        assertEquals(2, sample.tallies().get(10).nonconformingUnits(DefectClass.ANY));
        assertEquals(3, sample.all().nonconformingUnits(DefectClass.ANY));
        assertEquals(Map.of("scratch", 3), sample.defectTypes());
        assertEquals(2, sample.firstRow());
        assertEquals(21, sample.lastRow());
    }

    @Test
    void classCountsGiveUnitsAndNonconformitiesSeparately() throws IOException {
        // A unit with 3 minor defects is one nonconforming unit and three nonconformities (common practice).
        List<List<Object>> rows = new ArrayList<>();
        rows.add(row("unit", "critical", "major", "minor"));
        rows.add(row("A", 0, 0, 3));
        rows.add(row("B", null, 1, 1));
        rows.add(row("C", 0, 0, 0));
        InspectionSample sample = read(xlsx("b.xlsx", rows), 3);
        assertEquals(2, sample.all().nonconformingUnits(DefectClass.MINOR));
        assertEquals(4, sample.all().nonconformities(DefectClass.MINOR));
        assertEquals(2, sample.all().nonconformingUnits(DefectClass.ANY));
        assertEquals(5, sample.all().nonconformities(DefectClass.ANY));
        assertEquals(-1, sample.firstCriticalRow());
    }

    @Test
    void csvWithSemicolonsAndAByteOrderMarkReadsLikeAWorkbook() throws IOException {
        Path file = folder.resolve("c.csv");
        DemoData.csv(file, ';', true, passFail(12, 4));
        InspectionSample sample = read(file, 12);
        assertEquals(12, sample.units());
        assertEquals(1, sample.all().nonconformingUnits(DefectClass.ANY));
    }

    @Test
    void oldStyleXlsWorkbooksAreRead() throws IOException {
        Path file = folder.resolve("d.xls");
        try (var workbook = new org.apache.poi.hssf.usermodel.HSSFWorkbook(); OutputStream out = Files.newOutputStream(file)) {
            DemoData.fill(workbook.createSheet("Sample"), passFail(8, 2, 3));
            workbook.write(out);
        }
        assertEquals(2, read(file, 8).all().nonconformingUnits(DefectClass.ANY));
    }

    @Test
    void blankRowsAreSkippedAndFormulasGiveTheirCachedValues() throws IOException {
        Path file = folder.resolve("e.xlsx");
        try (XSSFWorkbook workbook = new XSSFWorkbook(); OutputStream out = Files.newOutputStream(file)) {
            var sheet = workbook.createSheet("Sample");
            DemoData.fill(sheet, List.of(row("unit", "major"), row("A", 1), row(), row("B", null)));
            sheet.getRow(3).createCell(1).setCellFormula("1+1");
            workbook.getCreationHelper().createFormulaEvaluator().evaluateAll();
            workbook.write(out);
        }
        InspectionSample sample = read(file, 2);
        assertEquals(2, sample.units());
        assertEquals(3, sample.all().nonconformities(DefectClass.MAJOR));
    }

    @Test
    void aNegativeOrWordCountIsRefusedByItsCell() throws IOException {
        List<List<Object>> rows = new ArrayList<>(List.of(row("unit", "major"), row("A", 0), row("B", -1)));
        String negative = refused(xlsx("f.xlsx", rows));
        assertTrue(negative.endsWith("f.xlsx: sheet 'Sample' cell B3: major count '-1' is not a whole number of 0 or"
                + " more"), negative);
        rows.set(2, row("B", "2.5"));
        assertTrue(refused(xlsx("g.xlsx", rows)).endsWith("cell B3: major count '2.5' is not a whole number of 0 or"
                + " more"));
    }

    @Test
    void anUnknownResultIsRefusedByItsCell() throws IOException {
        List<List<Object>> rows = passFail(3);
        rows.set(2, row("U2", "maybe", null));
        assertTrue(refused(xlsx("h.xlsx", rows)).endsWith("sheet 'Sample' cell B3: result 'maybe' is not a result word;"
                + " the words are pass, p, ok, good (pass) or fail, f, nc, ng, bad (fail) (add your own with"
                + " --result-words)"), refused(xlsx("h2.xlsx", rows)));
    }

    @Test
    void aUnitWithoutAResultIsRefused() throws IOException {
        List<List<Object>> rows = passFail(3);
        rows.set(2, row("U2", null, "scratch"));
        assertTrue(refused(xlsx("i.xlsx", rows)).endsWith("sheet 'Sample' cell B3: no result (pass or fail) for this"
                + " unit"));
    }

    @Test
    void missingColumnsListTheHeadersFound() throws IOException {
        Path file = xlsx("j.xlsx", List.of(row("Serial", "Outcome", "Remarks"), row("A", "pass", null)));
        assertTrue(refused(file).endsWith("j.xlsx: no header row: none of rows 1 to 2 of sheet 'Sample' has a 'result'"
                + " column or defect class count columns (critical, major, minor); the rows looked at are row 1:"
                + " Serial, Outcome, Remarks; row 2: A, pass (name your own headers with --columns, e.g."
                + " result=Outcome, or give the header row with --header-row)"), refused(file));
        InspectionSample mapped = new SampleReader(SheetSource.open(file), null,
                Columns.mapped("unit=Serial,result=Outcome"), new int[] {1}, 0, 0).read();
        assertEquals(1, mapped.units());
    }

    @Test
    void duplicateUnitIdsNameBothRows() throws IOException {
        List<List<Object>> rows = passFail(30);
        rows.set(25, row("U7", "pass", null));
        String message = refused(xlsx("k.xlsx", rows));
        assertTrue(message.endsWith("unit 'U7' appears twice, sheet 'Sample' row 8 and row 26; each unit of the"
                + " sample must be recorded once"), message);
    }

    @Test
    void anEmptySheetHasNoHeaderRow() throws IOException {
        assertTrue(refused(xlsx("l.xlsx", List.of())).endsWith("l.xlsx: sheet 'Sample' is empty: there is no header"
                + " row"));
        Path csv = folder.resolve("m.csv");
        Files.writeString(csv, "\n\n");
        assertTrue(refused(csv).endsWith("m.csv: the file is empty: there is no header row"), refused(csv));
    }

    @Test
    void aMissingSheetListsTheSheets() throws IOException {
        Path file = xlsx("n.xlsx", passFail(2));
        String message = assertThrows(SheetException.class, () -> new SampleReader(SheetSource.open(file), "Other",
                Columns.standard(), new int[] {2}, 0, 0).read()).getMessage();
        assertTrue(message.endsWith("no sheet named 'Other'; the sheets are 'Sample'"), message);
    }

    @Test
    void aPasswordProtectedWorkbookIsRefused() throws Exception {
        Path plain = xlsx("o.xlsx", passFail(2));
        Path locked = folder.resolve("locked.xlsx");
        try (POIFSFileSystem fs = new POIFSFileSystem()) {
            Encryptor encryptor = new EncryptionInfo(EncryptionMode.agile).getEncryptor();
            encryptor.confirmPassword("invented");
            try (OutputStream out = encryptor.getDataStream(fs)) {
                Files.copy(plain, out);
            }
            try (OutputStream file = Files.newOutputStream(locked)) {
                fs.writeFilesystem(file);
            }
        }
        String message = assertThrows(SheetException.class, () -> SheetSource.open(locked)).getMessage();
        assertTrue(message.endsWith("the workbook is password-protected; save a copy without a password and sentence"
                + " that"), message);
    }

    @Test
    void aCorruptWorkbookIsRefused() throws IOException {
        Path good = xlsx("p.xlsx", passFail(2));
        Path broken = folder.resolve("broken.xlsx");
        byte[] bytes = Files.readAllBytes(good);
        Files.write(broken, java.util.Arrays.copyOf(bytes, bytes.length / 2));
        String message = assertThrows(SheetException.class, () -> read(broken, 2)).getMessage();
        assertTrue(message.startsWith(broken + ": corrupt"), message);
    }

    @Test
    void aFileThatIsNotWhatItsExtensionSaysIsRefused() throws IOException {
        Path csvNamedXlsx = folder.resolve("q.xlsx");
        Files.writeString(csvNamedXlsx, "unit,result\nA,pass\n");
        assertEquals(csvNamedXlsx + ": not an .xlsx workbook (the content is something else)",
                assertThrows(SheetException.class, () -> SheetSource.open(csvNamedXlsx)).getMessage());
        Path xlsxNamedCsv = folder.resolve("r.csv");
        Files.copy(xlsx("r.xlsx", passFail(2)), xlsxNamedCsv);
        assertEquals(xlsxNamedCsv + ": this is a spreadsheet workbook, not CSV text; give it the extension .xlsx or"
                + " .xls", assertThrows(SheetException.class, () -> SheetSource.open(xlsxNamedCsv)).getMessage());
        Path pdf = folder.resolve("s.xlsx");
        Files.writeString(pdf, "%PDF-1.4\n%invented\n");
        assertEquals(pdf + ": not an .xlsx workbook (the content is a PDF document)",
                assertThrows(SheetException.class, () -> SheetSource.open(pdf)).getMessage());
        Path binary = folder.resolve("t.csv");
        Files.write(binary, new byte[] {'u', 'n', 'i', 't', 0, 0, 1, 2, '\n'});
        assertTrue(refused(binary).endsWith("not a text file (it holds NUL bytes)"), refused(binary));
        Path latin = folder.resolve("u.csv");
        Files.write(latin, "unit,result\nA\u00e9,pass\n".getBytes(StandardCharsets.ISO_8859_1));
        assertTrue(refused(latin).endsWith("not UTF-8 text; save the CSV as UTF-8"), refused(latin));
    }

    /** A CSV file long enough (over 1 MiB) to be parsed on a thread of its own while its rows are handled. */
    private Path longCsv(String name, int rows, String lastLine) throws IOException {
        StringBuilder text = new StringBuilder("unit,result,remark\n");
        for (int i = 1; i <= rows; i++) {
            text.append('U').append(i).append(",pass,a remark long enough to fill the file quickly\n");
        }
        text.append(lastLine);
        Path file = folder.resolve(name);
        Files.writeString(file, text);
        assertTrue(Files.size(file) > 1 << 20, "the file must be long enough to be parsed ahead");
        return file;
    }

    private static boolean parsingThreadAlive() {
        return Thread.getAllStackTraces().keySet().stream()
                .anyMatch(t -> t.getName().equals("lotgate-made-ahead") && t.isAlive());
    }

    @Test
    void aReaderThatStopsEarlyInALongCsvStopsItsParsingQuietly() throws IOException {
        Path file = longCsv("long.csv", 30_000, "");
        for (int stopAt : new int[] {2, 700, 5_000}) {
            List<Integer> seen = new ArrayList<>();
            SheetSource.open(file).read(null, (row, cells) -> {
                seen.add(row);
                if (row == stopAt) {
                    throw new RowHandler.Stop();
                }
            });
            assertEquals(stopAt, seen.size());
            assertEquals(stopAt, seen.get(seen.size() - 1));
            // Closing waits for the parsing thread, which may have been stopped in the middle of a read.
            assertTrue(!parsingThreadAlive(), "the parsing thread outlived its reader");
        }
        Files.delete(file);
    }

    @Test
    void aBadByteFarIntoALongCsvIsReportedAfterTheRowsBeforeIt() throws IOException {
        Path file = longCsv("nul.csv", 30_000, "U30001,pass,\0\n");
        List<Integer> seen = new ArrayList<>();
        SheetException refused = assertThrows(SheetException.class,
                () -> SheetSource.open(file).read(null, (row, cells) -> seen.add(row)));
        assertTrue(refused.getMessage().endsWith("not a text file (it holds NUL bytes)"), refused.getMessage());
        assertEquals(30_001, seen.size(), "every row before the bad one is handled first");
        assertTrue(!parsingThreadAlive(), "the parsing thread outlived its reader");
    }

    /** Rewrites one entry of an .xlsx package (or adds it), keeping the others. */
    private Path withEntry(Path xlsx, String entry, byte[] content, String name) throws IOException {
        return Packages.withEntry(xlsx, entry, content, folder.resolve(name));
    }

    private static byte[] sheetXml(String rows) {
        return ("<?xml version=\"1.0\" encoding=\"UTF-8\" standalone=\"yes\"?>\n<worksheet xmlns=\"http://schemas"
                + ".openxmlformats.org/spreadsheetml/2006/main\"><sheetData>" + rows + "</sheetData></worksheet>")
                .getBytes(StandardCharsets.UTF_8);
    }

    @Test
    void aZipBombIsRefusedByPoisInflateGuard() throws IOException {
        // 200 MB of white space inside the sheet part compresses about a thousandfold: far past POI's minimum
        // inflate ratio of 1%, which stays on.
        ByteArrayOutputStream bomb = new ByteArrayOutputStream();
        byte[] head = sheetXml("");
        int tail = "</worksheet>".length();
        bomb.write(head, 0, head.length - tail);
        byte[] spaces = new byte[1 << 20];
        java.util.Arrays.fill(spaces, (byte) ' ');
        for (int i = 0; i < 200; i++) {
            bomb.write(spaces);
        }
        bomb.write(head, head.length - tail, tail);
        Path file = withEntry(xlsx("v.xlsx", passFail(2)), "xl/worksheets/sheet1.xml", bomb.toByteArray(), "bomb.xlsx");
        assertTrue(refused(file).endsWith("refused: the workbook expands far beyond a real inspection sheet (a possible"
                + " zip bomb)"), refused(file));
    }

    @Test
    void aMillionEmptyStyledRowsAreStreamedPast() throws IOException {
        StringBuilder rows = new StringBuilder("<row r=\"1\"><c r=\"A1\" t=\"inlineStr\"><is><t>unit</t></is></c>"
                + "<c r=\"B1\" t=\"inlineStr\"><is><t>result</t></is></c></row>"
                + "<row r=\"2\"><c r=\"A2\" t=\"inlineStr\"><is><t>U1</t></is></c>"
                + "<c r=\"B2\" t=\"inlineStr\"><is><t>fail</t></is></c></row>");
        for (int r = 3; r <= 1_000_002; r++) {
            rows.append("<row r=\"").append(r).append("\" s=\"1\" customFormat=\"1\"><c r=\"A").append(r)
                    .append("\" s=\"1\"/></row>");
        }
        Path file = withEntry(xlsx("w.xlsx", passFail(1)), "xl/worksheets/sheet1.xml", sheetXml(rows.toString()),
                "styled.xlsx");
        InspectionSample sample = read(file, 1);
        assertEquals(1, sample.units());
        assertEquals(1, sample.all().nonconformingUnits(DefectClass.ANY));
    }

    @Test
    void aFormulaWithNoCachedValueIsRefusedByItsCell() throws IOException {
        String rows = "<row r=\"1\"><c r=\"A1\" t=\"inlineStr\"><is><t>unit</t></is></c><c r=\"B1\" t=\"inlineStr\">"
                + "<is><t>major</t></is></c></row><row r=\"2\"><c r=\"A2\" t=\"inlineStr\"><is><t>U1</t></is></c>"
                + "<c r=\"B2\"><f>C2*2</f></c></row>";
        Path file = withEntry(xlsx("x.xlsx", passFail(1)), "xl/worksheets/sheet1.xml", sheetXml(rows), "formula.xlsx");
        assertTrue(refused(file).endsWith("sheet 'Sample' cell B2: the formula =C2*2 has no saved value; open the sheet"
                + " in a spreadsheet program, let it calculate, and save it"), refused(file));
    }

    @Test
    void macrosAndExternalLinksAreIgnoredAndNeverRun() throws IOException {
        // A macro part and an external-link formula with a cached value: lotgate reads the values only.
        String rows = "<row r=\"1\"><c r=\"A1\" t=\"inlineStr\"><is><t>unit</t></is></c><c r=\"B1\" t=\"inlineStr\">"
                + "<is><t>major</t></is></c></row><row r=\"2\"><c r=\"A2\" t=\"inlineStr\"><is><t>U1</t></is></c>"
                + "<c r=\"B2\"><f>[1]Sheet1!A1</f><v>2</v></c></row>";
        Path withSheet = withEntry(xlsx("y.xlsx", passFail(1)), "xl/worksheets/sheet1.xml", sheetXml(rows), "y2.xlsx");
        String types;
        try (ZipFile zip = new ZipFile(withSheet.toFile())) {
            types = new String(zip.getInputStream(zip.getEntry("[Content_Types].xml")).readAllBytes(),
                    StandardCharsets.UTF_8);
        }
        types = types.replaceFirst("(<Types[^>]*>)",
                "$1<Default Extension=\"bin\" ContentType=\"application/vnd.ms-office.vbaProject\"/>");
        Path typed = withEntry(withSheet, "[Content_Types].xml", types.getBytes(StandardCharsets.UTF_8), "y3.xlsx");
        Path macro = withEntry(typed, "xl/vbaProject.bin", new byte[] {1, 2, 3, 4}, "macro.xlsm");
        InspectionSample sample = read(macro, 1);
        assertEquals(2, sample.all().nonconformities(DefectClass.MAJOR));
    }

    @Test
    void lotDetailsComeFromTheLotSheet() throws IOException {
        Path file = folder.resolve("z.xlsx");
        DemoData.workbook(file, "Sample", passFail(2), Map.of("lot", "L-1", "lot size", 500, "received",
                java.time.LocalDate.of(2026, 3, 14)));
        LotDetails lot = LotDetails.read(SheetSource.open(file), null);
        assertEquals("L-1", lot.lot());
        assertEquals(500, lot.lotSize());
        assertEquals(java.time.LocalDate.of(2026, 3, 14), lot.received());
    }
}
