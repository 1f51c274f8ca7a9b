package lotgate.report;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import lotgate.files.AtomicWrite;
import lotgate.inspection.Cell;
import lotgate.inspection.InspectionSample;
import lotgate.inspection.LotDetails;
import lotgate.inspection.SheetSource;
import lotgate.sampling.CurvePoint;
import lotgate.sentencing.ClassVerdict;
import lotgate.sentencing.Evidence;
import lotgate.sentencing.LotDecision;
import org.apache.poi.ss.usermodel.CellStyle;
import org.apache.poi.ss.usermodel.FillPatternType;
import org.apache.poi.ss.usermodel.Font;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.ss.util.CellRangeAddress;
import org.apache.poi.xddf.usermodel.chart.AxisCrosses;
import org.apache.poi.xddf.usermodel.chart.AxisPosition;
import org.apache.poi.xddf.usermodel.chart.MarkerStyle;
import org.apache.poi.xddf.usermodel.chart.XDDFScatterChartData;
import org.apache.poi.xddf.usermodel.chart.XDDFValueAxis;
import org.apache.poi.xssf.streaming.SXSSFWorkbook;
import org.apache.poi.xssf.usermodel.XSSFCellStyle;
import org.apache.poi.xssf.usermodel.XSSFChart;
import org.apache.poi.xssf.usermodel.XSSFColor;
import org.apache.poi.xssf.usermodel.XSSFSheet;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;

/**
 * The lot report as a workbook: a summary sheet (verdict, lot, plan, counts or the variables criterion,
 * evidence), the sample copied from the inspection sheet with nonconforming units highlighted, and a native OC
 * chart with the design points and the lot's observed quality. Only the sample goes through POI's streaming
 * workbook, so a large sample does not fill memory; the summary and the chart are ordinary sheets of the
 * workbook under it, which the streaming writer copies as they are.
 */
final class LotReportXlsx {
    private static final int SUMMARY_COLUMNS = 9;
    private static final int TEXT_WIDTH = 100;

    private final LotDecision decision;
    private final XSSFWorkbook base = new XSSFWorkbook();
    private final SXSSFWorkbook workbook = new SXSSFWorkbook(base, 200);
    private final String title;
    private final String subject;
    private final String generated;
    private final HistoryPlace place;
    /** The most characters a spreadsheet cell holds. */
    static final int CELL_LIMIT = 32_767;
    private final CellStyle bold;
    private final CellStyle big;
    private final CellStyle percent;
    private final CellStyle count;
    private final CellStyle highlighted;
    private final CellStyle quoted;
    private final CellStyle verdictStyle;
    private final CellStyle alarm;
    private final CellStyle wrapped;
    private final CellStyle heading;
    private final CellStyle numberHeading;
    private final CellStyle text;

    private LotReportXlsx(LotDecision decision, HistoryPlace place) {
        this.decision = decision;
        this.place = place;
        WorkbookLayout.baseFont(base);
        title = "Lot report: " + decision.lot().lot() + ", " + (decision.sentence().accepted() ? "accepted"
                : "rejected");
        subject = (decision.lot().supplier() == null ? "" : decision.lot().supplier())
                + (decision.lot().part() == null ? "" : ", part " + decision.lot().part());
        generated = decision.decidedAt().toString().substring(0, 10);
        Font boldFont = WorkbookLayout.font(base);
        boldFont.setBold(true);
        bold = base.createCellStyle();
        bold.setFont(boldFont);
        Font bigFont = WorkbookLayout.font(base);
        bigFont.setBold(true);
        bigFont.setFontHeightInPoints((short) 15);
        big = base.createCellStyle();
        big.setFont(bigFont);
        percent = WorkbookLayout.format(base, "0.000%");
        count = WorkbookLayout.format(base, "#,##0");
        XSSFCellStyle rose = base.createCellStyle();
        rose.setFillForegroundColor(new XSSFColor(ChartStyle.rgb(ChartStyle.TIGHTENED_SHADE), null));
        rose.setFillPattern(FillPatternType.SOLID_FOREGROUND);
        highlighted = rose;
        quoted = base.createCellStyle();
        quoted.setQuotePrefixed(true);
        verdictStyle = WorkbookLayout.banner(base, decision.sentence().accepted() ? ChartStyle.ACCEPT
                : ChartStyle.REJECT, (short) 14);
        alarm = WorkbookLayout.banner(base, ChartStyle.REJECT, (short) 11);
        wrapped = WorkbookLayout.wrapped(base);
        heading = WorkbookLayout.heading(base);
        numberHeading = WorkbookLayout.numberHeading(base);
        text = WorkbookLayout.text(base);
    }

    static void write(LotDecision decision, HistoryPlace place, Path file) {
        LotReportXlsx report = new LotReportXlsx(decision, place);
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
            String string = fitted(value.toString());
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

    /** The text cut to what a cell holds, with a visible mark saying how long it was. */
    static String fitted(String text) {
        if (text.length() <= CELL_LIMIT) {
            return text;
        }
        String mark = " [... cut here: " + text.length() + " characters in all]";
        int keep = CELL_LIMIT - mark.length();
        if (Character.isHighSurrogate(text.charAt(keep - 1))) {
            keep--;
        }
        return text.substring(0, keep) + mark;
    }

    private void pair(Sheet sheet, String key, Object value) {
        Row r = next(sheet);
        put(r, 0, key, bold);
        put(r, 1, value == null ? "(not given)" : value, null);
        sheet.addMergedRegion(new CellRangeAddress(r.getRowNum(), r.getRowNum(), 1, SUMMARY_COLUMNS - 1));
    }

    /** A line of text across the whole summary, wrapped, its row as tall as its lines need. */
    private void line(Sheet sheet, String value, CellStyle style, float lineHeight) {
        Row r = next(sheet);
        put(r, 0, value, style);
        sheet.addMergedRegion(new CellRangeAddress(r.getRowNum(), r.getRowNum(), 0, SUMMARY_COLUMNS - 1));
        int lines = Math.max(1, (int) Math.ceil(value.length() * 1.0 / TEXT_WIDTH));
        r.setHeightInPoints(lines * lineHeight + 4);
    }

    private void summary() {
        XSSFSheet sheet = base.createSheet("Summary");
        int[] widths = {26, 11, 9, 10, 9, 9, 11, 10, 10};
        for (int c = 0; c < widths.length; c++) {
            sheet.setColumnWidth(c, widths[c] * 256);
        }
        row = 0;
        Row top = next(sheet);
        put(top, 0, "Lot " + decision.lot().lot(), big);
        top.setHeightInPoints(22);
        Row verdictRow = next(sheet);
        put(verdictRow, 0, decision.sentence().accepted() ? "ACCEPT" : "REJECT", verdictStyle);
        put(verdictRow, 1, SentenceText.reason(decision), wrapped);
        sheet.addMergedRegion(new CellRangeAddress(verdictRow.getRowNum(), verdictRow.getRowNum(), 1,
                SUMMARY_COLUMNS - 1));
        verdictRow.setHeightInPoints(Math.max(24, (float) Math.ceil(SentenceText.reason(decision).length() / 90.0)
                * 13 + 4));
        if (decision.criticalFound()) {
            line(sheet, "CRITICAL NONCONFORMITY FOUND (sheet row " + decision.sample().firstCriticalRow() + "):"
                    + " quarantine the lot and follow the customer's requirements and local regulations, whatever"
                    + " the verdict.", alarm, 15);
        }
        if (LotReport.normalityFailed(decision)) {
            line(sheet, "WARNING: " + LotReport.normalityWarning(decision), alarm, 15);
        }
        row++;
        LotDetails lot = decision.lot();
        pair(sheet, "Lot", lot.lot());
        pair(sheet, "Supplier", lot.supplier());
        pair(sheet, "Part", lot.part());
        // As words beside the other details, not a number pushed to the far edge of the merged cells.
        pair(sheet, "Lot size", lot.lotSize() > 0 ? lot.lotSize() + " units" : null);
        pair(sheet, "Received", lot.received());
        pair(sheet, "Inspector", lot.inspector());
        row++;
        pair(sheet, "Plan", decision.plan().name() + " (" + PlanWording.brief(decision.sentence().classes().get(0)
                .plan()) + ")");
        pair(sheet, "Plan fingerprint", decision.plan().fingerprint());
        if (decision.measured() != null) {
            pair(sheet, "Method", "variables plan (k-method), sigma " + (decision.measured().sigmaKnown() ? "known"
                    : "unknown") + (decision.plan().measurement().limits().equals(lotgate.plan.Measurement.COMBINED)
                            ? ", limits held together (M-method)" : ""));
        } else {
            pair(sheet, "Model", decision.plan().model().name());
        }
        InspectionSample sample = decision.sample();
        pair(sheet, "Inspection sheet", LotReportHtml.sheetLine(sample));
        pair(sheet, "Sheet SHA-256", decision.sheetSha256());
        pair(sheet, "Decided", decision.decidedAt().toString() + " by lotgate " + decision.toolVersion());
        if (place != null) {
            pair(sheet, "History record", "#" + place.seq() + " in " + place.store());
            pair(sheet, "Chain hash", place.hash());
        }
        row++;
        if (decision.measured() != null) {
            Row head = next(sheet);
            head.setHeightInPoints(18);
            String[] headings = {"Criterion", "Value", "", "Held against", "", "Outcome"};
            for (int c = 0; c < headings.length; c++) {
                put(head, c, headings[c], c == 1 ? numberHeading : heading);
            }
            for (LotReport.Criterion criterion : LotReport.criteria(decision)) {
                Row r = next(sheet);
                put(r, 0, criterion.what(), text);
                put(r, 1, criterion.value(), null);
                put(r, 3, criterion.against(), text);
                put(r, 5, criterion.outcome(), "FAILS".equals(criterion.outcome()) || "falls short".equals(
                        criterion.outcome()) || "above".equals(criterion.outcome()) ? bold : text);
                sheet.addMergedRegion(new CellRangeAddress(r.getRowNum(), r.getRowNum(), 1, 2));
                sheet.addMergedRegion(new CellRangeAddress(r.getRowNum(), r.getRowNum(), 3, 4));
            }
        } else {
            Row head = next(sheet);
            head.setHeightInPoints(30);
            String[] headings = {"Class", "Units inspected", "Found", "Accept up to", "Reject at", "Verdict",
                    "p-value at the AQL", "Lower bound", "Upper bound"};
            for (int c = 0; c < headings.length; c++) {
                put(head, c, headings[c], c == 0 || c == 5 ? heading : numberHeading);
            }
            for (ClassVerdict verdict : decision.sentence().classes()) {
                Evidence evidence = verdict.evidence();
                Row r = next(sheet);
                put(r, 0, verdict.defectClass().label(), text);
                put(r, 1, verdict.inspected(), count);
                put(r, 2, verdict.found(), count);
                if (verdict.acceptanceNumber() >= 0) {
                    put(r, 3, verdict.acceptanceNumber(), count);
                    put(r, 4, verdict.rejectionNumber(), count);
                } else {
                    put(r, 3, SentenceText.acceptanceCell(verdict), null);
                    put(r, 4, SentenceText.rejectionCell(verdict), null);
                }
                put(r, 5, verdict.accepted() ? "accept" : "reject", verdict.accepted() ? text : bold);
                put(r, 6, evidence.pValue(), percent);
                if (evidence.bounds().twoSided()) {
                    put(r, 7, evidence.lower(), percent);
                }
                put(r, 8, evidence.upper(), percent);
            }
        }
        row++;
        put(next(sheet), 0, "Evidence", bold);
        for (String evidence : SentenceText.evidenceLines(decision)) {
            line(sheet, evidence, wrapped, 13);
        }
        for (String notice : decision.notices()) {
            line(sheet, "Note: " + notice, wrapped, 13);
        }
        if (!sample.defectTypes().isEmpty()) {
            row++;
            Row typesHead = next(sheet);
            put(typesHead, 0, "Defect type", heading);
            put(typesHead, 1, "Units found", numberHeading);
            typesHead.setHeightInPoints(30);
            Map<String, Integer> sorted = new TreeMap<>(sample.defectTypes());
            for (Map.Entry<String, Integer> entry : sorted.entrySet()) {
                Row r = next(sheet);
                put(r, 0, entry.getKey(), text);
                put(r, 1, entry.getValue(), count);
            }
        }
        row++;
        line(sheet, "Acceptance sampling controls the risks of this decision; it does not show that the lot is free"
                + " of nonconforming units.", wrapped, 13);
        WorkbookLayout.print(base, sheet, false, SUMMARY_COLUMNS - 1, row, 0, false, title, subject, generated);
    }

    private void sample() {
        InspectionSample sample = decision.sample();
        Sheet sheet = workbook.createSheet("Sample");
        sheet.createFreezePane(0, 1);
        boolean marks = LotReport.subSamples(decision);
        int[] written = {0};
        int[] position = {0};
        int[] widest = {1};
        int[] chars = new int[64];
        SheetSource.open(sample.file()).read(sample.sheet(), (sourceRow, cells) -> {
            boolean header = sourceRow == sample.headerRow();
            if (!header && (sourceRow < sample.firstRow() || sourceRow > sample.lastRow())) {
                return;
            }
            Row r = sheet.createRow(written[0]++);
            CellStyle style = header ? heading : sample.nonconformingAt(sourceRow) ? highlighted : null;
            put(r, 0, header ? "sheet row" : sourceRow, style);
            int last = 0;
            for (Cell cell : cells) {
                Object value = cell.kind() == Cell.Kind.NUMBER ? cell.number() : cell.text();
                put(r, cell.column() + 1, value, style);
                last = Math.max(last, cell.column() + 1);
                if (cell.column() + 1 < chars.length) {
                    String shown = value instanceof Double number ? SentenceText.number(number) : String.valueOf(value);
                    chars[cell.column() + 1] = Math.max(chars[cell.column() + 1], shown.length());
                }
            }
            widest[0] = Math.max(widest[0], last);
            if (marks) {
                // A class judged on fewer units than the sheet holds did not count the units past its sample.
                int column = Math.max(last + 1, sample.headers().size() + 1);
                if (header) {
                    put(r, column, "outside the sample of", heading);
                } else {
                    position[0]++;
                    List<String> without = LotReport.classesWithout(decision, position[0]);
                    if (!without.isEmpty()) {
                        put(r, column, String.join(", ", without), style);
                    }
                }
            }
        });
        int columns = Math.max(widest[0], sample.headers().size()) + (marks ? 2 : 1);
        for (int c = 0; c < columns; c++) {
            int width = c == 0 ? 10 : c == columns - 1 && marks ? 22 : Math.max(9, Math.min(40, chars[Math.min(c,
                    chars.length - 1)] + 2));
            sheet.setColumnWidth(c, width * 256);
        }
        WorkbookLayout.print(workbook, sheet, columns > 7, columns - 1, Math.max(0, written[0] - 1), 1, false,
                title, subject, generated);
    }

    /**
     * The OC chart as a native scatter chart: each class's curve, the design points (AQL, LTPD) and the lot's
     * observed point, with the data to the right of the printed area.
     */
    private void chart() {
        XSSFSheet sheet = base.createSheet("OC chart");
        LotReport.OcView view = LotReport.ocView(decision);
        int first = 20;
        Row head = sheet.createRow(0);
        int column = first;
        XSSFChart chart = NativeCharts.chart(sheet, view.title() + ", lot " + decision.lot().lot(), 0, 0, 14, 32);
        XDDFValueAxis bottom = chart.createValueAxis(AxisPosition.BOTTOM);
        bottom.setTitle(Charts.qualityAxis(view.perUnit()));
        bottom.setNumberFormat(view.perUnit() ? "0.###" : "0.0%");
        bottom.setCrosses(AxisCrosses.AUTO_ZERO);
        XDDFValueAxis left = NativeCharts.valueAxis(chart, AxisPosition.LEFT, "Probability of acceptance", "0%");
        left.setCrosses(AxisCrosses.AUTO_ZERO);
        NativeCharts.range(left, 0, 1);
        left.setMajorUnit(0.1);
        double widest = 0;
        XDDFScatterChartData data = NativeCharts.scatter(chart, bottom, left);
        for (int c = 0; c < view.curves().size(); c++) {
            ChartCurve curve = view.curves().get(c);
            int rows = curve.points().size();
            put(head, column, "quality", null);
            put(head, column + 1, curve.label(), null);
            for (int i = 0; i < rows; i++) {
                CurvePoint point = curve.points().get(i);
                Row r = sheet.getRow(i + 1) != null ? sheet.getRow(i + 1) : sheet.createRow(i + 1);
                put(r, column, view.perUnit() ? point.quality() * 100 : point.quality(), null);
                put(r, column + 1, point.acceptance(), null);
                widest = Math.max(widest, point.quality());
            }
            NativeCharts.addScatter(data, NativeCharts.numbers(sheet, 1, rows, column),
                    NativeCharts.numbers(sheet, 1, rows, column + 1), curve.label(), new NativeCharts.Look(
                            ChartStyle.series(c), 2.25, c == 0 ? null : c == 1
                                    ? org.apache.poi.xddf.usermodel.PresetLineDash.DASH
                                    : org.apache.poi.xddf.usermodel.PresetLineDash.SYSTEM_DOT, MarkerStyle.NONE, 0,
                            true));
            column += 2;
        }
        column = marks(sheet, data, head, column, view.design(), "Design points (AQL, LTPD)", ChartStyle.QUIET,
                MarkerStyle.SQUARE, view.perUnit());
        marks(sheet, data, head, column, view.observed(), view.observedLabel(), ChartStyle.INK, MarkerStyle.DIAMOND,
                view.perUnit());
        NativeCharts.range(bottom, 0, view.perUnit() ? widest * 100 : widest);
        chart.plot(data);
        // The points' meanings, in words under the chart (a native chart has no labels beside its points here).
        int r = 34;
        for (List<Charts.RiskMark> kind : List.of(view.design(), view.observed())) {
            for (Charts.RiskMark mark : kind) {
                if (!mark.label().isEmpty()) {
                    Row line = sheet.getRow(r) != null ? sheet.getRow(r) : sheet.createRow(r);
                    put(line, 0, mark.label() + "; accepted " + SentenceText.percent(mark.acceptance())
                            + " of the time", null);
                    r++;
                }
            }
        }
        WorkbookLayout.print(base, sheet, true, 14, Math.max(r, 34), 0, true, title, subject, generated);
    }

    private int marks(XSSFSheet sheet, XDDFScatterChartData data, Row head, int column, List<Charts.RiskMark> marks,
            String label, java.awt.Color colour, MarkerStyle marker, boolean perUnit) {
        if (marks.isEmpty()) {
            return column;
        }
        put(head, column, "quality", null);
        put(head, column + 1, label, null);
        for (int i = 0; i < marks.size(); i++) {
            Row r = sheet.getRow(i + 1) != null ? sheet.getRow(i + 1) : sheet.createRow(i + 1);
            put(r, column, perUnit ? marks.get(i).quality() * 100 : marks.get(i).quality(), null);
            put(r, column + 1, marks.get(i).acceptance(), null);
        }
        NativeCharts.addScatter(data, NativeCharts.numbers(sheet, 1, marks.size(), column),
                NativeCharts.numbers(sheet, 1, marks.size(), column + 1), label,
                NativeCharts.Look.markers(colour, marker, 9));
        return column + 2;
    }
}
