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

    /** Reads the records asked for. */
    public static Result run(Request request) {
        try (HistoryStore store = HistoryStore.open(request.store(), false)) {
            return new Result(store.location(), store.rows(request.supplier(), request.part()));
        }
    }
}
