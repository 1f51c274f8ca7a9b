package lotgate.cli;

import java.util.ArrayList;
import java.util.List;
import lotgate.history.HistoryStore;
import lotgate.jobs.VerifyStore;
import lotgate.report.results.VerifyRendering;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

/** Checks the whole history store and names the first record altered or removed; prints the head to keep. */
@Command(name = "verify", header = "Check that no record of the history store was altered or removed.",
        description = {"Recomputes the hash of every record and its link to the one before, checks every column"
                + " that queries, reports and rankings read and every defect count against each record's content,"
                + " and names the first record that was altered or removed (exit code 7).",
                "",
                "It prints the head (the last record's number and chain hash) and the store's id. Keep the head"
                        + " elsewhere (an email, a decision record): 'verify --expect SEQ:HASH' later proves that"
                        + " the store still holds that record with that hash, so that it was neither cut short nor"
                        + " replaced. Someone able to write to the store could rewrite the whole chain"
                        + " consistently; only a kept head or a copy of a decision catches that.",
                ""})
final class VerifyCommand implements Runnable {
    @Spec
    CommandSpec spec;

    @Option(names = "--expect", paramLabel = "SEQ:HASH",
            description = "A head kept from an earlier verify or a lot's record (e.g. 12:3f9a...); the store must"
                    + " still hold that hash at that place (exit code 7 if not). Repeatable.")
    List<String> expected = new ArrayList<>();

    @Mixin
    StoreOption storeOption;

    @Mixin
    OutputFormat format;

    @Override
    public void run() {
        List<HistoryStore.Head> kept = new ArrayList<>();
        for (String text : expected) {
            try {
                kept.add(HistoryStore.Head.parse(text));
            } catch (IllegalArgumentException e) {
                throw new ParameterException(spec.commandLine(), "--expect " + e.getMessage());
            }
        }
        VerifyStore.Result result = VerifyStore.run(new VerifyStore.Request(storeOption.location(), kept));
        boolean forPrograms = format.kind != OutputFormat.Kind.text;
        if (forPrograms || result.intact()) {
            format.print(result, VerifyRendering::text, VerifyRendering::json, VerifyRendering::csv);
        }
        if (!result.intact()) {
            throw new Main.Failure(ExitCode.STORE, forPrograms ? null : VerifyRendering.damage(result));
        }
    }
}
