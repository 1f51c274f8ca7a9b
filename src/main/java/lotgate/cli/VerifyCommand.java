package lotgate.cli;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.List;
import lotgate.history.HistoryStore;
import lotgate.report.Json;
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
    @Option(names = "--expect", paramLabel = "SEQ:HASH",
            description = "A head kept from an earlier verify or a lot's record (e.g. 12:3f9a...); the store must"
                    + " still hold that hash at that place (exit code 7 if not). Repeatable.")
    List<String> expected = new ArrayList<>();

    @Mixin
    StoreOption storeOption;

    @Mixin
    OutputFormat format;

    @Spec
    CommandSpec spec;

    @Override
    public void run() {
        if (format.kind == OutputFormat.Kind.csv) {
            throw new ParameterException(spec.commandLine(), "--format csv: verify prints text or json");
        }
        List<HistoryStore.Head> kept = new ArrayList<>();
        for (String text : expected) {
            try {
                kept.add(HistoryStore.Head.parse(text));
            } catch (IllegalArgumentException e) {
                throw new ParameterException(spec.commandLine(), "--expect " + e.getMessage());
            }
        }
        HistoryStore.Verification verification;
        String location;
        try (HistoryStore store = storeOption.open()) {
            verification = store.verify(kept);
            location = store.location();
        }
        PrintWriter out = spec.commandLine().getOut();
        if (format.kind == OutputFormat.Kind.json) {
            ObjectNode node = Json.object();
            node.put("store", location);
            node.put("storeId", verification.storeId());
            node.put("intact", verification.intact());
            node.put("records", verification.records());
            if (verification.head() != null) {
                node.put("headSeq", verification.head().seq());
                node.put("headHash", verification.head().hash());
                node.put("head", verification.head().toString());
            }
            var checked = node.putArray("expected");
            kept.forEach(head -> checked.add(head.toString()));
            node.put("problem", verification.problem());
            out.println(Json.text(node));
            out.flush();
            if (!verification.intact()) {
                throw new Main.Failure(ExitCode.STORE, null);
            }
            return;
        }
        if (!verification.intact()) {
            throw new Main.Failure(ExitCode.STORE, "history store " + location + " is damaged: "
                    + verification.problem() + " (" + verification.records() + " records before it are intact)");
        }
        out.println("History store " + location + ": " + verification.records() + " records, chain intact.");
        out.println("  store id: " + verification.storeId());
        out.println("  head:     " + verification.head() + "   (keep it; 'lotgate verify --expect "
                + verification.head() + "' proves later that the store still holds it)");
        for (HistoryStore.Head head : kept) {
            out.println("  still holds " + head);
        }
        out.flush();
    }
}
