package lotgate.cli;

import java.time.LocalDate;
import lotgate.jobs.RecordCorrectiveAction;
import lotgate.report.results.ActionRendering;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/** Records a supplier's corrective action, which lets a discontinued part be inspected again (on tightened). */
@Command(name = "corrective-action", header = "Record a supplier's corrective action for a part.",
        description = {"Records the supplier's corrective action in the history. Where the switching rules had"
                + " discontinued inspection of the part, lots are sentenced again, on tightened inspection.", ""})
final class ActionCommand implements Runnable {
    @Option(names = "--supplier", required = true, paramLabel = "NAME", description = "The supplier.")
    String supplier;

    @Option(names = "--part", required = true, paramLabel = "PART", description = "The part.")
    String part;

    @Option(names = "--reason", required = true, paramLabel = "TEXT",
            description = "What the supplier did (the corrective action report's summary).")
    String reason;

    @Option(names = "--date", paramLabel = "DATE", converter = Values.Day.class, description = "The day the action was accepted (default today).")
    LocalDate date;

    @Mixin
    RecordingStoreOption storeOption;

    @Mixin
    OutputFormat format;

    @Override
    public void run() {
        RecordCorrectiveAction.Request request = new RecordCorrectiveAction.Request(supplier, part, reason, date,
                storeOption.location());
        RecordCorrectiveAction.check(request);
        storeOption.prepareForRecording();
        RecordCorrectiveAction.Result result = RecordCorrectiveAction.run(request);
        format.print(result, ActionRendering::text, ActionRendering::json, ActionRendering::csv);
    }
}
