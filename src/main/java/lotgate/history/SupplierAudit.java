package lotgate.history;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/**
 * What an audit reads about one supplier (and part) over a period: lots, acceptance, the process
 * average with its exact interval, the p-chart, the Pareto of defect types, the severity timeline
 * with every switch, and the rejected lots. Built from the store's rows; computes, stores nothing.
 *
 * @param lotsInOrder the period's lots in the order received, the same order as {@code pChart}
 * @param measurements the mean and s charts of the period's lots judged on measurements, or null for none
 */
public record SupplierAudit(String supplier, String part, LocalDate from, LocalDate to, double confidence,
        List<Part> parts, long lots, long accepted, long rejected, QualityStatistics.ProcessAverage acceptanceRate,
        QualityStatistics.ProcessAverage processAverage, List<QualityStatistics.PChartPoint> pChart,
        List<QualityStatistics.ParetoBar> pareto, List<LotRow> rejectedLots, List<LotRow> lotsInOrder,
        MeasurementCharts measurements) {

    /** One part's severity now and its switches (over all its lots, not only the period). */
    public record Part(String part, Severity current, List<SeverityTracker.Switch> switches, int lots) {
    }

    public static SupplierAudit of(String supplier, String part, LocalDate from, LocalDate to, List<LotRow> rows,
            Map<String, Long> defectTypes, SwitchingRules rules, double confidence) {
        return of(supplier, part, from, to, rows, defectTypes, rules, confidence, List.of());
    }

    /**
     * The audit with each lot's defect types (by record sequence number, as {@link HistoryStore#defectTypesByLot}
     * reads them): the Pareto counts only the period's effective lots, as every other table and chart does.
     */
    public static SupplierAudit ofLots(String supplier, String part, LocalDate from, LocalDate to, List<LotRow> rows,
            Map<Long, Map<String, Long>> defectsByLot, SwitchingRules rules, double confidence,
            List<MeasurementCharts.Row> measured) {
        SupplierAudit all = of(supplier, part, from, to, rows, Map.of(), rules, confidence, measured);
        Map<String, Long> types = new java.util.HashMap<>();
        for (LotRow lot : all.lotsInOrder()) {
            defectsByLot.getOrDefault(lot.seq(), Map.of()).forEach((type, count) -> types.merge(type, count, Long::sum));
        }
        Map<String, Long> ordered = new java.util.LinkedHashMap<>();
        types.entrySet().stream().sorted(Map.Entry.<String, Long>comparingByValue().reversed()
                .thenComparing(Map.Entry.comparingByKey())).forEach(e -> ordered.put(e.getKey(), e.getValue()));
        return new SupplierAudit(all.supplier(), all.part(), all.from(), all.to(), all.confidence(), all.parts(),
                all.lots(), all.accepted(), all.rejected(), all.acceptanceRate(), all.processAverage(), all.pChart(),
                QualityStatistics.pareto(ordered), all.rejectedLots(), all.lotsInOrder(), all.measurements());
    }

    /**
     * The audit with the lots judged on measurements (as the store reads them, any order).
     *
     * @param defectTypes the defect type counts of the period's lots, most frequent first
     */
    public static SupplierAudit of(String supplier, String part, LocalDate from, LocalDate to, List<LotRow> rows,
            Map<String, Long> defectTypes, SwitchingRules rules, double confidence,
            List<MeasurementCharts.Row> measured) {
        List<Part> parts = new ArrayList<>();
        List<LotRow> inPeriod = new ArrayList<>();
        for (Map.Entry<String, List<LotRow>> entry : SupplierHistory.byPart(rows).entrySet()) {
            SupplierHistory history = new SupplierHistory(entry.getValue(), rules);
            parts.add(new Part(entry.getKey(), history.current(), history.switches(), history.entries().size()));
            for (SupplierHistory.Entry lot : history.entries()) {
                LocalDate day = lot.row().received();
                if ((from == null || (day != null && !day.isBefore(from))) && (to == null || (day != null && !day.isAfter(to)))) {
                    inPeriod.add(lot.row());
                }
            }
        }
        inPeriod.sort(java.util.Comparator.comparing((LotRow r) -> r.received() == null ? LocalDate.MIN : r.received())
                .thenComparingLong(LotRow::seq));
        long accepted = inPeriod.stream().filter(LotRow::accepted).count();
        long inspected = inPeriod.stream().mapToLong(LotRow::inspected).sum();
        long nonconforming = inPeriod.stream().mapToLong(LotRow::nonconforming).sum();
        int[] n = inPeriod.stream().mapToInt(LotRow::inspected).toArray();
        int[] d = inPeriod.stream().mapToInt(LotRow::nonconforming).toArray();
        List<String> names = inPeriod.stream().map(LotRow::lot).toList();
        return new SupplierAudit(supplier, part, from, to, confidence, parts, inPeriod.size(), accepted,
                inPeriod.size() - accepted, QualityStatistics.acceptanceRate(inPeriod.size(), accepted, confidence),
                QualityStatistics.processAverage(inspected, nonconforming, confidence),
                QualityStatistics.pChart(names, n, d), QualityStatistics.pareto(defectTypes),
                inPeriod.stream().filter(r -> !r.accepted()).toList(), List.copyOf(inPeriod),
                MeasurementCharts.of(inOrder(measured, inPeriod)));
    }

    /** The measured lots that are among the period's effective lots, in the same order. */
    private static List<MeasurementCharts.Row> inOrder(List<MeasurementCharts.Row> measured, List<LotRow> inPeriod) {
        Map<Long, MeasurementCharts.Row> bySeq = new java.util.HashMap<>();
        measured.forEach(row -> bySeq.put(row.seq(), row));
        List<MeasurementCharts.Row> ordered = new ArrayList<>();
        for (LotRow lot : inPeriod) {
            MeasurementCharts.Row row = bySeq.get(lot.seq());
            if (row != null) {
                ordered.add(row);
            }
        }
        return ordered;
    }
}
