package lotgate.cli;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import lotgate.jobs.RankSuppliers;
import lotgate.report.results.RankingRendering;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/** Ranks all suppliers by process average and rejection rate, with intervals that show how sure each rank is. */
@Command(name = "suppliers", header = "Rank every supplier by process average and rejection rate.",
        description = {"Ranks suppliers by the upper confidence bound of their process average (then of their"
                + " rejection rate), so that a supplier with 3 lots is not ranked as if it had 300: its interval is"
                + " wide and its upper bound high.", ""})
final class SuppliersCommand implements Runnable {
    @Override
    public void run() {
        format.print(RankSuppliers.run(new RankSuppliers.Request(confidence, reports,
                storeOption.location())), RankingRendering::text, RankingRendering::json, RankingRendering::csv);
    }

    @Option(names = "--confidence", paramLabel = "LEVEL", defaultValue = "95%", converter = Values.Risk.class,
            description = "Confidence level of the intervals (default ${DEFAULT-VALUE}).")
    double confidence;

    @Option(names = "--report", paramLabel = "FILE", description = "Write the ranking as .xlsx or .html; repeatable.")
    List<Path> reports = new ArrayList<>();

    @Mixin
    StoreOption storeOption;

    @Mixin
    OutputFormat format;
}
