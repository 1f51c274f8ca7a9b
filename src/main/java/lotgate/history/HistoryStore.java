package lotgate.history;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.Instant;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Properties;
import lotgate.files.CanonicalJson;

/**
 * The lot history: an append-only chain of records in an embedded SQLite file or a shared
 * PostgreSQL database. Each record carries the hash of its content chained to the record before;
 * every write is one transaction, and appends are serialised so that the chain never forks.
 */
public final class HistoryStore implements AutoCloseable {
    /** The schema version this lotgate writes; older stores are migrated when opened. */
    public static final int SCHEMA_VERSION = 2;
    static final String GENESIS = "0".repeat(64);

    private final String location;
    private final Connection connection;
    private final boolean postgres;
    /** The schema version after migration, which decides the columns a record is written with. */
    private int version;

    private HistoryStore(String location, Connection connection, boolean postgres) {
        this.location = location;
        this.connection = connection;
        this.postgres = postgres;
    }

    /** The store a user names: a JDBC URL (jdbc:sqlite:, jdbc:postgresql:) or the path of a SQLite file. */
    public static HistoryStore open(String location) {
        return open(location, SCHEMA_VERSION);
    }

    /** Opens a store and migrates it to the given schema version (tests build older stores with this). */
    static HistoryStore open(String location, int targetVersion) {
        boolean postgres = location.startsWith("jdbc:postgresql:");
        String url;
        if (postgres || location.startsWith("jdbc:sqlite:")) {
            url = location;
        } else if (location.startsWith("jdbc:")) {
            throw new StoreException("store " + location + ": lotgate stores history in SQLite (a file path or"
                    + " jdbc:sqlite:) or PostgreSQL (jdbc:postgresql:)");
        } else {
            Path file = Path.of(location).toAbsolutePath();
            try {
                Files.createDirectories(file.getParent());
            } catch (java.io.IOException e) {
                throw new StoreException("store " + location + ": cannot create its folder (" + e.getMessage() + ")", e);
            }
            url = "jdbc:sqlite:" + file;
        }
        Connection connection;
        try {
            if (postgres) {
                connection = DriverManager.getConnection(url);
            } else {
                Properties properties = new Properties();
                properties.setProperty("journal_mode", "WAL");
                properties.setProperty("synchronous", "FULL");
                properties.setProperty("busy_timeout", "60000");
                properties.setProperty("foreign_keys", "true");
                connection = DriverManager.getConnection(url, properties);
            }
            // SQLite: lotgate begins each transaction itself (the driver would otherwise begin the next one at
            // once after every commit and, for writes, hold the lock for as long as the connection is open).
            connection.setAutoCommit(!postgres);
        } catch (SQLException e) {
            throw new StoreException("cannot open the history store " + location + " (" + firstLine(e) + ")", e);
        }
        HistoryStore store = new HistoryStore(location, connection, postgres);
        try {
            store.migrate(targetVersion);
        } catch (RuntimeException e) {
            store.close();
            throw e;
        }
        return store;
    }

    private static String firstLine(Exception e) {
        String message = e.getMessage() == null ? e.getClass().getSimpleName() : e.getMessage();
        return message.lines().findFirst().orElse(message);
    }

    public String location() {
        return location;
    }

    public boolean isPostgres() {
        return postgres;
    }

    @Override
    public void close() {
        try {
            connection.close();
        } catch (SQLException ignored) {
            // Nothing is pending: every write was committed or rolled back.
        }
    }

    private interface Work<T> {
        T run() throws SQLException;
    }

    private void execute(String sql) throws SQLException {
        try (Statement statement = connection.createStatement()) {
            statement.execute(sql);
        }
    }

    /** Runs a writing transaction; on any failure it is rolled back and nothing is written. */
    private <T> T transaction(String what, Work<T> work) {
        return transaction(what, true, work);
    }

    /**
     * Runs one transaction: on SQLite a write takes the database's write lock at its start (BEGIN
     * IMMEDIATE), so that concurrent appends queue instead of failing; a read sees one snapshot.
     */
    private <T> T transaction(String what, boolean write, Work<T> work) {
        try {
            if (!postgres) {
                execute(write ? "BEGIN IMMEDIATE" : "BEGIN");
            }
            T result = work.run();
            if (postgres) {
                connection.commit();
            } else {
                execute("COMMIT");
            }
            return result;
        } catch (SQLException | RuntimeException e) {
            try {
                if (postgres) {
                    connection.rollback();
                } else {
                    execute("ROLLBACK");
                }
            } catch (SQLException ignored) {
                // The original failure is the one worth reporting (there may be no transaction to roll back).
            }
            if (e instanceof StoreException store) {
                throw store;
            }
            throw new StoreException("history store " + location + ": cannot " + what + " (" + firstLine(e) + ")", e);
        }
    }

    // ---- schema and migrations ----

    private void migrate(int targetVersion) {
        transaction("migrate the schema", () -> {
            try (Statement statement = connection.createStatement()) {
                if (postgres) {
                    statement.execute("SELECT pg_advisory_xact_lock(2859)");
                }
                statement.execute("CREATE TABLE IF NOT EXISTS lotgate_schema (version INTEGER NOT NULL)");
            }
            int version = schemaVersion();
            if (version > SCHEMA_VERSION) {
                throw new StoreException("history store " + location + " has schema version " + version
                        + ", newer than this lotgate reads (" + SCHEMA_VERSION + "); use a newer lotgate");
            }
            if (version == 0) {
                try (Statement statement = connection.createStatement()) {
                    statement.execute("INSERT INTO lotgate_schema (version) VALUES (0)");
                }
            }
            for (int next = version + 1; next <= targetVersion; next++) {
                Migrations.apply(next, connection, postgres);
                try (PreparedStatement update = connection.prepareStatement("UPDATE lotgate_schema SET version = ?")) {
                    update.setInt(1, next);
                    update.executeUpdate();
                }
            }
            this.version = Math.max(version, targetVersion);
            return null;
        });
    }

    /** The store's schema version (0 for a new store). */
    public int schemaVersion() {
        try (Statement statement = connection.createStatement();
                ResultSet rows = statement.executeQuery("SELECT version FROM lotgate_schema")) {
            return rows.next() ? rows.getInt(1) : 0;
        } catch (SQLException e) {
            throw new StoreException("history store " + location + ": cannot read the schema version", e);
        }
    }

    // ---- writing ----

    /**
     * Appends a record in one transaction, chained to the last one.
     *
     * @param content the record's content: kind, supplier, part, lot and the rest (see {@link RecordContent})
     */
    public StoredRecord append(ObjectNode content, Instant recordedAt) {
        return appendAll(List.of(content), recordedAt).get(0);
    }

    /** Appends several records in one transaction: all of them, or none. */
    public List<StoredRecord> appendAll(List<ObjectNode> contents, Instant recordedAt) {
        return transaction("record the lots", () -> {
            long last;
            String previous;
            try (Statement statement = connection.createStatement();
                    ResultSet head = statement.executeQuery("SELECT seq, hash FROM chain_head WHERE id = 1"
                            + (postgres ? " FOR UPDATE" : ""))) {
                head.next();
                last = head.getLong(1);
                previous = head.getString(2);
            }
            List<StoredRecord> stored = new ArrayList<>();
            for (ObjectNode content : contents) {
                String text = CanonicalJson.text(content);
                long seq = ++last;
                String hash = StoredRecord.hashOf(previous, seq, recordedAt, text);
                Migrations.insertRecord(connection, version, seq, recordedAt, text, content, previous, hash);
                stored.add(new StoredRecord(seq, recordedAt, text, previous, hash));
                previous = hash;
            }
            try (PreparedStatement update = connection.prepareStatement("UPDATE chain_head SET seq = ?, hash = ?"
                    + " WHERE id = 1")) {
                update.setLong(1, last);
                update.setString(2, previous);
                update.executeUpdate();
            }
            return stored;
        });
    }

    // ---- reading ----

    /** The lots and actions of a supplier (all when null) and part (all when null), in record order. */
    public List<LotRow> rows(String supplier, String part) {
        StringBuilder sql = new StringBuilder("SELECT seq, recorded_at, kind, supplier, part, lot, lot_size, received,"
                + " verdict, inspected, nonconforming, severity, production, supersedes FROM lot_record WHERE 1 = 1");
        List<String> values = new ArrayList<>();
        if (supplier != null) {
            sql.append(" AND supplier = ?");
            values.add(supplier);
        }
        if (part != null) {
            sql.append(" AND part = ?");
            values.add(part);
        }
        sql.append(" ORDER BY seq");
        return read("read the lots", () -> {
            List<LotRow> rows = new ArrayList<>();
            try (PreparedStatement query = connection.prepareStatement(sql.toString())) {
                for (int i = 0; i < values.size(); i++) {
                    query.setString(i + 1, values.get(i));
                }
                try (ResultSet result = query.executeQuery()) {
                    while (result.next()) {
                        rows.add(row(result));
                    }
                }
            }
            return rows;
        });
    }

    private static LotRow row(ResultSet result) throws SQLException {
        String received = result.getString(8);
        return new LotRow(result.getLong(1), Instant.parse(result.getString(2)), result.getString(3),
                result.getString(4), result.getString(5), result.getString(6), result.getInt(7),
                received == null ? null : LocalDate.parse(received), result.getString(9), result.getInt(10),
                result.getInt(11), result.getString(12), result.getString(13), result.getLong(14));
    }

    /**
     * The lots of a supplier (and part) that were judged on measurements, with their sample sizes, means and
     * standard deviations as their decision records hold them, in record order.
     */
    public List<MeasurementCharts.Row> measuredLots(String supplier, String part) {
        String sql = "SELECT seq, content FROM lot_record WHERE supplier = ? AND kind = 'lot'"
                + (part == null ? "" : " AND part = ?") + " AND content LIKE ? ORDER BY seq";
        return read("read the measured lots", () -> {
            List<MeasurementCharts.Row> rows = new ArrayList<>();
            try (PreparedStatement query = connection.prepareStatement(sql)) {
                int index = 1;
                query.setString(index++, supplier);
                if (part != null) {
                    query.setString(index++, part);
                }
                query.setString(index, "%\"recording\":\"measurements\"%");
                try (ResultSet result = query.executeQuery()) {
                    while (result.next()) {
                        com.fasterxml.jackson.databind.JsonNode content = new StoredRecord(result.getLong(1), null,
                                result.getString(2), null, null).json();
                        com.fasterxml.jackson.databind.JsonNode measured = content.path("decision").path("measurement");
                        if (measured.isMissingNode()) {
                            continue;
                        }
                        String received = content.path("received").isTextual() ? content.path("received").asText() : null;
                        rows.add(new MeasurementCharts.Row(result.getLong(1), content.path("lot").asText(),
                                received == null ? null : LocalDate.parse(received), measured.path("n").asInt(),
                                measured.path("mean").asDouble(), measured.path("sampleStandardDeviation").asDouble(),
                                measured.path("characteristic").asText(""), measured.path("unit").asText("")));
                    }
                }
            }
            return rows;
        });
    }

    /** The full content of one record. */
    public StoredRecord record(long seq) {
        return read("read record " + seq, () -> {
            try (PreparedStatement query = connection.prepareStatement("SELECT seq, recorded_at, content,"
                    + " previous_hash, hash FROM lot_record WHERE seq = ?")) {
                query.setLong(1, seq);
                try (ResultSet result = query.executeQuery()) {
                    if (!result.next()) {
                        return null;
                    }
                    return new StoredRecord(result.getLong(1), Instant.parse(result.getString(2)), result.getString(3),
                            result.getString(4), result.getString(5));
                }
            }
        });
    }

    /** Nonconforming units per defect type for a supplier (and part), most frequent first. */
    public Map<String, Long> defectTypes(String supplier, String part) {
        String sql = "SELECT defect, SUM(units) AS total FROM defect_count WHERE supplier = ?"
                + (part == null ? "" : " AND part = ?")
                + " AND seq NOT IN (SELECT supersedes FROM lot_record WHERE supersedes > 0)"
                + " GROUP BY defect ORDER BY total DESC, defect";
        return read("read the defect types", () -> {
            Map<String, Long> types = new LinkedHashMap<>();
            try (PreparedStatement query = connection.prepareStatement(sql)) {
                query.setString(1, supplier);
                if (part != null) {
                    query.setString(2, part);
                }
                try (ResultSet result = query.executeQuery()) {
                    while (result.next()) {
                        types.put(result.getString(1), result.getLong(2));
                    }
                }
            }
            return types;
        });
    }

    /** One supplier's totals over its effective lots (corrections replace what they supersede). */
    public record SupplierTotals(String supplier, long lots, long rejected, long inspected, long nonconforming) {
    }

    /** Totals per supplier, by the store's own aggregation. */
    public List<SupplierTotals> supplierTotals() {
        String sql = "SELECT supplier, COUNT(*), SUM(CASE WHEN verdict = 'reject' THEN 1 ELSE 0 END), SUM(inspected),"
                + " SUM(nonconforming) FROM lot_record WHERE kind = 'lot'"
                + " AND seq NOT IN (SELECT supersedes FROM lot_record WHERE supersedes > 0)"
                + " GROUP BY supplier ORDER BY supplier";
        return read("aggregate the suppliers", () -> {
            List<SupplierTotals> totals = new ArrayList<>();
            try (Statement statement = connection.createStatement(); ResultSet result = statement.executeQuery(sql)) {
                while (result.next()) {
                    totals.add(new SupplierTotals(result.getString(1), result.getLong(2), result.getLong(3),
                            result.getLong(4), result.getLong(5)));
                }
            }
            return totals;
        });
    }

    private <T> T read(String what, Work<T> work) {
        return transaction(what, false, work);
    }

    // ---- verification ----

    /** The outcome of checking the whole chain: intact, or the first record that was altered or removed. */
    public record Verification(boolean intact, long records, String problem) {
    }

    /** Recomputes every hash and link, and checks that the extracted columns still match the content. */
    public Verification verify() {
        return read("verify the chain", () -> {
            long expected = 1;
            String previous = GENESIS;
            try (Statement statement = connection.createStatement();
                    ResultSet result = statement.executeQuery("SELECT seq, recorded_at, content, previous_hash, hash,"
                            + " kind, supplier, part, lot, verdict, inspected, nonconforming, supersedes"
                            + " FROM lot_record ORDER BY seq")) {
                while (result.next()) {
                    long seq = result.getLong(1);
                    if (seq != expected) {
                        return new Verification(false, expected - 1, seq > expected
                                ? "record " + expected + (seq == expected + 1 ? " was" : " to " + (seq - 1) + " were")
                                        + " removed (the chain goes on at record " + seq + ")"
                                : "record " + seq + " appears twice");
                    }
                    String content = result.getString(3);
                    if (!previous.equals(result.getString(4))) {
                        return new Verification(false, seq - 1, "record " + seq + " no longer links to record "
                                + (seq - 1) + ": a record before it was altered or replaced");
                    }
                    String hash = StoredRecord.hashOf(previous, seq, Instant.parse(result.getString(2)), content);
                    if (!hash.equals(result.getString(5))) {
                        return new Verification(false, seq - 1, "record " + seq + " was altered: its content no"
                                + " longer matches its hash");
                    }
                    String mismatch = Migrations.columnsMismatch(result, new StoredRecord(seq, null, content, previous,
                            hash).json());
                    if (mismatch != null) {
                        return new Verification(false, seq - 1, "record " + seq + " was altered: column " + mismatch
                                + " no longer matches its content");
                    }
                    previous = hash;
                    expected++;
                }
            }
            try (Statement statement = connection.createStatement();
                    ResultSet head = statement.executeQuery("SELECT seq, hash FROM chain_head WHERE id = 1")) {
                head.next();
                long last = head.getLong(1);
                if (last != expected - 1 || !head.getString(2).equals(previous)) {
                    return new Verification(false, expected - 1, last > expected - 1
                            ? "the last " + (last - expected + 1) + " record(s) were removed (the chain head names"
                                    + " record " + last + ", the store ends at record " + (expected - 1) + ")"
                            : "the chain head does not match the last record " + (expected - 1));
                }
            }
            return new Verification(true, expected - 1, null);
        });
    }

}
