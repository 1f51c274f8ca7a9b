package lotgate.cli;

import java.io.PrintWriter;
import java.time.Instant;
import java.time.LocalDate;
import java.time.temporal.ChronoUnit;
import lotgate.history.HistoryStore;
import lotgate.history.RecordContent;
import lotgate.history.StoredRecord;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

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

    @Spec
    CommandSpec spec;

    @Override
    public void run() {
        for (String[] id : new String[][] {{"--supplier", supplier}, {"--part", part}}) {
            String problem = lotgate.history.Identifiers.problem(id[0], id[1]);
            if (problem != null) {
                throw new ParameterException(spec.commandLine(), problem);
            }
        }
        if (reason.isBlank()) {
            throw new ParameterException(spec.commandLine(), "--reason must say what the supplier did");
        }
        StoredRecord record;
        String location;
        try (HistoryStore store = storeOption.openForRecording()) {
            record = store.append(RecordContent.action(supplier, part, reason.trim(), date == null ? LocalDate.now() : date),
                    Instant.now().truncatedTo(ChronoUnit.MILLIS));
            location = store.location();
        }
        PrintWriter out = spec.commandLine().getOut();
        out.println("Corrective action for " + supplier + ", part " + part + " recorded as #" + record.seq() + " in "
                + location + " (chain hash " + record.hash() + ").");
        out.flush();
    }
}
