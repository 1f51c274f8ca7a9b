package lotgate.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
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

    @Option(names = "--supplier", paramLabel = "NAME", description = "The lot's supplier, when its id is not unique.")
    String supplier;

    @Option(names = "--part", paramLabel = "PART", description = "The lot's part, when its id is not unique.")
    String part;

    @Option(names = "--sheet-file", paramLabel = "FILE",
            description = "Where the inspection sheet is now, if it moved (it must be the same file: same SHA-256).")
    Path sheetFile;

    @Option(names = "--plan-file", paramLabel = "FILE",
            description = "Where the applied plan is now, if it moved (it must be the same plan: same fingerprint).")
    Path planFile;

    @Option(names = "--columns", paramLabel = "MAPPING",
            description = "The header names given when the lot was sentenced, if any (as for sentence).")
    String columnMapping;

    @Option(names = "--report", paramLabel = "FILE", description = "Write a lot report: .xlsx or .html; repeatable.")
    List<Path> reports = new ArrayList<>();

    @Option(names = "--record", paramLabel = "FILE", description = "Write the decision record as a JSON file.")
    Path record;

    @Option(names = "--chart", paramLabel = "FILE", description = "Draw the sampling chart (.png or .svg).")
    Path chart;

    @Mixin
    StoreOption storeOption;

    @Spec
    CommandSpec spec;

    @Override
    public void run() {
        if (reports.isEmpty() && record == null && chart == null) {
            throw new ParameterException(spec.commandLine(), "name what to write: --report, --record or --chart");
        }
        Long seq = null;
        String lot = which;
        String number = which.startsWith("#") ? which.substring(1) : which;
        if (number.matches("[0-9]{1,18}") && (which.startsWith("#") || supplier == null)) {
            seq = Long.parseLong(number);
            lot = null;
        }
        Columns columns = null;
        if (columnMapping != null) {
            try {
                columns = Columns.mapped(columnMapping);
            } catch (IllegalArgumentException e) {
                throw new ParameterException(spec.commandLine(), "--columns: " + e.getMessage());
            }
        }
        ReissueLotOutputs.Result result = ReissueLotOutputs.run(new ReissueLotOutputs.Request(storeOption.location(),
                seq, lot, supplier, part, sheetFile, planFile, columns, new SentenceLot.Outputs(record, chart,
                reports)));
        PrintWriter out = spec.commandLine().getOut();
        out.println("Lot " + result.decision().lot().lot() + ", record " + result.place().text() + ":");
        for (Path report : reports) {
            out.println("  report written to " + report);
        }
        if (record != null) {
            out.println("  record saved to " + record);
        }
        if (chart != null) {
            out.println("  sampling chart written to " + chart);
        }
        out.flush();
    }
}
