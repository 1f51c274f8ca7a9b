package lotgate.jobs;

import java.nio.file.Path;
import java.util.List;
import lotgate.history.HistoryStore;
import lotgate.history.QualityStatistics;
import lotgate.report.SupplierRanking;

/** Ranking every supplier by the upper bound of its process average, then of its rejection rate. */
public final class RankSuppliers {

    /** The confidence of the intervals, the report files, and the store. */
    public record Request(double confidence, List<Path> reports, String store) {
        public Request {
            reports = List.copyOf(reports);
        }
    }

    /** The suppliers, best first, with the confidence of their intervals. */
    public record Result(List<QualityStatistics.Ranked> ranking, double confidence) {
        public Result {
            ranking = List.copyOf(ranking);
        }
    }

    private RankSuppliers() {
    }

    /** Ranks the store's suppliers and writes the reports asked for. */
    public static Result run(Request request) {
        Checks.supplierReports(request.reports(), "a ranking report");
        List<QualityStatistics.Ranked> ranking;
        try (HistoryStore store = HistoryStore.open(request.store(), false)) {
            ranking = QualityStatistics.rank(store.supplierTotals(), request.confidence());
        }
        for (Path report : request.reports()) {
            SupplierRanking.write(ranking, request.confidence(), report);
        }
        return new Result(ranking, request.confidence());
    }
}
