package lotgate.report.results;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.List;
import lotgate.history.LotRow;
import lotgate.history.QualityStatistics;
import lotgate.history.SeverityTracker;
import lotgate.history.SupplierAudit;
import lotgate.jobs.AuditSupplier;
import lotgate.report.CsvTable;
import lotgate.report.Json;
import lotgate.report.SentenceText;
import lotgate.report.SupplierReport;

/** A supplier audit as text, JSON or CSV. */
public final class AuditRendering {
    private AuditRendering() {
    }

    /** The audit as text. */
    public static String text(AuditSupplier.Result result) {
        return Text.of(out -> printText(out, result.audit(), result.evidence()));
    }

    private static void printText(PrintWriter out, SupplierAudit audit, List<String> evidence) {
        out.println(SupplierReport.title(audit));
        for (String line : SupplierReport.summary(audit)) {
            out.println("  " + line);
        }
        out.println();
        out.println("  Severity timeline");
        for (SupplierAudit.Part part : audit.parts()) {
            if (part.switches().isEmpty()) {
                out.println("    " + part.part() + ": normal inspection throughout");
            }
            for (SeverityTracker.Switch change : part.switches()) {
                out.println("    " + part.part() + ", after lot " + (change.lot() == null ? "-" : change.lot()) + ": "
                        + change.from().label() + " to " + change.to().label() + " (" + change.reason() + ")");
            }
        }
        List<QualityStatistics.PChartPoint> beyond = audit.pChart().stream()
                .filter(QualityStatistics.PChartPoint::outOfControl).toList();
        if (!beyond.isEmpty()) {
            out.println();
            out.println("  Lots outside the p-chart limits");
            for (QualityStatistics.PChartPoint point : beyond) {
                out.println("    " + point.lot() + ": " + SentenceText.percent(point.fraction()) + " (limits "
                        + SentenceText.percent(point.lower()) + " to " + SentenceText.percent(point.upper()) + ")");
            }
        }
        if (!audit.pareto().isEmpty()) {
            out.println();
            out.println("  Defect types (Pareto)");
            for (QualityStatistics.ParetoBar bar : audit.pareto()) {
                out.printf("    %-30s %6d   cumulative %s%n", HistoryRendering.clip(bar.defect(), 30), bar.count(),
                        SentenceText.percent(bar.cumulativeShare()));
            }
        }
        if (!audit.rejectedLots().isEmpty()) {
            out.println();
            out.println("  Rejected lots");
            for (int i = 0; i < audit.rejectedLots().size(); i++) {
                LotRow lot = audit.rejectedLots().get(i);
                out.println("    " + SupplierReport.heading(lot) + ": " + evidence.get(i));
            }
        }
    }

    private static ObjectNode average(QualityStatistics.ProcessAverage average) {
        ObjectNode node = Json.object();
        node.put("estimate", average.average());
        node.put("lowerBound", average.lower());
        node.put("upperBound", average.upper());
        node.put("of", average.inspected());
        node.put("count", average.nonconforming());
        return node;
    }

    /** The audit as JSON. */
    public static ObjectNode json(AuditSupplier.Result result) {
        SupplierAudit audit = result.audit();
        List<String> evidence = result.evidence();
        ObjectNode node = Json.object();
        node.put("supplier", audit.supplier());
        node.put("part", audit.part());
        node.put("from", audit.from() == null ? null : audit.from().toString());
        node.put("to", audit.to() == null ? null : audit.to().toString());
        node.put("confidence", audit.confidence());
        node.put("lots", audit.lots());
        node.put("accepted", audit.accepted());
        node.put("rejected", audit.rejected());
        node.set("acceptanceRate", average(audit.acceptanceRate()));
        node.set("processAverage", average(audit.processAverage()));
        var parts = node.putArray("parts");
        for (SupplierAudit.Part part : audit.parts()) {
            ObjectNode item = parts.addObject();
            item.put("part", part.part());
            item.put("severity", part.current().label());
            var switches = item.putArray("switches");
            for (SeverityTracker.Switch change : part.switches()) {
                ObjectNode entry = switches.addObject();
                entry.put("afterLot", change.lot());
                entry.put("from", change.from().label());
                entry.put("to", change.to().label());
                entry.put("reason", change.reason());
            }
        }
        var chart = node.putArray("pChart");
        for (QualityStatistics.PChartPoint point : audit.pChart()) {
            ObjectNode item = chart.addObject();
            item.put("lot", point.lot());
            item.put("inspected", point.inspected());
            item.put("fraction", point.fraction());
            item.put("centre", point.centre());
            item.put("lowerLimit", point.lower());
            item.put("upperLimit", point.upper());
            item.put("outOfControl", point.outOfControl());
        }
        var pareto = node.putArray("defectTypes");
        for (QualityStatistics.ParetoBar bar : audit.pareto()) {
            ObjectNode item = pareto.addObject();
            item.put("defect", bar.defect());
            item.put("count", bar.count());
            item.put("cumulativeShare", bar.cumulativeShare());
        }
        var rejected = node.putArray("rejectedLots");
        for (int i = 0; i < audit.rejectedLots().size(); i++) {
            LotRow lot = audit.rejectedLots().get(i);
            ObjectNode item = rejected.addObject();
            item.put("seq", lot.seq());
            item.put("lot", lot.lot());
            item.put("part", lot.part());
            item.put("received", lot.received() == null ? null : lot.received().toString());
            item.put("evidence", evidence.get(i));
        }
        return node;
    }

    /** The audit as CSV: a row per lot with its p-chart point. */
    public static String csv(AuditSupplier.Result result) {
        SupplierAudit audit = result.audit();
        List<List<Object>> rows = new ArrayList<>();
        for (int i = 0; i < audit.pChart().size(); i++) {
            QualityStatistics.PChartPoint point = audit.pChart().get(i);
            LotRow lot = audit.lotsInOrder().get(i);
            rows.add(List.of(lot.seq(), lot.supplier(), lot.part(), lot.lot(),
                    lot.received() == null ? "" : lot.received().toString(), lot.verdict(), point.inspected(),
                    lot.nonconforming(), point.fraction(), point.centre(), point.lower(), point.upper(),
                    lot.severity() == null ? "" : lot.severity()));
        }
        return CsvTable.table(List.of("seq", "supplier", "part", "lot", "received", "verdict", "inspected", "nonconforming",
                "fraction", "centre", "lowerLimit", "upperLimit", "severity"), rows);
    }
}
