package lotgate.cli;

import java.nio.file.Path;
import lotgate.history.HistoryStore;
import picocli.CommandLine.Option;

/** The --store option of commands that only read the history: a store that does not exist is refused. */
class StoreOption {
    @Option(names = "--store", paramLabel = "PATH-OR-URL",
            description = "The history store: a SQLite file, or a JDBC URL such as"
                    + " jdbc:postgresql://host/db?user=u for a store shared by several stations; its password comes"
                    + " from PGPASSWORD or the PostgreSQL password file (~/.pgpass), or from the URL, and is never"
                    + " shown (default: $LOTGATE_STORE, else ~/.local/share/lotgate/history.sqlite).")
    String store;

    /** The store named by the option, the lotgate.store property, LOTGATE_STORE, or the default file. */
    String location() {
        if (given()) {
            return store;
        }
        String property = System.getProperty("lotgate.store");
        if (property != null && !property.isBlank()) {
            return property;
        }
        String environment = System.getenv("LOTGATE_STORE");
        if (environment != null && !environment.isBlank()) {
            return environment;
        }
        String data = System.getenv("XDG_DATA_HOME");
        Path base = data != null && !data.isBlank() ? Path.of(data)
                : Path.of(System.getProperty("user.home"), ".local", "share");
        return base.resolve("lotgate").resolve("history.sqlite").toString();
    }

    /** Whether --store named the store (rather than the default). */
    boolean given() {
        return store != null && !store.isBlank();
    }

    /** Opens the store to read it; one that does not exist is refused (exit code 3, naming where it was looked for). */
    HistoryStore open() {
        return HistoryStore.open(location(), false);
    }
}
