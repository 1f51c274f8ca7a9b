package lotgate.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.File;
import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;
import org.apache.poi.xssf.usermodel.XSSFChart;
import org.apache.poi.xssf.usermodel.XSSFDrawing;
import org.apache.poi.xssf.usermodel.XSSFSheet;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.Assertions;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.openxmlformats.schemas.drawingml.x2006.chart.CTMarker;
import org.openxmlformats.schemas.drawingml.x2006.chart.CTPlotArea;
import org.openxmlformats.schemas.drawingml.x2006.chart.STMarkerStyle;
import org.openxmlformats.schemas.drawingml.x2006.main.CTLineProperties;
import org.openxmlformats.schemas.drawingml.x2006.main.CTShapeProperties;

/**
 * Every report the demo writes, printed as a person would print it: workbooks through LibreOffice (headless, to
 * PDF), HTML pages through headless Chromium (print to PDF). The page counts are those a quality manager gets on
 * paper, and every series of every workbook chart must say how it is drawn, since LibreOffice draws a series
 * without an explicit fill as nothing at all. The PDFs, and the page worth showing of each report as a small PNG, are
 * kept in {@code target/rendered-reports/}; the README's copies of the PNGs are in {@code docs/rendered/}.
 *
 * <p>Needs LibreOffice ({@code soffice}), Debian's Chromium and poppler-utils: skipped with a message where they
 * are missing locally, failed under CI=true ({@code .ci/run} installs them).
 */
class RenderedReportsTest {
    private static final Path CHROMIUM = Path.of("/usr/bin/chromium");
    private static final Path OUT = Path.of("target", "rendered-reports");

    /** How a report prints: its pages, whether a longer print would be a fault, and the page the README shows. */
    private record Print(int pages, boolean exact, int shown, String why) {
    }

    /**
     * The expected prints. A workbook prints each sheet fitted to the page width (chart sheets on one page), so its
     * count is exact; an HTML page flows, so its count is a most.
     */
    private static final Map<String, Print> EXPECTED = new TreeMap<>(Map.ofEntries(
            Map.entry("AF-2611.xlsx", new Print(5, true, 1,
                    "verdict, evidence, OC chart, units found, defect types: one sheet each")),
            Map.entry("arnwick-audit.xlsx", new Print(4, true, 3,
                    "summary, lots, p-chart, defect types with their Pareto chart")),
            Map.entry("mirelle-audit.xlsx", new Print(4, true, 3,
                    "summary, lots, p-chart, defect types with their Pareto chart")),
            Map.entry("AF-2611.html", new Print(1, false, 1, "an attribute lot report fits one page")),
            Map.entry("AF-2618.html", new Print(1, false, 1, "an attribute lot report fits one page")),
            Map.entry("KC-0907.html", new Print(2, false, 1,
                    "three defect classes, each with its evidence, and the units found: a second page is accepted")),
            Map.entry("KC-0911.html", new Print(1, false, 1, "a variables lot report fits one page")),
            Map.entry("KC-0915.html", new Print(1, false, 1,
                    "a variables lot report with the normality warning fits one page")),
            Map.entry("QP-2611.html", new Print(1, false, 1, "a double-plan lot report fits one page")),
            Map.entry("arnwick-audit.html", new Print(2, false, 1,
                    "summary, severity timeline and both charts on the first page, rejected lots on the second")),
            Map.entry("mirelle-audit.html", new Print(1, false, 1, "no rejected lots: one page")),
            Map.entry("kestrune-audit.html", new Print(2, false, 1,
                    "a p-chart, a Pareto chart and the mean and s charts of the bores: two pages")),
            Map.entry("quorrin-audit.html", new Print(1, false, 1, "four lots: one page")),
            Map.entry("ranking.html", new Print(1, false, 1, "four suppliers: one page"))));

    private static Path work;
    private static Path reports;
    private static Path pdfs;

    @BeforeAll
    static void printTheDemo() throws Exception {
        String soffice = requireTools();
        work = Files.createTempDirectory("lotgate-rendered-");
        // The demo runs in a JVM of its own in the work folder, so that its reports name their files as a user's
        // run does (demo-output/...), not by this machine's temporary path.
        Path java = Path.of(System.getProperty("java.home"), "bin", "java");
        Path log = work.resolve("demo.log");
        Process demo = new ProcessBuilder(java.toString(), "-Djava.awt.headless=true", "-cp",
                System.getProperty("java.class.path"), Main.class.getName(), "demo").directory(work.toFile())
                .redirectErrorStream(true).redirectOutput(log.toFile())
                .redirectInput(ProcessBuilder.Redirect.from(new File("/dev/null"))).start();
        // A bound for a hung demo only: the test waits for the process to end.
        if (!demo.waitFor(15, TimeUnit.MINUTES)) {
            demo.destroyForcibly();
            Assertions.fail("the demo did not finish within 15 minutes: " + readQuietly(log));
        }
        assertEquals(0, demo.exitValue(), () -> "the demo failed: " + readQuietly(log));
        reports = work.resolve("demo-output").resolve("reports");
        pdfs = work.resolve("pdf");
        Files.createDirectories(pdfs);
        List<String> workbooks = new ArrayList<>();
        List<Path> pages = new ArrayList<>();
        try (Stream<Path> files = Files.list(reports)) {
            files.sorted().forEach(file -> {
                String name = file.getFileName().toString();
                if (name.endsWith(".xlsx")) {
                    workbooks.add(file.toString());
                } else if (name.endsWith(".html")) {
                    pages.add(file);
                }
            });
        }
        // One LibreOffice run converts every workbook, in a profile of its own so that no other instance interferes.
        List<String> convert = new ArrayList<>(List.of(soffice,
                "-env:UserInstallation=" + work.resolve("libreoffice-profile").toUri(), "--headless", "--norestore",
                "--convert-to", "pdf", "--outdir", pdfs.toString()));
        convert.addAll(workbooks);
        run(convert, "libreoffice");
        for (Path page : pages) {
            String name = page.getFileName().toString();
            run(List.of(CHROMIUM.toString(), "--headless", "--no-sandbox", "--disable-gpu",
                    "--disable-background-networking", "--disable-component-update", "--disable-sync",
                    "--no-first-run", "--no-pdf-header-footer",
                    "--user-data-dir=" + work.resolve("chromium-" + name), "--print-to-pdf="
                            + pdfs.resolve(name + ".pdf"), page.toUri().toString()), "chromium-" + name);
        }
    }

    @AfterAll
    static void removeTheWork() throws IOException {
        if (work == null) {
            return;
        }
        try (Stream<Path> files = Files.walk(work)) {
            files.sorted(Comparator.reverseOrder()).map(Path::toFile).forEach(File::delete);
        }
    }

    @Test
    void everyReportOfTheDemoPrintsOnItsExpectedPages() throws Exception {
        List<String> written = new ArrayList<>();
        try (Stream<Path> files = Files.list(reports)) {
            files.map(f -> f.getFileName().toString()).filter(n -> n.endsWith(".xlsx") || n.endsWith(".html"))
                    .sorted().forEach(written::add);
        }
        assertEquals(List.copyOf(EXPECTED.keySet()), written, "the demo's reports and this test's list differ");
        Files.createDirectories(OUT);
        Map<String, Integer> counted = new TreeMap<>();
        for (String report : written) {
            Path pdf = pdfs.resolve(report.endsWith(".xlsx") ? report.replace(".xlsx", ".pdf") : report + ".pdf");
            assertTrue(Files.isRegularFile(pdf), () -> report + " was not printed to PDF");
            counted.put(report, pages(pdf));
            Files.copy(pdf, OUT.resolve(report + ".pdf"), java.nio.file.StandardCopyOption.REPLACE_EXISTING);
            Print print = EXPECTED.get(report);
            String base = report.replace('.', '-');
            run(List.of("pdftoppm", "-r", "60", "-png", "-singlefile", "-f", Integer.toString(print.shown()), "-l",
                    Integer.toString(print.shown()), pdf.toString(), OUT.resolve(base).toString()), "pdftoppm-" + base);
            assertTrue(Files.size(OUT.resolve(base + ".png")) > 1000, () -> report + ": its page drew nothing");
        }
        System.out.println("printed pages: " + counted);
        for (Map.Entry<String, Integer> entry : counted.entrySet()) {
            Print print = EXPECTED.get(entry.getKey());
            if (print.exact()) {
                assertEquals(print.pages(), entry.getValue(), entry.getKey() + " pages (" + print.why() + ")");
            } else {
                int pages = entry.getValue();
                assertTrue(pages >= 1 && pages <= print.pages(), () -> entry.getKey() + " prints on " + pages
                        + " pages, expected at most " + print.pages() + " (" + print.why() + ")");
            }
        }
    }

    @Test
    void everyWorkbookChartSeriesSaysHowItIsDrawn() throws Exception {
        int series = 0;
        List<String> unstyled = new ArrayList<>();
        for (String report : EXPECTED.keySet()) {
            if (!report.endsWith(".xlsx")) {
                continue;
            }
            try (InputStream in = Files.newInputStream(reports.resolve(report));
                    XSSFWorkbook workbook = new XSSFWorkbook(in)) {
                for (int s = 0; s < workbook.getNumberOfSheets(); s++) {
                    XSSFSheet sheet = workbook.getSheetAt(s);
                    XSSFDrawing drawing = sheet.getDrawingPatriarch();
                    if (drawing == null) {
                        continue;
                    }
                    for (XSSFChart chart : drawing.getCharts()) {
                        String where = report + ", sheet " + sheet.getSheetName() + ", chart " + chartTitle(chart);
                        CTPlotArea plot = chart.getCTChart().getPlotArea();
                        for (var bars : plot.getBarChartList()) {
                            for (var ser : bars.getSerList()) {
                                series++;
                                if (!filled(ser.getSpPr())) {
                                    unstyled.add(where + ", bars " + name(ser.getTx()));
                                }
                            }
                        }
                        for (var lines : plot.getLineChartList()) {
                            for (var ser : lines.getSerList()) {
                                series++;
                                if (!drawn(ser.getSpPr(), ser.getMarker())) {
                                    unstyled.add(where + ", line " + name(ser.getTx()));
                                }
                            }
                        }
                        for (var scatter : plot.getScatterChartList()) {
                            for (var ser : scatter.getSerList()) {
                                series++;
                                if (!drawn(ser.getSpPr(), ser.getMarker())) {
                                    unstyled.add(where + ", scatter " + name(ser.getTx()));
                                }
                            }
                        }
                        assertTrue(plot.getAreaChartList().isEmpty() && plot.getPieChartList().isEmpty(),
                                where + ": a chart kind this test does not check");
                    }
                }
            }
        }
        assertTrue(series >= 10, "too few chart series found: " + series);
        assertEquals(List.of(), unstyled, "series without an explicit fill or line");
    }

    /** A bar series is drawn when its shape has a solid fill of its own. */
    private static boolean filled(CTShapeProperties shape) {
        return shape != null && shape.isSetSolidFill();
    }

    /**
     * A line series is drawn when its line has a colour, or is explicitly hidden and its markers have a colour; any
     * marker it shows must have a colour too.
     */
    private static boolean drawn(CTShapeProperties shape, CTMarker marker) {
        if (shape == null || !shape.isSetLn()) {
            return false;
        }
        CTLineProperties line = shape.getLn();
        boolean markers = marker != null && marker.isSetSymbol() && marker.getSymbol().getVal() != STMarkerStyle.NONE;
        boolean markerColoured = marker != null && marker.isSetSpPr() && marker.getSpPr().isSetSolidFill();
        if (markers && !markerColoured) {
            return false;
        }
        if (line.isSetSolidFill()) {
            return true;
        }
        return line.isSetNoFill() && markers;
    }

    private static String name(org.openxmlformats.schemas.drawingml.x2006.chart.CTSerTx title) {
        if (title == null) {
            return "(untitled)";
        }
        return title.isSetV() ? title.getV() : title.isSetStrRef() ? title.getStrRef().getF() : "(untitled)";
    }

    private static String chartTitle(XSSFChart chart) {
        return chart.getTitleText() == null ? "(untitled)" : chart.getTitleText().getString();
    }

    private static int pages(Path pdf) throws Exception {
        Path info = run(List.of("pdfinfo", pdf.toString()), "pdfinfo-" + pdf.getFileName());
        for (String line : Files.readAllLines(info)) {
            if (line.startsWith("Pages:")) {
                return Integer.parseInt(line.substring("Pages:".length()).trim());
            }
        }
        throw new AssertionError("pdfinfo gave no page count for " + pdf);
    }

    /**
     * Runs a program to its end, its output kept in a log beside the work; the bound is for a hung program only,
     * generous because LibreOffice starts slowly on a loaded machine.
     */
    private static Path run(List<String> command, String label) throws Exception {
        Path log = work.resolve(label.replaceAll("[^A-Za-z0-9.-]", "_") + ".log");
        Process process = new ProcessBuilder(command).redirectErrorStream(true).redirectOutput(log.toFile())
                .redirectInput(ProcessBuilder.Redirect.from(new File("/dev/null"))).start();
        if (!process.waitFor(15, TimeUnit.MINUTES)) {
            process.destroyForcibly();
            process.waitFor();
            Assertions.fail(label + " did not finish within 15 minutes: " + Files.readString(log));
        }
        assertEquals(0, process.exitValue(), () -> label + " failed: " + readQuietly(log));
        return log;
    }

    private static String readQuietly(Path log) {
        try {
            return Files.readString(log);
        } catch (IOException e) {
            return "(no log: " + e.getMessage() + ")";
        }
    }

    /** Finds soffice, Chromium and poppler's tools; skips locally where one is missing, fails under CI=true. */
    private static String requireTools() {
        String soffice = onPath("soffice");
        List<String> missing = new ArrayList<>();
        if (soffice == null) {
            missing.add("LibreOffice's soffice (apt-get install libreoffice-calc-nogui)");
        }
        if (!Files.isExecutable(CHROMIUM)) {
            missing.add(CHROMIUM + " (apt-get install chromium)");
        }
        if (onPath("pdfinfo") == null || onPath("pdftoppm") == null) {
            missing.add("pdfinfo and pdftoppm (apt-get install poppler-utils)");
        }
        if (!missing.isEmpty()) {
            String message = "rendering the demo's reports needs " + String.join(", ", missing);
            if ("true".equals(System.getenv("CI"))) {
                Assertions.fail(message);
            }
            System.err.println("SKIPPED: " + message);
            Assumptions.abort(message);
        }
        return soffice;
    }

    private static String onPath(String program) {
        String path = System.getenv("PATH");
        if (path == null) {
            return null;
        }
        for (String folder : path.split(File.pathSeparator)) {
            Path candidate = Path.of(folder, program);
            if (Files.isExecutable(candidate)) {
                return candidate.toString();
            }
        }
        return null;
    }
}
