package lotgate.cli;

import java.io.PrintWriter;
import lotgate.history.HistoryStore;
import lotgate.history.StoreException;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/**
 * The --store option of commands that record: a missing store is created at the default location,
 * or wherever --create-store asks, and the command says so on stderr; anywhere else it is refused,
 * so that a mistyped path or a deleted store never silently starts a new history.
 */
final class RecordingStoreOption extends StoreOption {
    @Option(names = "--create-store",
            description = "Create the store named by --store if it does not exist yet (a store at the default"
                    + " location is created when needed).")
    boolean create;

    @Spec(Spec.Target.MIXEE)
    CommandSpec mixee;

    /**
     * Makes sure the store exists before a job records into it (a job never creates one): creates it where
     * allowed, saying so, and refuses a missing store anywhere else.
     */
    void prepareForRecording() {
        openForRecording().close();
    }

    /** Opens the store to record into it, creating it only where allowed, and says when it created it. */
    HistoryStore openForRecording() {
        HistoryStore store;
        try {
            store = HistoryStore.open(location(), create || !given());
        } catch (StoreException.Missing missing) {
            throw refusal(missing);
        }
        announceIfCreated(store);
        return store;
    }

    /**
     * Opens the store to record into it, creating it only where allowed, without a word, and a new SQLite store
     * under a hidden name until the job publishes it ({@link HistoryStore#openStaged}): a job that may fail part-way
     * says that it created the store ({@link #announceIfCreated}) once it has succeeded.
     */
    HistoryStore openStagedQuietly() {
        try {
            return HistoryStore.openStaged(location(), create || !given());
        } catch (StoreException.Missing missing) {
            throw refusal(missing);
        }
    }

    private static StoreException.Missing refusal(StoreException.Missing missing) {
        return new StoreException.Missing(missing.getMessage() + "; give --create-store to start a new store there"
                + " (nothing was recorded)");
    }

    /** Says on stderr that the store was created, when opening it did. */
    void announceIfCreated(HistoryStore store) {
        if (store != null && store.created()) {
            PrintWriter err = mixee.commandLine().getErr();
            err.println("lotgate: created a new history store " + store.location() + " (store id " + store.storeId()
                    + ")");
            err.flush();
        }
    }
}
