package lotgate.report;

import java.awt.Color;
import org.apache.poi.ss.util.CellRangeAddress;
import org.apache.poi.xddf.usermodel.PresetLineDash;
import org.apache.poi.xddf.usermodel.XDDFShapeProperties;
import org.apache.poi.xddf.usermodel.chart.AxisCrossBetween;
import org.apache.poi.xddf.usermodel.chart.AxisCrosses;
import org.apache.poi.xddf.usermodel.chart.AxisPosition;
import org.apache.poi.xddf.usermodel.chart.BarDirection;
import org.apache.poi.xddf.usermodel.chart.ChartTypes;
import org.apache.poi.xddf.usermodel.chart.LegendPosition;
import org.apache.poi.xddf.usermodel.chart.MarkerStyle;
import org.apache.poi.xddf.usermodel.chart.XDDFBarChartData;
import org.apache.poi.xddf.usermodel.chart.XDDFCategoryAxis;
import org.apache.poi.xddf.usermodel.chart.XDDFChartAxis;
import org.apache.poi.xddf.usermodel.chart.XDDFChartData;
import org.apache.poi.xddf.usermodel.chart.XDDFDataSource;
import org.apache.poi.xddf.usermodel.chart.XDDFDataSourcesFactory;
import org.apache.poi.xddf.usermodel.chart.XDDFLineChartData;
import org.apache.poi.xddf.usermodel.chart.XDDFNumericalDataSource;
import org.apache.poi.xddf.usermodel.chart.XDDFScatterChartData;
import org.apache.poi.xddf.usermodel.chart.XDDFValueAxis;
import org.apache.poi.xssf.usermodel.XSSFChart;
import org.apache.poi.xssf.usermodel.XSSFDrawing;
import org.apache.poi.xssf.usermodel.XSSFSheet;
import org.openxmlformats.schemas.drawingml.x2006.chart.CTMarker;
import org.openxmlformats.schemas.drawingml.x2006.chart.STDispBlanksAs;

/**
 * Native spreadsheet charts in lotgate's look: every series gets its colour, width, dash and marker written out,
 * since a chart without them is drawn differently by each spreadsheet program (or not at all).
 */
final class NativeCharts {
    private NativeCharts() {
    }

    /** How one series is drawn. */
    record Look(Color colour, double width, PresetLineDash dash, MarkerStyle marker, int markerSize,
            boolean line) {
        static Look line(Color colour, double width, PresetLineDash dash) {
            return new Look(colour, width, dash, MarkerStyle.NONE, 0, true);
        }

        static Look lineWithMarkers(Color colour, double width, MarkerStyle marker, int size) {
            return new Look(colour, width, null, marker, size, true);
        }

        static Look markers(Color colour, MarkerStyle marker, int size) {
            return new Look(colour, 0, null, marker, size, false);
        }
    }

    /** A chart anchored over a block of cells, with its title and a legend below. */
    static XSSFChart chart(XSSFSheet sheet, String title, int column1, int row1, int column2, int row2) {
        XSSFDrawing drawing = sheet.getDrawingPatriarch() != null ? sheet.getDrawingPatriarch()
                : sheet.createDrawingPatriarch();
        XSSFChart chart = drawing.createChart(drawing.createAnchor(0, 0, 0, 0, column1, row1, column2, row2));
        chart.setTitleText(title);
        chart.setTitleOverlay(false);
        chart.getOrAddLegend().setPosition(LegendPosition.BOTTOM);
        // Empty cells are gaps: marker-only series hold a value only where there is something to mark.
        if (chart.getCTChart().isSetDispBlanksAs()) {
            chart.getCTChart().getDispBlanksAs().setVal(STDispBlanksAs.GAP);
        } else {
            chart.getCTChart().addNewDispBlanksAs().setVal(STDispBlanksAs.GAP);
        }
        chart.getCTChart().addNewPlotVisOnly().setVal(false);
        return chart;
    }

    static XDDFCategoryAxis categoryAxis(XSSFChart chart, String title) {
        XDDFCategoryAxis axis = chart.createCategoryAxis(AxisPosition.BOTTOM);
        axis.setTitle(title);
        return axis;
    }

    static XDDFValueAxis valueAxis(XSSFChart chart, AxisPosition position, String title, String format) {
        XDDFValueAxis axis = chart.createValueAxis(position);
        axis.setTitle(title);
        axis.setNumberFormat(format);
        axis.setCrossBetween(AxisCrossBetween.BETWEEN);
        axis.getOrAddMajorGridProperties().setLineProperties(WorkbookLayout.line(ChartStyle.GRID, 0.75, null));
        return axis;
    }

    static XDDFDataSource<String> names(XSSFSheet sheet, int firstRow, int lastRow, int column) {
        return XDDFDataSourcesFactory.fromStringCellRange(sheet, new CellRangeAddress(firstRow, lastRow, column, column));
    }

    static XDDFNumericalDataSource<Double> numbers(XSSFSheet sheet, int firstRow, int lastRow, int column) {
        return XDDFDataSourcesFactory.fromNumericCellRange(sheet, new CellRangeAddress(firstRow, lastRow, column,
                column));
    }

    static XDDFLineChartData lines(XSSFChart chart, XDDFCategoryAxis bottom, XDDFValueAxis left) {
        XDDFLineChartData data = (XDDFLineChartData) chart.createData(ChartTypes.LINE, bottom, left);
        data.setVaryColors(false);
        return data;
    }

    static void addLine(XDDFLineChartData data, XDDFDataSource<?> categories, XDDFNumericalDataSource<Double> values,
            String title, Look look) {
        XDDFLineChartData.Series series = (XDDFLineChartData.Series) data.addSeries(categories, values);
        series.setSmooth(false);
        series.setMarkerStyle(look.marker());
        drawAs(series, title, look, () -> series.getCTLineSer().getMarker());
    }

    static XDDFScatterChartData scatter(XSSFChart chart, XDDFValueAxis bottom, XDDFValueAxis left) {
        XDDFScatterChartData data = (XDDFScatterChartData) chart.createData(ChartTypes.SCATTER, bottom, left);
        data.setVaryColors(false);
        return data;
    }

    static void addScatter(XDDFScatterChartData data, XDDFNumericalDataSource<Double> x,
            XDDFNumericalDataSource<Double> y, String title, Look look) {
        XDDFScatterChartData.Series series = (XDDFScatterChartData.Series) data.addSeries(x, y);
        series.setSmooth(false);
        series.setMarkerStyle(look.marker());
        drawAs(series, title, look, () -> series.getCTScatterSer().getMarker());
    }

    /** Gives a series of lines or points its title, its line and its marker's colour, as the look says. */
    private static void drawAs(XDDFChartData.Series series, String title, Look look,
            java.util.function.Supplier<CTMarker> marker) {
        series.setTitle(title, null);
        series.setLineProperties(look.line() ? WorkbookLayout.line(look.colour(), look.width(), look.dash())
                : WorkbookLayout.noLine());
        if (look.marker() != MarkerStyle.NONE) {
            markerColour(marker.get(), look.colour(), look.markerSize());
        }
    }

    /** Bars of one series with an explicit fill and outline. */
    static XDDFBarChartData bars(XSSFChart chart, XDDFCategoryAxis bottom, XDDFValueAxis left) {
        XDDFBarChartData data = (XDDFBarChartData) chart.createData(ChartTypes.BAR, bottom, left);
        data.setBarDirection(BarDirection.COL);
        data.setVaryColors(false);
        return data;
    }

    static void addBars(XDDFBarChartData data, XDDFDataSource<?> categories, XDDFNumericalDataSource<Double> values,
            String title, Color fill, Color outline) {
        XDDFChartData.Series series = data.addSeries(categories, values);
        series.setTitle(title, null);
        XDDFShapeProperties shape = new XDDFShapeProperties();
        shape.setFillProperties(WorkbookLayout.fill(fill));
        shape.setLineProperties(outline == null ? WorkbookLayout.noLine() : WorkbookLayout.line(outline, 0.75, null));
        series.setShapeProperties(shape);
    }

    /** A second value axis on the right, over its own hidden category axis, for a line drawn over bars. */
    static XDDFValueAxis[] secondAxis(XSSFChart chart, String title, String format) {
        XDDFCategoryAxis hidden = chart.createCategoryAxis(AxisPosition.BOTTOM);
        hidden.setVisible(false);
        XDDFValueAxis right = valueAxis(chart, AxisPosition.RIGHT, title, format);
        right.setCrosses(AxisCrosses.MAX);
        right.getOrAddMajorGridProperties().setLineProperties(WorkbookLayout.noLine());
        hidden.crossAxis(right);
        right.crossAxis(hidden);
        return new XDDFValueAxis[] {right};
    }

    static XDDFCategoryAxis lastCategoryAxis(XSSFChart chart) {
        return (XDDFCategoryAxis) chart.getAxes().stream().filter(a -> a instanceof XDDFCategoryAxis)
                .reduce((a, b) -> b).orElseThrow();
    }

    static void range(XDDFChartAxis axis, double minimum, double maximum) {
        axis.setMinimum(minimum);
        axis.setMaximum(maximum);
    }

    private static final String CHART_NS = "http://schemas.openxmlformats.org/drawingml/2006/chart";
    private static final String DRAWING_NS = "http://schemas.openxmlformats.org/drawingml/2006/main";

    /**
     * Labels each point of a series with the series' name, in its colour and bold: for a marker series that holds
     * a value only where there is something to mark ("Outside the control limits"), the mark explains itself.
     */
    static void labelWithName(XDDFLineChartData data, int seriesIndex, Color colour, boolean left) {
        XDDFLineChartData.Series series = (XDDFLineChartData.Series) data.getSeries(seriesIndex);
        insertBeforeCategories(series.getCTLineSer(), "<c:dLbls xmlns:c=\"" + CHART_NS + "\" xmlns:a=\"" + DRAWING_NS
                + "\"><c:spPr><a:solidFill><a:srgbClr val=\"ffffff\"/></a:solidFill></c:spPr><c:txPr><a:bodyPr/>"
                + "<a:lstStyle/><a:p><a:pPr><a:defRPr sz=\"1100\" b=\"1\"><a:solidFill><a:srgbClr val=\""
                + ChartStyle.hex(colour) + "\"/></a:solidFill></a:defRPr></a:pPr><a:endParaRPr lang=\"en-US\"/></a:p>"
                + "</c:txPr><c:dLblPos val=\"" + (left ? "l" : "r") + "\"/><c:showLegendKey val=\"0\"/>"
                + "<c:showVal val=\"0\"/><c:showCatName val=\"0\"/><c:showSerName val=\"1\"/>"
                + "<c:showPercent val=\"0\"/><c:showBubbleSize val=\"0\"/></c:dLbls>");
    }

    /** Gives one bar of a bar series its own fill (the others keep the series' fill). */
    static void barColour(XDDFBarChartData data, int seriesIndex, int point, Color fill, Color outline) {
        XDDFBarChartData.Series series = (XDDFBarChartData.Series) data.getSeries(seriesIndex);
        insertBeforeCategories(series.getCTBarSer(), "<c:dPt xmlns:c=\"" + CHART_NS + "\" xmlns:a=\"" + DRAWING_NS
                + "\"><c:idx val=\"" + point + "\"/><c:invertIfNegative val=\"0\"/><c:bubble3D val=\"0\"/><c:spPr>"
                + "<a:solidFill><a:srgbClr val=\"" + ChartStyle.hex(fill) + "\"/></a:solidFill><a:ln w=\"9525\">"
                + "<a:solidFill><a:srgbClr val=\"" + ChartStyle.hex(outline) + "\"/></a:solidFill></a:ln></c:spPr>"
                + "</c:dPt>");
    }

    /**
     * POI's lean schema build lacks the typed classes of data labels and data points: the element is written as it
     * is, where the schema's order puts it, before the series' categories.
     */
    private static void insertBeforeCategories(org.apache.xmlbeans.XmlObject series, String xml) {
        try (org.apache.xmlbeans.XmlCursor target = series.newCursor();
                org.apache.xmlbeans.XmlCursor source = org.apache.xmlbeans.XmlObject.Factory.parse(xml).newCursor()) {
            if (!target.toChild(new javax.xml.namespace.QName(CHART_NS, "cat"))) {
                throw new IllegalStateException("a chart series without categories");
            }
            source.toFirstChild();
            source.copyXml(target);
        } catch (org.apache.xmlbeans.XmlException e) {
            throw new IllegalStateException(e);
        }
    }

    private static void markerColour(CTMarker marker, Color colour, int size) {
        // POI's lean schema build cannot write a marker's size through its typed API: write the element as it is.
        if (!marker.isSetSpPr()) {
            try (org.apache.xmlbeans.XmlCursor cursor = marker.newCursor()) {
                cursor.toEndToken();
                cursor.beginElement(new javax.xml.namespace.QName(
                        "http://schemas.openxmlformats.org/drawingml/2006/chart", "size", "c"));
                cursor.insertAttributeWithValue("val", Integer.toString(Math.max(2, Math.min(72, size))));
            }
        }
        var properties = marker.isSetSpPr() ? marker.getSpPr() : marker.addNewSpPr();
        XDDFShapeProperties shape = new XDDFShapeProperties(properties);
        shape.setFillProperties(WorkbookLayout.fill(colour));
        shape.setLineProperties(WorkbookLayout.line(colour, 0.75, null));
    }
}
