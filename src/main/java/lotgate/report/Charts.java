package lotgate.report;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.Shape;
import java.awt.geom.Rectangle2D;
import java.text.DecimalFormat;
import java.text.DecimalFormatSymbols;
import java.util.List;
import java.util.Locale;
import java.util.function.ToDoubleFunction;
import lotgate.sampling.CurvePoint;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.LegendItem;
import org.jfree.chart.LegendItemCollection;
import org.jfree.chart.annotations.XYTextAnnotation;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.CombinedDomainXYPlot;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.title.TextTitle;
import org.jfree.chart.ui.RectangleAnchor;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

/**
 * Builds the OC, AOQ and ATI charts from computed curve points; the numbers come from the sampling
 * core, the charts only draw them.
 */
public final class Charts {
    private static final Font LABEL = ChartStyle.NOTE;

    /** A point the plan was asked to pass through or stay clear of: the AQL and LTPD requests. */
    public record RiskMark(String label, double quality, double acceptance) {
    }

    private Charts() {
    }

    /** The x-axis title for fractions nonconforming or nonconformities per unit. */
    public static String qualityAxis(boolean perUnit) {
        return perUnit ? "Incoming quality (nonconformities per 100 units)" : "Incoming quality (% nonconforming)";
    }

    public static JFreeChart oc(String title, boolean perUnit, List<ChartCurve> curves, List<RiskMark> marks) {
        return oc(title, perUnit, curves, marks, "Design points (AQL, LTPD)");
    }

    /** An OC chart whose marked points carry their own legend entry, such as a lot's observed quality. */
    public static JFreeChart oc(String title, boolean perUnit, List<ChartCurve> curves, List<RiskMark> marks,
            String marksLabel) {
        XYPlot plot = ocPlot(perUnit, curves, marks, marksLabel);
        plot.getDomainAxis().setRange(0, widest(curves));
        return finish(new JFreeChart(title, ChartStyle.TITLE, plot, true));
    }

    /**
     * An OC chart with the points asked of the plan (squares, such as the AQL and LTPD with their risks) and the
     * points observed (diamonds, such as a lot's observed quality), each kind with its legend entry.
     */
    public static JFreeChart oc(String title, boolean perUnit, List<ChartCurve> curves, List<RiskMark> design,
            String designLabel, List<RiskMark> observed, String observedLabel) {
        XYPlot plot = ocPlot(perUnit, curves, design, designLabel, observed, observedLabel);
        plot.getDomainAxis().setRange(0, widest(curves));
        return finish(new JFreeChart(title, ChartStyle.TITLE, plot, true));
    }

    public static JFreeChart aoq(String title, boolean perUnit, ChartCurve curve, double aoql, double aoqlAt) {
        XYPlot plot = aoqPlot(perUnit, curve, aoql, aoqlAt, true);
        plot.getDomainAxis().setRange(0, widest(List.of(curve)));
        return finish(new JFreeChart(title, ChartStyle.TITLE, plot, true));
    }

    public static JFreeChart ati(String title, boolean perUnit, ChartCurve curve, int sampleSize, int lotSize) {
        XYPlot plot = atiPlot(perUnit, curve, sampleSize, lotSize, true);
        plot.getDomainAxis().setRange(0, widest(List.of(curve)));
        return finish(new JFreeChart(title, ChartStyle.TITLE, plot, true));
    }

    /** ASN curves: the units inspected on average to reach a decision, against incoming quality. */
    public static JFreeChart asn(String title, boolean perUnit, List<ChartCurve> curves) {
        XYSeriesCollection data = new XYSeriesCollection();
        for (ChartCurve curve : curves) {
            data.addSeries(series(curve, CurvePoint::asn));
        }
        XYLineAndShapeRenderer renderer = new XYLineAndShapeRenderer(true, false);
        for (int i = 0; i < curves.size(); i++) {
            renderer.setSeriesPaint(i, ChartStyle.series(i));
            renderer.setSeriesStroke(i, ChartStyle.seriesStroke(i));
        }
        NumberAxis units = new NumberAxis("Average sample number (units)");
        units.setAutoRangeIncludesZero(true);
        XYPlot plot = new XYPlot(data, qualityAxisOf(perUnit), units, renderer);
        plot.getDomainAxis().setRange(0, widest(curves));
        return finish(new JFreeChart(title, ChartStyle.TITLE, style(plot), true));
    }

    /**
     * The sampling chart of a lot: the count found against the units inspected, with the counts that accept
     * and those that reject at each point where the plan may stop.
     *
     * @param acceptance per unit inspected (index m), the largest count that accepts there, or NaN where the plan
     *                   cannot stop; likewise {@code rejection}
     * @param path       the count found after each unit (index m), or NaN where it is not known
     */
    public static JFreeChart sampling(String title, boolean units, double[] acceptance, double[] rejection,
            double[] path, boolean lines) {
        XYSeries accept = new XYSeries("Accept at or below", false, true);
        XYSeries reject = new XYSeries("Reject at or above", false, true);
        XYSeries acceptPoints = new XYSeries("Accept at or below (at a stage end)", false, true);
        XYSeries rejectPoints = new XYSeries("Reject at or above (at a stage end)", false, true);
        int last = 0;
        if (lines) {
            for (int m = 1; m < acceptance.length; m++) {
                // Counts are never negative: the acceptance line starts where it reaches 0.
                if (!Double.isNaN(acceptance[m]) && acceptance[m] >= 0) {
                    accept.add(m, acceptance[m]);
                }
                if (!Double.isNaN(rejection[m])) {
                    reject.add(m, rejection[m]);
                }
            }
        } else {
            // A plan in stages decides only at the end of each stage: its numbers hold over the stage, as steps.
            for (int m = 1; m < acceptance.length; m++) {
                if (!Double.isNaN(acceptance[m]) || !Double.isNaN(rejection[m])) {
                    if (!Double.isNaN(acceptance[m]) && acceptance[m] >= 0) {
                        accept.add(last, acceptance[m]);
                        accept.add(m, acceptance[m]);
                        acceptPoints.add(m, acceptance[m]);
                    }
                    reject.add(last, rejection[m]);
                    reject.add(m, rejection[m]);
                    rejectPoints.add(m, rejection[m]);
                    last = m;
                }
            }
        }
        XYSeries found = new XYSeries("Count found in this lot", false, true);
        found.add(0, 0);
        double count = 0;
        int stop = 0;
        for (int m = 1; m < path.length; m++) {
            if (!Double.isNaN(path[m])) {
                // The count moves only when a nonconforming unit is found: a step, not a slope.
                found.add(m, count);
                found.add(m, path[m]);
                count = path[m];
                stop = m;
            }
        }
        XYSeries end = new XYSeries("Where this lot's inspection stopped", false, true);
        end.add(stop, count);
        XYSeriesCollection data = collection(accept, reject, found, end, acceptPoints, rejectPoints);
        XYLineAndShapeRenderer renderer = new XYLineAndShapeRenderer(true, false);
        renderer.setSeriesPaint(0, ChartStyle.CALM);
        renderer.setSeriesStroke(0, ChartStyle.limit());
        renderer.setSeriesPaint(1, ChartStyle.ALERT);
        renderer.setSeriesStroke(1, ChartStyle.limit());
        renderer.setSeriesPaint(2, ChartStyle.DATA);
        renderer.setSeriesStroke(2, new BasicStroke(2.6f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER));
        marksOnly(renderer, 3, ChartStyle.INK, ChartStyle.observed());
        for (int s = 4; s <= 5; s++) {
            marksOnly(renderer, s, s == 4 ? ChartStyle.CALM : ChartStyle.ALERT, ChartStyle.designPoint());
            renderer.setSeriesVisibleInLegend(s, false);
        }
        NumberAxis inspected = new NumberAxis("Units inspected");
        inspected.setStandardTickUnits(NumberAxis.createIntegerTickUnits());
        inspected.setRange(0, Math.max(acceptance.length - 1, path.length - 1) * 1.02 + 1);
        NumberAxis counts = new NumberAxis(units ? "Nonconforming units found" : "Nonconformities found");
        counts.setStandardTickUnits(NumberAxis.createIntegerTickUnits());
        double top = 1;
        for (int s = 0; s < 3; s++) {
            top = Math.max(top, data.getSeries(s).getMaxY());
        }
        counts.setRange(0, top * 1.08 + 0.3);
        XYPlot plot = new XYPlot(data, inspected, counts, renderer);
        return finish(new JFreeChart(title, ChartStyle.TITLE, style(plot), true));
    }

    /**
     * A lot on a control chart: its value and the centre and limits for its sample size, whether it was rejected,
     * and the inspection severity it was judged under ("normal", "tightened", "reduced", or null).
     */
    public record ControlPoint(String lot, double value, double centre, double lower, double upper, boolean rejected,
            String severity) {
        boolean outside() {
            return value > upper || value < lower;
        }
    }

    /** A change of inspection severity, drawn after the lot of index {@code afterIndex} (0-based). */
    public record SwitchMark(int afterIndex, String to) {
    }

    /**
     * The p-chart: each lot's fraction nonconforming in receiving order, named by its lot id, with the centre line
     * and the 3-sigma limits for each lot's sample size (steps where sample sizes differ), the lots outside their
     * limits, the rejected lots, and the stretches of tightened or reduced inspection with their switches marked.
     */
    public static JFreeChart pChart(String title, List<ControlPoint> points, List<SwitchMark> switches) {
        return control(title, points, switches, percentAxis("Fraction nonconforming"), "Lot fraction nonconforming");
    }

    /**
     * A Shewhart chart of one value per lot in receiving order, with its centre and 3-sigma limits (per lot). The
     * value axis starts where the data does, not at 0.
     */
    public static JFreeChart control(String title, List<ControlPoint> points, String valueLabel) {
        NumberAxis value = new NumberAxis(valueLabel);
        value.setAutoRangeIncludesZero(false);
        return control(title, points, List.of(), value, "Lot value");
    }

    private static JFreeChart control(String title, List<ControlPoint> points, List<SwitchMark> switches,
            NumberAxis valueAxis, String valueName) {
        XYSeries values = new XYSeries(valueName, false, true);
        XYSeries centre = new XYSeries("Centre line", false, true);
        XYSeries upper = new XYSeries("Upper control limit", false, true);
        XYSeries lower = new XYSeries("Lower control limit", false, true);
        XYSeries outside = new XYSeries("Outside the control limits", false, true);
        XYSeries rejected = new XYSeries("Lot rejected", false, true);
        for (int i = 0; i < points.size(); i++) {
            ControlPoint point = points.get(i);
            values.add(i, point.value());
            // Each lot's limits span its own slot, so that limits for different sample sizes show as steps.
            centre.add(i - 0.5, point.centre());
            centre.add(i + 0.5, point.centre());
            upper.add(i - 0.5, point.upper());
            upper.add(i + 0.5, point.upper());
            lower.add(i - 0.5, point.lower());
            lower.add(i + 0.5, point.lower());
            if (point.outside()) {
                outside.add(i, point.value());
            }
            if (point.rejected()) {
                rejected.add(i, point.value());
            }
        }
        XYSeriesCollection data = collection(values, centre, upper, lower, outside, rejected);
        XYLineAndShapeRenderer renderer = new XYLineAndShapeRenderer(true, false);
        renderer.setSeriesPaint(0, ChartStyle.DATA);
        renderer.setSeriesStroke(0, new BasicStroke(1.6f));
        renderer.setSeriesShapesVisible(0, true);
        renderer.setSeriesShape(0, ChartStyle.point());
        renderer.setSeriesPaint(1, ChartStyle.CALM);
        renderer.setSeriesStroke(1, ChartStyle.centre());
        renderer.setSeriesPaint(2, ChartStyle.ALERT);
        renderer.setSeriesStroke(2, ChartStyle.limit());
        renderer.setSeriesPaint(3, ChartStyle.ALERT);
        renderer.setSeriesStroke(3, ChartStyle.limit());
        marksOnly(renderer, 4, ChartStyle.ALERT, ChartStyle.outside());
        marksOnly(renderer, 5, ChartStyle.INK, ChartStyle.ring());
        renderer.setSeriesShapesFilled(5, false);
        renderer.setSeriesOutlineStroke(5, new BasicStroke(1.8f));
        renderer.setUseOutlinePaint(false);
        renderer.setDrawOutlines(true);

        String[] names = points.stream().map(ControlPoint::lot).toArray(String[]::new);
        org.jfree.chart.axis.SymbolAxis order = new org.jfree.chart.axis.SymbolAxis("Lot, in the order received",
                names);
        order.setVerticalTickLabels(true);
        order.setGridBandsVisible(false);
        order.setRange(-0.6, Math.max(points.size() - 0.4, 0.6));
        XYPlot plot = new XYPlot(data, order, valueAxis, renderer);
        valueAxis.setUpperMargin(0.12);

        LegendItemCollection legend = new LegendItemCollection();
        legend.add(legendLine(valueName, ChartStyle.DATA, new BasicStroke(1.6f), ChartStyle.point(), true));
        legend.add(legendLine("Centre line", ChartStyle.CALM, ChartStyle.centre(), null, false));
        legend.add(legendLine("Upper and lower control limits (3 sigma)", ChartStyle.ALERT, ChartStyle.limit(), null,
                false));
        if (!outside.isEmpty()) {
            legend.add(legendMark("Outside the control limits", ChartStyle.ALERT, ChartStyle.outside(), true));
        }
        if (!rejected.isEmpty()) {
            legend.add(legendMark("Lot rejected", ChartStyle.INK, ChartStyle.ring(), false));
        }
        shadeSeverity(plot, points, legend);
        for (int i = 0; i < points.size(); i++) {
            ControlPoint point = points.get(i);
            if (point.outside()) {
                // The mark says what it means beside the point, pointing at it from below and inside the plot.
                boolean late = i > points.size() / 2;
                org.jfree.chart.annotations.XYPointerAnnotation note = new org.jfree.chart.annotations
                        .XYPointerAnnotation(point.lot() + " outside the limits", i, point.value(),
                                late ? 3 * Math.PI / 4 : Math.PI / 4);
                note.setFont(ChartStyle.NOTE_BOLD);
                note.setPaint(ChartStyle.ALERT);
                note.setArrowPaint(ChartStyle.ALERT);
                note.setArrowStroke(new BasicStroke(1.4f));
                note.setTipRadius(11);
                note.setBaseRadius(34);
                note.setLabelOffset(4);
                note.setBackgroundPaint(new Color(255, 255, 255, 225));
                note.setTextAnchor(late ? TextAnchor.TOP_RIGHT : TextAnchor.TOP_LEFT);
                renderer.addAnnotation(note);
            }
        }
        for (SwitchMark change : switches) {
            ValueMarker line = new ValueMarker(change.afterIndex() + 0.5, ChartStyle.INK, new BasicStroke(1.2f,
                    BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f, new float[] {2f, 2f}, 0f));
            line.setLabel("to " + change.to());
            line.setLabelFont(ChartStyle.NOTE_BOLD);
            line.setLabelPaint(ChartStyle.INK);
            line.setLabelBackgroundColor(new Color(255, 255, 255, 225));
            boolean atEnd = change.afterIndex() >= points.size() - 1;
            // A switch after the last lot reads to the left of its line, inside the plot.
            line.setLabelAnchor(atEnd ? RectangleAnchor.TOP_LEFT : RectangleAnchor.TOP_RIGHT);
            line.setLabelTextAnchor(atEnd ? TextAnchor.TOP_RIGHT : TextAnchor.TOP_LEFT);
            plot.addDomainMarker(line, org.jfree.chart.ui.Layer.FOREGROUND);
        }
        if (!switches.isEmpty()) {
            legend.add(legendLine("Severity switch (after the lot on its left)", ChartStyle.INK, new BasicStroke(1.2f,
                    BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f, new float[] {2f, 2f}, 0f), null, false));
        }
        plot.setFixedLegendItems(legend);
        return finish(new JFreeChart(title, ChartStyle.TITLE, style(plot), true));
    }

    /** Shades each stretch of lots judged under tightened or reduced inspection. */
    private static void shadeSeverity(XYPlot plot, List<ControlPoint> points, LegendItemCollection legend) {
        boolean tightened = false;
        boolean reduced = false;
        int i = 0;
        while (i < points.size()) {
            String severity = points.get(i).severity();
            int j = i;
            while (j + 1 < points.size() && java.util.Objects.equals(points.get(j + 1).severity(), severity)) {
                j++;
            }
            if ("tightened".equals(severity) || "reduced".equals(severity)) {
                Color shade = "tightened".equals(severity) ? ChartStyle.TIGHTENED_SHADE : ChartStyle.REDUCED_SHADE;
                org.jfree.chart.plot.IntervalMarker band = new org.jfree.chart.plot.IntervalMarker(i - 0.5, j + 0.5,
                        shade);
                plot.addDomainMarker(band, org.jfree.chart.ui.Layer.BACKGROUND);
                tightened |= "tightened".equals(severity);
                reduced |= "reduced".equals(severity);
            }
            i = j + 1;
        }
        if (tightened) {
            legend.add(legendShade("Judged under tightened inspection", ChartStyle.TIGHTENED_SHADE));
        }
        if (reduced) {
            legend.add(legendShade("Judged under reduced inspection", ChartStyle.REDUCED_SHADE));
        }
    }

    private static LegendItem legendLine(String label, Color colour, BasicStroke stroke, Shape shape, boolean filled) {
        LegendItem item = new LegendItem(label, null, null, null, shape != null,
                shape != null ? shape : new Rectangle2D.Double(-3, -3, 6, 6), filled, colour, false, colour, stroke,
                true, new java.awt.geom.Line2D.Double(-10, 0, 10, 0), stroke, colour);
        item.setLabelFont(ChartStyle.LEGEND);
        return item;
    }

    private static LegendItem legendShade(String label, Color shade) {
        LegendItem item = new LegendItem(label, null, null, null, true, new Rectangle2D.Double(-7, -6, 14, 12), true,
                shade, true, ChartStyle.QUIET, new BasicStroke(0.8f), false,
                new java.awt.geom.Line2D.Double(-10, 0, 10, 0), new BasicStroke(1f), shade);
        item.setLabelFont(ChartStyle.LEGEND);
        return item;
    }

    private static LegendItem legendMark(String label, Color colour, Shape shape, boolean filled) {
        LegendItem item = new LegendItem(label, null, null, null, true, shape, filled, colour, !filled, colour,
                new BasicStroke(1.8f), false, new java.awt.geom.Line2D.Double(-10, 0, 10, 0), new BasicStroke(1f),
                colour);
        item.setLabelFont(ChartStyle.LEGEND);
        return item;
    }

    /** The Pareto chart: defect types as bars, most frequent first, with the cumulative share as a line. */
    public static JFreeChart pareto(String title, List<String> types, long[] counts, double[] cumulative) {
        org.jfree.data.category.DefaultCategoryDataset bars = new org.jfree.data.category.DefaultCategoryDataset();
        org.jfree.data.category.DefaultCategoryDataset line = new org.jfree.data.category.DefaultCategoryDataset();
        for (int i = 0; i < types.size(); i++) {
            String label = types.get(i).length() > 24 ? types.get(i).substring(0, 23) + "~" : types.get(i);
            bars.addValue(counts[i], "Nonconforming units", label + "​".repeat(i));
            line.addValue(cumulative[i], "Cumulative share", label + "​".repeat(i));
        }
        org.jfree.chart.plot.CategoryPlot plot = new org.jfree.chart.plot.CategoryPlot(bars,
                new org.jfree.chart.axis.CategoryAxis("Defect type"), countAxis("Nonconforming units"),
                new org.jfree.chart.renderer.category.BarRenderer());
        // The leading type in the data's full colour, the others lighter: the bar that dominates reads first.
        plot.setRenderer(new org.jfree.chart.renderer.category.BarRenderer() {
            @Override
            public java.awt.Paint getItemPaint(int row, int column) {
                return column == 0 || counts[column] == counts[0] ? ChartStyle.DATA : ChartStyle.DATA_LIGHT;
            }
        });
        plot.getRenderer().setSeriesPaint(0, ChartStyle.DATA);
        ((org.jfree.chart.renderer.category.BarRenderer) plot.getRenderer()).setShadowVisible(false);
        ((org.jfree.chart.renderer.category.BarRenderer) plot.getRenderer())
                .setBarPainter(new org.jfree.chart.renderer.category.StandardBarPainter());
        plot.setDataset(1, line);
        plot.setRangeAxis(1, percentAxis("Cumulative share"));
        plot.getRangeAxis(1).setRange(0, 1.05);
        plot.mapDatasetToRangeAxis(1, 1);
        org.jfree.chart.renderer.category.LineAndShapeRenderer cumulativeRenderer =
                new org.jfree.chart.renderer.category.LineAndShapeRenderer();
        cumulativeRenderer.setSeriesPaint(0, ChartStyle.ALERT);
        cumulativeRenderer.setSeriesStroke(0, ChartStyle.data());
        cumulativeRenderer.setSeriesShape(0, ChartStyle.point());
        plot.setRenderer(1, cumulativeRenderer);
        plot.setDatasetRenderingOrder(org.jfree.chart.plot.DatasetRenderingOrder.FORWARD);
        // A few types read level under their bars; many would collide, so they slant.
        plot.getDomainAxis().setCategoryLabelPositions(types.size() <= 6
                ? org.jfree.chart.axis.CategoryLabelPositions.STANDARD
                : org.jfree.chart.axis.CategoryLabelPositions.UP_45);
        plot.getDomainAxis().setMaximumCategoryLabelLines(2);
        plot.setBackgroundPaint(Color.WHITE);
        plot.setRangeGridlinePaint(ChartStyle.GRID);
        plot.setOutlinePaint(ChartStyle.GRID);
        for (int a = 0; a < 2; a++) {
            axisFonts(plot.getRangeAxis(a));
        }
        axisFonts(plot.getDomainAxis());
        return finish(new JFreeChart(title, ChartStyle.TITLE, plot, true));
    }

    /** A value axis of whole counts: no tick between two whole numbers. */
    private static NumberAxis countAxis(String label) {
        NumberAxis axis = new NumberAxis(label);
        axis.setStandardTickUnits(NumberAxis.createIntegerTickUnits());
        return axis;
    }

    /**
     * An interval chart: one row per name (the first at the top), its estimate as a dot and its confidence interval
     * as a bar, on a percent axis.
     */
    public static JFreeChart intervals(String title, List<String> names, double[] estimate, double[] lower,
            double[] upper, String valueLabel, String estimateLabel) {
        org.jfree.data.xy.XYIntervalSeries series = new org.jfree.data.xy.XYIntervalSeries(estimateLabel);
        for (int i = 0; i < names.size(); i++) {
            series.add(estimate[i], lower[i], upper[i], i, i, i);
        }
        org.jfree.data.xy.XYIntervalSeriesCollection data = new org.jfree.data.xy.XYIntervalSeriesCollection();
        data.addSeries(series);
        org.jfree.chart.renderer.xy.XYErrorRenderer renderer = new org.jfree.chart.renderer.xy.XYErrorRenderer();
        renderer.setDrawYError(false);
        renderer.setDrawXError(true);
        renderer.setErrorPaint(ChartStyle.DATA);
        renderer.setErrorStroke(new BasicStroke(3f));
        renderer.setCapLength(10);
        renderer.setDefaultLinesVisible(false);
        renderer.setSeriesShape(0, ChartStyle.observed());
        renderer.setSeriesPaint(0, ChartStyle.INK);
        NumberAxis value = percentAxis(valueLabel);
        double widest = 0;
        for (double bound : upper) {
            widest = Math.max(widest, bound);
        }
        value.setRange(0, widest > 0 ? widest * 1.1 : 1);
        org.jfree.chart.axis.SymbolAxis rows = new org.jfree.chart.axis.SymbolAxis(null,
                names.stream().map(n -> n.length() > 36 ? n.substring(0, 35) + "~" : n).toArray(String[]::new));
        rows.setInverted(true);
        rows.setGridBandsVisible(false);
        rows.setRange(-0.6, names.size() - 0.4);
        XYPlot plot = new XYPlot(data, value, rows, renderer);
        LegendItemCollection legend = new LegendItemCollection();
        legend.add(legendMark(estimateLabel, ChartStyle.INK, ChartStyle.observed(), true));
        legend.add(legendLine("Confidence interval", ChartStyle.DATA, new BasicStroke(3f), null, false));
        plot.setFixedLegendItems(legend);
        return finish(new JFreeChart(title, ChartStyle.TITLE, style(plot), true));
    }

    /** Adds a line under the title, such as the model and lot size. */
    public static JFreeChart withSubtitle(JFreeChart chart, String subtitle) {
        TextTitle line = new TextTitle(subtitle, ChartStyle.SUBTITLE, ChartStyle.INK,
                org.jfree.chart.ui.RectangleEdge.TOP, org.jfree.chart.ui.HorizontalAlignment.CENTER,
                org.jfree.chart.ui.VerticalAlignment.CENTER, new org.jfree.chart.ui.RectangleInsets(2, 4, 6, 4));
        chart.addSubtitle(0, line);
        return chart;
    }

    private static double widest(List<ChartCurve> curves) {
        double widest = 0;
        for (ChartCurve curve : curves) {
            for (CurvePoint point : curve.points()) {
                widest = Math.max(widest, point.quality());
            }
        }
        return widest > 0 ? widest : 1;
    }

    /** OC, AOQ and (with a lot size) ATI stacked over one quality axis. */
    public static JFreeChart all(String title, boolean perUnit, ChartCurve curve, List<RiskMark> marks,
            double aoql, double aoqlAt, int sampleSize, int lotSize) {
        NumberAxis shared = qualityAxisOf(perUnit);
        shared.setRange(0, widest(List.of(curve)));
        CombinedDomainXYPlot combined = new CombinedDomainXYPlot(shared);
        combined.setGap(14);
        combined.add(ocPlot(perUnit, List.of(curve), marks, "Design points (AQL, LTPD)"), 3);
        combined.add(aoqPlot(perUnit, curve, aoql, aoqlAt, false), 2);
        if (lotSize > 0) {
            combined.add(atiPlot(perUnit, curve, sampleSize, lotSize, false), 2);
        }
        return finish(new JFreeChart(title, ChartStyle.TITLE, combined, true));
    }

    private static XYPlot ocPlot(boolean perUnit, List<ChartCurve> curves, List<RiskMark> marks, String marksLabel) {
        return ocPlot(perUnit, curves, marks, marksLabel, List.of(), null);
    }

    /**
     * The OC curves with two kinds of marks: points asked of the plan (squares) and points observed (diamonds).
     * Labels sit up and to the right of their point, where a falling curve leaves room.
     */
    private static XYPlot ocPlot(boolean perUnit, List<ChartCurve> curves, List<RiskMark> marks, String marksLabel,
            List<RiskMark> observed, String observedLabel) {
        XYSeriesCollection data = new XYSeriesCollection();
        XYLineAndShapeRenderer renderer = new XYLineAndShapeRenderer(true, false);
        for (int i = 0; i < curves.size(); i++) {
            data.addSeries(series(curves.get(i), CurvePoint::acceptance));
            renderer.setSeriesPaint(i, ChartStyle.series(i));
            renderer.setSeriesStroke(i, ChartStyle.seriesStroke(i));
        }
        NumberAxis probability = percentAxis("Probability of acceptance");
        probability.setRange(0, 1.09);
        probability.setTickUnit(new org.jfree.chart.axis.NumberTickUnit(0.1, probability.getNumberFormatOverride()));
        XYPlot plot = new XYPlot(data, qualityAxisOf(perUnit), probability, renderer);
        int index = 1;
        for (int kind = 0; kind < 2; kind++) {
            List<RiskMark> list = kind == 0 ? marks : observed;
            if (list.isEmpty()) {
                continue;
            }
            XYSeriesCollection points = new XYSeriesCollection();
            XYSeries asked = new XYSeries(kind == 0 ? marksLabel : observedLabel, false, true);
            for (RiskMark mark : list) {
                asked.add(mark.quality(), mark.acceptance());
                if (mark.label().isEmpty()) {
                    continue;
                }
                XYTextAnnotation text = new XYTextAnnotation(" " + mark.label() + " ", mark.quality(), mark.acceptance());
                text.setFont(kind == 0 ? LABEL : ChartStyle.NOTE_BOLD);
                text.setPaint(ChartStyle.INK);
                text.setBackgroundPaint(new Color(255, 255, 255, 215));
                text.setTextAnchor(TextAnchor.BOTTOM_LEFT);
                plot.addAnnotation(new OffsetText(text, 8, -8));
            }
            points.addSeries(asked);
            XYLineAndShapeRenderer dots = new XYLineAndShapeRenderer(false, true);
            dots.setSeriesPaint(0, kind == 0 ? ChartStyle.QUIET : ChartStyle.INK);
            dots.setSeriesShape(0, kind == 0 ? ChartStyle.designPoint() : ChartStyle.observed());
            plot.setDataset(index, points);
            plot.setRenderer(index, dots);
            index++;
        }
        return style(plot);
    }

    private static XYPlot aoqPlot(boolean perUnit, ChartCurve curve, double aoql, double aoqlAt, boolean legend) {
        XYSeriesCollection data = new XYSeriesCollection(series(curve, CurvePoint::aoq));
        XYLineAndShapeRenderer renderer = lines(ChartStyle.DATA, legend);
        String outgoing = perUnit ? "Average outgoing quality (per 100 units)" : "Average outgoing quality";
        XYPlot plot = new XYPlot(data, qualityAxisOf(perUnit), percentAxis(outgoing), renderer);
        ValueMarker limit = new ValueMarker(aoql, ChartStyle.ALERT, ChartStyle.limit());
        // The same digits as every text output gives the AOQL.
        limit.setLabel("AOQL " + Percent.probability(aoql) + " at incoming " + Percent.probability(aoqlAt) + "  ");
        limit.setLabelFont(LABEL);
        limit.setLabelBackgroundColor(new Color(255, 255, 255, 225));
        limit.setLabelAnchor(RectangleAnchor.TOP_RIGHT);
        limit.setLabelTextAnchor(TextAnchor.BOTTOM_RIGHT);
        plot.addRangeMarker(limit);
        plot.getRangeAxis().setUpperMargin(0.2);
        return style(plot);
    }

    private static XYPlot atiPlot(boolean perUnit, ChartCurve curve, int sampleSize, int lotSize, boolean legend) {
        XYSeriesCollection data = new XYSeriesCollection(series(curve, CurvePoint::ati));
        XYLineAndShapeRenderer renderer = lines(ChartStyle.CALM, legend);
        NumberAxis units = new NumberAxis("Units inspected per lot");
        units.setRange(0, lotSize * 1.05);
        XYPlot plot = new XYPlot(data, qualityAxisOf(perUnit), units, renderer);
        for (double level : new double[] {sampleSize, lotSize}) {
            ValueMarker marker = new ValueMarker(level, ChartStyle.QUIET, ChartStyle.reference());
            marker.setLabel((level == lotSize ? "whole lot N = " : "fewest inspected = ") + (int) level + "  ");
            marker.setLabelFont(LABEL);
            marker.setLabelBackgroundColor(new Color(255, 255, 255, 225));
            marker.setLabelAnchor(RectangleAnchor.TOP_RIGHT);
            marker.setLabelTextAnchor(TextAnchor.BOTTOM_RIGHT);
            plot.addRangeMarker(marker);
        }
        return style(plot);
    }

    /** The series in the order their renderer numbers them. */
    private static XYSeriesCollection collection(XYSeries... series) {
        XYSeriesCollection data = new XYSeriesCollection();
        for (XYSeries one : series) {
            data.addSeries(one);
        }
        return data;
    }

    /** Draws a series as marks of the given colour and shape, without a line between them. */
    private static void marksOnly(XYLineAndShapeRenderer renderer, int series, Color colour, Shape shape) {
        renderer.setSeriesPaint(series, colour);
        renderer.setSeriesLinesVisible(series, false);
        renderer.setSeriesShapesVisible(series, true);
        renderer.setSeriesShape(series, shape);
    }

    /** A renderer drawing one series as a 2-point-wide line of the given colour. */
    private static XYLineAndShapeRenderer lines(Color colour, boolean legend) {
        XYLineAndShapeRenderer renderer = new XYLineAndShapeRenderer(true, false);
        renderer.setSeriesVisibleInLegend(0, legend);
        renderer.setSeriesPaint(0, colour);
        renderer.setSeriesStroke(0, ChartStyle.data());
        return renderer;
    }

    private static XYSeries series(ChartCurve curve, ToDoubleFunction<CurvePoint> value) {
        XYSeries series = new XYSeries(curve.label(), false, true);
        for (CurvePoint point : curve.points()) {
            series.add(point.quality(), value.applyAsDouble(point));
        }
        return series;
    }

    private static NumberAxis qualityAxisOf(boolean perUnit) {
        NumberAxis axis = percentAxis(qualityAxis(perUnit));
        if (perUnit) {
            DecimalFormat perHundred = new DecimalFormat("0.###", DecimalFormatSymbols.getInstance(Locale.ROOT));
            perHundred.setMultiplier(100);
            axis.setNumberFormatOverride(perHundred);
        }
        axis.setLowerBound(0);
        axis.setLowerMargin(0);
        return axis;
    }

    private static NumberAxis percentAxis(String label) {
        NumberAxis axis = new NumberAxis(label);
        DecimalFormat percent = new DecimalFormat("0.###'%'", DecimalFormatSymbols.getInstance(Locale.ROOT));
        percent.setMultiplier(100);
        axis.setNumberFormatOverride(percent);
        axis.setAutoRangeIncludesZero(true);
        return axis;
    }

    private static XYPlot style(XYPlot plot) {
        plot.setBackgroundPaint(Color.WHITE);
        plot.setDomainGridlinePaint(ChartStyle.GRID);
        plot.setRangeGridlinePaint(ChartStyle.GRID);
        plot.setDomainGridlineStroke(new BasicStroke(0.8f));
        plot.setRangeGridlineStroke(new BasicStroke(0.8f));
        plot.setOutlinePaint(ChartStyle.QUIET);
        for (int a = 0; a < plot.getDomainAxisCount(); a++) {
            axisFonts(plot.getDomainAxis(a));
        }
        for (int a = 0; a < plot.getRangeAxisCount(); a++) {
            axisFonts(plot.getRangeAxis(a));
        }
        return plot;
    }

    private static void axisFonts(org.jfree.chart.axis.Axis axis) {
        if (axis == null) {
            return;
        }
        axis.setLabelFont(ChartStyle.AXIS_LABEL);
        axis.setLabelPaint(ChartStyle.INK);
        axis.setTickLabelFont(ChartStyle.TICKS);
        axis.setTickLabelPaint(ChartStyle.INK);
        axis.setAxisLinePaint(ChartStyle.QUIET);
        axis.setTickMarkPaint(ChartStyle.QUIET);
    }

    private static JFreeChart finish(JFreeChart chart) {
        chart.setBackgroundPaint(Color.WHITE);
        chart.setAntiAlias(true);
        chart.setTextAntiAlias(true);
        if (chart.getTitle() != null) {
            chart.getTitle().setPaint(ChartStyle.INK);
        }
        if (chart.getPlot() instanceof CombinedDomainXYPlot combined) {
            axisFonts(combined.getDomainAxis());
            for (Object sub : combined.getSubplots()) {
                style((XYPlot) sub);
            }
        }
        if (chart.getLegend() != null) {
            chart.getLegend().setItemFont(ChartStyle.LEGEND);
            chart.getLegend().setItemPaint(ChartStyle.INK);
            chart.getLegend().setFrame(org.jfree.chart.block.BlockBorder.NONE);
        }
        return chart;
    }

    /** A text annotation moved by a few points from its data point, so that it never sits on the mark or curve. */
    private static final class OffsetText extends org.jfree.chart.annotations.AbstractXYAnnotation {
        private static final long serialVersionUID = 1L;
        private final XYTextAnnotation text;
        private final double dx;
        private final double dy;

        OffsetText(XYTextAnnotation text, double dx, double dy) {
            this.text = text;
            this.dx = dx;
            this.dy = dy;
        }

        @Override
        public void draw(java.awt.Graphics2D g2, XYPlot plot, Rectangle2D dataArea,
                org.jfree.chart.axis.ValueAxis domainAxis, org.jfree.chart.axis.ValueAxis rangeAxis, int rendererIndex,
                org.jfree.chart.plot.PlotRenderingInfo info) {
            java.awt.Graphics2D shifted = (java.awt.Graphics2D) g2.create();
            try {
                shifted.translate(dx, dy);
                text.draw(shifted, plot, dataArea, domainAxis, rangeAxis, rendererIndex, null);
            } finally {
                shifted.dispose();
            }
        }
    }
}
