package lotgate.jobs;

import java.util.List;
import lotgate.history.HistoryStore;
import lotgate.history.LotRow;

/** Listing the history store's records: every one in order, or those of one supplier and part. */
public final class ListHistory {

    /** The supplier and part to list (each null: all), and the store. */
    public record Request(String supplier, String part, String store) {
    }

    /** Where the store is and its records in order. */
    public record Result(String store, List<LotRow> rows) {
        public Result {
            rows = List.copyOf(rows);
        }
    }

    private ListHistory() {
    }

    /**
     * Reads the records asked for; a supplier or part typed in another case or spacing than recorded finds the
     * recorded one, and names the store does not hold are refused with the closest recorded names.
     */
    public static Result run(Request request) {
        try (HistoryStore store = HistoryStore.open(request.store(), false)) {
            RecordedNames.Names names = RecordedNames.of(store, request.supplier(), request.part());
            if (!names.found()) {
                throw RecordedNames.notFound(store, names);
            }
            return new Result(store.location(), store.rows(names.supplier(), names.part()));
        }
    }
}
