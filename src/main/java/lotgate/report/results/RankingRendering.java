package lotgate.report.results;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import lotgate.history.QualityStatistics;
import lotgate.jobs.RankSuppliers;
import lotgate.report.Json;
import lotgate.report.SentenceText;
import lotgate.report.SupplierRanking;

/** The supplier ranking as text, JSON or CSV. */
public final class RankingRendering {
    private RankingRendering() {
    }

    /** The ranking as JSON. */
    public static ObjectNode json(RankSuppliers.Result result) {
        ObjectNode node = Json.object();
        node.put("confidence", result.confidence());
        var list = node.putArray("suppliers");
        int rank = 1;
        for (QualityStatistics.Ranked supplier : result.ranking()) {
            ObjectNode item = list.addObject();
            item.put("rank", rank++);
            item.put("supplier", supplier.supplier());
            item.put("lots", supplier.lots());
            item.put("rejected", supplier.rejected());
            item.put("processAverage", supplier.average().average());
            item.put("processAverageLower", supplier.average().lower());
            item.put("processAverageUpper", supplier.average().upper());
            item.put("rejectionRate", supplier.rejection().average());
            item.put("rejectionRateLower", supplier.rejection().lower());
            item.put("rejectionRateUpper", supplier.rejection().upper());
        }
        return node;
    }

    /** The ranking as CSV. */
    public static String csv(RankSuppliers.Result result) {
        return SupplierRanking.csv(result.ranking());
    }

    /** The ranking as text. */
    public static String text(RankSuppliers.Result result) {
        return Text.of(out -> {
            out.println("Suppliers ranked by the upper " + SentenceText.percent(result.confidence())
                    + " bound of their process average");
            out.printf("  %4s  %-32s %6s %8s  %-28s %-28s%n", "rank", "supplier", "lots", "rejected",
                    "process average (interval)", "rejection rate (interval)");
            int rank = 1;
            for (QualityStatistics.Ranked supplier : result.ranking()) {
                out.printf("  %4d  %-32s %6d %8d  %-28s %-28s%n", rank++, HistoryRendering.clip(supplier.supplier(), 32),
                        supplier.lots(), supplier.rejected(), SupplierRanking.interval(supplier.average()),
                        SupplierRanking.interval(supplier.rejection()));
            }
        });
    }
}
