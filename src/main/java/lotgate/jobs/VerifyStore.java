package lotgate.jobs;

import java.util.List;
import lotgate.history.HistoryStore;

/** Verifying the history store: every record's hash and link, the columns read from it, and kept heads. */
public final class VerifyStore {

    /** The store and the heads kept from earlier (SEQ:HASH) that it must still hold. */
    public record Request(String store, List<HistoryStore.Head> expected) {
        public Request {
            expected = List.copyOf(expected);
        }
    }

    /** Where the store is, what the verification found, and the heads it was asked about. */
    public record Result(String store, HistoryStore.Verification verification, List<HistoryStore.Head> expected) {
        public Result {
            expected = List.copyOf(expected);
        }

        /** Whether the chain is intact and holds every kept head. */
        public boolean intact() {
            return verification.intact();
        }
    }

    private VerifyStore() {
    }

    /** Verifies the store, which must exist. */
    public static Result run(Request request) {
        try (HistoryStore store = HistoryStore.open(request.store(), false)) {
            return new Result(store.location(), store.verify(request.expected()), request.expected());
        }
    }
}
