package lotgate.history;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.special.Gamma;

/**
 * The mean and standard deviation charts of a supplier's lots judged on measurements: each lot's sample mean
 * and s in the order received, with 3-sigma limits for that lot's sample size. Sigma is estimated as the
 * average of s_i / c4(n_i); the mean chart's limits are the grand mean plus and minus 3 sigma / sqrt(n_i), the
 * s chart's centre c4(n_i) sigma and limits c4 sigma plus and minus 3 sigma sqrt(1 - c4^2), the lower one no
 * less than 0 (Shewhart's charts for means and standard deviations; common practice).
 */
public record MeasurementCharts(String characteristic, String unit, double grandMean, double sigma,
        List<Point> points) {

    /** A measured lot as the store holds it. */
    public record Row(long seq, String lot, LocalDate received, int n, double mean, double deviation,
            String characteristic, String unit) {
    }

    /** One lot on both charts. */
    public record Point(String lot, LocalDate received, int n, double mean, double deviation, double meanLower,
            double meanUpper, double deviationCentre, double deviationLower, double deviationUpper) {
        public boolean outOfControl() {
            return mean < meanLower || mean > meanUpper || deviation > deviationUpper || deviation < deviationLower;
        }
    }

    public MeasurementCharts {
        points = List.copyOf(points);
    }

    /** c4(n) = sqrt(2 / (n - 1)) Gamma(n / 2) / Gamma((n - 1) / 2): E[s] = c4 sigma for normal samples. */
    public static double c4(int n) {
        if (n < 2) {
            throw new IllegalArgumentException("c4 needs a sample of at least 2, got " + n);
        }
        return Math.sqrt(2.0 / (n - 1)) * Math.exp(Gamma.logGamma(n / 2.0) - Gamma.logGamma((n - 1) / 2.0));
    }

    /** The charts of the given lots (in the order received), or null when none has two or more values. */
    public static MeasurementCharts of(List<Row> rows) {
        List<Row> usable = rows.stream().filter(r -> r.n() >= 2).toList();
        if (usable.isEmpty()) {
            return null;
        }
        double weighted = 0;
        long units = 0;
        double sigmaSum = 0;
        for (Row row : usable) {
            weighted += row.mean() * row.n();
            units += row.n();
            sigmaSum += row.deviation() / c4(row.n());
        }
        double grand = weighted / units;
        double sigma = sigmaSum / usable.size();
        List<Point> points = new ArrayList<>();
        for (Row row : usable) {
            double c4 = c4(row.n());
            double spread = 3 * sigma / Math.sqrt(row.n());
            double sSpread = 3 * sigma * Math.sqrt(1 - c4 * c4);
            points.add(new Point(row.lot(), row.received(), row.n(), row.mean(), row.deviation(), grand - spread,
                    grand + spread, c4 * sigma, Math.max(0, c4 * sigma - sSpread), c4 * sigma + sSpread));
        }
        Row first = usable.get(0);
        return new MeasurementCharts(first.characteristic(), first.unit(), grand, sigma, points);
    }
}
