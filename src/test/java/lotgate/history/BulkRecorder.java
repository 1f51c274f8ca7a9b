package lotgate.history;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.Iterator;

/**
 * A bulk-loading process for the store's reliability tests: appends COUNT invented lots in one bulk load,
 * printing "writing N" as it hands over the Nth hundred lots and "done" after the commit, so that a test can
 * kill it in the middle of the load.
 */
public final class BulkRecorder {
    private BulkRecorder() {
    }

    public static void main(String[] args) {
        String location = args[0];
        int count = Integer.parseInt(args[1]);
        Iterable<ObjectNode> lots = () -> new Iterator<>() {
            private int next;

            @Override
            public boolean hasNext() {
                return next < count;
            }

            @Override
            public ObjectNode next() {
                next++;
                if (next % 100 == 0) {
                    System.out.println("writing " + next / 100);
                    System.out.flush();
                }
                return Stores.lot("Invented Bulk Supplier", "P-1", "K-" + next, next % 7 != 0, next % 3);
            }
        };
        try (HistoryStore store = HistoryStore.open(location)) {
            store.appendEach(lots, count, Stores.now());
        }
        System.out.println("done");
        System.out.flush();
    }
}
