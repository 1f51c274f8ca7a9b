package lotgate.cli;

import java.nio.file.Path;
import lotgate.history.HistoryStore;
import picocli.CommandLine.Option;

/** The --store option: where the lot history lives. */
final class StoreOption {
    @Option(names = "--store", paramLabel = "PATH-OR-URL",
            description = "The history store: a SQLite file, or a JDBC URL such as"
                    + " jdbc:postgresql://host/db?user=u&password=p for a store shared by several stations"
                    + " (default: $LOTGATE_STORE, else ~/.local/share/lotgate/history.sqlite).")
    String store;

    /** The store named by the option, the lotgate.store property, LOTGATE_STORE, or the default file. */
    String location() {
        if (store != null && !store.isBlank()) {
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

    HistoryStore open() {
        return HistoryStore.open(location());
    }
}
