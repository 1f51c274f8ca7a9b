package lotgate.cli;

import lotgate.report.Json;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import lotgate.history.HistoryStore;
import lotgate.history.QualityStatistics;
import lotgate.report.SentenceText;
import lotgate.report.SupplierRanking;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

/** Ranks all suppliers by process average and rejection rate, with intervals that show how sure each rank is. */
@Command(name = "suppliers", mixinStandardHelpOptions = true, sortOptions = false, usageHelpAutoWidth = true,
        header = "Rank every supplier by process average and rejection rate.",
        description = {"Ranks suppliers by the upper confidence bound of their process average (then of their"
                + " rejection rate), so that a supplier with 3 lots is not ranked as if it had 300: its interval is"
                + " wide and its upper bound high.", ""})
final class SuppliersCommand implements Runnable {
    @Option(names = "--confidence", paramLabel = "LEVEL", defaultValue = "95%", converter = Values.Risk.class,
            description = "Confidence level of the intervals (default ${DEFAULT-VALUE}).")
    double confidence;

    @Option(names = "--report", paramLabel = "FILE", description = "Write the ranking as .xlsx or .html; repeatable.")
    List<Path> reports = new ArrayList<>();

    @Mixin
    StoreOption storeOption;

    @Mixin
    OutputFormat format;

    @Spec
    CommandSpec spec;

    @Override
    public void run() {
        for (Path report : reports) {
            if (!lotgate.report.SupplierReport.supported(report)) {
                throw new ParameterException(spec.commandLine(), "--report " + report + ": a ranking report is a .xlsx"
                        + " or .html file");
            }
        }
        List<QualityStatistics.Ranked> ranking;
        try (HistoryStore store = storeOption.open()) {
            ranking = QualityStatistics.rank(store.supplierTotals(), confidence);
        }
        for (Path report : reports) {
            SupplierRanking.write(ranking, confidence, report);
        }
        PrintWriter out = spec.commandLine().getOut();
        switch (format.kind) {
            case json -> {
                ObjectNode node = Json.object();
                node.put("confidence", confidence);
                var list = node.putArray("suppliers");
                int rank = 1;
                for (QualityStatistics.Ranked supplier : ranking) {
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
                out.println(Json.text(node));
            }
            case csv -> out.print(SupplierRanking.csv(ranking));
            case text -> {
                out.println("Suppliers ranked by the upper " + SentenceText.percent(confidence)
                        + " bound of their process average");
                out.printf("  %4s  %-32s %6s %8s  %-28s %-28s%n", "rank", "supplier", "lots", "rejected",
                        "process average (interval)", "rejection rate (interval)");
                int rank = 1;
                for (QualityStatistics.Ranked supplier : ranking) {
                    out.printf("  %4d  %-32s %6d %8d  %-28s %-28s%n", rank++, HistoryCommand.clip(supplier.supplier(), 32),
                            supplier.lots(), supplier.rejected(), SupplierRanking.interval(supplier.average()),
                            SupplierRanking.interval(supplier.rejection()));
                }
            }
        }
        out.flush();
    }

}
