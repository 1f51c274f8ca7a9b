package lotgate.report.results;

import com.fasterxml.jackson.databind.node.ObjectNode;
import lotgate.history.HistoryStore;
import lotgate.jobs.VerifyStore;
import lotgate.report.Json;

/** A store's verification as text or JSON. */
public final class VerifyRendering {
    private VerifyRendering() {
    }

    /** The verification as one CSV row, intact or not. */
    public static String csv(VerifyStore.Result result) {
        HistoryStore.Verification verification = result.verification();
        return lotgate.report.CsvTable.table(java.util.List.of("store", "storeId", "intact", "records", "head",
                "problem"), java.util.List.of(java.util.List.of(result.store(), verification.storeId() == null ? ""
                        : verification.storeId(), verification.intact(), verification.records(),
                        verification.head() == null ? "" : verification.head().toString(),
                        verification.problem() == null ? "" : verification.problem())));
    }

    /** The verification as JSON, intact or not. */
    public static ObjectNode json(VerifyStore.Result result) {
        HistoryStore.Verification verification = result.verification();
        ObjectNode node = Json.object();
        node.put("store", result.store());
        node.put("storeId", verification.storeId());
        node.put("intact", verification.intact());
        node.put("records", verification.records());
        if (verification.head() != null) {
            node.put("headSeq", verification.head().seq());
            node.put("headHash", verification.head().hash());
            node.put("head", verification.head().toString());
        }
        var checked = node.putArray("expected");
        result.expected().forEach(head -> checked.add(head.toString()));
        node.put("problem", verification.problem());
        return node;
    }

    /** What is wrong with a damaged store, in one line. */
    public static String damage(VerifyStore.Result result) {
        return "history store " + result.store() + " is damaged: " + result.verification().problem() + " ("
                + lotgate.report.Words.count(result.verification().records(), "record") + " before it "
                + (result.verification().records() == 1 ? "is" : "are") + " intact)";
    }

    /** An intact store as text: its records, id and head, and the kept heads it still holds. */
    public static String text(VerifyStore.Result result) {
        HistoryStore.Verification verification = result.verification();
        return Text.of(out -> {
            out.println("History store " + result.store() + ": " + lotgate.report.Words.count(verification.records(), "record") + ", chain intact.");
            out.println("  store id: " + verification.storeId());
            out.println("  head:     " + verification.head() + "   (keep it; 'lotgate verify --expect "
                    + verification.head() + "' proves later that the store still holds it)");
            for (HistoryStore.Head head : result.expected()) {
                out.println("  still holds " + head);
            }
        });
    }
}
