package lotgate.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import lotgate.inspection.Columns;
import lotgate.jobs.ReissueLotOutputs;
import lotgate.jobs.SentenceLot;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

/** Writes a recorded lot's reports, decision record and chart again, from its record in the history store. */
@Command(name = "reissue", mixinStandardHelpOptions = true, sortOptions = false, usageHelpAutoWidth = true,
        header = "Write a recorded lot's reports again from the history store.",
        description = {"Finds the lot's record (by its number, e.g. 12 or #12, or by its lot id), checks the whole"
                + " store, applies the recorded plan to the recorded sheet again (their fingerprint and SHA-256 must"
                + " be those recorded, and the decision must come out exactly as recorded), and writes the outputs"
                + " asked for, each showing the record's number and chain hash. Use it when a run was stopped after"
                + " the lot was recorded but before its reports were in place, or to replace a lost report.", ""})
final class ReissueCommand implements Runnable {
    @Parameters(index = "0", paramLabel = "RECORD-OR-LOT",
            description = "The record's number (12 or #12), or the lot id.")
    String which;

    @Mixin
    SupplierAndPart lotOf;

    @Option(names = "--sheet-file", paramLabel = "FILE",
            description = "Where the inspection sheet is now, if it moved (it must be the same file: same SHA-256).")
    Path sheetFile;

    @Option(names = "--plan-file", paramLabel = "FILE",
            description = "Where the applied plan is now, if it moved (it must be the same plan: same fingerprint).")
    Path planFile;

    @Mixin
    SharedOptions.ColumnNames columnNames;

    @Mixin
    SharedOptions.Reports reports;

    @Mixin
    SharedOptions.RecordFile record;

    @Mixin
    SharedOptions.SamplingChart chart;

    @Mixin
    StoreOption storeOption;

    @Spec
    CommandSpec spec;

    @Override
    public void run() {
        SentenceLot.Outputs outputs = new SentenceLot.Outputs(record.file, chart.file(), reports.files);
        if (outputs.reports().isEmpty() && outputs.record() == null && outputs.chart() == null) {
            throw new ParameterException(spec.commandLine(), "name what to write: --report, --record or --sampling-chart");
        }
        Long seq = null;
        String lot = which;
        String number = which.startsWith("#") ? which.substring(1) : which;
        if (number.matches("[0-9]{1,18}") && (which.startsWith("#") || lotOf.supplier.name == null)) {
            seq = Long.parseLong(number);
            lot = null;
        }
        Columns columns = null;
        if (columnNames.mapping != null) {
            try {
                columns = Columns.mapped(columnNames.mapping);
            } catch (IllegalArgumentException e) {
                throw new ParameterException(spec.commandLine(), "--columns: " + e.getMessage());
            }
        }
        ReissueLotOutputs.Result result = ReissueLotOutputs.run(new ReissueLotOutputs.Request(storeOption.location(),
                seq, lot, lotOf.supplier.name, lotOf.part.name, sheetFile, planFile, columns, outputs));
        PrintWriter out = spec.commandLine().getOut();
        out.println("Lot " + result.decision().lot().lot() + ", record " + result.place().text() + ":");
        for (Path report : outputs.reports()) {
            out.println("  report written to " + report);
        }
        if (outputs.record() != null) {
            out.println("  record saved to " + outputs.record());
        }
        if (outputs.chart() != null) {
            out.println("  sampling chart written to " + outputs.chart());
        }
        out.flush();
    }
}
