package lotgate.report;

import java.awt.image.BufferedImage;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.Map;
import java.util.TreeMap;
import javax.imageio.ImageIO;
import lotgate.files.AtomicWrite;
import lotgate.inspection.Cell;
import lotgate.inspection.InspectionSample;
import lotgate.inspection.LotDetails;
import lotgate.inspection.SheetSource;
import lotgate.sentencing.ClassVerdict;
import lotgate.sentencing.Evidence;
import lotgate.sentencing.LotDecision;
import org.apache.poi.ss.usermodel.CellStyle;
import org.apache.poi.ss.usermodel.ClientAnchor;
import org.apache.poi.ss.usermodel.FillPatternType;
import org.apache.poi.ss.usermodel.Font;
import org.apache.poi.ss.usermodel.IndexedColors;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.ss.usermodel.Workbook;
import org.apache.poi.xssf.streaming.SXSSFWorkbook;
import org.jfree.chart.JFreeChart;

/**
 * The lot report as a workbook: a summary sheet (verdict, lot, plan, counts, evidence), the sample
 * copied from the inspection sheet with nonconforming units highlighted, and the OC chart with the
 * observed point. Written with POI's streaming workbook, so a large sample does not fill memory.
 */
final class LotReportXlsx {
    private final LotDecision decision;
    private final SXSSFWorkbook workbook = new SXSSFWorkbook(200);
    private final CellStyle bold;
    private final CellStyle title;
    private final CellStyle percent;
    private final CellStyle highlighted;
    private final CellStyle quoted;
    private final CellStyle verdictStyle;

    private LotReportXlsx(LotDecision decision) {
        this.decision = decision;
        Font boldFont = WorkbookLayout.font(workbook);
        boldFont.setBold(true);
        bold = workbook.createCellStyle();
        bold.setFont(boldFont);
        Font big = WorkbookLayout.font(workbook);
        big.setBold(true);
        big.setFontHeightInPoints((short) 16);
        title = workbook.createCellStyle();
        title.setFont(big);
        percent = workbook.createCellStyle();
        percent.setDataFormat(workbook.createDataFormat().getFormat("0.000%"));
        highlighted = workbook.createCellStyle();
        highlighted.setFillForegroundColor(IndexedColors.ROSE.getIndex());
        highlighted.setFillPattern(FillPatternType.SOLID_FOREGROUND);
        quoted = workbook.createCellStyle();
        quoted.setQuotePrefixed(true);
        Font verdictFont = WorkbookLayout.font(workbook);
        verdictFont.setBold(true);
        verdictFont.setFontHeightInPoints((short) 14);
        verdictFont.setColor(IndexedColors.WHITE.getIndex());
        verdictStyle = workbook.createCellStyle();
        verdictStyle.setFont(verdictFont);
        verdictStyle.setFillForegroundColor(decision.sentence().accepted() ? IndexedColors.SEA_GREEN.getIndex()
                : IndexedColors.DARK_RED.getIndex());
        verdictStyle.setFillPattern(FillPatternType.SOLID_FOREGROUND);
    }

    static void write(LotDecision decision, Path file) {
        LotReportXlsx report = new LotReportXlsx(decision);
        try {
            report.summary();
            report.sample();
            report.chart();
            AtomicWrite.write(file, report.workbook::write);
        } finally {
            report.workbook.dispose();
            try {
                report.workbook.close();
            } catch (IOException ignored) {
                // Closing a streaming workbook only removes its temporary files.
            }
        }
    }

    private int row;

    private Row next(Sheet sheet) {
        return sheet.createRow(row++);
    }

    private void put(Row r, int column, Object value, CellStyle style) {
        org.apache.poi.ss.usermodel.Cell cell = r.createCell(column);
        if (value instanceof Number number) {
            cell.setCellValue(number.doubleValue());
        } else if (value != null) {
            String string = value.toString();
            cell.setCellValue(string);
            if (LotReport.looksLikeFormula(string)) {
                cell.setCellStyle(quoted);
                return;
            }
        }
        if (style != null) {
            cell.setCellStyle(style);
        }
    }

    private void pair(Sheet sheet, String key, Object value) {
        Row r = next(sheet);
        put(r, 0, key, bold);
        put(r, 1, value == null ? "(not given)" : value, null);
    }

    private void summary() {
        Sheet sheet = workbook.createSheet("Summary");
        sheet.setColumnWidth(0, 30 * 256);
        for (int c = 1; c < 9; c++) {
            sheet.setColumnWidth(c, 16 * 256);
        }
        row = 0;
        put(next(sheet), 0, "Lot sentence", title);
        Row verdictRow = next(sheet);
        put(verdictRow, 0, decision.sentence().accepted() ? "ACCEPT" : "REJECT", verdictStyle);
        put(verdictRow, 1, SentenceText.reason(decision), null);
        if (decision.criticalFound()) {
            put(next(sheet), 0, "CRITICAL NONCONFORMITY FOUND: quarantine the lot and follow the customer's"
                    + " requirements and local regulations, whatever the verdict.", verdictStyle);
        }
        row++;
        LotDetails lot = decision.lot();
        pair(sheet, "Lot", lot.lot());
        pair(sheet, "Supplier", lot.supplier());
        pair(sheet, "Part", lot.part());
        pair(sheet, "Lot size", lot.lotSize() > 0 ? lot.lotSize() : null);
        pair(sheet, "Received", lot.received());
        pair(sheet, "Inspector", lot.inspector());
        row++;
        pair(sheet, "Plan", decision.plan().name());
        pair(sheet, "Plan fingerprint", decision.plan().fingerprint());
        pair(sheet, "Model", decision.plan().model().name());
        InspectionSample sample = decision.sample();
        pair(sheet, "Inspection sheet", LotReportHtml.sheetLine(sample));
        pair(sheet, "Sheet SHA-256", decision.sheetSha256());
        pair(sheet, "Decided", decision.decidedAt().toString() + " by lotgate " + decision.toolVersion());
        row++;
        Row head = next(sheet);
        String[] headings = {"Class", "Inspected", "Found", "Accept up to", "Reject at", "Verdict", "p-value at AQL",
                "Lower bound", "Upper bound"};
        for (int c = 0; c < headings.length; c++) {
            put(head, c, headings[c], bold);
        }
        for (ClassVerdict verdict : decision.sentence().classes()) {
            Evidence evidence = verdict.evidence();
            Row r = next(sheet);
            put(r, 0, verdict.defectClass().label(), null);
            put(r, 1, verdict.inspected(), null);
            put(r, 2, verdict.found(), null);
            if (verdict.acceptanceNumber() >= 0) {
                put(r, 3, verdict.acceptanceNumber(), null);
                put(r, 4, verdict.rejectionNumber(), null);
            } else {
                put(r, 3, SentenceText.acceptanceCell(verdict), null);
                put(r, 4, SentenceText.rejectionCell(verdict), null);
            }
            put(r, 5, verdict.accepted() ? "accept" : "reject", verdict.accepted() ? null : bold);
            put(r, 6, evidence.pValue(), percent);
            if (evidence.bounds().twoSided()) {
                put(r, 7, evidence.lower(), percent);
            }
            put(r, 8, evidence.upper(), percent);
        }
        row++;
        put(next(sheet), 0, "Evidence", bold);
        for (String line : SentenceText.evidenceLines(decision)) {
            put(next(sheet), 0, line, null);
        }
        for (String notice : decision.notices()) {
            put(next(sheet), 0, "Note: " + notice, null);
        }
        if (!sample.defectTypes().isEmpty()) {
            row++;
            Row typesHead = next(sheet);
            put(typesHead, 0, "Defect type", bold);
            put(typesHead, 1, "Nonconforming units", bold);
            Map<String, Integer> sorted = new TreeMap<>(sample.defectTypes());
            for (Map.Entry<String, Integer> entry : sorted.entrySet()) {
                Row r = next(sheet);
                put(r, 0, entry.getKey(), null);
                put(r, 1, entry.getValue(), null);
            }
        }
    }

    private void sample() {
        InspectionSample sample = decision.sample();
        Sheet sheet = workbook.createSheet("Sample");
        sheet.createFreezePane(0, 1);
        int[] written = {0};
        SheetSource.open(sample.file()).read(sample.sheet(), (sourceRow, cells) -> {
            boolean header = sourceRow == sample.headerRow();
            if (!header && (sourceRow < sample.firstRow() || sourceRow > sample.lastRow())) {
                return;
            }
            Row r = sheet.createRow(written[0]++);
            CellStyle style = header ? bold : sample.nonconformingAt(sourceRow) ? highlighted : null;
            put(r, 0, header ? "sheet row" : sourceRow, style);
            for (Cell cell : cells) {
                Object value = cell.kind() == Cell.Kind.NUMBER ? cell.number() : cell.text();
                put(r, cell.column() + 1, value, style);
            }
        });
    }

    private void chart() {
        Sheet sheet = workbook.createSheet("OC chart");
        JFreeChart chart = LotReport.ocChart(decision);
        BufferedImage image = chart.createBufferedImage(900, 560);
        ByteArrayOutputStream png = new ByteArrayOutputStream();
        try {
            ImageIO.write(image, "png", png);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        int picture = workbook.addPicture(png.toByteArray(), Workbook.PICTURE_TYPE_PNG);
        ClientAnchor anchor = workbook.getCreationHelper().createClientAnchor();
        anchor.setCol1(0);
        anchor.setRow1(0);
        anchor.setCol2(14);
        anchor.setRow2(28);
        sheet.createDrawingPatriarch().createPicture(anchor, picture);
    }
}
