package lotgate.cli;

import lotgate.jobs.RankSuppliers;
import lotgate.report.results.RankingRendering;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;

/** Ranks all suppliers by process average and rejection rate, with intervals that show how sure each rank is. */
@Command(name = "suppliers", header = "Rank every supplier by process average and rejection rate.",
        description = {"Ranks suppliers by the upper confidence bound of their process average (then of their"
                + " rejection rate), so that a supplier with 3 lots is not ranked as if it had 300: its interval is"
                + " wide and its upper bound high.", ""})
final class SuppliersCommand implements Runnable {
    @Override
    public void run() {
        format.outputs(audit.reports.files);
        format.print(RankSuppliers.run(new RankSuppliers.Request(audit.confidence.level, audit.reports.files,
                audit.storeOption.location())), RankingRendering::text, RankingRendering::json, RankingRendering::csv);
        format.written("report", audit.reports.files);
    }

    @Mixin
    SupplierCommand.AuditOptions audit;

    @Mixin
    OutputFormat format;
}
