package lotgate.history;

/**
 * A recording process for the store's reliability tests: appends lots one by one and prints
 * "done SEQ" after each commit, so that the test knows which writes were reported done.
 */
public final class Recorder {
    private Recorder() {
    }

    public static void main(String[] args) {
        String location = args[0];
        int count = Integer.parseInt(args[1]);
        String supplier = args[2];
        try (HistoryStore store = HistoryStore.open(location)) {
            for (int i = 1; i <= count; i++) {
                StoredRecord record = store.append(Stores.lot(supplier, "P-1", supplier + "-" + i, i % 7 != 0, i % 3),
                        Stores.now());
                System.out.println("done " + record.seq());
                System.out.flush();
            }
        }
    }
}
