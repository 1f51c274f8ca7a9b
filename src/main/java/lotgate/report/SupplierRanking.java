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

    public static void write(List<QualityStatistics.Ranked> ranking, double confidence, Path file) {
        String name = file.getFileName().toString().toLowerCase(Locale.ROOT);
        if (name.endsWith(".xlsx")) {
            try (XSSFWorkbook workbook = new XSSFWorkbook()) {
                XSSFSheet sheet = workbook.createSheet("Ranking");
                CellStyle percent = workbook.createCellStyle();
                percent.setDataFormat(workbook.createDataFormat().getFormat("0.00%"));
                CellStyle quoted = workbook.createCellStyle();
                quoted.setQuotePrefixed(true);
                String[] headings = {"Rank", "Supplier", "Lots", "Rejected", "Process average", "Lower bound",
                        "Upper bound", "Rejection rate", "Lower bound", "Upper bound"};
                XSSFRow head = sheet.createRow(0);
                for (int c = 0; c < headings.length; c++) {
                    head.createCell(c).setCellValue(headings[c]);
                }
                sheet.setColumnWidth(1, 36 * 256);
                int r = 1;
                for (QualityStatistics.Ranked supplier : ranking) {
                    XSSFRow row = sheet.createRow(r);
                    row.createCell(0).setCellValue(r++);
                    var nameCell = row.createCell(1);
                    nameCell.setCellValue(supplier.supplier());
                    if (LotReport.looksLikeFormula(supplier.supplier())) {
                        nameCell.setCellStyle(quoted);
                    }
                    row.createCell(2).setCellValue(supplier.lots());
                    row.createCell(3).setCellValue(supplier.rejected());
                    double[] values = {supplier.average().average(), supplier.average().lower(), supplier.average().upper(),
                            supplier.rejection().average(), supplier.rejection().lower(), supplier.rejection().upper()};
                    for (int v = 0; v < values.length; v++) {
                        var cell = row.createCell(4 + v);
                        cell.setCellValue(values[v]);
                        cell.setCellStyle(percent);
                    }
                }
                AtomicWrite.write(file, workbook::write);
            } catch (IOException e) {
                throw new OutputFileException(file, e);
            }
            return;
        }
        StringBuilder html = new StringBuilder("<!DOCTYPE html>\n<html lang=\"en\"><head><meta charset=\"utf-8\">"
                + "<title>Supplier ranking</title><style>body{font:10pt system-ui,sans-serif;max-width:190mm;margin:0 auto}"
                + "table{border-collapse:collapse}td,th{border-bottom:1px solid #ccc;padding:2pt 6pt;text-align:left}"
                + "th{background:#f0f0f0}td.n{text-align:right}</style></head><body>\n<h1>Suppliers ranked by the upper "
                + SentenceText.percent(confidence) + " bound of their process average</h1>\n<table><tr><th>Rank</th>"
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
        html.append("</table>\n</body></html>\n");
        AtomicWrite.writeString(file, html.toString());
    }
}
