package lotgate.report;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.geom.Rectangle2D;
import java.text.DecimalFormat;
import java.text.DecimalFormatSymbols;
import java.util.List;
import java.util.Locale;
import java.util.function.ToDoubleFunction;
import lotgate.sampling.CurvePoint;
import org.jfree.chart.JFreeChart;
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
    private static final Color[] PALETTE = {
            new Color(0x1f, 0x4e, 0x99), new Color(0xc0, 0x39, 0x2b), new Color(0x2e, 0x8b, 0x57),
            new Color(0x8e, 0x44, 0xad), new Color(0xd3, 0x84, 0x00), new Color(0x34, 0x49, 0x5e)};
    private static final Color MARK = new Color(0x55, 0x55, 0x55);
    private static final Font LABEL = new Font(Font.SANS_SERIF, Font.PLAIN, 11);

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
        return finish(new JFreeChart(title, JFreeChart.DEFAULT_TITLE_FONT, plot, true));
    }

    public static JFreeChart aoq(String title, boolean perUnit, ChartCurve curve, double aoql, double aoqlAt) {
        XYPlot plot = aoqPlot(perUnit, curve, aoql, aoqlAt, true);
        plot.getDomainAxis().setRange(0, widest(List.of(curve)));
        return finish(new JFreeChart(title, JFreeChart.DEFAULT_TITLE_FONT, plot, true));
    }

    public static JFreeChart ati(String title, boolean perUnit, ChartCurve curve, int sampleSize, int lotSize) {
        XYPlot plot = atiPlot(perUnit, curve, sampleSize, lotSize, true);
        plot.getDomainAxis().setRange(0, widest(List.of(curve)));
        return finish(new JFreeChart(title, JFreeChart.DEFAULT_TITLE_FONT, plot, true));
    }

    /** ASN curves: the units inspected on average to reach a decision, against incoming quality. */
    public static JFreeChart asn(String title, boolean perUnit, List<ChartCurve> curves) {
        XYSeriesCollection data = new XYSeriesCollection();
        for (ChartCurve curve : curves) {
            data.addSeries(series(curve, CurvePoint::asn));
        }
        XYLineAndShapeRenderer renderer = new XYLineAndShapeRenderer(true, false);
        for (int i = 0; i < curves.size(); i++) {
            renderer.setSeriesPaint(i, PALETTE[i % PALETTE.length]);
            renderer.setSeriesStroke(i, new BasicStroke(2f));
        }
        NumberAxis units = new NumberAxis("Average sample number (units)");
        units.setAutoRangeIncludesZero(true);
        XYPlot plot = new XYPlot(data, qualityAxisOf(perUnit), units, renderer);
        plot.getDomainAxis().setRange(0, widest(curves));
        return finish(new JFreeChart(title, JFreeChart.DEFAULT_TITLE_FONT, style(plot), true));
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
        XYSeriesCollection data = new XYSeriesCollection();
        XYSeries accept = new XYSeries("Accept at or below", false, true);
        XYSeries reject = new XYSeries("Reject at or above", false, true);
        XYSeries found = new XYSeries("Count found in this lot", false, true);
        for (int m = 1; m < acceptance.length; m++) {
            if (!Double.isNaN(acceptance[m])) {
                accept.add(m, acceptance[m]);
            }
            if (!Double.isNaN(rejection[m])) {
                reject.add(m, rejection[m]);
            }
        }
        found.add(0, 0);
        for (int m = 1; m < path.length; m++) {
            if (!Double.isNaN(path[m])) {
                found.add(m, path[m]);
            }
        }
        data.addSeries(accept);
        data.addSeries(reject);
        data.addSeries(found);
        XYLineAndShapeRenderer renderer = new XYLineAndShapeRenderer(true, !lines);
        renderer.setSeriesPaint(0, PALETTE[2]);
        renderer.setSeriesPaint(1, PALETTE[1]);
        renderer.setSeriesPaint(2, PALETTE[0]);
        renderer.setSeriesStroke(0, new BasicStroke(1.6f));
        renderer.setSeriesStroke(1, new BasicStroke(1.6f));
        renderer.setSeriesStroke(2, new BasicStroke(2.2f));
        renderer.setSeriesShapesVisible(2, true);
        renderer.setSeriesShape(2, new Rectangle2D.Double(-2.5, -2.5, 5, 5));
        if (!lines) {
            // A plan in stages decides only at the end of each stage: its numbers are points, not lines.
            renderer.setSeriesLinesVisible(0, false);
            renderer.setSeriesLinesVisible(1, false);
            renderer.setSeriesShape(0, new Rectangle2D.Double(-5, -5, 10, 10));
            renderer.setSeriesShape(1, new Rectangle2D.Double(-5, -5, 10, 10));
        }
        NumberAxis inspected = new NumberAxis("Units inspected");
        inspected.setStandardTickUnits(NumberAxis.createIntegerTickUnits());
        inspected.setAutoRangeIncludesZero(true);
        NumberAxis count = new NumberAxis(units ? "Nonconforming units found" : "Nonconformities found");
        count.setStandardTickUnits(NumberAxis.createIntegerTickUnits());
        // The path starts at 0 anyway; a margin below keeps markers at 0 clear of the axis.
        count.setAutoRangeIncludesZero(false);
        count.setLowerMargin(0.06);
        XYPlot plot = new XYPlot(data, inspected, count, renderer);
        return finish(new JFreeChart(title, JFreeChart.DEFAULT_TITLE_FONT, style(plot), true));
    }

    /**
     * The p-chart: each lot's fraction nonconforming in receiving order, with the centre line and the
     * 3-sigma limits for each lot's sample size.
     */
    public static JFreeChart pChart(String title, List<String> lots, double[] fraction, double[] centre,
            double[] lower, double[] upper) {
        return shewhart(title, lots, new double[][] {fraction, centre, lower, upper}, new String[] {
                "Lot fraction nonconforming", "Centre (process average)", "Upper control limit", "Lower control limit"},
                percentAxis("Fraction nonconforming"));
    }

    /**
     * A Shewhart chart of one value per lot in receiving order, with its centre and 3-sigma limits (per lot).
     *
     * @param series the values, the centre, the lower and the upper limits, each one entry per lot
     */
    public static JFreeChart control(String title, List<String> lots, double[][] series, String valueLabel) {
        NumberAxis value = new NumberAxis(valueLabel);
        value.setAutoRangeIncludesZero(false);
        return shewhart(title, lots, series, new String[] {"Lot value", "Centre", "Upper control limit",
                "Lower control limit"}, value);
    }

    /** The values with their centre line and limits (the lower one unlabelled in the legend). */
    private static JFreeChart shewhart(String title, List<String> lots, double[][] series, String[] names,
            NumberAxis valueAxis) {
        XYSeriesCollection data = new XYSeriesCollection();
        double[][] ordered = {series[0], series[1], series[3], series[2]};
        for (int s = 0; s < names.length; s++) {
            XYSeries line = new XYSeries(names[s], false, true);
            for (int i = 0; i < lots.size(); i++) {
                line.add(i + 1, ordered[s][i]);
            }
            data.addSeries(line);
        }
        XYLineAndShapeRenderer renderer = new XYLineAndShapeRenderer(true, false);
        renderer.setSeriesShapesVisible(0, true);
        renderer.setSeriesShape(0, new Rectangle2D.Double(-3, -3, 6, 6));
        Color[] colours = {PALETTE[0], PALETTE[2], PALETTE[1], PALETTE[1]};
        for (int s = 0; s < names.length; s++) {
            renderer.setSeriesPaint(s, colours[s]);
            renderer.setSeriesStroke(s, s == 0 ? new BasicStroke(1.5f) : new BasicStroke(1.2f, BasicStroke.CAP_BUTT,
                    BasicStroke.JOIN_MITER, 10f, new float[] {5f, 3f}, 0f));
        }
        renderer.setSeriesVisibleInLegend(3, false);
        NumberAxis order = new NumberAxis("Lot, in order received (1 = " + (lots.isEmpty() ? "" : lots.get(0)) + ")");
        order.setStandardTickUnits(NumberAxis.createIntegerTickUnits());
        XYPlot plot = new XYPlot(data, order, valueAxis, renderer);
        return finish(new JFreeChart(title, JFreeChart.DEFAULT_TITLE_FONT, style(plot), true));
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
                new org.jfree.chart.axis.CategoryAxis("Defect type"), new NumberAxis("Nonconforming units"),
                new org.jfree.chart.renderer.category.BarRenderer());
        plot.getRenderer().setSeriesPaint(0, PALETTE[0]);
        ((org.jfree.chart.renderer.category.BarRenderer) plot.getRenderer()).setShadowVisible(false);
        ((org.jfree.chart.renderer.category.BarRenderer) plot.getRenderer())
                .setBarPainter(new org.jfree.chart.renderer.category.StandardBarPainter());
        plot.setDataset(1, line);
        plot.setRangeAxis(1, percentAxis("Cumulative share"));
        plot.getRangeAxis(1).setRange(0, 1.05);
        plot.mapDatasetToRangeAxis(1, 1);
        org.jfree.chart.renderer.category.LineAndShapeRenderer cumulativeRenderer =
                new org.jfree.chart.renderer.category.LineAndShapeRenderer();
        cumulativeRenderer.setSeriesPaint(0, PALETTE[1]);
        plot.setRenderer(1, cumulativeRenderer);
        plot.setDatasetRenderingOrder(org.jfree.chart.plot.DatasetRenderingOrder.FORWARD);
        plot.getDomainAxis().setCategoryLabelPositions(org.jfree.chart.axis.CategoryLabelPositions.UP_45);
        plot.setBackgroundPaint(Color.WHITE);
        plot.setRangeGridlinePaint(new Color(0xdd, 0xdd, 0xdd));
        return finish(new JFreeChart(title, JFreeChart.DEFAULT_TITLE_FONT, plot, true));
    }

    /** Adds a line under the title, such as the model and lot size. */
    public static JFreeChart withSubtitle(JFreeChart chart, String subtitle) {
        TextTitle line = new TextTitle(subtitle, new Font(Font.SANS_SERIF, Font.PLAIN, 13));
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
        return finish(new JFreeChart(title, JFreeChart.DEFAULT_TITLE_FONT, combined, true));
    }

    private static XYPlot ocPlot(boolean perUnit, List<ChartCurve> curves, List<RiskMark> marks, String marksLabel) {
        XYSeriesCollection data = new XYSeriesCollection();
        XYLineAndShapeRenderer renderer = new XYLineAndShapeRenderer(true, false);
        for (int i = 0; i < curves.size(); i++) {
            data.addSeries(series(curves.get(i), CurvePoint::acceptance));
            renderer.setSeriesPaint(i, PALETTE[i % PALETTE.length]);
            renderer.setSeriesStroke(i, new BasicStroke(2f));
        }
        XYPlot plot = new XYPlot(data, qualityAxisOf(perUnit), percentAxis("Probability of acceptance"), renderer);
        plot.getRangeAxis().setRange(0, 1.02);
        if (!marks.isEmpty()) {
            XYSeriesCollection points = new XYSeriesCollection();
            XYSeries asked = new XYSeries(marksLabel, false, true);
            for (RiskMark mark : marks) {
                asked.add(mark.quality(), mark.acceptance());
                XYTextAnnotation text = new XYTextAnnotation("  " + mark.label(), mark.quality(), mark.acceptance());
                text.setFont(LABEL);
                text.setTextAnchor(mark.acceptance() > 0.5 ? TextAnchor.TOP_LEFT : TextAnchor.BOTTOM_LEFT);
                plot.addAnnotation(text);
            }
            points.addSeries(asked);
            XYLineAndShapeRenderer dots = new XYLineAndShapeRenderer(false, true);
            dots.setSeriesPaint(0, MARK);
            dots.setSeriesShape(0, new Rectangle2D.Double(-4, -4, 8, 8));
            plot.setDataset(1, points);
            plot.setRenderer(1, dots);
        }
        return style(plot);
    }

    private static XYPlot aoqPlot(boolean perUnit, ChartCurve curve, double aoql, double aoqlAt, boolean legend) {
        XYSeriesCollection data = new XYSeriesCollection(series(curve, CurvePoint::aoq));
        XYLineAndShapeRenderer renderer = lines(PALETTE[0], legend);
        String outgoing = perUnit ? "Average outgoing quality (per 100 units)" : "Average outgoing quality";
        XYPlot plot = new XYPlot(data, qualityAxisOf(perUnit), percentAxis(outgoing), renderer);
        ValueMarker limit = new ValueMarker(aoql, PALETTE[1], new BasicStroke(1.2f, BasicStroke.CAP_BUTT,
                BasicStroke.JOIN_MITER, 10f, new float[] {6f, 4f}, 0f));
        limit.setLabel("AOQL " + percent(aoql) + " at incoming " + percent(aoqlAt) + "  ");
        limit.setLabelFont(LABEL);
        limit.setLabelAnchor(RectangleAnchor.TOP_RIGHT);
        limit.setLabelTextAnchor(TextAnchor.BOTTOM_RIGHT);
        plot.addRangeMarker(limit);
        plot.getRangeAxis().setUpperMargin(0.2);
        return style(plot);
    }

    private static XYPlot atiPlot(boolean perUnit, ChartCurve curve, int sampleSize, int lotSize, boolean legend) {
        XYSeriesCollection data = new XYSeriesCollection(series(curve, CurvePoint::ati));
        XYLineAndShapeRenderer renderer = lines(PALETTE[2], legend);
        NumberAxis units = new NumberAxis("Units inspected per lot");
        units.setRange(0, lotSize * 1.05);
        XYPlot plot = new XYPlot(data, qualityAxisOf(perUnit), units, renderer);
        for (double level : new double[] {sampleSize, lotSize}) {
            ValueMarker marker = new ValueMarker(level, MARK, new BasicStroke(0.8f));
            marker.setLabel((level == lotSize ? "whole lot N = " : "fewest inspected = ") + (int) level + "  ");
            marker.setLabelFont(LABEL);
            marker.setLabelAnchor(RectangleAnchor.TOP_RIGHT);
            marker.setLabelTextAnchor(TextAnchor.BOTTOM_RIGHT);
            plot.addRangeMarker(marker);
        }
        return style(plot);
    }

    /** A renderer drawing one series as a 2-point-wide line of the given colour. */
    private static XYLineAndShapeRenderer lines(Color colour, boolean legend) {
        XYLineAndShapeRenderer renderer = new XYLineAndShapeRenderer(true, false);
        renderer.setSeriesVisibleInLegend(0, legend);
        renderer.setSeriesPaint(0, colour);
        renderer.setSeriesStroke(0, new BasicStroke(2f));
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

    private static String percent(double fraction) {
        DecimalFormat format = new DecimalFormat("0.####'%'", DecimalFormatSymbols.getInstance(Locale.ROOT));
        format.setMultiplier(100);
        return format.format(fraction);
    }

    private static XYPlot style(XYPlot plot) {
        plot.setBackgroundPaint(Color.WHITE);
        plot.setDomainGridlinePaint(new Color(0xdd, 0xdd, 0xdd));
        plot.setRangeGridlinePaint(new Color(0xdd, 0xdd, 0xdd));
        plot.setOutlinePaint(new Color(0xaa, 0xaa, 0xaa));
        return plot;
    }

    private static JFreeChart finish(JFreeChart chart) {
        chart.setBackgroundPaint(Color.WHITE);
        chart.setAntiAlias(true);
        return chart;
    }

}
