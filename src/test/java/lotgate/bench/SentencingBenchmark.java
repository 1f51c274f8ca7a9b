package lotgate.bench;

import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.io.PrintWriter;
import java.io.Writer;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.concurrent.TimeUnit;
import lotgate.cli.Main;
import lotgate.plan.PlanFormat;
import lotgate.plan.SavedPlan;
import lotgate.sampling.OcModel;
import lotgate.sampling.RiskPoints;
import lotgate.sampling.SinglePlan;
import org.apache.poi.openxml4j.opc.OPCPackage;
import org.apache.poi.openxml4j.opc.PackageAccess;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.util.XMLHelper;
import org.apache.poi.xssf.eventusermodel.ReadOnlySharedStringsTable;
import org.apache.poi.xssf.eventusermodel.XSSFReader;
import org.apache.poi.xssf.eventusermodel.XSSFSheetXMLHandler;
import org.apache.poi.xssf.streaming.SXSSFWorkbook;
import org.apache.poi.xssf.usermodel.XSSFComment;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.TearDown;
import org.openjdk.jmh.annotations.Warmup;
import org.xml.sax.InputSource;
import org.xml.sax.XMLReader;

/**
 * Sentencing a sample sheet of 1,048,576 rows (the xlsx row limit: a header and 1,048,575 units)
 * through the whole command, against a bare POI SAX pass over the same file that only counts cells.
 * Both run in a JVM limited to 256 MiB of heap.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.SingleShotTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Fork(value = 1, jvmArgs = {"-Xmx256m", "-Dlog4j.provider=org.apache.logging.log4j.simple.internal.SimpleProvider"})
@Warmup(iterations = 1)
@Measurement(iterations = 4)
public class SentencingBenchmark {
    static final int ROWS = 1_048_576;

    private Path folder;
    private Path sheet;
    private Path plan;

    @Setup(Level.Trial)
    public void generate() throws IOException {
        folder = Files.createTempDirectory("lotgate-bench");
        sheet = folder.resolve("sample.xlsx");
        // Unit serials as numbers and results as shared strings, as a spreadsheet program saves them.
        try (SXSSFWorkbook workbook = new SXSSFWorkbook(new XSSFWorkbook(), 500, true, true);
                OutputStream out = Files.newOutputStream(sheet)) {
            Sheet rows = workbook.createSheet("Sample");
            Row header = rows.createRow(0);
            header.createCell(0).setCellValue("unit");
            header.createCell(1).setCellValue("result");
            header.createCell(2).setCellValue("defect");
            for (int r = 1; r < ROWS; r++) {
                Row row = rows.createRow(r);
                row.createCell(0).setCellValue(1_000_000 + r);
                boolean fail = r % 997 == 0;
                row.createCell(1).setCellValue(fail ? "fail" : "pass");
                if (fail) {
                    row.createCell(2).setCellValue(r % 2 == 0 ? "burr" : "crack");
                }
            }
            workbook.write(out);
            workbook.dispose();
        }
        plan = folder.resolve("plan.json");
        PlanFormat.write(plan, PlanFormat.seal("bench", "Benchmark plan (invented)", Instant.parse("2026-01-01T00:00:00Z"),
                new SinglePlan(ROWS - 1, 1100), new OcModel.Binomial(), 0, new RiskPoints(0.001, 0.05, 0.0012, 0.10),
                SavedPlan.GIVEN));
    }

    @TearDown(Level.Trial)
    public void remove() throws IOException {
        Files.deleteIfExists(sheet);
        Files.deleteIfExists(plan);
        Files.deleteIfExists(folder);
    }

    @Benchmark
    public int sentence() {
        PrintWriter nowhere = new PrintWriter(Writer.nullWriter());
        // Recording is measured on its own (HistoryBenchmark): this is the reading and the deciding.
        int code = Main.run(nowhere, nowhere, "sentence", "--no-record", plan.toString(), sheet.toString(), "--lot",
                "BENCH-1", "--format", "json");
        if (code != 0 && code != 1) {
            throw new IllegalStateException("sentencing failed with exit code " + code);
        }
        return code;
    }

    @Benchmark
    public long bareSaxPass() throws Exception {
        long[] cells = {0};
        try (OPCPackage pkg = OPCPackage.open(sheet.toFile(), PackageAccess.READ)) {
            XSSFReader reader = new XSSFReader(pkg);
            ReadOnlySharedStringsTable strings = new ReadOnlySharedStringsTable(pkg, false);
            XSSFSheetXMLHandler.SheetContentsHandler counter = new XSSFSheetXMLHandler.SheetContentsHandler() {
                @Override
                public void startRow(int rowNum) {
                }

                @Override
                public void endRow(int rowNum) {
                }

                @Override
                public void cell(String reference, String value, XSSFComment comment) {
                    cells[0]++;
                }
            };
            try (InputStream in = reader.getSheetsData().next()) {
                XMLReader xml = XMLHelper.newXMLReader();
                xml.setContentHandler(new XSSFSheetXMLHandler(reader.getStylesTable(), strings, counter, false));
                xml.parse(new InputSource(in));
            }
        }
        return cells[0];
    }
}
