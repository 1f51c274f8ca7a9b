package lotgate.cli;

import java.io.PrintWriter;
import lotgate.history.HistoryStore;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Spec;

/** Checks the whole hash chain of the history store and names the first record altered or removed. */
@Command(name = "verify", mixinStandardHelpOptions = true, usageHelpAutoWidth = true,
        header = "Check that no record of the history store was altered or removed.",
        description = {"Recomputes the hash of every record and its link to the one before, checks that the"
                + " columns queries read still match each record's content, and names the first record that was"
                + " altered or removed (exit code 7).", ""})
final class VerifyCommand implements Runnable {
    @Mixin
    StoreOption storeOption;

    @Spec
    CommandSpec spec;

    @Override
    public void run() {
        HistoryStore.Verification verification;
        String location;
        try (HistoryStore store = storeOption.open()) {
            verification = store.verify();
            location = store.location();
        }
        PrintWriter out = spec.commandLine().getOut();
        if (!verification.intact()) {
            throw new Main.Failure(ExitCode.STORE, "history store " + location + " is damaged: "
                    + verification.problem() + " (" + verification.records() + " records before it are intact)");
        }
        out.println("History store " + location + ": " + verification.records() + " records, chain intact.");
        out.flush();
    }
}
