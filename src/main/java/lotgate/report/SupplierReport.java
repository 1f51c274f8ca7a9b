package lotgate.report;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import lotgate.files.AtomicWrite;
import lotgate.history.LotRow;
import lotgate.history.MeasurementCharts;
import lotgate.history.QualityStatistics;
import lotgate.history.SeverityTracker;
import lotgate.history.SupplierAudit;
import lotgate.sentencing.BoundMethod;
import org.apache.poi.ss.usermodel.CellStyle;
import org.apache.poi.ss.usermodel.Font;
import org.apache.poi.xddf.usermodel.PresetLineDash;
import org.apache.poi.xddf.usermodel.chart.AxisPosition;
import org.apache.poi.xddf.usermodel.chart.MarkerStyle;
import org.apache.poi.xddf.usermodel.chart.XDDFBarChartData;
import org.apache.poi.xddf.usermodel.chart.XDDFCategoryAxis;
import org.apache.poi.xddf.usermodel.chart.XDDFDataSource;
import org.apache.poi.xddf.usermodel.chart.XDDFLineChartData;
import org.apache.poi.xddf.usermodel.chart.XDDFValueAxis;
import org.apache.poi.xssf.usermodel.XSSFChart;
import org.apache.poi.xssf.usermodel.XSSFRow;
import org.apache.poi.xssf.usermodel.XSSFSheet;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.jfree.svg.SVGGraphics2D;
import org.jfree.svg.ViewBox;

/**
 * The supplier audit report: an .xlsx workbook with native spreadsheet charts over its data sheets,
 * or a self-contained, printable .html page with the charts inline as SVG. Names from the history
 * are made inert in both.
 */
public final class SupplierReport {
    private SupplierReport() {
    }

    public static boolean supported(Path file) {
        String name = file.getFileName().toString().toLowerCase(Locale.ROOT);
        return name.endsWith(".xlsx") || name.endsWith(".html") || name.endsWith(".htm");
    }

    /**
     * @param evidence per rejected lot, in the order of {@code audit.rejectedLots()}, a line of its evidence
     */
    public static void write(SupplierAudit audit, List<String> evidence, Path file) {
        String name = file.getFileName().toString().toLowerCase(Locale.ROOT);
        if (name.endsWith(".xlsx")) {
            xlsx(audit, evidence, file);
        } else {
            AtomicWrite.writeString(file, html(audit, evidence));
        }
    }

    public static String title(SupplierAudit audit) {
        return "Supplier audit: " + audit.supplier() + (audit.part() == null ? ", all parts" : ", part " + audit.part())
                + period(audit);
    }

    static String period(SupplierAudit audit) {
        if (audit.from() == null && audit.to() == null) {
            return "";
        }
        return ", " + (audit.from() == null ? "start" : audit.from().toString()) + " to "
                + (audit.to() == null ? "today" : audit.to().toString());
    }

    /** The audit's headline numbers in words, the same on every output. */
    public static List<String> summary(SupplierAudit audit) {
        String level = SentenceText.percent(audit.confidence());
        QualityStatistics.ProcessAverage rate = audit.acceptanceRate();
        QualityStatistics.ProcessAverage average = audit.processAverage();
        List<String> lines = new java.util.ArrayList<>();
        lines.add(audit.lots() + " lots: " + audit.accepted() + " accepted, " + audit.rejected() + " rejected"
                + (audit.lots() == 0 ? "" : " (acceptance rate " + SentenceText.percent(rate.average()) + ", " + level
                        + " interval " + SentenceText.percent(rate.lower()) + " to " + SentenceText.percent(rate.upper())
                        + ")"));
        if (average.inspected() > 0) {
            lines.add("process average " + SentenceText.percent(average.average()) + " nonconforming (" + level
                    + " Clopper-Pearson interval " + SentenceText.percent(average.lower()) + " to "
                    + SentenceText.percent(average.upper()) + "), " + average.nonconforming() + " nonconforming in "
                    + average.inspected() + " units inspected");
        }
        long beyond = audit.pChart().stream().filter(QualityStatistics.PChartPoint::outOfControl).count();
        lines.add("p-chart: " + beyond + " of " + audit.pChart().size() + " lots outside the 3-sigma limits");
        for (SupplierAudit.Part part : audit.parts()) {
            lines.add("part " + part.part() + ": " + part.current().label() + " inspection now, "
                    + Words.count(part.switches().size(), "switch", "switches") + " over " + Words.count(part.lots(), "lot"));
        }
        MeasurementCharts charts = audit.measurements();
        if (charts != null) {
            String unit = charts.unit().isEmpty() ? "" : " " + charts.unit();
            long outside = charts.points().stream().filter(MeasurementCharts.Point::outOfControl).count();
            lines.add(Words.count(charts.points().size(), "lot") + " judged on measurements of " + what(charts) + ": grand mean "
                    + SentenceText.number(charts.grandMean()) + unit + ", process sigma estimated "
                    + SentenceText.number(charts.sigma()) + unit + "; " + outside + " outside the 3-sigma limits of the"
                    + " mean or s chart");
        }
        return lines;
    }

    // ---- xlsx ----

    private static void xlsx(SupplierAudit audit, List<String> evidence, Path file) {
        try (XSSFWorkbook workbook = new XSSFWorkbook()) {
            String generated = java.time.LocalDate.now(java.time.ZoneOffset.UTC).toString();
            WorkbookLayout.baseFont(workbook);
            String title = title(audit);
            String subject = audit.supplier() + (audit.part() == null ? "" : ", part " + audit.part());
            CellStyle bold = workbook.createCellStyle();
            Font font = WorkbookLayout.font(workbook);
            font.setBold(true);
            bold.setFont(font);
            CellStyle big = workbook.createCellStyle();
            Font bigFont = WorkbookLayout.font(workbook);
            bigFont.setBold(true);
            bigFont.setFontHeightInPoints((short) 14);
            big.setFont(bigFont);
            big.setWrapText(true);
            CellStyle quoted = workbook.createCellStyle();
            quoted.setQuotePrefixed(true);
            CellStyle percent = WorkbookLayout.format(workbook, "0.00%");
            CellStyle count = WorkbookLayout.format(workbook, "#,##0");
            CellStyle day = WorkbookLayout.format(workbook, "yyyy-mm-dd");
            CellStyle measure = WorkbookLayout.format(workbook, "0.0000");
            CellStyle wrapped = WorkbookLayout.wrapped(workbook);
            CellStyle heading = WorkbookLayout.heading(workbook);
            CellStyle text = WorkbookLayout.text(workbook);
            CellStyle numberHeading = WorkbookLayout.numberHeading(workbook);
            Cells cells = new Cells(bold, quoted, percent);

            XSSFSheet summary = workbook.createSheet("Summary");
            int lineWidth = 100;
            summary.setColumnWidth(0, lineWidth * 256);
            int r = 0;
            cells.line(summary.createRow(r++), title, big, lineWidth, 18);
            cells.line(summary.createRow(r++), "made " + generated + " by lotgate", null, lineWidth, 13);
            r++;
            for (String line : summary(audit)) {
                cells.line(summary.createRow(r++), line, wrapped, lineWidth, 13);
            }
            r++;
            cells.put(summary.createRow(r++), 0, "Severity switches", bold);
            for (SupplierAudit.Part part : audit.parts()) {
                if (part.switches().isEmpty()) {
                    cells.line(summary.createRow(r++), part.part() + ": normal inspection throughout", wrapped,
                            lineWidth, 13);
                }
                for (SeverityTracker.Switch change : part.switches()) {
                    cells.line(summary.createRow(r++), part.part() + ": after lot " + (change.lot() == null ? "-"
                            : change.lot()) + ", " + change.from().label() + " to " + change.to().label() + ": "
                            + change.reason(), wrapped, lineWidth, 13);
                }
            }
            r++;
            cells.put(summary.createRow(r++), 0, "Rejected lots", bold);
            if (audit.rejectedLots().isEmpty()) {
                cells.line(summary.createRow(r++), "none in this period", wrapped, lineWidth, 13);
            }
            for (int i = 0; i < audit.rejectedLots().size(); i++) {
                LotRow lot = audit.rejectedLots().get(i);
                cells.line(summary.createRow(r++), heading(lot) + ": " + evidence.get(i), wrapped, lineWidth, 13);
            }
            WorkbookLayout.print(workbook, summary, false, 0, r, 0, false, title, subject, generated);

            XSSFSheet lots = workbook.createSheet("Lots");
            String[] headings = {"Record", "Lot", "Part", "Received", "Units inspected", "Nonconforming units",
                    "Fraction nonconforming", "Centre line", "Lower control limit", "Upper control limit", "Verdict",
                    "Severity"};
            WorkbookLayout.Widths widths = new WorkbookLayout.Widths(headings.length);
            XSSFRow head = lots.createRow(0);
            head.setHeightInPoints(44);
            for (int c = 0; c < headings.length; c++) {
                cells.put(head, c, headings[c], c == 0 || (c >= 4 && c <= 9) ? numberHeading : heading);
                widths.note(c, headings[c], true);
            }
            for (int index = 0; index < audit.pChart().size(); index++) {
                QualityStatistics.PChartPoint point = audit.pChart().get(index);
                LotRow lot = audit.lotsInOrder().get(index);
                XSSFRow row = lots.createRow(index + 1);
                cells.put(row, 0, lot.seq(), count);
                cells.put(row, 1, point.lot(), text);
                cells.put(row, 2, lot.part(), text);
                if (lot.received() != null) {
                    row.createCell(3).setCellValue(lot.received());
                    row.getCell(3).setCellStyle(day);
                }
                cells.put(row, 4, point.inspected(), count);
                cells.put(row, 5, lot.nonconforming(), count);
                cells.put(row, 6, point.fraction(), percent);
                cells.put(row, 7, point.centre(), percent);
                cells.put(row, 8, point.lower(), percent);
                cells.put(row, 9, point.upper(), percent);
                cells.put(row, 10, lot.verdict(), text);
                cells.put(row, 11, lot.severity(), text);
                widths.note(1, point.lot(), false);
                widths.note(2, lot.part(), false);
                widths.note(3, "2026-12-31", false);
                widths.note(10, lot.verdict(), false);
                widths.note(11, lot.severity(), false);
            }
            widths.apply(lots, 8, 28);
            lots.createFreezePane(0, 1);
            int n = audit.pChart().size();
            WorkbookLayout.print(workbook, lots, true, headings.length - 1, n, 1, false, title, subject, generated);
            if (n > 0) {
                pChartSheet(workbook, audit, cells, percent, title, subject, generated);
            }
            MeasurementCharts charts = audit.measurements();
            if (charts != null) {
                XSSFSheet measured = workbook.createSheet("Measurements");
                String[] columns = {"Lot", "Received", "Units measured", "Mean", "Centre line", "Lower control limit",
                        "Upper control limit", "s", "s centre line", "s lower control limit", "s upper control limit"};
                WorkbookLayout.Widths measuredWidths = new WorkbookLayout.Widths(columns.length);
                XSSFRow top = measured.createRow(0);
                top.setHeightInPoints(44);
                for (int c = 0; c < columns.length; c++) {
                    cells.put(top, c, columns[c], c >= 2 ? numberHeading : heading);
                    measuredWidths.note(c, columns[c], true);
                }
                int row = 1;
                for (MeasurementCharts.Point point : charts.points()) {
                    XSSFRow line = measured.createRow(row++);
                    cells.put(line, 0, point.lot(), text);
                    if (point.received() != null) {
                        line.createCell(1).setCellValue(point.received());
                        line.getCell(1).setCellStyle(day);
                    }
                    cells.put(line, 2, point.n(), count);
                    double[] values = {point.mean(), charts.grandMean(), point.meanLower(), point.meanUpper(),
                            point.deviation(), point.deviationCentre(), point.deviationLower(), point.deviationUpper()};
                    for (int v = 0; v < values.length; v++) {
                        cells.put(line, 3 + v, values[v], measure);
                    }
                    measuredWidths.note(0, point.lot(), false);
                    measuredWidths.note(1, "2026-12-31", false);
                }
                measuredWidths.apply(measured, 9, 28);
                measured.createFreezePane(0, 1);
                int m = charts.points().size();
                WorkbookLayout.print(workbook, measured, true, columns.length - 1, m, 1, false, title, subject,
                        generated);
                String unit = charts.unit().isEmpty() ? "" : " (" + charts.unit() + ")";
                XSSFSheet chartSheet = workbook.createSheet("Mean and s charts");
                controlChart(chartSheet, measured, "Means of " + what(charts), "Mean" + unit, m, 3,
                        new String[] {"Lot mean", "Centre line", "Lower control limit", "Upper control limit"}, 0);
                controlChart(chartSheet, measured, "Standard deviations of " + what(charts), "s" + unit, m, 7,
                        new String[] {"Lot s", "Centre line", "Lower control limit", "Upper control limit"}, 30);
                WorkbookLayout.print(workbook, chartSheet, false, 11, 59, 0, true, title, subject, generated);
            }

            XSSFSheet types = workbook.createSheet("Defect types");
            XSSFRow typesHead = types.createRow(0);
            typesHead.setHeightInPoints(30);
            cells.put(typesHead, 0, "Defect type", heading);
            cells.put(typesHead, 1, "Nonconforming units", numberHeading);
            cells.put(typesHead, 2, "Cumulative share", numberHeading);
            WorkbookLayout.Widths typeWidths = new WorkbookLayout.Widths(3);
            typeWidths.note(0, "Defect type", true);
            typeWidths.note(1, "Nonconforming", true);
            typeWidths.note(2, "Cumulative", true);
            int t = 1;
            for (QualityStatistics.ParetoBar bar : audit.pareto()) {
                XSSFRow row = types.createRow(t++);
                cells.put(row, 0, bar.defect(), text);
                cells.put(row, 1, bar.count(), count);
                cells.put(row, 2, bar.cumulativeShare(), percent);
                typeWidths.note(0, bar.defect(), false);
            }
            typeWidths.apply(types, 10, 36);
            int m = audit.pareto().size();
            if (m > 0) {
                XSSFChart chart = NativeCharts.chart(types, paretoTitle(audit), 4, 0, 16, 26);
                XDDFCategoryAxis bottom = NativeCharts.categoryAxis(chart, "Defect type, most frequent first");
                XDDFValueAxis left = NativeCharts.valueAxis(chart, AxisPosition.LEFT, "Nonconforming units", "0");
                left.setCrosses(org.apache.poi.xddf.usermodel.chart.AxisCrosses.AUTO_ZERO);
                left.setMinimum(0);
                XDDFDataSource<String> names = NativeCharts.names(types, 1, m, 0);
                XDDFBarChartData bars = NativeCharts.bars(chart, bottom, left);
                bars.setGapWidth(60);
                NativeCharts.addBars(bars, names, NativeCharts.numbers(types, 1, m, 1), "Nonconforming units",
                        ChartStyle.DATA, ChartStyle.INK);
                // The leading type in the data's full colour, the others lighter: the bar that dominates reads first.
                for (int b = 1; b < m; b++) {
                    NativeCharts.barColour(bars, 0, b, ChartStyle.DATA_LIGHT, ChartStyle.INK);
                }
                chart.plot(bars);
                XDDFValueAxis right = NativeCharts.secondAxis(chart, "Cumulative share", "0%")[0];
                NativeCharts.range(right, 0, 1);
                XDDFLineChartData line = NativeCharts.lines(chart, NativeCharts.lastCategoryAxis(chart), right);
                NativeCharts.addLine(line, names, NativeCharts.numbers(types, 1, m, 2), "Cumulative share",
                        NativeCharts.Look.lineWithMarkers(ChartStyle.ALERT, 2.25, MarkerStyle.CIRCLE, 6));
                chart.plot(line);
            }
            WorkbookLayout.print(workbook, types, true, 16, Math.max(26, m), 1, true, title, subject, generated);
            AtomicWrite.write(file, workbook::write);
        } catch (IOException e) {
            throw new lotgate.files.OutputFileException(file, e);
        }
    }

    /**
     * The p-chart as a native chart: the lots' fractions with centre and limits, marks for lots outside the limits
     * and for rejected lots, and shaded bars behind the lots judged under tightened or reduced inspection. Its data
     * sit to the right of the printed area.
     */
    private static void pChartSheet(XSSFWorkbook workbook, SupplierAudit audit, Cells cells, CellStyle percent,
            String title, String subject, String generated) {
        XSSFSheet sheet = workbook.createSheet("p-chart");
        int n = audit.pChart().size();
        int first = 20;
        String[] columns = {"Lot", "Fraction nonconforming", "Centre line", "Lower control limit",
                "Upper control limit", "Outside the control limits", "Lot rejected", "Tightened inspection",
                "Reduced inspection"};
        XSSFRow head = sheet.getRow(0) != null ? sheet.getRow(0) : sheet.createRow(0);
        for (int c = 0; c < columns.length; c++) {
            cells.put(head, first + c, columns[c], null);
        }
        double top = 0;
        for (QualityStatistics.PChartPoint point : audit.pChart()) {
            top = Math.max(top, Math.max(point.upper(), point.fraction()));
        }
        top = Math.ceil(top * 1.15 * 200) / 200;
        boolean tightened = false;
        boolean reduced = false;
        for (int i = 0; i < n; i++) {
            QualityStatistics.PChartPoint point = audit.pChart().get(i);
            LotRow lot = audit.lotsInOrder().get(i);
            XSSFRow row = sheet.getRow(i + 1) != null ? sheet.getRow(i + 1) : sheet.createRow(i + 1);
            cells.put(row, first, point.lot(), null);
            cells.put(row, first + 1, point.fraction(), percent);
            cells.put(row, first + 2, point.centre(), percent);
            cells.put(row, first + 3, point.lower(), percent);
            cells.put(row, first + 4, point.upper(), percent);
            if (point.outOfControl()) {
                cells.put(row, first + 5, point.fraction(), percent);
            }
            if (!lot.accepted()) {
                cells.put(row, first + 6, point.fraction(), percent);
            }
            if ("tightened".equals(lot.severity())) {
                cells.put(row, first + 7, top, percent);
                tightened = true;
            }
            if ("reduced".equals(lot.severity())) {
                cells.put(row, first + 8, top, percent);
                reduced = true;
            }
        }
        // A part whose severity changed after its last lot: a slot after the lots, shaded for the severity its next
        // lot gets, so that a switch at the end of the period shows as plainly as one in the middle.
        int slots = n;
        for (SupplierAudit.Part part : audit.parts()) {
            String now = part.current().label();
            LotRow last = null;
            for (LotRow lot : audit.lotsInOrder()) {
                if (lot.part().equals(part.part())) {
                    last = lot;
                }
            }
            boolean changed = last != null && !now.equals(last.severity());
            if (changed && ("tightened".equals(now) || "reduced".equals(now))) {
                XSSFRow row = sheet.getRow(slots + 1) != null ? sheet.getRow(slots + 1) : sheet.createRow(slots + 1);
                cells.put(row, first, audit.parts().size() == 1 ? "next lot" : "next " + part.part(), null);
                cells.put(row, first + ("tightened".equals(now) ? 7 : 8), top, percent);
                tightened |= "tightened".equals(now);
                reduced |= "reduced".equals(now);
                slots++;
            }
        }
        n = slots;
        XSSFChart chart = NativeCharts.chart(sheet, "p-chart: lot fractions nonconforming", 0, 0, 18, 34);
        XDDFCategoryAxis bottom = NativeCharts.categoryAxis(chart, "Lot, in the order received");
        XDDFValueAxis left = NativeCharts.valueAxis(chart, AxisPosition.LEFT, "Fraction nonconforming", "0.0%");
        NativeCharts.range(left, 0, top);
        XDDFDataSource<String> names = NativeCharts.names(sheet, 1, n, first);
        if (tightened || reduced) {
            // Shading behind the lots judged under a changed severity: its edges are the switches.
            XDDFBarChartData bands = NativeCharts.bars(chart, bottom, left);
            bands.setGapWidth(0);
            // Tightened and reduced never share a lot: stacked, each lot's one band fills its whole slot.
            bands.setBarGrouping(org.apache.poi.xddf.usermodel.chart.BarGrouping.STACKED);
            if (tightened) {
                NativeCharts.addBars(bands, names, NativeCharts.numbers(sheet, 1, n, first + 7),
                        "Under tightened inspection", ChartStyle.TIGHTENED_SHADE, null);
            }
            if (reduced) {
                NativeCharts.addBars(bands, names, NativeCharts.numbers(sheet, 1, n, first + 8),
                        "Under reduced inspection", ChartStyle.REDUCED_SHADE, null);
            }
            chart.plot(bands);
        }
        XDDFLineChartData lines = NativeCharts.lines(chart, bottom, left);
        NativeCharts.addLine(lines, names, NativeCharts.numbers(sheet, 1, n, first + 1), "Lot fraction nonconforming",
                NativeCharts.Look.lineWithMarkers(ChartStyle.DATA, 1.75, MarkerStyle.CIRCLE, 5));
        NativeCharts.addLine(lines, names, NativeCharts.numbers(sheet, 1, n, first + 2), "Centre line",
                NativeCharts.Look.line(ChartStyle.CALM, 1.25, PresetLineDash.LARGE_DASH_DOT));
        NativeCharts.addLine(lines, names, NativeCharts.numbers(sheet, 1, n, first + 4), "Upper control limit",
                NativeCharts.Look.line(ChartStyle.ALERT, 1.5, PresetLineDash.DASH));
        NativeCharts.addLine(lines, names, NativeCharts.numbers(sheet, 1, n, first + 3), "Lower control limit",
                NativeCharts.Look.line(ChartStyle.ALERT, 1.5, PresetLineDash.SYSTEM_DASH));
        // A large triangle under a small cross, so that a rejected lot outside the limits shows both marks, and the
        // triangle labelled with what it means.
        // Marks only where there is something to mark, so that the legend lists no mark the chart lacks.
        if (audit.pChart().stream().anyMatch(QualityStatistics.PChartPoint::outOfControl)) {
            NativeCharts.addLine(lines, names, NativeCharts.numbers(sheet, 1, n, first + 5),
                    "Outside the control limits", NativeCharts.Look.markers(ChartStyle.ALERT, MarkerStyle.TRIANGLE, 15));
            int at = 0;
            while (!audit.pChart().get(at).outOfControl()) {
                at++;
            }
            // The label on the side with room: left of a late lot, right of an early one.
            NativeCharts.labelWithName(lines, lines.getSeriesCount() - 1, ChartStyle.ALERT, at > n / 2);
        }
        if (audit.lotsInOrder().stream().anyMatch(lot -> !lot.accepted())) {
            NativeCharts.addLine(lines, names, NativeCharts.numbers(sheet, 1, n, first + 6), "Lot rejected",
                    NativeCharts.Look.markers(ChartStyle.INK, MarkerStyle.X, 7));
        }
        chart.plot(lines);
        WorkbookLayout.print(workbook, sheet, true, 18, 34, 0, true, title, subject, generated);
    }

    private static String what(MeasurementCharts charts) {
        return charts.characteristic().isEmpty() ? "the measurements" : charts.characteristic();
    }

    /**
     * A native chart of a value and its centre and limits, read from four adjacent columns of a data sheet whose
     * first column names the lots; the value axis spans the data, not from 0.
     */
    private static void controlChart(XSSFSheet sheet, XSSFSheet dataSheet, String title, String valueTitle, int n,
            int firstColumn, String[] series, int topRow) {
        XSSFChart chart = NativeCharts.chart(sheet, title, 0, topRow, 12, topRow + 29);
        XDDFCategoryAxis bottom = NativeCharts.categoryAxis(chart, "Lot, in the order received");
        XDDFValueAxis left = NativeCharts.valueAxis(chart, AxisPosition.LEFT, valueTitle, "General");
        double low = Double.POSITIVE_INFINITY;
        double high = Double.NEGATIVE_INFINITY;
        for (int r = 1; r <= n; r++) {
            for (int c = firstColumn; c < firstColumn + series.length; c++) {
                double value = dataSheet.getRow(r).getCell(c).getNumericCellValue();
                low = Math.min(low, value);
                high = Math.max(high, value);
            }
        }
        double margin = (high - low) * 0.08 + 1e-12;
        NativeCharts.range(left, low - margin, high + margin);
        left.setCrosses(org.apache.poi.xddf.usermodel.chart.AxisCrosses.MIN);
        XDDFDataSource<String> names = NativeCharts.names(dataSheet, 1, n, 0);
        XDDFLineChartData data = NativeCharts.lines(chart, bottom, left);
        NativeCharts.addLine(data, names, NativeCharts.numbers(dataSheet, 1, n, firstColumn), series[0],
                NativeCharts.Look.lineWithMarkers(ChartStyle.DATA, 1.75, MarkerStyle.CIRCLE, 5));
        NativeCharts.addLine(data, names, NativeCharts.numbers(dataSheet, 1, n, firstColumn + 1), series[1],
                NativeCharts.Look.line(ChartStyle.CALM, 1.25, PresetLineDash.LARGE_DASH_DOT));
        NativeCharts.addLine(data, names, NativeCharts.numbers(dataSheet, 1, n, firstColumn + 2), series[2],
                NativeCharts.Look.line(ChartStyle.ALERT, 1.5, PresetLineDash.SYSTEM_DASH));
        NativeCharts.addLine(data, names, NativeCharts.numbers(dataSheet, 1, n, firstColumn + 3), series[3],
                NativeCharts.Look.line(ChartStyle.ALERT, 1.5, PresetLineDash.DASH));
        chart.plot(data);
    }

    /** Writes cells, with formula-like text quote-prefixed so that a spreadsheet never runs it. */
    private record Cells(CellStyle bold, CellStyle quoted, CellStyle percent) {
        void put(XSSFRow row, int column, Object value, CellStyle style) {
            if (value == null) {
                return;
            }
            var cell = row.createCell(column);
            if (value instanceof Number number) {
                cell.setCellValue(number.doubleValue());
            } else {
                String text = value.toString();
                cell.setCellValue(LotReportXlsx.fitted(text));
                if (LotReport.looksLikeFormula(text)) {
                    cell.setCellStyle(quoted);
                    return;
                }
            }
            if (style != null) {
                cell.setCellStyle(style);
            }
        }

        /** A line of text in a column of the given width, its row as tall as its wrapped lines need. */
        void line(XSSFRow row, String text, CellStyle style, int width, float lineHeight) {
            put(row, 0, text, style);
            // The column holds about 1.1 characters of body text per character of width (LibreOffice's Liberation
            // Sans wraps earlier than Calibri would): estimate the wrapped lines from that.
            int lines = Math.max(1, (int) Math.ceil(text.length() / (width * 1.1)));
            row.setHeightInPoints(lines * lineHeight + 2);
        }
    }

    // ---- html ----

    private static String svg(org.jfree.chart.JFreeChart chart, int width, int height) {
        SVGGraphics2D svg = new SVGGraphics2D(width, height);
        chart.draw(svg, new java.awt.Rectangle(0, 0, width, height));
        return svg.getSVGElement(null, false, new ViewBox(0, 0, width, height), null, null);
    }

    /** The audit's p-chart with its lots' verdicts, severities and switches. */
    static org.jfree.chart.JFreeChart pChart(SupplierAudit audit) {
        List<Charts.ControlPoint> points = new java.util.ArrayList<>();
        java.util.Map<String, Integer> index = new java.util.HashMap<>();
        for (int i = 0; i < audit.pChart().size(); i++) {
            QualityStatistics.PChartPoint point = audit.pChart().get(i);
            LotRow lot = audit.lotsInOrder().get(i);
            points.add(new Charts.ControlPoint(point.lot(), point.fraction(), point.centre(), point.lower(),
                    point.upper(), !lot.accepted(), lot.severity()));
            index.put(lot.part() + "\u0000" + lot.lot(), i);
        }
        List<Charts.SwitchMark> switches = new java.util.ArrayList<>();
        for (SupplierAudit.Part part : audit.parts()) {
            for (SeverityTracker.Switch change : part.switches()) {
                Integer at = change.lot() == null ? null : index.get(part.part() + "\u0000" + change.lot());
                if (at != null) {
                    switches.add(new Charts.SwitchMark(at, change.to().label()));
                }
            }
        }
        return Charts.pChart("p-chart: lot fractions nonconforming", points, switches);
    }

    private static List<Charts.ControlPoint> meanPoints(SupplierAudit audit) {
        MeasurementCharts charts = audit.measurements();
        return charts.points().stream().map(p -> new Charts.ControlPoint(p.lot(), p.mean(), charts.grandMean(),
                p.meanLower(), p.meanUpper(), false, null)).toList();
    }

    private static List<Charts.ControlPoint> deviationPoints(SupplierAudit audit) {
        return audit.measurements().points().stream().map(p -> new Charts.ControlPoint(p.lot(), p.deviation(),
                p.deviationCentre(), p.deviationLower(), p.deviationUpper(), false, null)).toList();
    }

    static String html(SupplierAudit audit, List<String> evidence) {
        StringBuilder html = new StringBuilder("<!DOCTYPE html>\n<html lang=\"en\"><head><meta charset=\"utf-8\">\n<title>")
                .append(LotReportHtml.escape(title(audit))).append("</title>\n<style>\n")
                .append("@page { size: A4; margin: 12mm; }\n")
                .append("body { font: 10pt/1.35 system-ui, sans-serif; color: #222; max-width: 190mm; margin: 0 auto; }\n")
                .append("h1 { font-size: 14pt; } h2 { font-size: 11pt; margin: 10pt 0 3pt; break-after: avoid; }\n")
                .append("tr, svg, .keep { break-inside: avoid; }\n")
                .append("table { border-collapse: collapse; } td, th { border-bottom: 1px solid #ccc; padding: 2pt 6pt;")
                .append(" text-align: left; } th { background: #f0f0f0; } td.n { text-align: right; }\n")
                .append("svg { width: 100%; height: auto; } table.lots td:nth-child(-n+5), table.timeline td:nth-child(-n+3) { white-space: nowrap; }\n")
                .append("</style></head><body>\n<h1>").append(LotReportHtml.escape(title(audit))).append("</h1>\n<ul>\n");
        for (String line : summary(audit)) {
            html.append("<li>").append(LotReportHtml.escape(line)).append("</li>\n");
        }
        html.append("</ul>\n<h2>Severity timeline</h2>\n<table class=\"timeline\"><tr><th>Part</th><th>After lot</th><th>Switch</th>"
                + "<th>Reason</th></tr>\n");
        for (SupplierAudit.Part part : audit.parts()) {
            if (part.switches().isEmpty()) {
                html.append("<tr><td>").append(LotReportHtml.escape(part.part()))
                        .append("</td><td colspan=\"3\">normal inspection throughout</td></tr>\n");
            }
            for (SeverityTracker.Switch change : part.switches()) {
                html.append("<tr><td>").append(LotReportHtml.escape(part.part())).append("</td><td>")
                        .append(LotReportHtml.escape(change.lot() == null ? "-" : change.lot())).append("</td><td>")
                        .append(change.from().label()).append(" to ").append(change.to().label()).append("</td><td>")
                        .append(LotReportHtml.escape(change.reason())).append("</td></tr>\n");
            }
        }
        html.append("</table>\n");
        if (!audit.pChart().isEmpty()) {
            html.append("<h2>p-chart</h2>\n").append(svg(pChart(audit), 900, 400)).append('\n');
        }
        if (!audit.pareto().isEmpty()) {
            List<QualityStatistics.ParetoBar> bars = audit.pareto();
            html.append("<h2>Defect types</h2>\n").append(svg(Charts.pareto(paretoTitle(audit),
                    bars.stream().map(QualityStatistics.ParetoBar::defect).toList(),
                    bars.stream().mapToLong(QualityStatistics.ParetoBar::count).toArray(),
                    bars.stream().mapToDouble(QualityStatistics.ParetoBar::cumulativeShare).toArray()), 900, 330))
                    .append('\n');
        }
        MeasurementCharts charts = audit.measurements();
        if (charts != null) {
            String unit = charts.unit().isEmpty() ? "" : " (" + charts.unit() + ")";
            html.append("<h2>Measurements: means and standard deviations</h2>\n")
                    .append(svg(Charts.control("Means of " + what(charts), meanPoints(audit), "Mean" + unit), 900,
                            360)).append('\n')
                    .append(svg(Charts.control("Standard deviations of " + what(charts), deviationPoints(audit),
                            "s" + unit), 900, 360)).append('\n');
        }
        // A short list of rejected lots stays with its heading, on one page.
        boolean keep = audit.rejectedLots().size() <= 12;
        html.append(keep ? "<div class=\"keep\">" : "").append("<h2>Rejected lots</h2>\n");
        if (audit.rejectedLots().isEmpty()) {
            html.append("<p>none in this period</p>\n</div>\n</body></html>\n");
            return html.toString();
        }
        html.append("<table class=\"lots\"><tr><th>Record</th><th>Lot</th><th>Part</th><th>Received</th>"
                + "<th>Found</th><th>Evidence</th></tr>\n");
        for (int i = 0; i < audit.rejectedLots().size(); i++) {
            LotRow lot = audit.rejectedLots().get(i);
            html.append("<tr><td class=\"n\">").append(lot.seq()).append("</td><td>").append(LotReportHtml.escape(lot.lot()))
                    .append("</td><td>").append(LotReportHtml.escape(lot.part())).append("</td><td>")
                    .append(lot.received() == null ? "not recorded" : lot.received()).append("</td><td class=\"n\">")
                    .append(lot.nonconforming()).append(" of ").append(lot.inspected()).append("</td><td>")
                    .append(LotReportHtml.escape(evidence.get(i))).append("</td></tr>\n");
        }
        html.append("</table>\n").append(keep ? "</div>\n" : "").append("</body></html>\n");
        return html.toString();
    }

    /** The Pareto chart's title, naming the defect type that leads (or the types that share the lead). */
    static String paretoTitle(SupplierAudit audit) {
        List<QualityStatistics.ParetoBar> bars = audit.pareto();
        if (bars.isEmpty()) {
            return "Pareto of defect types";
        }
        List<String> leading = bars.stream().filter(b -> b.count() == bars.get(0).count())
                .map(QualityStatistics.ParetoBar::defect).toList();
        return "Pareto of defect types: " + (leading.size() == 1 ? leading.get(0) + " leads"
                : String.join(" and ", leading) + " share the lead");
    }

    /** A rejected lot named for the audit: record, lot, part and receipt date, or that the date is missing. */
    public static String heading(LotRow lot) {
        return "#" + lot.seq() + " " + lot.lot() + " (" + lot.part() + ", "
                + (lot.received() == null ? "receipt date not recorded" : "received " + lot.received()) + ")";
    }

    /**
     * A lot judged on measurements, described by its own criterion from its decision record: the statistic
     * against k (or the estimate against M), and the upper bound on the fraction beyond the limits by its method.
     */
    public static String measuredEvidence(JsonNode decision) {
        JsonNode measured = decision.path("measurement");
        String unit = measured.path("unit").asText("").isEmpty() ? "" : " " + measured.path("unit").asText();
        boolean sigmaKnown = measured.path("sigmaKnown").asBoolean();
        String deviation = sigmaKnown ? "sigma" : "s";
        List<String> criterion = new ArrayList<>();
        if (measured.hasNonNull("maxEstimate")) {
            criterion.add("estimated fraction beyond the limits " + SentenceText.percent(measured.path("estimate")
                    .asDouble()) + " against M = " + SentenceText.percent(measured.path("maxEstimate").asDouble()));
        } else {
            if (measured.hasNonNull("statisticLower")) {
                criterion.add("(mean - L)/" + deviation + " = " + SentenceText.number(measured.path("statisticLower")
                        .asDouble()));
            }
            if (measured.hasNonNull("statisticUpper")) {
                criterion.add("(U - mean)/" + deviation + " = " + SentenceText.number(measured.path("statisticUpper")
                        .asDouble()));
            }
            criterion.add("k = " + SentenceText.number(measured.path("k").asDouble()));
        }
        return "measured " + measured.path("characteristic").asText() + ": mean "
                + SentenceText.number(measured.path("mean").asDouble()) + unit + ", " + deviation + " "
                + SentenceText.number(measured.path("standardDeviation").asDouble()) + unit + "; "
                + String.join(", ", criterion) + "; estimated " + SentenceText.percent(measured.path("estimate")
                        .asDouble()) + " beyond the limits, at most " + SentenceText.percent(measured.path("upperBound")
                        .asDouble()) + " (" + BoundMethod.measured(sigmaKnown).label() + ", "
                + SentenceText.percent(decision.path("confidence").asDouble()) + " one-sided upper bound); plan "
                + decision.path("plan").path("name").asText();
    }
}
