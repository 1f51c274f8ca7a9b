package lotgate.jobs;

import lotgate.history.HistoryStore;

/** Checking the history store's whole chain and reading its head, for a face that shows the store's state. */
public final class StoreStatus {
    /** The store's location. */
    public record Request(String store) {
    }

    /**
     * Where the store is, its id, how many records it holds, its head as SEQ:HASH (or null when empty),
     * whether the chain is intact, and the first problem found (or null).
     */
    public record Result(String location, String storeId, long records, String head, boolean intact, String problem) {
    }

    private StoreStatus() {
    }

    /** Verifies every record of the store, as the verify command does with no kept head. */
    public static Result run(Request request) {
        try (HistoryStore store = HistoryStore.open(request.store(), false)) {
            HistoryStore.Verification verification = store.verify();
            return new Result(store.location(), verification.storeId(), verification.records(),
                    verification.head() == null ? null : verification.head().toString(), verification.intact(),
                    verification.problem());
        }
    }
}
