package lotgate.cli;

import lotgate.jobs.ListHistory;
import lotgate.report.results.HistoryRendering;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;

/** Lists the recorded lots, corrections and corrective actions of the history store. */
@Command(name = "history", header = "List the lots recorded in the history store.",
        description = {"Lists every record of the history store in order, or those of one supplier and part:"
                + " sentenced and imported lots, corrections (with the record they supersede) and corrective"
                + " actions.", ""})
final class HistoryCommand implements Runnable {
    @Override
    public void run() {
        format.print(ListHistory.run(new ListHistory.Request(lotOf.supplier.name, lotOf.part.name,
                storeOption.location())), HistoryRendering::text, HistoryRendering::json, HistoryRendering::csv);
    }

    @Mixin
    SupplierAndPart lotOf;

    @Mixin
    StoreOption storeOption;

    @Mixin
    OutputFormat format;
}
