package lotgate.report;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.Shape;
import java.awt.geom.Ellipse2D;
import java.awt.geom.GeneralPath;
import java.awt.geom.Rectangle2D;
import java.util.Locale;

/**
 * lotgate's look, in one place for every chart it draws: JFreeChart pictures (PNG, SVG, the SVG inside HTML
 * reports) and the native charts of its workbooks. Reports are printed, often in greyscale, and read by people
 * who may not tell red from green; so each colour below differs from the others in lightness as well as in hue,
 * no meaning rests on red against green, and every series also differs by line pattern or marker shape.
 */
public final class ChartStyle {
    /** Text, axes and the marks that must read first: near-black slate. */
    public static final Color INK = new Color(0x23, 0x2a, 0x33);
    /** The data itself: a deep ink blue (greyscale about 28%). */
    public static final Color DATA = new Color(0x1d, 0x4e, 0x89);
    /** The same data where it must step back behind the part that leads (the other bars of a Pareto chart). */
    public static final Color DATA_LIGHT = new Color(0x9d, 0xb5, 0xd2);
    /** Limits, rejections and anything out of bounds: burnt vermilion (greyscale about 40%). */
    public static final Color ALERT = new Color(0xc4, 0x42, 0x1a);
    /** Centre lines and the second curve: sea teal (greyscale about 48%). */
    public static final Color CALM = new Color(0x2a, 0x8c, 0x7e);
    /** Severity changes and highlights: ochre (greyscale about 65%). */
    public static final Color OCHRE = new Color(0xd9, 0x9a, 0x1e);
    /** Reference marks that must not compete with the data: mid grey. */
    public static final Color QUIET = new Color(0x6e, 0x74, 0x7c);
    /** Gridlines and frames. */
    public static final Color GRID = new Color(0xe3, 0xe5, 0xe8);
    /** The shading of a stretch of tightened inspection: a pale ochre that prints as a light grey. */
    public static final Color TIGHTENED_SHADE = new Color(0xf6, 0xe3, 0xbb);
    /** The shading of a stretch of reduced inspection: a pale teal, lighter still in greyscale. */
    public static final Color REDUCED_SHADE = new Color(0xd8, 0xee, 0xea);
    /** The verdict colours behind white text: the words ACCEPT and REJECT carry the meaning, not the hue. */
    public static final Color ACCEPT = new Color(0x1f, 0x6e, 0x5c);
    public static final Color REJECT = new Color(0xa8, 0x32, 0x1a);

    /** Curves drawn side by side take these colours in turn, each with its own line pattern too. */
    private static final Color[] SERIES = {DATA, ALERT, CALM, OCHRE, new Color(0x6b, 0x3e, 0x75), QUIET};
    private static final float[][] PATTERNS = {null, {9f, 4f}, {2f, 3f}, {12f, 3f, 2f, 3f}, {5f, 5f}, {1f, 2f}};

    public static final float DATA_WIDTH = 2.2f;
    public static final float LIMIT_WIDTH = 1.5f;
    public static final float CENTRE_WIDTH = 1.2f;

    private static final String FAMILY = Font.SANS_SERIF;
    public static final Font TITLE = new Font(FAMILY, Font.BOLD, 17);
    public static final Font SUBTITLE = new Font(FAMILY, Font.PLAIN, 13);
    public static final Font AXIS_LABEL = new Font(FAMILY, Font.PLAIN, 13);
    public static final Font TICKS = new Font(FAMILY, Font.PLAIN, 12);
    public static final Font NOTE = new Font(FAMILY, Font.PLAIN, 12);
    public static final Font NOTE_BOLD = new Font(FAMILY, Font.BOLD, 12);
    public static final Font LEGEND = new Font(FAMILY, Font.PLAIN, 12);

    private ChartStyle() {
    }

    /** The colour of the i-th of several curves. */
    public static Color series(int i) {
        return SERIES[i % SERIES.length];
    }

    /** The stroke of the i-th of several curves: solid, long dash, dots, dash-dot... */
    public static BasicStroke seriesStroke(int i) {
        float[] pattern = PATTERNS[i % PATTERNS.length];
        return pattern == null ? data() : new BasicStroke(DATA_WIDTH, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND, 10f,
                pattern, 0f);
    }

    public static BasicStroke data() {
        return new BasicStroke(DATA_WIDTH, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND);
    }

    /** Control limits and acceptance boundaries: dashed. */
    public static BasicStroke limit() {
        return new BasicStroke(LIMIT_WIDTH, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f, new float[] {7f, 4f}, 0f);
    }

    /** Centre lines: dash-dot, thinner. */
    public static BasicStroke centre() {
        return new BasicStroke(CENTRE_WIDTH, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f,
                new float[] {10f, 3f, 2f, 3f}, 0f);
    }

    /** Reference lines such as a lot size or a severity switch. */
    public static BasicStroke reference() {
        return new BasicStroke(1.0f);
    }

    // ---- marker shapes: each mark of a story has its own, so that it reads without colour ----

    /** A plain data point: a filled circle. */
    public static Shape point() {
        return new Ellipse2D.Double(-3.5, -3.5, 7, 7);
    }

    /** A design point asked of a plan (AQL, LTPD): a square. */
    public static Shape designPoint() {
        return new Rectangle2D.Double(-5, -5, 10, 10);
    }

    /** What this lot showed: a diamond. */
    public static Shape observed() {
        GeneralPath diamond = new GeneralPath();
        diamond.moveTo(0, -7);
        diamond.lineTo(7, 0);
        diamond.lineTo(0, 7);
        diamond.lineTo(-7, 0);
        diamond.closePath();
        return diamond;
    }

    /** A point beyond its control limits: a large upward triangle. */
    public static Shape outside() {
        GeneralPath triangle = new GeneralPath();
        triangle.moveTo(0, -8);
        triangle.lineTo(7.5, 5.5);
        triangle.lineTo(-7.5, 5.5);
        triangle.closePath();
        return triangle;
    }

    /** A rejected lot: a ring drawn around its point (drawn as an outline). */
    public static Shape ring() {
        return new Ellipse2D.Double(-8, -8, 16, 16);
    }

    /** Hex form of a colour for CSS and spreadsheet charts, such as {@code 1d4e89}. */
    public static String hex(Color colour) {
        return String.format(Locale.ROOT, "%02x%02x%02x", colour.getRed(), colour.getGreen(), colour.getBlue());
    }

    /** The colour as the three bytes a spreadsheet chart's colour takes. */
    public static byte[] rgb(Color colour) {
        return new byte[] {(byte) colour.getRed(), (byte) colour.getGreen(), (byte) colour.getBlue()};
    }
}
