package lotgate.history;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import lotgate.sampling.ConfidenceBounds;

/**
 * The supplier audit's statistics, pure: the process average pooled over lots with its exact
 * interval, the p-chart of lot fractions with 3-sigma limits for each lot's sample size, the Pareto
 * of defect types, and a ranking that weighs how much evidence each supplier has.
 */
public final class QualityStatistics {
    private QualityStatistics() {
    }

    /**
     * The process average: nonconforming units over units inspected, pooled over lots, with its
     * Clopper-Pearson interval.
     */
    public record ProcessAverage(long inspected, long nonconforming, double average, double lower, double upper) {
    }

    public static ProcessAverage processAverage(long inspected, long nonconforming, double confidence) {
        if (inspected == 0) {
            return new ProcessAverage(0, 0, Double.NaN, 0, 1);
        }
        if (inspected > Integer.MAX_VALUE) {
            throw new IllegalArgumentException("more than 2^31 units inspected");
        }
        ConfidenceBounds.Interval interval = ConfidenceBounds.clopperPearson((int) nonconforming, (int) inspected,
                confidence);
        return new ProcessAverage(inspected, nonconforming, (double) nonconforming / inspected, interval.lower(),
                interval.upper());
    }

    /** The acceptance rate of lots with its Clopper-Pearson interval. */
    public static ProcessAverage acceptanceRate(long lots, long accepted, double confidence) {
        return processAverage(lots, accepted, confidence);
    }

    /** A point of the p-chart: a lot's fraction nonconforming and its limits for its sample size. */
    public record PChartPoint(String lot, int inspected, double fraction, double centre, double lower, double upper) {
        public boolean outOfControl() {
            return fraction > upper || fraction < lower;
        }
    }

    /** The p-chart: centre p-bar, limits p-bar +- 3 sqrt(p-bar (1 - p-bar) / n_i), the lower one at least 0. */
    public static List<PChartPoint> pChart(List<String> lots, int[] inspected, int[] nonconforming) {
        long n = 0;
        long d = 0;
        for (int i = 0; i < inspected.length; i++) {
            n += inspected[i];
            d += nonconforming[i];
        }
        double centre = n == 0 ? 0 : (double) d / n;
        List<PChartPoint> points = new ArrayList<>();
        for (int i = 0; i < inspected.length; i++) {
            double sigma = inspected[i] == 0 ? 0 : Math.sqrt(centre * (1 - centre) / inspected[i]);
            points.add(new PChartPoint(lots.get(i), inspected[i], inspected[i] == 0 ? 0 : (double) nonconforming[i]
                    / inspected[i], centre, Math.max(0, centre - 3 * sigma), Math.min(1, centre + 3 * sigma)));
        }
        return points;
    }

    /** A bar of the Pareto chart: a defect type, its count and the cumulative share up to it. */
    public record ParetoBar(String defect, long count, double cumulativeShare) {
    }

    /** Defect types ordered by count, with the cumulative share. */
    public static List<ParetoBar> pareto(Map<String, Long> counts) {
        long total = counts.values().stream().mapToLong(Long::longValue).sum();
        List<Map.Entry<String, Long>> sorted = new ArrayList<>(counts.entrySet());
        sorted.sort(Map.Entry.<String, Long>comparingByValue().reversed().thenComparing(Map.Entry.comparingByKey()));
        List<ParetoBar> bars = new ArrayList<>();
        long running = 0;
        for (Map.Entry<String, Long> entry : sorted) {
            running += entry.getValue();
            bars.add(new ParetoBar(entry.getKey(), entry.getValue(), total == 0 ? 0 : (double) running / total));
        }
        return bars;
    }

    /** One supplier in the ranking. */
    public record Ranked(String supplier, long lots, long rejected, ProcessAverage average, ProcessAverage rejection) {
    }

    /**
     * Ranks suppliers by the upper confidence bound of their process average (then of their rejection
     * rate): a supplier with few lots has a wide interval and cannot rank as if it had many.
     */
    public static List<Ranked> rank(List<HistoryStore.SupplierTotals> totals, double confidence) {
        List<Ranked> ranked = new ArrayList<>();
        for (HistoryStore.SupplierTotals supplier : totals) {
            ranked.add(new Ranked(supplier.supplier(), supplier.lots(), supplier.rejected(),
                    processAverage(supplier.inspected(), supplier.nonconforming(), confidence),
                    processAverage(supplier.lots(), supplier.rejected(), confidence)));
        }
        ranked.sort((a, b) -> {
            int byAverage = Double.compare(a.average().upper(), b.average().upper());
            return byAverage != 0 ? byAverage : Double.compare(a.rejection().upper(), b.rejection().upper());
        });
        return ranked;
    }
}
