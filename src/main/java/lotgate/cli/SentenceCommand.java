package lotgate.cli;

import java.nio.file.Path;
import lotgate.jobs.SentenceLot;
import lotgate.report.results.SentenceRendering;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** Sentences a lot: reads its inspection sheet, applies a saved plan, and gives the verdict with its evidence. */
@Command(name = "sentence", header = "Accept or reject a lot from its inspection sheet and a saved plan.",
        description = {
                "Reads the sample recorded in an inspection sheet (.xlsx, .xls or .csv), applies the saved plan,"
                        + " and gives the verdict per defect class and for the lot, with exact evidence: the"
                        + " p-value of the count against the AQL, a confidence interval for the lot's quality, for a"
                        + " known lot size an upper bound on its nonconforming units, and where the count sits on"
                        + " the plan's OC curve.",
                "",
                "A variables plan reads measurements from a 'value' column instead, and gives the sample's mean"
                        + " and s, the quality statistic against k, the estimated fraction beyond the limits with an"
                        + " exact upper bound, and a normality test.",
                "",
                "The lot is recorded in the supplier's history (see --store), unless --no-record.",
                "",
                "A double or multiple plan stops at the first sample (stage) whose count decides; a sequential"
                        + " plan after the first unit at which the count crosses a line. The sheet lists the units in"
                        + " the order inspected; when the plan has not decided yet, lotgate says how many more units to"
                        + " inspect (exit code 9) and records nothing.",
                "",
                "Exit code 0: accepted; 1: rejected; 4: the sheet holds fewer or more units than the plan samples;"
                        + " 8: inspection of the part is discontinued; 9: no decision yet, inspect more units;"
                        + " 2 and 3: bad options or input; 6: a report or record cannot be written; 7: the history"
                        + " store cannot be used.",
                ""})
final class SentenceCommand implements Runnable {

    @Parameters(index = "0", paramLabel = "PLAN",
            description = "The saved plan file to apply (plans/*.json), or a plan family, whose variant for the"
                    + " supplier's current inspection severity is applied.")
    Path planFile;

    @Parameters(index = "1", paramLabel = "SHEET", description = "The inspection sheet: .xlsx, .xls or .csv.")
    Path sheetFile;

    @Mixin
    SheetOptions sheetOptions;

    @Mixin
    LotOptions lot;

    @Mixin
    SharedOptions.Confidence confidence;

    @Mixin
    SharedOptions.RecordFile record;

    @Option(names = "--no-record", description = "Do not add this lot to the history store (a trial run).")
    boolean noRecord;

    @Option(names = "--supersedes", paramLabel = "SEQ", converter = Values.Sequence.class,
            description = "This sentence corrects the history record SEQ (give --reason); the old record stays.")
    Long supersedes;

    @Option(names = "--reason", paramLabel = "TEXT", description = "Why this sentence corrects an earlier record.")
    String reason;

    @Option(names = "--production", paramLabel = "STEADY-OR-IRREGULAR", defaultValue = "steady",
            description = "Whether the supplier's production was steady or irregular (default ${DEFAULT-VALUE});"
                    + " irregular production ends reduced inspection.")
    String production;

    @Mixin
    RecordingStoreOption storeOption;

    @Mixin
    SharedOptions.SamplingChart chart;

    @Mixin
    SharedOptions.Reports reports;

    @Mixin
    OutputFormat format;

    @Spec
    CommandSpec spec;

    @Override
    public void run() {
        int[] range = sheetOptions.rowRange(spec);
        SentenceLot.Request request = new SentenceLot.Request(planFile, sheetFile, sheetOptions.sheet.name,
                sheetOptions.columns(spec), range[0], range[1], lot.given(spec), lot.file, confidence.level, !noRecord,
                supersedes, reason, production, storeOption.location(), new SentenceLot.Outputs(record.file,
                chart.file(), reports.files));
        if (!noRecord) {
            storeOption.prepareForRecording();
        }
        SentenceLot.Result result;
        try (Progress reading = Progress.onTerminal("sentence: reading sheet rows", 0,
                format.kind == OutputFormat.Kind.text)) {
            result = SentenceLot.run(request, reading::at);
        }
        format.print(result, SentenceRendering::text, SentenceRendering::json, SentenceRendering::csv);
        if (result instanceof SentenceLot.Undecided) {
            throw new Main.Failure(ExitCode.NOT_DECIDED, null);
        }
        if (!((SentenceLot.Decided) result).accepted()) {
            throw new Main.Failure(ExitCode.REJECTED, null);
        }
    }
}
