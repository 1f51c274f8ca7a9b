package lotgate.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import lotgate.history.HistoryStore;
import lotgate.jobs.ImportHistory;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** Imports past lots from a spreadsheet or CSV into the history, all or nothing. */
@Command(name = "import", header = "Import past lots into the history store, all or nothing.",
        description = {"Reads one past lot per row under a header row (columns, any order: lot, supplier, part,"
                + " received, sample size, nonconforming, verdict; optional: lot size, acceptance number, inspector,"
                + " defects as 'type:count; type:count', production steady or irregular) and records them in the"
                + " file's order in one transaction. One bad cell records nothing.", ""})
final class ImportCommand implements Runnable {
    @Parameters(index = "0", paramLabel = "FILE", description = "The list of past lots: .xlsx, .xls or .csv.")
    Path file;

    @Mixin
    SharedOptions.Sheet sheet;

    @Mixin
    RecordingStoreOption storeOption;

    @Spec
    CommandSpec spec;

    @Override
    public void run() {
        ImportHistory.Request request = new ImportHistory.Request(file, sheet.name, storeOption.location());
        HistoryStore[] opened = new HistoryStore[1];
        ImportHistory.Result result;
        try (Shown shown = new Shown()) {
            result = ImportHistory.run(request, () -> opened[0] = storeOption.openStagedQuietly(),
                    System.console() == null ? ImportHistory.Watch.NONE : shown);
        }
        storeOption.announceIfCreated(opened[0]);
        PrintWriter out = spec.commandLine().getOut();
        out.println("Imported " + result.recorded() + " lots from " + result.file() + " into " + result.store() + ".");
        out.flush();
    }

    /**
     * The import's progress line: the rows checked, then the lots recorded (of how many, when the whole list was
     * checked first). The rows are told from the thread that checks them, the lots from the one that records.
     */
    private static final class Shown implements ImportHistory.Watch, AutoCloseable {
        private Progress line = Progress.onTerminal("import: checking rows", 0, true);

        @Override
        public synchronized void rowRead(long row) {
            line.at(row);
        }

        @Override
        public synchronized void recording(long lots) {
            line.close();
            line = Progress.onTerminal(lots > 0 ? "import: recording lots" : "import: checking and recording lots",
                    lots, true);
        }

        @Override
        public synchronized void recorded(long lots) {
            line.at(lots);
        }

        @Override
        public synchronized void committing(long lots) {
            // Said only where the import has run long enough to show its progress.
            if (line.shown()) {
                line.close();
                line = Progress.onTerminal(String.format(java.util.Locale.ROOT,
                        "import: %,d lots checked; writing the indexes and committing", lots), 0, true);
                line.say();
            }
        }

        @Override
        public synchronized void close() {
            line.close();
        }
    }
}
