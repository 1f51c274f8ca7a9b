package lotgate.report;

import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.Locale;
import lotgate.files.AtomicWrite;
import org.jfree.chart.ChartUtils;
import org.jfree.chart.JFreeChart;
import org.jfree.svg.SVGGraphics2D;

/** Writes a chart as PNG or SVG, chosen by the file's extension, all at once or not at all. */
public final class ChartFile {
    private ChartFile() {
    }

    /** Whether the file name ends in an extension lotgate can draw to. */
    public static boolean supported(Path file) {
        String name = file.getFileName().toString().toLowerCase(Locale.ROOT);
        return name.endsWith(".png") || name.endsWith(".svg");
    }

    public static void write(JFreeChart chart, Path file, int width, int height) {
        String name = file.getFileName().toString().toLowerCase(Locale.ROOT);
        if (name.endsWith(".svg")) {
            SVGGraphics2D svg = new SVGGraphics2D(width, height);
            chart.draw(svg, new java.awt.Rectangle(0, 0, width, height));
            byte[] document = svg.getSVGDocument().getBytes(StandardCharsets.UTF_8);
            AtomicWrite.write(file, out -> out.write(document));
        } else if (name.endsWith(".png")) {
            AtomicWrite.write(file, out -> ChartUtils.writeChartAsPNG(out, chart, width, height));
        } else {
            throw new IllegalArgumentException("a chart file must end in .png or .svg: " + file);
        }
    }
}
