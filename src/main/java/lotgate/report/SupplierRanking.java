package lotgate.report;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import lotgate.files.AtomicWrite;
import lotgate.files.OutputFileException;
import lotgate.history.QualityStatistics;
import org.apache.poi.ss.usermodel.CellStyle;
import org.apache.poi.xssf.usermodel.XSSFRow;
import org.apache.poi.xssf.usermodel.XSSFSheet;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;

/** The cross-supplier ranking as a table: text, CSV, .xlsx or .html. */
public final class SupplierRanking {
    private SupplierRanking() {
    }

    public static String interval(QualityStatistics.ProcessAverage value) {
        return SentenceText.percent(value.average()) + " (" + SentenceText.percent(value.lower()) + " to "
                + SentenceText.percent(value.upper()) + ")";
    }

    public static String csv(List<QualityStatistics.Ranked> ranking) {
        List<List<Object>> rows = new ArrayList<>();
        int rank = 1;
        for (QualityStatistics.Ranked supplier : ranking) {
            rows.add(List.of(rank++, supplier.supplier(), supplier.lots(), supplier.rejected(), supplier.average().average(),
                    supplier.average().lower(), supplier.average().upper(), supplier.rejection().average(),
                    supplier.rejection().lower(), supplier.rejection().upper()));
        }
        return CsvTable.table(List.of("rank", "supplier", "lots", "rejected", "processAverage", "processAverageLower",
                "processAverageUpper", "rejectionRate", "rejectionRateLower", "rejectionRateUpper"), rows);
    }

    /** The ranking's title. */
    static String title(double confidence) {
        return "Suppliers ranked by the upper " + SentenceText.percent(confidence) + " bound of their process average";
    }

    /** What the ranking covers and when it was made. */
    static String period(String generated) {
        return "Every lot in the history store up to " + generated + " (made " + generated + " by lotgate)";
    }

    /** The process averages with their intervals, best first. */
    static org.jfree.chart.JFreeChart chart(List<QualityStatistics.Ranked> ranking, double confidence) {
        int n = ranking.size();
        double[] estimate = new double[n];
        double[] lower = new double[n];
        double[] upper = new double[n];
        for (int i = 0; i < n; i++) {
            QualityStatistics.ProcessAverage average = ranking.get(i).average();
            estimate[i] = Double.isNaN(average.average()) ? 0 : average.average();
            lower[i] = average.lower();
            upper[i] = average.upper();
        }
        return Charts.intervals("Process average with its " + SentenceText.percent(confidence) + " interval",
                ranking.stream().map(r -> (ranking.indexOf(r) + 1) + ". " + r.supplier()).toList(), estimate, lower,
                upper, "Process average (% nonconforming)", "Process average");
    }

    public static void write(List<QualityStatistics.Ranked> ranking, double confidence, Path file) {
        String generated = java.time.LocalDate.now(java.time.ZoneOffset.UTC).toString();
        String name = file.getFileName().toString().toLowerCase(Locale.ROOT);
        if (name.endsWith(".xlsx")) {
            try (XSSFWorkbook workbook = new XSSFWorkbook()) {
                WorkbookLayout.baseFont(workbook);
                XSSFSheet sheet = workbook.createSheet("Ranking");
                CellStyle percent = WorkbookLayout.format(workbook, "0.00%");
                CellStyle count = WorkbookLayout.format(workbook, "#,##0");
                CellStyle text = WorkbookLayout.text(workbook);
                CellStyle heading = WorkbookLayout.heading(workbook);
                CellStyle numberHeading = WorkbookLayout.numberHeading(workbook);
                CellStyle quoted = workbook.createCellStyle();
                quoted.setQuotePrefixed(true);
                String[] headings = {"Rank", "Supplier", "Lots", "Rejected", "Process average", "Lower bound",
                        "Upper bound", "Rejection rate", "Lower bound", "Upper bound"};
                XSSFRow head = sheet.createRow(0);
                head.setHeightInPoints(30);
                WorkbookLayout.Widths widths = new WorkbookLayout.Widths(headings.length);
                for (int c = 0; c < headings.length; c++) {
                    head.createCell(c).setCellValue(headings[c]);
                    head.getCell(c).setCellStyle(c == 1 ? heading : numberHeading);
                    widths.note(c, headings[c], true);
                }
                int r = 1;
                for (QualityStatistics.Ranked supplier : ranking) {
                    XSSFRow row = sheet.createRow(r);
                    row.createCell(0).setCellValue(r++);
                    row.getCell(0).setCellStyle(count);
                    var nameCell = row.createCell(1);
                    nameCell.setCellValue(LotReportXlsx.fitted(supplier.supplier()));
                    nameCell.setCellStyle(LotReport.looksLikeFormula(supplier.supplier()) ? quoted : text);
                    widths.note(1, supplier.supplier(), false);
                    row.createCell(2).setCellValue(supplier.lots());
                    row.getCell(2).setCellStyle(count);
                    row.createCell(3).setCellValue(supplier.rejected());
                    row.getCell(3).setCellStyle(count);
                    double[] values = {supplier.average().average(), supplier.average().lower(), supplier.average().upper(),
                            supplier.rejection().average(), supplier.rejection().lower(), supplier.rejection().upper()};
                    for (int v = 0; v < values.length; v++) {
                        var cell = row.createCell(4 + v);
                        cell.setCellValue(values[v]);
                        cell.setCellStyle(percent);
                    }
                }
                widths.apply(sheet, 8, 40);
                r++;
                sheet.createRow(r++).createCell(0).setCellValue(title(confidence) + "; Clopper-Pearson intervals.");
                sheet.createRow(r++).createCell(0).setCellValue(period(generated) + ".");
                sheet.createFreezePane(0, 1);
                WorkbookLayout.print(workbook, sheet, true, headings.length - 1, r, 1, false, title(confidence),
                        "all suppliers", generated);
                AtomicWrite.write(file, workbook::write);
            } catch (IOException e) {
                throw new OutputFileException(file, e);
            }
            return;
        }
        StringBuilder html = new StringBuilder("<!DOCTYPE html>\n<html lang=\"en\"><head><meta charset=\"utf-8\">"
                + "<title>Supplier ranking</title><style>@page { size: A4; margin: 12mm; }"
                + "body{font:10pt/1.35 system-ui,sans-serif;color:#222;max-width:190mm;margin:0 auto}"
                + "h1{font-size:14pt}table{border-collapse:collapse}"
                + "td,th{border-bottom:1px solid #ccc;padding:2pt 6pt;text-align:left}"
                + "th{background:#f0f0f0}td.n{text-align:right}svg{width:100%;height:auto}.small{color:#555}"
                + "</style></head><body>\n<h1>" + title(confidence) + "</h1>\n<p class=\"small\">"
                + LotReportHtml.escape(period(generated)) + ". Clopper-Pearson intervals; a supplier with few lots"
                + " has a wide interval and cannot rank as if it had many.</p>\n<table><tr><th>Rank</th>"
                + "<th>Supplier</th><th>Lots</th><th>Rejected</th><th>Process average (interval)</th>"
                + "<th>Rejection rate (interval)</th></tr>\n");
        List<String> rows = new ArrayList<>();
        int rank = 1;
        for (QualityStatistics.Ranked supplier : ranking) {
            rows.add("<tr><td class=\"n\">" + rank++ + "</td><td>" + LotReportHtml.escape(supplier.supplier())
                    + "</td><td class=\"n\">" + supplier.lots() + "</td><td class=\"n\">" + supplier.rejected()
                    + "</td><td>" + interval(supplier.average()) + "</td><td>" + interval(supplier.rejection())
                    + "</td></tr>\n");
        }
        rows.forEach(html::append);
        html.append("</table>\n");
        if (!ranking.isEmpty()) {
            int height = 120 + 38 * ranking.size();
            org.jfree.svg.SVGGraphics2D svg = new org.jfree.svg.SVGGraphics2D(760, height);
            chart(ranking, confidence).draw(svg, new java.awt.Rectangle(0, 0, 760, height));
            html.append(svg.getSVGElement(null, false, new org.jfree.svg.ViewBox(0, 0, 760, height), null, null))
                    .append('\n');
        }
        html.append("</body></html>\n");
        AtomicWrite.writeString(file, html.toString());
    }
}
