package lotgate.report;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import lotgate.files.AtomicWrite;
import lotgate.history.LotRow;
import lotgate.history.MeasurementCharts;
import lotgate.history.QualityStatistics;
import lotgate.history.SeverityTracker;
import lotgate.history.SupplierAudit;
import org.apache.poi.ss.usermodel.CellStyle;
import org.apache.poi.ss.usermodel.Font;
import org.apache.poi.ss.util.CellRangeAddress;
import org.apache.poi.xddf.usermodel.chart.AxisPosition;
import org.apache.poi.xddf.usermodel.chart.BarDirection;
import org.apache.poi.xddf.usermodel.chart.ChartTypes;
import org.apache.poi.xddf.usermodel.chart.LegendPosition;
import org.apache.poi.xddf.usermodel.chart.MarkerStyle;
import org.apache.poi.xddf.usermodel.chart.XDDFBarChartData;
import org.apache.poi.xddf.usermodel.chart.XDDFCategoryAxis;
import org.apache.poi.xddf.usermodel.chart.XDDFChartData;
import org.apache.poi.xddf.usermodel.chart.XDDFDataSource;
import org.apache.poi.xddf.usermodel.chart.XDDFDataSourcesFactory;
import org.apache.poi.xddf.usermodel.chart.XDDFLineChartData;
import org.apache.poi.xddf.usermodel.chart.XDDFNumericalDataSource;
import org.apache.poi.xddf.usermodel.chart.XDDFValueAxis;
import org.apache.poi.xssf.usermodel.XSSFChart;
import org.apache.poi.xssf.usermodel.XSSFDrawing;
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
            lines.add("part " + part.part() + ": " + part.current().label() + " inspection now, " + part.switches().size()
                    + " switch(es) over " + part.lots() + " lots");
        }
        MeasurementCharts charts = audit.measurements();
        if (charts != null) {
            String unit = charts.unit().isEmpty() ? "" : " " + charts.unit();
            long outside = charts.points().stream().filter(MeasurementCharts.Point::outOfControl).count();
            lines.add(charts.points().size() + " lot(s) judged on measurements of " + what(charts) + ": grand mean "
                    + SentenceText.number(charts.grandMean()) + unit + ", process sigma estimated "
                    + SentenceText.number(charts.sigma()) + unit + "; " + outside + " outside the 3-sigma limits of the"
                    + " mean or s chart");
        }
        return lines;
    }

    // ---- xlsx ----

    private static void xlsx(SupplierAudit audit, List<String> evidence, Path file) {
        try (XSSFWorkbook workbook = new XSSFWorkbook()) {
            CellStyle bold = workbook.createCellStyle();
            Font font = workbook.createFont();
            font.setBold(true);
            bold.setFont(font);
            CellStyle quoted = workbook.createCellStyle();
            quoted.setQuotePrefixed(true);
            CellStyle percent = workbook.createCellStyle();
            percent.setDataFormat(workbook.createDataFormat().getFormat("0.00%"));
            Cells cells = new Cells(bold, quoted, percent);

            XSSFSheet summary = workbook.createSheet("Summary");
            summary.setColumnWidth(0, 110 * 256);
            int r = 0;
            cells.put(summary.createRow(r++), 0, title(audit), bold);
            for (String line : summary(audit)) {
                cells.put(summary.createRow(r++), 0, line, null);
            }
            r++;
            cells.put(summary.createRow(r++), 0, "Severity switches", bold);
            for (SupplierAudit.Part part : audit.parts()) {
                for (SeverityTracker.Switch change : part.switches()) {
                    cells.put(summary.createRow(r++), 0, part.part() + ": after lot " + (change.lot() == null ? "-"
                            : change.lot()) + ", " + change.from().label() + " to " + change.to().label() + ": "
                            + change.reason(), null);
                }
            }
            r++;
            cells.put(summary.createRow(r++), 0, "Rejected lots", bold);
            for (int i = 0; i < audit.rejectedLots().size(); i++) {
                LotRow lot = audit.rejectedLots().get(i);
                cells.put(summary.createRow(r++), 0, "#" + lot.seq() + " " + lot.lot() + " (" + lot.part() + ", received "
                        + lot.received() + "): " + evidence.get(i), null);
            }

            XSSFSheet lots = workbook.createSheet("Lots");
            String[] headings = {"Record", "Lot", "Part", "Received", "Inspected", "Nonconforming", "Fraction",
                    "Centre", "Lower limit", "Upper limit", "Verdict", "Severity"};
            XSSFRow head = lots.createRow(0);
            for (int c = 0; c < headings.length; c++) {
                cells.put(head, c, headings[c], bold);
            }
            for (int index = 0; index < audit.pChart().size(); index++) {
                QualityStatistics.PChartPoint point = audit.pChart().get(index);
                LotRow lot = audit.lotsInOrder().get(index);
                XSSFRow row = lots.createRow(index + 1);
                cells.put(row, 0, lot.seq(), null);
                cells.put(row, 1, point.lot(), null);
                cells.put(row, 2, lot.part(), null);
                cells.put(row, 3, lot.received() == null ? null : lot.received().toString(), null);
                cells.put(row, 4, point.inspected(), null);
                cells.put(row, 5, lot.nonconforming(), null);
                cells.put(row, 6, point.fraction(), percent);
                cells.put(row, 7, point.centre(), percent);
                cells.put(row, 8, point.lower(), percent);
                cells.put(row, 9, point.upper(), percent);
                cells.put(row, 10, lot.verdict(), null);
                cells.put(row, 11, lot.severity(), null);
            }
            int n = audit.pChart().size();
            if (n > 0) {
                XSSFSheet chartSheet = workbook.createSheet("p-chart");
                lineChart(chartSheet, lots, 1, "p-chart of lot fractions nonconforming", "Fraction nonconforming", "0.0%",
                        n, 6, new String[] {"Lot fraction", "Centre", "Lower limit", "Upper limit"}, 0);
            }
            MeasurementCharts charts = audit.measurements();
            if (charts != null) {
                XSSFSheet measured = workbook.createSheet("Measurements");
                String[] columns = {"Lot", "Received", "n", "Mean", "Centre", "Lower limit", "Upper limit", "s",
                        "s centre", "s lower limit", "s upper limit"};
                XSSFRow top = measured.createRow(0);
                for (int c = 0; c < columns.length; c++) {
                    cells.put(top, c, columns[c], bold);
                }
                int row = 1;
                for (MeasurementCharts.Point point : charts.points()) {
                    XSSFRow line = measured.createRow(row++);
                    cells.put(line, 0, point.lot(), null);
                    cells.put(line, 1, point.received() == null ? null : point.received().toString(), null);
                    cells.put(line, 2, point.n(), null);
                    cells.put(line, 3, point.mean(), null);
                    cells.put(line, 4, charts.grandMean(), null);
                    cells.put(line, 5, point.meanLower(), null);
                    cells.put(line, 6, point.meanUpper(), null);
                    cells.put(line, 7, point.deviation(), null);
                    cells.put(line, 8, point.deviationCentre(), null);
                    cells.put(line, 9, point.deviationLower(), null);
                    cells.put(line, 10, point.deviationUpper(), null);
                }
                int m = charts.points().size();
                String unit = charts.unit().isEmpty() ? "" : " (" + charts.unit() + ")";
                XSSFSheet chartSheet = workbook.createSheet("Mean and s charts");
                lineChart(chartSheet, measured, 0, "Means of " + what(charts), "Mean" + unit, "General", m, 3,
                        new String[] {"Lot mean", "Centre", "Lower limit", "Upper limit"}, 0);
                lineChart(chartSheet, measured, 0, "Standard deviations of " + what(charts), "s" + unit, "General", m, 7,
                        new String[] {"Lot s", "Centre", "Lower limit", "Upper limit"}, 31);
            }

            XSSFSheet types = workbook.createSheet("Defect types");
            XSSFRow typesHead = types.createRow(0);
            cells.put(typesHead, 0, "Defect type", bold);
            cells.put(typesHead, 1, "Nonconforming units", bold);
            cells.put(typesHead, 2, "Cumulative share", bold);
            types.setColumnWidth(0, 30 * 256);
            int t = 1;
            for (QualityStatistics.ParetoBar bar : audit.pareto()) {
                XSSFRow row = types.createRow(t++);
                cells.put(row, 0, bar.defect(), null);
                cells.put(row, 1, bar.count(), null);
                cells.put(row, 2, bar.cumulativeShare(), percent);
            }
            int m = audit.pareto().size();
            if (m > 0) {
                XSSFDrawing drawing = types.createDrawingPatriarch();
                XSSFChart chart = drawing.createChart(drawing.createAnchor(0, 0, 0, 0, 4, 0, 18, 24));
                chart.setTitleText("Pareto of defect types");
                XDDFCategoryAxis bottom = chart.createCategoryAxis(AxisPosition.BOTTOM);
                XDDFValueAxis left = chart.createValueAxis(AxisPosition.LEFT);
                left.setTitle("Nonconforming units");
                XDDFChartData data = chart.createData(ChartTypes.BAR, bottom, left);
                ((XDDFBarChartData) data).setBarDirection(BarDirection.COL);
                data.addSeries(XDDFDataSourcesFactory.fromStringCellRange(types, new CellRangeAddress(1, m, 0, 0)),
                        XDDFDataSourcesFactory.fromNumericCellRange(types, new CellRangeAddress(1, m, 1, 1)))
                        .setTitle("Nonconforming units", null);
                chart.plot(data);
            }
            AtomicWrite.write(file, workbook::write);
        } catch (IOException e) {
            throw new lotgate.files.OutputFileException(file, e);
        }
    }

    private static String what(MeasurementCharts charts) {
        return charts.characteristic().isEmpty() ? "the measurements" : charts.characteristic();
    }

    /**
     * A native line chart of a value and its centre and limits, read from four adjacent columns of a data sheet
     * whose column {@code nameColumn} names the lots.
     */
    private static void lineChart(XSSFSheet sheet, XSSFSheet dataSheet, int nameColumn, String title, String valueTitle,
            String format, int n, int firstColumn, String[] series, int topRow) {
        XSSFDrawing drawing = sheet.getDrawingPatriarch() != null ? sheet.getDrawingPatriarch()
                : sheet.createDrawingPatriarch();
        XSSFChart chart = drawing.createChart(drawing.createAnchor(0, 0, 0, 0, 0, topRow, 18, topRow + 30));
        chart.setTitleText(title);
        chart.getOrAddLegend().setPosition(LegendPosition.BOTTOM);
        XDDFCategoryAxis bottom = chart.createCategoryAxis(AxisPosition.BOTTOM);
        bottom.setTitle("Lot, in order received");
        XDDFValueAxis left = chart.createValueAxis(AxisPosition.LEFT);
        left.setTitle(valueTitle);
        left.setNumberFormat(format);
        XDDFDataSource<String> names = XDDFDataSourcesFactory.fromStringCellRange(dataSheet,
                new CellRangeAddress(1, n, nameColumn, nameColumn));
        XDDFLineChartData data = (XDDFLineChartData) chart.createData(ChartTypes.LINE, bottom, left);
        org.apache.poi.xddf.usermodel.PresetColor[] colours = {org.apache.poi.xddf.usermodel.PresetColor.NAVY,
                org.apache.poi.xddf.usermodel.PresetColor.SEA_GREEN,
                org.apache.poi.xddf.usermodel.PresetColor.DARK_RED,
                org.apache.poi.xddf.usermodel.PresetColor.DARK_RED};
        for (int s = 0; s < series.length; s++) {
            XDDFNumericalDataSource<Double> values = XDDFDataSourcesFactory.fromNumericCellRange(dataSheet,
                    new CellRangeAddress(1, n, firstColumn + s, firstColumn + s));
            XDDFLineChartData.Series line = (XDDFLineChartData.Series) data.addSeries(names, values);
            line.setTitle(series[s], null);
            line.setMarkerStyle(s == 0 ? MarkerStyle.CIRCLE : MarkerStyle.NONE);
            line.setSmooth(false);
            // Spreadsheet programs differ in their default line; name it so that every one draws it.
            org.apache.poi.xddf.usermodel.XDDFLineProperties stroke = new org.apache.poi.xddf.usermodel.XDDFLineProperties(
                    new org.apache.poi.xddf.usermodel.XDDFSolidFillProperties(
                            org.apache.poi.xddf.usermodel.XDDFColor.from(colours[s])));
            stroke.setWidth(s == 0 ? 1.75 : 1.25);
            if (s > 0) {
                stroke.setPresetDash(new org.apache.poi.xddf.usermodel.XDDFPresetLineDash(
                        org.apache.poi.xddf.usermodel.PresetLineDash.DASH));
            }
            line.setLineProperties(stroke);
        }
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
                cell.setCellValue(text);
                if (LotReport.looksLikeFormula(text)) {
                    cell.setCellStyle(quoted);
                    return;
                }
            }
            if (style != null) {
                cell.setCellStyle(style);
            }
        }
    }

    // ---- html ----

    private static String svg(org.jfree.chart.JFreeChart chart, int width, int height) {
        SVGGraphics2D svg = new SVGGraphics2D(width, height);
        chart.draw(svg, new java.awt.Rectangle(0, 0, width, height));
        return svg.getSVGElement(null, false, new ViewBox(0, 0, width, height), null, null);
    }

    static String html(SupplierAudit audit, List<String> evidence) {
        StringBuilder html = new StringBuilder("<!DOCTYPE html>\n<html lang=\"en\"><head><meta charset=\"utf-8\">\n<title>")
                .append(LotReportHtml.escape(title(audit))).append("</title>\n<style>\n")
                .append("@page { size: A4; margin: 12mm; }\n")
                .append("body { font: 10pt/1.35 system-ui, sans-serif; color: #222; max-width: 190mm; margin: 0 auto; }\n")
                .append("h1 { font-size: 14pt; } h2 { font-size: 11pt; margin: 10pt 0 3pt; }\n")
                .append("table { border-collapse: collapse; } td, th { border-bottom: 1px solid #ccc; padding: 2pt 6pt;")
                .append(" text-align: left; } th { background: #f0f0f0; } td.n { text-align: right; }\n")
                .append("svg { width: 100%; height: auto; } td:nth-child(-n+5) { white-space: nowrap; }\n")
                .append("</style></head><body>\n<h1>").append(LotReportHtml.escape(title(audit))).append("</h1>\n<ul>\n");
        for (String line : summary(audit)) {
            html.append("<li>").append(LotReportHtml.escape(line)).append("</li>\n");
        }
        html.append("</ul>\n<h2>Severity timeline</h2>\n<table><tr><th>Part</th><th>After lot</th><th>Switch</th>"
                + "<th>Reason</th></tr>\n");
        for (SupplierAudit.Part part : audit.parts()) {
            for (SeverityTracker.Switch change : part.switches()) {
                html.append("<tr><td>").append(LotReportHtml.escape(part.part())).append("</td><td>")
                        .append(LotReportHtml.escape(change.lot() == null ? "-" : change.lot())).append("</td><td>")
                        .append(change.from().label()).append(" to ").append(change.to().label()).append("</td><td>")
                        .append(LotReportHtml.escape(change.reason())).append("</td></tr>\n");
            }
        }
        html.append("</table>\n");
        if (!audit.pChart().isEmpty()) {
            int n = audit.pChart().size();
            double[][] series = new double[4][n];
            for (int i = 0; i < n; i++) {
                QualityStatistics.PChartPoint point = audit.pChart().get(i);
                series[0][i] = point.fraction();
                series[1][i] = point.centre();
                series[2][i] = point.lower();
                series[3][i] = point.upper();
            }
            html.append("<h2>p-chart</h2>\n").append(svg(Charts.pChart("Lot fractions nonconforming",
                    audit.pChart().stream().map(QualityStatistics.PChartPoint::lot).toList(), series[0], series[1],
                    series[2], series[3]), 900, 380)).append('\n');
        }
        if (!audit.pareto().isEmpty()) {
            List<QualityStatistics.ParetoBar> bars = audit.pareto();
            html.append("<h2>Defect types</h2>\n").append(svg(Charts.pareto("Pareto of defect types",
                    bars.stream().map(QualityStatistics.ParetoBar::defect).toList(),
                    bars.stream().mapToLong(QualityStatistics.ParetoBar::count).toArray(),
                    bars.stream().mapToDouble(QualityStatistics.ParetoBar::cumulativeShare).toArray()), 900, 380))
                    .append('\n');
        }
        MeasurementCharts charts = audit.measurements();
        if (charts != null) {
            int m = charts.points().size();
            List<String> names = charts.points().stream().map(MeasurementCharts.Point::lot).toList();
            double[][] means = new double[4][m];
            double[][] deviations = new double[4][m];
            for (int i = 0; i < m; i++) {
                MeasurementCharts.Point point = charts.points().get(i);
                means[0][i] = point.mean();
                means[1][i] = charts.grandMean();
                means[2][i] = point.meanLower();
                means[3][i] = point.meanUpper();
                deviations[0][i] = point.deviation();
                deviations[1][i] = point.deviationCentre();
                deviations[2][i] = point.deviationLower();
                deviations[3][i] = point.deviationUpper();
            }
            String unit = charts.unit().isEmpty() ? "" : " (" + charts.unit() + ")";
            html.append("<h2>Measurements: means and standard deviations</h2>\n")
                    .append(svg(Charts.control("Means of " + what(charts), names, means, "Mean" + unit), 900, 320))
                    .append('\n')
                    .append(svg(Charts.control("Standard deviations of " + what(charts), names, deviations, "s" + unit),
                            900, 320)).append('\n');
        }
        html.append("<h2>Rejected lots</h2>\n<table><tr><th>Record</th><th>Lot</th><th>Part</th><th>Received</th>"
                + "<th>Found</th><th>Evidence</th></tr>\n");
        for (int i = 0; i < audit.rejectedLots().size(); i++) {
            LotRow lot = audit.rejectedLots().get(i);
            html.append("<tr><td class=\"n\">").append(lot.seq()).append("</td><td>").append(LotReportHtml.escape(lot.lot()))
                    .append("</td><td>").append(LotReportHtml.escape(lot.part())).append("</td><td>")
                    .append(lot.received() == null ? "" : lot.received()).append("</td><td class=\"n\">")
                    .append(lot.nonconforming()).append(" of ").append(lot.inspected()).append("</td><td>")
                    .append(LotReportHtml.escape(evidence.get(i))).append("</td></tr>\n");
        }
        html.append("</table>\n</body></html>\n");
        return html.toString();
    }
}
