package lotgate.report;

import java.util.List;
import lotgate.sampling.CurvePoint;

/** A plan's computed curve points with the label a chart shows for them. */
public record ChartCurve(String label, List<CurvePoint> points) {
    public ChartCurve {
        points = List.copyOf(points);
    }
}
