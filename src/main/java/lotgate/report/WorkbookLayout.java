package lotgate.report;

import java.awt.Color;
import org.apache.poi.ss.usermodel.BorderStyle;
import org.apache.poi.ss.usermodel.CellStyle;
import org.apache.poi.ss.usermodel.FillPatternType;
import org.apache.poi.ss.usermodel.Font;
import org.apache.poi.ss.usermodel.HorizontalAlignment;
import org.apache.poi.ss.usermodel.PrintSetup;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.ss.usermodel.VerticalAlignment;
import org.apache.poi.ss.usermodel.Workbook;
import org.apache.poi.ss.util.CellRangeAddress;
import org.apache.poi.xddf.usermodel.PresetLineDash;
import org.apache.poi.xddf.usermodel.XDDFColor;
import org.apache.poi.xddf.usermodel.XDDFLineProperties;
import org.apache.poi.xddf.usermodel.XDDFPresetLineDash;
import org.apache.poi.xddf.usermodel.XDDFSolidFillProperties;
import org.apache.poi.xddf.usermodel.chart.XDDFChartData;
import org.apache.poi.xssf.usermodel.XSSFCellStyle;
import org.apache.poi.xssf.usermodel.XSSFColor;
import org.apache.poi.xssf.usermodel.XSSFFont;

/**
 * What every lotgate workbook shares so that it prints as a report: A4 pages fitted to the width, landscape
 * where a sheet is wide, the header row repeated on every page, a header and footer naming the report, its
 * subject and the day it was made; header cells that wrap instead of cutting words; and the chart colours of
 * {@link ChartStyle}, given explicitly because spreadsheet programs differ in their defaults.
 */
final class WorkbookLayout {
    private WorkbookLayout() {
    }

    /**
     * Sets a sheet up to print.
     *
     * @param lastColumn  the last column (0-based) of the print area
     * @param lastRow     the last row (0-based) of the print area
     * @param headerRows  rows repeated at the top of each page (0 for none)
     * @param onePage     whether the whole area is shrunk onto one page (a chart sheet), else only to the width
     */
    static void print(Workbook workbook, Sheet sheet, boolean landscape, int lastColumn, int lastRow, int headerRows,
            boolean onePage, String title, String subject, String generated) {
        int index = workbook.getSheetIndex(sheet);
        workbook.setPrintArea(index, 0, Math.max(0, lastColumn), 0, Math.max(0, lastRow));
        sheet.setAutobreaks(true);
        sheet.setFitToPage(true);
        PrintSetup setup = sheet.getPrintSetup();
        setup.setPaperSize(PrintSetup.A4_PAPERSIZE);
        setup.setLandscape(landscape);
        setup.setFitWidth((short) 1);
        setup.setFitHeight((short) (onePage ? 1 : 0));
        sheet.setMargin(Sheet.LeftMargin, 0.5);
        sheet.setMargin(Sheet.RightMargin, 0.5);
        sheet.setMargin(Sheet.TopMargin, 0.75);
        sheet.setMargin(Sheet.BottomMargin, 0.65);
        sheet.setMargin(Sheet.HeaderMargin, 0.3);
        sheet.setMargin(Sheet.FooterMargin, 0.3);
        sheet.setHorizontallyCenter(onePage);
        if (headerRows > 0) {
            sheet.setRepeatingRows(new CellRangeAddress(0, headerRows - 1, -1, -1));
        }
        sheet.getHeader().setLeft(headerText(title));
        sheet.getHeader().setRight(headerText(subject));
        sheet.getFooter().setLeft(headerText("lotgate, made " + generated));
        sheet.getFooter().setCenter(headerText(sheet.getSheetName()));
        sheet.getFooter().setRight("page &P of &N");
    }

    /** Header and footer text treats '&' as a code: a literal one is doubled. */
    private static String headerText(String text) {
        String plain = text == null ? "" : text.replace("&", "&&");
        return plain.length() > 120 ? plain.substring(0, 119) + "~" : plain;
    }

    /** The typeface of every workbook: Arial, which every spreadsheet program has or replaces by equal metrics. */
    static final String TYPEFACE = "Arial";

    /** Sets the workbook's default font (the one unstyled cells use). */
    static void baseFont(Workbook workbook) {
        Font base = workbook.getFontAt(0);
        base.setFontName(TYPEFACE);
        base.setFontHeightInPoints((short) 10);
    }

    /** A new font in the workbook's typeface. */
    static Font font(Workbook workbook) {
        Font font = workbook.createFont();
        font.setFontName(TYPEFACE);
        font.setFontHeightInPoints((short) 10);
        return font;
    }

    /** A column heading: bold, wrapped within its column, on a light band with a rule below. */
    static CellStyle heading(Workbook workbook) {
        CellStyle style = workbook.createCellStyle();
        Font font = font(workbook);
        font.setBold(true);
        style.setFont(font);
        style.setWrapText(true);
        style.setAlignment(HorizontalAlignment.LEFT);
        style.setIndention((short) 1);
        style.setVerticalAlignment(VerticalAlignment.BOTTOM);
        style.setBorderBottom(BorderStyle.THIN);
        if (style instanceof XSSFCellStyle xssf) {
            xssf.setFillForegroundColor(new XSSFColor(ChartStyle.rgb(new Color(0xec, 0xee, 0xf1)), null));
            xssf.setFillPattern(FillPatternType.SOLID_FOREGROUND);
        }
        return style;
    }

    /** A heading over numbers: as {@link #heading} but right-aligned, above the figures it names. */
    static CellStyle numberHeading(Workbook workbook) {
        CellStyle style = heading(workbook);
        style.setAlignment(HorizontalAlignment.RIGHT);
        style.setIndention((short) 0);
        return style;
    }

    /** Body text in a table, indented a little so that it never runs into the figures on its left. */
    static CellStyle text(Workbook workbook) {
        CellStyle style = workbook.createCellStyle();
        style.setAlignment(HorizontalAlignment.LEFT);
        style.setIndention((short) 1);
        return style;
    }

    /** Body text that wraps within its column (long summary lines). */
    static CellStyle wrapped(Workbook workbook) {
        CellStyle style = workbook.createCellStyle();
        style.setWrapText(true);
        style.setVerticalAlignment(VerticalAlignment.TOP);
        return style;
    }

    static CellStyle format(Workbook workbook, String format) {
        CellStyle style = workbook.createCellStyle();
        style.setDataFormat(workbook.createDataFormat().getFormat(format));
        return style;
    }

    /** A bold font in a colour of the identity, for a verdict or a warning. */
    static CellStyle banner(Workbook workbook, Color background, short points) {
        CellStyle style = workbook.createCellStyle();
        Font font = font(workbook);
        font.setBold(true);
        font.setFontHeightInPoints(points);
        if (font instanceof XSSFFont xssf) {
            xssf.setColor(new XSSFColor(new byte[] {(byte) 255, (byte) 255, (byte) 255}, null));
        }
        style.setFont(font);
        style.setWrapText(true);
        style.setVerticalAlignment(VerticalAlignment.CENTER);
        if (style instanceof XSSFCellStyle xssf) {
            xssf.setFillForegroundColor(new XSSFColor(ChartStyle.rgb(background), null));
            xssf.setFillPattern(FillPatternType.SOLID_FOREGROUND);
        }
        return style;
    }

    /** Column widths from the longest text in each, within bounds, in characters. */
    static final class Widths {
        private final int[] widest;

        Widths(int columns) {
            widest = new int[columns];
        }

        /** Notes a value shown in a column; a heading counts by its longest word, since headings wrap. */
        void note(int column, String text, boolean heading) {
            if (column >= widest.length || text == null) {
                return;
            }
            int length = 0;
            if (heading) {
                for (String word : text.split(" ")) {
                    length = Math.max(length, word.length() + 1);
                }
            } else {
                length = text.length();
            }
            widest[column] = Math.max(widest[column], length);
        }

        void apply(Sheet sheet, int fewest, int most) {
            for (int c = 0; c < widest.length; c++) {
                int chars = Math.max(fewest, Math.min(most, widest[c] + 2));
                sheet.setColumnWidth(c, chars * 256);
            }
        }
    }

    // ---- native chart styling ----

    static XDDFSolidFillProperties fill(Color colour) {
        return new XDDFSolidFillProperties(XDDFColor.from(ChartStyle.rgb(colour)));
    }

    /** A line of a native chart in an identity colour, solid or dashed, width in points. */
    static XDDFLineProperties line(Color colour, double width, PresetLineDash dash) {
        XDDFLineProperties line = new XDDFLineProperties(fill(colour));
        line.setWidth(width);
        if (dash != null) {
            line.setPresetDash(new XDDFPresetLineDash(dash));
        }
        return line;
    }

    /** A series drawn with no line at all: markers only. */
    static XDDFLineProperties noLine() {
        return new XDDFLineProperties(new org.apache.poi.xddf.usermodel.XDDFNoFillProperties());
    }

    /** Gives a series its fill and outline explicitly (bars, markers). */
    static void fill(XDDFChartData.Series series, Color colour) {
        series.setFillProperties(fill(colour));
    }
}
