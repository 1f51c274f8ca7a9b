package lotgate.jobs;

import java.time.Instant;
import java.time.LocalDate;
import java.time.temporal.ChronoUnit;
import lotgate.history.HistoryStore;
import lotgate.history.Identifiers;
import lotgate.history.RecordContent;
import lotgate.history.StoredRecord;

/** Recording a supplier's corrective action, which lets a discontinued part be inspected again (on tightened). */
public final class RecordCorrectiveAction {

    /** The supplier, the part, what the supplier did, the day it was accepted (null: today), and the store. */
    public record Request(String supplier, String part, String reason, LocalDate date, String store) {
    }

    /** The record appended and the store it is in. */
    public record Result(String supplier, String part, StoredRecord record, String store) {
    }

    private RecordCorrectiveAction() {
    }

    /** Checks the request and appends the action to the store, which must exist. */
    public static Result run(Request request) {
        check(request);
        try (HistoryStore store = HistoryStore.open(request.store(), false)) {
            StoredRecord record = store.append(RecordContent.action(request.supplier(), request.part(),
                    request.reason().trim(), request.date() == null ? LocalDate.now() : request.date()),
                    Instant.now().truncatedTo(ChronoUnit.MILLIS));
            return new Result(request.supplier(), request.part(), record, store.location());
        }
    }

    /** Refuses a supplier or part that is not a usable identifier, and a reason that says nothing. */
    public static void check(Request request) {
        for (String[] id : new String[][] {{"supplier", "--supplier", request.supplier()},
                {"part", "--part", request.part()}}) {
            String problem = Identifiers.problem(id[1], id[2]);
            if (problem != null) {
                throw JobException.invalid(id[0], problem);
            }
        }
        if (request.reason().isBlank()) {
            throw JobException.invalid("reason", "--reason must say what the supplier did");
        }
    }
}
