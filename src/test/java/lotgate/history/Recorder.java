package lotgate.history;

/**
 * A recording process for the store's reliability tests: appends lots one by one and prints
 * "done SEQ" after each commit, so that the test knows which writes were reported done.
 * With a fourth argument LOTS, the lot ids cycle through LOTS ids shared with other recorders, and a
 * lot the store already holds is reported as "duplicate SEQ" (the record that holds it).
 */
public final class Recorder {
    private Recorder() {
    }

    public static void main(String[] args) {
        String location = args[0];
        int count = Integer.parseInt(args[1]);
        String supplier = args[2];
        int shared = args.length > 3 ? Integer.parseInt(args[3]) : 0;
        String own = supplier + "-" + ProcessHandle.current().pid() + "-";
        try (HistoryStore store = HistoryStore.open(location)) {
            for (int i = 1; i <= count; i++) {
                String lot = shared > 0 ? "LOT-" + ((i - 1) % shared + 1) : own + i;
                try {
                    StoredRecord record = store.append(Stores.lot(supplier, "P-1", lot, i % 7 != 0, i % 3),
                            Stores.now());
                    System.out.println("done " + record.seq());
                } catch (StoreException.DuplicateLot duplicate) {
                    System.out.println("duplicate " + duplicate.existing());
                }
                System.out.flush();
            }
        }
    }
}
