package lotgate.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
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
                + " file's order in one transaction. Every row is checked first; one bad cell records nothing.", ""})
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
        ImportHistory.Lots lots;
        try (Progress reading = Progress.onTerminal("import: reading rows", 0, true)) {
            lots = ImportHistory.check(request, reading::at);
        }
        storeOption.prepareForRecording();
        ImportHistory.Result result;
        try (Progress recording = Progress.onTerminal("import: recording lots", lots.lots().size(), true)) {
            result = ImportHistory.record(lots, recording::at);
        }
        PrintWriter out = spec.commandLine().getOut();
        out.println("Imported " + result.recorded() + " lots from " + result.file() + " into " + result.store() + ".");
        out.flush();
    }
}
