package lotgate.history;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.Instant;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Properties;
import java.util.TreeMap;
import java.util.UUID;
import lotgate.files.CanonicalJson;
import lotgate.files.IsoText;
import lotgate.files.MadeAhead;

/**
 * The lot history: an append-only chain of records in an embedded SQLite file or a shared
 * PostgreSQL database. Each record carries the hash of its content chained to the record before;
 * every write is one transaction, appends are serialised so that the chain never forks, and the
 * database itself holds each lot to one current record.
 */
public final class HistoryStore implements AutoCloseable {
    /** The schema version this lotgate writes; older stores are migrated when opened. */
    public static final int SCHEMA_VERSION = 5;
    static final String GENESIS = "0".repeat(64);

    private final StoreLocation location;
    private final Connection connection;
    private final boolean postgres;
    /** The schema version after migration, which decides the columns a record is written with. */
    private int version;
    /** Whether this opening created the store. */
    private boolean created;
    /** The hidden file a new store is made in until it is published ({@link #openStaged}), or null. */
    private Path stagedFile;
    private String storeId;
    private Instant idRecordedAt;
    /** The hash the first record links to: derived from the store's id, or zeros for a store older than its id. */
    private String genesis = GENESIS;

    private HistoryStore(StoreLocation location, Connection connection) {
        this.location = location;
        this.connection = connection;
        this.postgres = location.postgres();
    }

    /** A place in the chain: a record's sequence number and its chain hash ("SEQ:HASH" as text). */
    public record Head(long seq, String hash) {
        /** Reads "SEQ:HASH" as verify prints it. */
        public static Head parse(String text) {
            int colon = text.indexOf(':');
            if (colon < 1) {
                throw new IllegalArgumentException("'" + Identifiers.escape(text) + "' is not SEQ:HASH, as verify"
                        + " prints the head (e.g. 12:3f9a...)");
            }
            long seq;
            try {
                seq = Long.parseLong(text.substring(0, colon).trim().replace("#", ""));
            } catch (NumberFormatException e) {
                seq = -1;
            }
            String hash = text.substring(colon + 1).trim().toLowerCase(java.util.Locale.ROOT);
            if (seq < 0 || !hash.matches("[0-9a-f]{64}")) {
                throw new IllegalArgumentException("'" + Identifiers.escape(text) + "' is not SEQ:HASH with a"
                        + " record number and the 64 hexadecimal digits of its chain hash");
            }
            return new Head(seq, hash);
        }

        @Override
        public String toString() {
            return seq + ":" + hash;
        }
    }

    /** The store a user names: a JDBC URL (jdbc:sqlite:, jdbc:postgresql:) or the path of a SQLite file; created if missing. */
    public static HistoryStore open(String location) {
        return open(location, true);
    }

    /**
     * Opens a store; one that does not exist yet is created only when {@code mayCreate}, else refused
     * with {@link StoreException.Missing}. A store held in memory is always refused.
     */
    public static HistoryStore open(String location, boolean mayCreate) {
        return open(location, mayCreate, SCHEMA_VERSION, System.getenv());
    }

    /** Opens a store and migrates it to the given schema version (tests build older stores with this). */
    static HistoryStore open(String location, int targetVersion) {
        return open(location, true, targetVersion, System.getenv());
    }

    /**
     * Opens a store as {@link #open(String, boolean)} does, but a SQLite store that does not exist yet is made
     * under a hidden name beside its place, where no other lotgate can open it, and takes its name only when
     * {@link #publish} is called: a job that may fail part-way through its writes (a long import) leaves no store
     * behind, and nobody records into a store that is about to be removed ({@link #discardIfCreated}).
     */
    public static HistoryStore openStaged(String location, boolean mayCreate) {
        return open(location, mayCreate, SCHEMA_VERSION, System.getenv(), true);
    }

    static HistoryStore open(String given, boolean mayCreate, int targetVersion, Map<String, String> environment) {
        return open(given, mayCreate, targetVersion, environment, false);
    }

    private static HistoryStore open(String given, boolean mayCreate, int targetVersion,
            Map<String, String> environment, boolean staged) {
        StoreLocation location = StoreLocation.of(given);
        Path stagedFile = null;
        if (!location.postgres()) {
            Path file = location.file();
            if (!Files.exists(file)) {
                if (staged && mayCreate) {
                    stagedFile = file.resolveSibling("." + file.getFileName() + ".new-" + UUID.randomUUID());
                }
                if (!mayCreate) {
                    throw new StoreException.Missing("history store " + location.shown() + " does not exist");
                }
                try {
                    Files.createDirectories(file.getParent());
                } catch (java.io.IOException e) {
                    throw new StoreException("store " + location.shown() + ": cannot create its folder ("
                            + e.getMessage() + ")", e);
                }
            }
        }
        Connection connection;
        try {
            if (location.postgres()) {
                connection = new org.postgresql.Driver().connect(location.url(), location.postgresProperties(environment));
            } else {
                SqliteLibrary.prepare();
                // The driver itself rather than DriverManager, which would first load and start every JDBC
                // driver on the class path (PostgreSQL's and its logging: 15 ms of a short command).
                String url = location.url();
                if (stagedFile != null) {
                    // The hidden file in the place of the given one, with the settings the address gives.
                    int query = url.equals("jdbc:sqlite:" + location.file()) ? -1 : url.indexOf('?');
                    url = "jdbc:sqlite:" + stagedFile + (query < 0 ? "" : url.substring(query));
                }
                connection = new org.sqlite.JDBC().connect(url, sqliteSettings());
                if (connection != null) {
                    writeAheadLog(connection);
                }
            }
            if (connection == null) {
                throw new SQLException("the driver does not accept the address " + location.url());
            }
            // SQLite: lotgate begins each transaction itself (the driver would otherwise begin the next one at
            // once after every commit and, for writes, hold the lock for as long as the connection is open).
            connection.setAutoCommit(!location.postgres());
        } catch (SQLException e) {
            throw new StoreException("cannot open the history store " + location.shown() + " ("
                    + location.scrub(firstLine(e)) + ")", null);
        }
        HistoryStore store = new HistoryStore(location, connection);
        store.stagedFile = stagedFile;
        try {
            store.migrate(targetVersion, mayCreate);
        } catch (RuntimeException e) {
            store.close();
            throw e;
        }
        return store;
    }

    /**
     * The settings the store opens a SQLite connection with (the benchmarks open their bare SQL's so too); the
     * store then puts it in its write-ahead log mode ({@link #writeAheadLog}).
     */
    public static Properties sqliteSettings() {
        Properties properties = new Properties();
        properties.setProperty("synchronous", "FULL");
        // A new store takes pages of 16 KiB (SQLite's default is 4 KiB; an existing store keeps its own): a bulk
        // load's commit writes its pages one call each, and 100,000 lots took 170-270 ms to commit in 4 KiB pages,
        // 110-135 ms in 16 KiB. A lot recorded alone writes a few pages more to the log; larger pages (64 KiB)
        // saved little more at the commit and would make each of those writes four times as long again.
        properties.setProperty("page_size", Integer.toString(PAGE_SIZE));
        properties.setProperty("busy_timeout", Long.toString(BUSY_TIMEOUT_MS));
        properties.setProperty("foreign_keys", "true");
        // lotgate numbers its records itself; without this the driver asks for the new row id after
        // every insert (a fifth of the time an import spends writing).
        properties.setProperty("jdbc.get_generated_keys", "false");
        return properties;
    }

    /** How long a SQLite connection waits for another's write lock before it gives up. */
    private static final long BUSY_TIMEOUT_MS = 60_000;

    /**
     * Puts a SQLite store in its write-ahead log mode, in which readers never wait for a writer. A bulk load may
     * hold the store in rollback-journal mode (see {@link #rollbackJournal}); changing the mode back then fails
     * at once with SQLITE_BUSY, without SQLite's own wait, so it is tried again until the load has committed, for
     * as long as the busy timeout.
     */
    private static void writeAheadLog(Connection connection) throws SQLException {
        long deadline = System.nanoTime() + BUSY_TIMEOUT_MS * 1_000_000;
        for (long pause = 1; ; pause = Math.min(2 * pause, 50)) {
            try (Statement statement = connection.createStatement()) {
                statement.execute("PRAGMA journal_mode = WAL");
                return;
            } catch (SQLException e) {
                if ((e.getErrorCode() & 0xff) != SQLITE_BUSY || System.nanoTime() - deadline > 0) {
                    connection.close();
                    throw e;
                }
            }
            try {
                Thread.sleep(pause);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                connection.close();
                throw new SQLException("interrupted while the store was busy");
            }
        }
    }

    private static final int SQLITE_BUSY = 5;

    /** The page size of a new SQLite store, in bytes (see {@link #sqliteSettings}). */
    static final int PAGE_SIZE = 16384;

    private static String firstLine(Exception e) {
        String message = e.getMessage() == null ? e.getClass().getSimpleName() : e.getMessage();
        return message.lines().findFirst().orElse(message);
    }

    /** The store's location as shown to people (a password in it masked). */
    public String location() {
        return location.shown();
    }

    public boolean isPostgres() {
        return postgres;
    }

    /** Whether opening the store created it. */
    public boolean created() {
        return created;
    }

    /** The random id the store recorded when it was created (or, for an older store, when it was migrated). */
    public String storeId() {
        return storeId;
    }

    /** When the store recorded its id. */
    public Instant idRecordedAt() {
        return idRecordedAt;
    }

    @Override
    public void close() {
        try {
            connection.close();
        } catch (SQLException ignored) {
            // Nothing is pending: every write was committed or rolled back.
        }
    }

    /**
     * Closes the store; a new store made under a hidden name ({@link #openStaged}) is given its place, unless a
     * store appeared there meanwhile: that one is kept, and this one is removed and refused.
     */
    public void publish() {
        close();
        if (stagedFile == null) {
            return;
        }
        Path file = location.file();
        try {
            if (Files.exists(staged("-wal"))) {
                // Closing folds the log into the store and removes it: one left over would not follow the name.
                throw new java.io.IOException("its write-ahead log was not folded in");
            }
            try {
                // A hard link cannot replace a store that appeared at the place meanwhile; a move could.
                Files.createLink(file, stagedFile);
                Files.delete(stagedFile);
            } catch (UnsupportedOperationException | java.nio.file.FileSystemException e) {
                if (e instanceof java.nio.file.FileAlreadyExistsException) {
                    throw e;
                }
                Files.move(stagedFile, file);
            }
            // The rollback journal of a bulk load is left empty by its commit.
            Path journal = staged("-journal");
            if (Files.exists(journal) && Files.size(journal) == 0) {
                Files.delete(journal);
            }
            stagedFile = null;
        } catch (java.nio.file.FileAlreadyExistsException e) {
            removeStaged();
            throw new StoreException("history store " + location.shown() + " was created by another command while"
                    + " this one ran; nothing was recorded", null);
        } catch (java.io.IOException e) {
            removeStaged();
            throw new StoreException("cannot put the new history store in its place " + location.shown() + " ("
                    + e.getMessage() + "); nothing was recorded", null);
        }
    }

    /**
     * Closes the store and, when it is a new one made under a hidden name ({@link #openStaged}), removes it: a job
     * that failed leaves no new store behind. Any other store is only closed.
     */
    public void discardIfCreated() {
        close();
        removeStaged();
    }

    /** The hidden new store's file, or its journal, log or shared memory by their suffix. */
    private Path staged(String suffix) {
        return stagedFile.resolveSibling(stagedFile.getFileName() + suffix);
    }

    private void removeStaged() {
        if (stagedFile == null) {
            return;
        }
        for (String suffix : new String[] {"", "-journal", "-wal", "-shm"}) {
            try {
                Files.deleteIfExists(staged(suffix));
            } catch (java.io.IOException e) {
                // A hidden file left behind holds nothing anyone records into.
            }
        }
        stagedFile = null;
    }

    /**
     * The fewest records an append of many ({@link #appendEach(Iterable, long, Instant)}) writes as a bulk load into
     * this store now: {@link #BULK}, or as many as the store holds if more; none on PostgreSQL, where records are
     * written one by one.
     */
    public long bulkLoadFrom() {
        if (postgres) {
            return Long.MAX_VALUE;
        }
        return read("count the records", () -> {
            Head head = lockedHead();
            // A store without its chain head is damaged; the append says so.
            return head == null ? BULK : Math.max(BULK, head.seq());
        });
    }

    private interface Work<T> {
        T run() throws SQLException;
    }

    /** What is done with each row of a query's result. */
    private interface EachRow {
        void accept(ResultSet row) throws SQLException;
    }

    /** Runs a query whose parameters are a supplier and, when not null, a part, handing it each row. */
    private void eachRow(String sql, String supplier, String part, EachRow each) throws SQLException {
        try (PreparedStatement query = connection.prepareStatement(sql)) {
            query.setString(1, supplier);
            if (part != null) {
                query.setString(2, part);
            }
            try (ResultSet result = query.executeQuery()) {
                while (result.next()) {
                    each.accept(result);
                }
            }
        }
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
        } catch (SQLException | RuntimeException | Error e) {
            // An Error too (a load's thread out of memory): the transaction ends here, not at the connection's close.
            try {
                if (postgres) {
                    connection.rollback();
                } else {
                    execute("ROLLBACK");
                }
            } catch (SQLException ignored) {
                // The original failure is the one worth reporting (there may be no transaction to roll back).
            }
            if (e instanceof Error error) {
                throw error;
            }
            if (e instanceof StoreException store) {
                throw store;
            }
            // The driver's exception is not chained: its message may quote the URL with its password.
            throw new StoreException("history store " + location.shown() + ": cannot " + what + " ("
                    + location.scrub(firstLine((Exception) e)) + ")", null);
        }
    }

    // ---- schema and migrations ----

    private void migrate(int targetVersion, boolean mayCreate) {
        transaction("migrate the schema", () -> {
            try (Statement statement = connection.createStatement()) {
                if (postgres) {
                    statement.execute("SELECT pg_advisory_xact_lock(2859)");
                }
            }
            boolean exists = tableExists("lotgate_schema");
            if (!exists && !mayCreate) {
                throw new StoreException.Missing("history store " + location.shown() + " does not exist (it holds"
                        + " no lotgate history)");
            }
            if (!exists) {
                execute("CREATE TABLE lotgate_schema (version INTEGER NOT NULL)");
                execute("INSERT INTO lotgate_schema (version) VALUES (0)");
                created = true;
            }
            int version = schemaVersion();
            if (version > SCHEMA_VERSION) {
                throw new StoreException("history store " + location.shown() + " has schema version " + version
                        + ", newer than this lotgate reads (" + SCHEMA_VERSION + "); use a newer lotgate");
            }
            for (int next = version + 1; next <= targetVersion; next++) {
                Migrations.apply(next, connection, postgres);
                try (PreparedStatement update = connection.prepareStatement("UPDATE lotgate_schema SET version = ?")) {
                    update.setInt(1, next);
                    update.executeUpdate();
                }
            }
            this.version = Math.max(version, targetVersion);
            if (this.version >= 3) {
                try (Statement statement = connection.createStatement();
                        ResultSet identity = statement.executeQuery("SELECT id, recorded_at, genesis FROM lotgate_store")) {
                    if (identity.next()) {
                        storeId = identity.getString(1);
                        idRecordedAt = Instant.parse(identity.getString(2));
                        genesis = identity.getString(3);
                    }
                }
            }
            return null;
        });
    }

    private boolean tableExists(String table) throws SQLException {
        String sql = postgres ? "SELECT to_regclass(?) IS NOT NULL"
                : "SELECT COUNT(*) > 0 FROM sqlite_master WHERE type = 'table' AND name = ?";
        try (PreparedStatement query = connection.prepareStatement(sql)) {
            query.setString(1, table);
            try (ResultSet result = query.executeQuery()) {
                return result.next() && result.getBoolean(1);
            }
        }
    }

    /** The store's schema version (0 for a new store). */
    public int schemaVersion() {
        try (Statement statement = connection.createStatement();
                ResultSet rows = statement.executeQuery("SELECT version FROM lotgate_schema")) {
            return rows.next() ? rows.getInt(1) : 0;
        } catch (SQLException e) {
            throw new StoreException("history store " + location.shown() + ": cannot read the schema version", null);
        }
    }

    /** The hash a new store's first record links to: derived from its id, so that the id cannot be swapped. */
    static String genesisOf(String storeId) {
        return CanonicalJson.sha256("lotgate history store\n" + storeId);
    }

    /** The key that holds a lot to one current record: the hash of its supplier, part and lot id. */
    static String lotKey(String supplier, String part, String lot) {
        return CanonicalJson.sha256(CanonicalJson.textArray(supplier, part, lot));
    }

    // ---- writing ----

    /** The lot key taken by another record: the transaction is rolled back, then the holder is looked up. */
    private static final class KeyTaken extends StoreException {
        final String key;
        final JsonNode content;

        KeyTaken(String key, JsonNode content) {
            super("lot already recorded");
            this.key = key;
            this.content = content;
        }
    }

    /** The work before the commit failed: the transaction is rolled back and its own exception passed on. */
    /** What the contents of an append threw (a list being checked as it is read), passed on as it is. */
    private static final class ContentsFailed extends StoreException {
        ContentsFailed(RuntimeException cause) {
            super("the records' contents failed", cause);
        }
    }

    private static final class BeforeCommitFailed extends StoreException {
        BeforeCommitFailed(RuntimeException cause) {
            super("the work before the commit failed", cause);
        }
    }

    /**
     * Appends a record in one transaction, chained to the last one.
     *
     * @param content the record's content: kind, supplier, part, lot and the rest (see {@link RecordContent})
     */
    public StoredRecord append(ObjectNode content, Instant recordedAt) {
        return appendAll(List.of(content), recordedAt).get(0);
    }

    /**
     * Appends a record and, before committing it, hands its place in the chain to {@code beforeCommit}
     * (which renders and stages the outputs that show it); if that fails, nothing is recorded.
     */
    public StoredRecord append(ObjectNode content, Instant recordedAt,
            java.util.function.Consumer<StoredRecord> beforeCommit) {
        return appendAll(List.of(content), recordedAt, stored -> beforeCommit.accept(stored.get(0))).get(0);
    }

    /**
     * Appends several records in one transaction: all of them, or none. Refuses, recording nothing, when
     * the chain's head no longer matches its last record (the store was damaged: see {@link #verify}), when
     * an id holds a control character, and when a lot is already recorded and not superseded.
     */
    public List<StoredRecord> appendAll(List<ObjectNode> contents, Instant recordedAt) {
        return appendAll(contents, recordedAt, stored -> { });
    }

    /** Appends several records in one transaction, calling {@code beforeCommit} with them before the commit. */
    public List<StoredRecord> appendAll(List<ObjectNode> contents, Instant recordedAt,
            java.util.function.Consumer<List<StoredRecord>> beforeCommit) {
        for (ObjectNode content : contents) {
            String problem = identifierProblem(content);
            if (problem != null) {
                throw new StoreException("history store " + location.shown() + ": " + problem
                        + " (nothing was recorded)");
            }
        }
        List<StoredRecord> stored = new ArrayList<>();
        append(contents, recordedAt, stored::add, () -> beforeCommit.accept(stored), 0);
        return stored;
    }

    /**
     * Appends many records in one transaction, all or none, as {@link #appendAll} does, taking each content
     * from the iterator as it goes and keeping none of them: memory stays flat however many there are.
     *
     * @return how many records were appended
     */
    public long appendEach(Iterable<ObjectNode> contents, Instant recordedAt) {
        return appendEach(contents, 0, recordedAt);
    }

    /**
     * Appends many records as {@link #appendEach(Iterable, Instant)} does, told how many there will be at least
     * ({@code expected}; a stream that is still being read may hold more). On SQLite,
     * records at least {@link #BULK} and at least as many as the store holds are written as a bulk load: with a
     * larger page cache, and the store's own indexes (but a partial one) dropped at the start of the transaction
     * and created again before its commit (in one sorted pass each, where inserting keys one by one would touch
     * pages all over the index). Readers never see the store without them, and a lot recorded twice is still
     * refused, by the unique index's creation. Any load of at least {@link #BULK} records is written through a
     * rollback journal when no other connection has the store open (see {@link #rollbackJournal}).
     */
    public long appendEach(Iterable<ObjectNode> contents, long expected, Instant recordedAt) {
        if (postgres || expected < BULK) {
            return append(contents, recordedAt, stored -> { }, () -> { }, 0);
        }
        int cache = pragma("cache_size");
        boolean journal = rollbackJournal();
        try {
            execute("PRAGMA cache_size = " + BULK_CACHE);
            return append(contents, recordedAt, stored -> { }, () -> { }, expected);
        } catch (SQLException e) {
            throw new StoreException("history store " + location.shown() + ": cannot size the page cache ("
                    + location.scrub(firstLine(e)) + ")", null);
        } finally {
            try {
                execute("PRAGMA cache_size = " + cache);
            } catch (SQLException ignored) {
                // The connection is closed by the caller; its cache goes with it.
            }
            if (journal) {
                journalMode("WAL");
            }
        }
    }

    /**
     * Puts the store in rollback-journal mode (TRUNCATE) for a bulk load, and tells whether it did. In the store's
     * usual write-ahead log, each page of a load is written twice, to the log at the commit and again into the
     * store when the log is folded in; a rollback journal holds only the pages the load changes of those the store
     * had, so a load into a new store writes each page once (100,000 lots: 83 MB written instead of 174). The
     * commit is as durable: with synchronous=FULL, SQLite syncs the journal before it writes into the store, the
     * store before it empties the journal, and the emptied journal. SQLite leaves the log only when no other
     * connection has the store open: otherwise the load goes on in the log. A connection opened during the load
     * waits for its commit (the busy timeout); a load killed before its commit is rolled back from the journal by
     * the next opening, which puts the store back in the log's mode as every opening does.
     */
    private boolean rollbackJournal() {
        return "truncate".equals(journalMode("TRUNCATE"));
    }

    /** Sets SQLite's journal mode and returns the mode in force (lower case), or null when it could not be set. */
    private String journalMode(String mode) {
        try (Statement statement = connection.createStatement();
                ResultSet result = statement.executeQuery("PRAGMA journal_mode = " + mode)) {
            return result.next() ? result.getString(1).toLowerCase(java.util.Locale.ROOT) : null;
        } catch (SQLException e) {
            // Another connection holds the store, or the mode could not be changed back: the next opening sets it.
            return null;
        }
    }

    /** The fewest records an append writes as a bulk load (see {@link #appendEach(Iterable, long, Instant)}). */
    public static final long BULK = 1000;
    /**
     * SQLite's page cache during a bulk load, in kibibytes (negative: a size, not a page count); native memory, taken
     * as pages are used. 100,000 lots fill 83 MB: with 64 MB, creating each index read the table back from the file.
     */
    private static final int BULK_CACHE = -131072;

    private int pragma(String name) {
        try (Statement statement = connection.createStatement();
                ResultSet value = statement.executeQuery("PRAGMA " + name)) {
            return value.next() ? value.getInt(1) : 0;
        } catch (SQLException e) {
            throw new StoreException("history store " + location.shown() + ": cannot read " + name + " ("
                    + location.scrub(firstLine(e)) + ")", null);
        }
    }

    private static String identifierProblem(ObjectNode content) {
        for (String field : new String[] {"supplier", "part", "lot", "inspector"}) {
            String problem = Identifiers.problem(field, Migrations.text(content, field));
            if (problem != null) {
                return problem;
            }
        }
        return null;
    }

    /**
     * Appends records in one transaction, handing each to {@code each} and calling {@code beforeCommit} before the
     * commit; {@code bulk} is the number of records of a bulk load on SQLite (0: lot by lot), whose indexes are
     * created after the records when there are at least {@link #BULK} and at least as many as the store holds.
     */
    private long append(Iterable<ObjectNode> contents, Instant recordedAt,
            java.util.function.Consumer<StoredRecord> each, Runnable beforeCommit, long bulk) {
        try {
            return transaction("record the lots", () -> {
                Head head = lockedHead();
                String damage = headProblem(head);
                if (damage != null) {
                    throw new StoreException("history store " + location.shown() + " is damaged: " + damage
                            + "; nothing was recorded. Run 'lotgate verify --store " + location.shown() + "' to find"
                            + " the damage");
                }
                long first = head.seq();
                long last = first;
                String previous = head.hash();
                List<String> indexes = bulk >= BULK && bulk >= first ? dropIndexes() : List.of();
                try (Migrations.RecordInserter inserter = new Migrations.RecordInserter(connection, version,
                        !indexes.isEmpty());
                        MadeAhead<Made> made = new MadeAhead<>(passingOn(contents.iterator()), new Maker(first, previous,
                                recordedAt.toString(), inserter), bulk >= BULK)) {
                    while (made.hasNext()) {
                        Made record = made.next();
                        if (record.supersedes() > 0) {
                            inserter.flush();
                            release(record.supersedes());
                        }
                        try {
                            inserter.insert(record.row());
                        } catch (SQLException e) {
                            if (record.key() != null && uniqueViolation(e)) {
                                throw new KeyTaken(record.key(), record.row().content());
                            }
                            throw e;
                        }
                        each.accept(new StoredRecord(record.row().seq(), recordedAt, record.text(), previous,
                                record.hash()));
                        last = record.row().seq();
                        previous = record.hash();
                    }
                    inserter.flush();
                }
                createIndexes(indexes);
                try (PreparedStatement update = connection.prepareStatement("UPDATE chain_head SET seq = ?, hash = ?"
                        + " WHERE id = 1")) {
                    update.setLong(1, last);
                    update.setString(2, previous);
                    update.executeUpdate();
                }
                try {
                    beforeCommit.run();
                } catch (RuntimeException e) {
                    throw new BeforeCommitFailed(e);
                }
                return last - first;
            });
        } catch (BeforeCommitFailed | ContentsFailed failed) {
            throw (RuntimeException) failed.getCause();
        } catch (KeyTaken taken) {
            long holder = holderOf(taken.key);
            throw new StoreException.DuplicateLot("lot " + Migrations.text(taken.content, "lot") + " of "
                    + Migrations.text(taken.content, "supplier") + ", part " + Migrations.text(taken.content, "part")
                    + " is already recorded as #" + holder + " in " + location.shown() + " (nothing was recorded)",
                    holder);
        }
    }

    /** The contents, whatever they throw (but a store's failure) passed on to the caller as it is. */
    private static Iterator<ObjectNode> passingOn(Iterator<ObjectNode> contents) {
        return new Iterator<>() {
            @Override
            public boolean hasNext() {
                return passedOn(contents::hasNext);
            }

            @Override
            public ObjectNode next() {
                return passedOn(contents::next);
            }
        };
    }

    private static <T> T passedOn(java.util.function.Supplier<T> step) {
        try {
            return step.get();
        } catch (StoreException e) {
            throw e;
        } catch (RuntimeException e) {
            throw new ContentsFailed(e);
        }
    }

    /** A record made ready to be written: its row, canonical text, chain hash, lot key, and the record it corrects. */
    private record Made(Migrations.RecordInserter.Row row, String text, String hash, String key, long supersedes) {
    }

    /**
     * Makes each content into the record that follows the one before it in the chain. It touches no connection, so
     * that a bulk load runs it on a thread of its own ({@link MadeAhead}) while the records before are written.
     */
    private final class Maker implements java.util.function.Function<ObjectNode, Made> {
        private final String recordedAt;
        private final Migrations.RecordInserter inserter;
        private long seq;
        private String previous;

        Maker(long seq, String previous, String recordedAt, Migrations.RecordInserter inserter) {
            this.seq = seq;
            this.previous = previous;
            this.recordedAt = recordedAt;
            this.inserter = inserter;
        }

        @Override
        public Made apply(ObjectNode content) {
            String problem = identifierProblem(content);
            if (problem != null) {
                throw new StoreException("history store " + location.shown() + ": " + problem + " (nothing was recorded)");
            }
            String text = CanonicalJson.text(content);
            seq++;
            String hash = StoredRecord.hashOf(previous, seq, recordedAt, text);
            String key = null;
            long supersedes = 0;
            if (version >= 3 && "lot".equals(Migrations.text(content, "kind"))) {
                key = lotKey(Migrations.text(content, "supplier"), Migrations.text(content, "part"),
                        Migrations.text(content, "lot"));
                supersedes = content.path("supersedes").asLong(0);
            }
            Made made = new Made(inserter.row(seq, recordedAt, text, content, previous, hash, key), text, hash, key,
                    supersedes);
            previous = hash;
            return made;
        }
    }

    /**
     * Drops the indexes of the records and their defect counts, returning the statements that create them. A partial
     * index (the corrections') is kept: a load's records seldom enter it, and creating it again would read the whole
     * table for them.
     */
    private List<String> dropIndexes() throws SQLException {
        List<String[]> indexes = new ArrayList<>();
        try (Statement statement = connection.createStatement();
                ResultSet result = statement.executeQuery("SELECT name, sql FROM sqlite_master WHERE type = 'index'"
                        + " AND tbl_name IN ('lot_record', 'defect_count') AND sql IS NOT NULL"
                        + " AND sql NOT LIKE '% WHERE %' ORDER BY name")) {
            while (result.next()) {
                indexes.add(new String[] {result.getString(1), result.getString(2)});
            }
        }
        List<String> creations = new ArrayList<>();
        for (String[] index : indexes) {
            execute("DROP INDEX \"" + index[0].replace("\"", "\"\"") + "\"");
            creations.add(index[1]);
        }
        return creations;
    }

    /**
     * Creates the dropped indexes again with the statements they were created by. The unique lot key's index
     * refuses a lot recorded twice as a lot-by-lot append would: the first record, in chain order, whose key a
     * record before it holds.
     */
    private void createIndexes(List<String> creations) throws SQLException {
        for (String creation : creations) {
            try {
                execute(creation);
            } catch (SQLException e) {
                if (!uniqueViolation(e)) {
                    throw e;
                }
                KeyTaken taken = firstTakenKey();
                if (taken == null) {
                    throw e;
                }
                throw taken;
            }
        }
    }

    private KeyTaken firstTakenKey() throws SQLException {
        java.util.Set<String> held = new java.util.HashSet<>();
        try (Statement statement = connection.createStatement();
                ResultSet result = statement.executeQuery("SELECT seq, lot_key, content FROM lot_record WHERE lot_key IN"
                        + " (SELECT lot_key FROM lot_record WHERE lot_key IS NOT NULL GROUP BY lot_key HAVING COUNT(*) > 1)"
                        + " ORDER BY seq")) {
            while (result.next()) {
                if (!held.add(result.getString(2))) {
                    return new KeyTaken(result.getString(2), json(result.getLong(1), result.getString(3)));
                }
            }
        }
        return null;
    }

    private boolean uniqueViolation(SQLException e) {
        if (postgres) {
            return "23505".equals(e.getSQLState());
        }
        // SQLITE_CONSTRAINT_UNIQUE is 2067; the driver reports the primary code 19 with the name in its message.
        return e.getErrorCode() == 19 || e.getErrorCode() == 2067 || String.valueOf(e.getMessage())
                .contains("UNIQUE constraint failed: lot_record.lot_key");
    }

    /** The record that holds a lot key now, or 0. */
    private long holderOf(String key) {
        return read("find the lot's record", () -> {
            try (PreparedStatement query = connection.prepareStatement("SELECT seq FROM lot_record WHERE lot_key = ?")) {
                query.setString(1, key);
                try (ResultSet result = query.executeQuery()) {
                    return result.next() ? result.getLong(1) : 0L;
                }
            }
        });
    }

    /** A correction takes over its lot: the record it supersedes gives up the lot's key. */
    private void release(long superseded) throws SQLException {
        try (PreparedStatement update = connection.prepareStatement("UPDATE lot_record SET lot_key = NULL"
                + " WHERE seq = ? AND lot_key IS NOT NULL")) {
            update.setLong(1, superseded);
            if (update.executeUpdate() != 1) {
                throw new StoreException("history store " + location.shown() + ": record " + superseded + " is not"
                        + " the current record of a lot (it was already corrected, or is not a lot); supersede its"
                        + " latest correction instead (nothing was recorded)");
            }
        }
    }

    /** The chain head, locked for this transaction. */
    private Head lockedHead() throws SQLException {
        try (Statement statement = connection.createStatement();
                ResultSet head = statement.executeQuery("SELECT seq, hash FROM chain_head WHERE id = 1"
                        + (postgres ? " FOR UPDATE" : ""))) {
            if (!head.next()) {
                return null;
            }
            return new Head(head.getLong(1), head.getString(2));
        }
    }

    /**
     * What is wrong at the end of the chain, or null: in constant time, the head must name the last record,
     * whose hash (recomputed from its content) and columns must match; no record may follow it.
     */
    private String headProblem(Head head) throws SQLException {
        if (head == null) {
            return "its chain head is missing";
        }
        try (PreparedStatement after = connection.prepareStatement("SELECT seq FROM lot_record WHERE seq > ?"
                + " ORDER BY seq LIMIT 1")) {
            after.setLong(1, head.seq());
            try (ResultSet result = after.executeQuery()) {
                if (result.next()) {
                    return "record " + result.getLong(1) + " follows the chain head (record " + head.seq() + ")";
                }
            }
        }
        if (head.seq() == 0) {
            return head.hash().equals(genesis) ? null : "the chain head no longer matches the store's start";
        }
        try (PreparedStatement query = connection.prepareStatement("SELECT " + Migrations.columns(version)
                + " FROM lot_record WHERE seq = ?")) {
            query.setLong(1, head.seq());
            try (ResultSet row = query.executeQuery()) {
                if (!row.next()) {
                    return "the last record " + head.seq() + ", named by the chain head, is missing";
                }
                String content = row.getString(3);
                String hash = StoredRecord.hashOf(row.getString(4), head.seq(), Instant.parse(row.getString(2)),
                        content);
                if (!hash.equals(row.getString(5)) || !hash.equals(head.hash())) {
                    return "the last record " + head.seq() + " no longer matches its hash or the chain head";
                }
                String mismatch = Migrations.columnsMismatch(row, version, json(head.seq(), content));
                if (mismatch != null) {
                    return "column " + mismatch + " of the last record " + head.seq() + " no longer matches its content";
                }
            }
        }
        return null;
    }

    private static JsonNode json(long seq, String content) {
        return new StoredRecord(seq, null, content, null, null).json();
    }

    // ---- reading ----

    /** The lots and actions of a supplier (all when null) and part (all when null), in record order. */
    public List<LotRow> rows(String supplier, String part) {
        StringBuilder sql = new StringBuilder("SELECT " + rowColumns() + " FROM lot_record WHERE 1 = 1");
        List<String> values = ofSupplierAndPart(sql, supplier, part);
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

    /** The columns {@link #row} reads, in its order. */
    private String rowColumns() {
        return "seq, recorded_at, kind, supplier, part, lot, lot_size, received, verdict, inspected, nonconforming,"
                + " severity, production, supersedes, hash, " + (version >= 4 ? "reinstates" : "0");
    }

    /**
     * What an audit reads of one supplier and part, in one snapshot.
     *
     * @param rows         the records, as {@link #rows} lists them
     * @param defectsByLot each lot's defect counts, as {@link #defectTypesByLot} reads them
     * @param measured     the lots judged on measurements, as {@link #measuredLots} reads them
     * @param contents     the content of each lot not accepted or judged on measurements, by sequence number
     */
    public record AuditReading(List<LotRow> rows, Map<Long, Map<String, Long>> defectsByLot,
            List<MeasurementCharts.Row> measured, Map<Long, String> contents) {
        /** The content of a lot that was not accepted (its decision record holds the evidence). */
        public JsonNode content(long seq) {
            return new StoredRecord(seq, null, contents.get(seq), null, null).json();
        }
    }

    /**
     * Reads what an audit of a supplier (not null) and part (null: all) needs in one transaction: its records with
     * the content of the lots the audit shows more of in the same pass, then its lots' defect counts. The content
     * of a rejected lot used to be read by a query of its own, and the measured lots by a second pass.
     */
    public AuditReading auditReading(String supplier, String part) {
        StringBuilder sql = new StringBuilder("SELECT " + rowColumns() + ", CASE WHEN kind = 'lot' AND (verdict IS NULL"
                + " OR verdict <> 'accept' OR content LIKE ?) THEN content END, CASE WHEN kind = 'lot' AND content"
                + " LIKE ? THEN 1 ELSE 0 END FROM lot_record WHERE 1 = 1");
        List<String> values = ofSupplierAndPart(sql, supplier, part);
        sql.append(" ORDER BY seq");
        return read("read the supplier's lots", () -> {
            List<LotRow> rows = new ArrayList<>();
            List<MeasurementCharts.Row> measured = new ArrayList<>();
            Map<Long, String> contents = new HashMap<>();
            try (PreparedStatement query = connection.prepareStatement(sql.toString())) {
                query.setString(1, MEASURED_RECORDING);
                query.setString(2, MEASURED_RECORDING);
                for (int i = 0; i < values.size(); i++) {
                    query.setString(i + 3, values.get(i));
                }
                try (ResultSet result = query.executeQuery()) {
                    while (result.next()) {
                        LotRow row = row(result);
                        rows.add(row);
                        String content = result.getString(17);
                        if (content != null) {
                            contents.put(row.seq(), content);
                        }
                        MeasurementCharts.Row lot = result.getInt(18) == 0 ? null : measured(row.seq(), content);
                        if (lot != null) {
                            measured.add(lot);
                        }
                    }
                }
            }
            return new AuditReading(rows, defectsByLot(supplier, part), measured, contents);
        });
    }

    /** Whether the store holds any record of the supplier and part (null: any), as {@link #rows} would list. */
    public boolean holdsRecordsOf(String supplier, String part) {
        StringBuilder sql = new StringBuilder("SELECT 1 FROM lot_record WHERE 1 = 1");
        List<String> values = ofSupplierAndPart(sql, supplier, part);
        sql.append(" LIMIT 1");
        return read("read the lots", () -> {
            try (PreparedStatement query = connection.prepareStatement(sql.toString())) {
                for (int i = 0; i < values.size(); i++) {
                    query.setString(i + 1, values.get(i));
                }
                try (ResultSet result = query.executeQuery()) {
                    return result.next();
                }
            }
        });
    }

    /** Adds the conditions on supplier and part (null: any) to a query and returns the values they take. */
    private static List<String> ofSupplierAndPart(StringBuilder sql, String supplier, String part) {
        List<String> values = new ArrayList<>();
        if (supplier != null) {
            sql.append(" AND supplier = ?");
            values.add(supplier);
        }
        if (part != null) {
            sql.append(" AND part = ?");
            values.add(part);
        }
        return values;
    }

    private static LotRow row(ResultSet result) throws SQLException {
        String received = result.getString(8);
        return new LotRow(result.getLong(1), IsoText.instant(result.getString(2)), result.getString(3),
                result.getString(4), result.getString(5), result.getString(6), result.getInt(7),
                received == null ? null : IsoText.day(received), result.getString(9), result.getInt(10),
                result.getInt(11), result.getString(12), result.getString(13), result.getLong(14), result.getString(15),
                result.getInt(16) != 0);
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
                query.setString(index, MEASURED_RECORDING);
                try (ResultSet result = query.executeQuery()) {
                    while (result.next()) {
                        MeasurementCharts.Row row = measured(result.getLong(1), result.getString(2));
                        if (row != null) {
                            rows.add(row);
                        }
                    }
                }
            }
            return rows;
        });
    }

    /** What a lot judged on measurements records of it (a LIKE pattern over its content, which may miss). */
    private static final String MEASURED_RECORDING = "%\"recording\":\"measurements\"%";

    /** A lot's sample size, mean and standard deviation from its decision record, or null when it has none. */
    private static MeasurementCharts.Row measured(long seq, String text) {
        JsonNode content = new StoredRecord(seq, null, text, null, null).json();
        JsonNode measured = content.path("decision").path("measurement");
        if (measured.isMissingNode()) {
            return null;
        }
        String received = content.path("received").isTextual() ? content.path("received").asText() : null;
        return new MeasurementCharts.Row(seq, content.path("lot").asText(), received == null ? null
                : LocalDate.parse(received), measured.path("n").asInt(), measured.path("mean").asDouble(),
                measured.path("sampleStandardDeviation").asDouble(), measured.path("characteristic").asText(""),
                measured.path("unit").asText(""));
    }

    /** The record that holds a lot now (its latest correction, or the lot's only record), or 0 if none. */
    public long currentRecord(String supplier, String part, String lot) {
        if (version < 3) {
            return 0;
        }
        return holderOf(lotKey(supplier, part, lot));
    }

    /** The current records (not superseded) of a lot id, whatever the supplier and part, in record order. */
    public List<Long> currentRecords(String lot) {
        if (version < 3) {
            return List.of();
        }
        return read("find the lot's records", () -> {
            List<Long> seqs = new ArrayList<>();
            try (PreparedStatement query = connection.prepareStatement("SELECT seq FROM lot_record WHERE lot = ?"
                    + " AND lot_key IS NOT NULL ORDER BY seq")) {
                query.setString(1, lot);
                try (ResultSet result = query.executeQuery()) {
                    while (result.next()) {
                        seqs.add(result.getLong(1));
                    }
                }
            }
            return seqs;
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
        // A lot's current record holds its key (a correction takes it over): one look-up by seq per count,
        // where a superseded-record subquery would scan the whole table.
        String sql = version >= 3
                ? "SELECT d.defect, SUM(d.units) AS total FROM defect_count d JOIN lot_record r ON r.seq = d.seq"
                        + " WHERE d.supplier = ?" + (part == null ? "" : " AND d.part = ?")
                        + " AND r.lot_key IS NOT NULL GROUP BY d.defect ORDER BY total DESC, d.defect"
                : "SELECT defect, SUM(units) AS total FROM defect_count WHERE supplier = ?"
                        + (part == null ? "" : " AND part = ?")
                        + " AND seq NOT IN (SELECT supersedes FROM lot_record WHERE supersedes > 0)"
                        + " GROUP BY defect ORDER BY total DESC, defect";
        return read("read the defect types", () -> {
            Map<String, Long> types = new LinkedHashMap<>();
            eachRow(sql, supplier, part, result -> types.put(result.getString(1), result.getLong(2)));
            return types;
        });
    }

    /**
     * Each effective lot's defect type counts, by record sequence number, for one supplier (and part): an audit
     * of a period sums those of the period's lots.
     */
    public Map<Long, Map<String, Long>> defectTypesByLot(String supplier, String part) {
        return read("read the defect types", () -> defectsByLot(supplier, part));
    }

    private Map<Long, Map<String, Long>> defectsByLot(String supplier, String part) throws SQLException {
        // The partial index of the corrections (schema 5) keeps the subquery from reading every record.
        String sql = "SELECT seq, defect, units FROM defect_count WHERE supplier = ?"
                + (part == null ? "" : " AND part = ?")
                + " AND seq NOT IN (SELECT supersedes FROM lot_record WHERE supersedes > 0)";
        Map<Long, Map<String, Long>> byLot = new HashMap<>();
        eachRow(sql, supplier, part, result -> byLot.computeIfAbsent(result.getLong(1),
                k -> new LinkedHashMap<>()).merge(result.getString(2), result.getLong(3), Long::sum));
        return byLot;
    }

    /** One supplier's totals over its effective lots (corrections replace what they supersede). */
    public record SupplierTotals(String supplier, long lots, long rejected, long inspected, long nonconforming) {
    }

    /** Totals per supplier, by the store's own aggregation. */
    public List<SupplierTotals> supplierTotals() {
        // SQLite would otherwise walk the supplier index and fetch each record in its order; reading the table in
        // its own order and grouping as it goes takes half the time (100,000 lots: 110 to 170 ms instead of 260).
        String sql = "SELECT supplier, COUNT(*), SUM(CASE WHEN verdict = 'reject' THEN 1 ELSE 0 END), SUM(inspected),"
                + " SUM(nonconforming) FROM lot_record" + (postgres ? "" : " NOT INDEXED") + " WHERE kind = 'lot'"
                + (version >= 3 ? " AND lot_key IS NOT NULL"
                        : " AND seq NOT IN (SELECT supersedes FROM lot_record WHERE supersedes > 0)")
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

    /**
     * The outcome of checking the whole store: intact, or the first record that was altered or removed.
     *
     * @param records the records checked and found intact (all of them when intact)
     * @param head    the last record's place and hash, to keep elsewhere (null when damaged)
     * @param storeId the store's random id
     */
    public record Verification(boolean intact, long records, String problem, Head head, String storeId) {
    }

    /** Checks the whole store (see {@link #verify(List)}) with no kept heads. */
    public Verification verify() {
        return verify(List.of());
    }

    /**
     * Recomputes every hash and link; checks every column that queries read and every defect-count row
     * against each record's content, the lot keys against the records' order, the chain head against the
     * last record, and that each kept head (a place and hash copied from an earlier output) is still in
     * the chain: a store cut short, replaced or rewritten after the head was kept fails here.
     */
    public Verification verify(List<Head> kept) {
        return read("verify the chain", () -> {
            if (version >= 3 && !genesis.equals(GENESIS) && !genesis.equals(genesisOf(storeId))) {
                return new Verification(false, 0, "the store's id no longer matches the start of its chain",
                        null, storeId);
            }
            Map<Long, List<String>> defects = defectRows();
            Map<String, Long> keyHolder = new HashMap<>();
            Map<Long, String> heldKey = new HashMap<>();
            Map<Long, String> storedKeys = new TreeMap<>();
            long expected = 1;
            String previous = version >= 3 ? genesis : GENESIS;
            try (Statement statement = connection.createStatement();
                    ResultSet result = statement.executeQuery("SELECT " + Migrations.columns(version)
                            + " FROM lot_record ORDER BY seq")) {
                while (result.next()) {
                    long seq = result.getLong(1);
                    if (seq != expected) {
                        return damaged(expected - 1, seq > expected
                                ? "record " + expected + (seq == expected + 1 ? " was" : " to " + (seq - 1) + " were")
                                        + " removed (the chain goes on at record " + seq + ")"
                                : "record " + seq + " appears twice");
                    }
                    String content = result.getString(3);
                    if (!previous.equals(result.getString(4))) {
                        return damaged(seq - 1, "record " + seq + " no longer links to "
                                + (seq == 1 ? "the start of the store's chain" : "record " + (seq - 1))
                                + ": a record before it was altered or replaced");
                    }
                    String hash = StoredRecord.hashOf(previous, seq, Instant.parse(result.getString(2)), content);
                    if (!hash.equals(result.getString(5))) {
                        return damaged(seq - 1, "record " + seq + " was altered: its content no longer matches its"
                                + " hash");
                    }
                    JsonNode json = json(seq, content);
                    String mismatch = Migrations.columnsMismatch(result, version, json);
                    if (mismatch != null) {
                        return damaged(seq - 1, "record " + seq + " was altered: column " + mismatch
                                + " no longer matches its content");
                    }
                    if (version >= 2 && !Migrations.defectRows(json).equals(defects.getOrDefault(seq, List.of()))) {
                        return damaged(seq - 1, "record " + seq + " was altered: its defect counts (table"
                                + " defect_count) no longer match its content");
                    }
                    defects.remove(seq);
                    if (version >= 3) {
                        Migrations.claimKey(seq, json, keyHolder, heldKey);
                        String stored = result.getString(Migrations.LOT_KEY_COLUMN);
                        if (stored != null) {
                            storedKeys.put(seq, stored);
                        }
                    }
                    previous = hash;
                    expected++;
                }
            }
            long last = expected - 1;
            for (Map.Entry<Long, String> entry : storedKeys.entrySet()) {
                if (!entry.getValue().equals(heldKey.get(entry.getKey()))) {
                    return damaged(entry.getKey() - 1, "record " + entry.getKey() + " was altered: column lot_key no"
                            + " longer matches the records' content");
                }
            }
            for (Map.Entry<Long, String> entry : new TreeMap<>(heldKey).entrySet()) {
                if (!storedKeys.containsKey(entry.getKey())) {
                    return damaged(entry.getKey() - 1, "record " + entry.getKey() + " was altered: column lot_key no"
                            + " longer matches the records' content");
                }
            }
            Head head = lockedHead();
            if (head == null) {
                return damaged(last, "its chain head is missing");
            }
            if (head.seq() != last || !head.hash().equals(previous)) {
                return damaged(last, head.seq() > last
                        ? "the last " + (head.seq() - last == 1 ? "record was" : head.seq() - last + " records were")
                                + " removed (the chain head names record "
                                + head.seq() + ", the store ends at record " + last + ")"
                        : "the chain head does not match the last record " + last);
            }
            if (!defects.isEmpty()) {
                long seq = defects.keySet().iterator().next();
                return damaged(Math.min(last, seq - 1), "table defect_count holds defect counts for record " + seq
                        + (seq > last ? ", which is not in the store" : ", which has none"));
            }
            for (Head keptHead : kept) {
                String problem = keptHeadProblem(keptHead, last);
                if (problem != null) {
                    return damaged(last, problem);
                }
            }
            return new Verification(true, last, null, new Head(last, previous), storeId);
        });
    }

    private Verification damaged(long intactRecords, String problem) {
        return new Verification(false, intactRecords, problem, null, storeId);
    }

    private String keptHeadProblem(Head kept, long last) throws SQLException {
        if (kept.seq() == 0) {
            return kept.hash().equals(version >= 3 ? genesis : GENESIS) ? null
                    : "the kept head " + kept + " is not the start of this store's chain: the store was replaced";
        }
        if (kept.seq() > last) {
            return "the kept head " + kept + " names record " + kept.seq() + ", but the store ends at record " + last
                    + ": records were removed from its end, or the store was replaced";
        }
        try (PreparedStatement query = connection.prepareStatement("SELECT hash FROM lot_record WHERE seq = ?")) {
            query.setLong(1, kept.seq());
            try (ResultSet result = query.executeQuery()) {
                result.next();
                String hash = result.getString(1);
                return MessageDigest.isEqual(hash.getBytes(java.nio.charset.StandardCharsets.US_ASCII),
                        kept.hash().getBytes(java.nio.charset.StandardCharsets.US_ASCII)) ? null
                        : "record " + kept.seq() + " no longer has the kept hash " + kept.hash() + " (it has " + hash
                                + "): the chain was rewritten or replaced since that head was kept";
            }
        }
    }

    /** Every defect-count row, as text per record, sorted the way {@link Migrations#defectRows} sorts them. */
    private Map<Long, List<String>> defectRows() throws SQLException {
        Map<Long, List<String>> rows = new TreeMap<>();
        if (version < 2) {
            return rows;
        }
        try (Statement statement = connection.createStatement();
                ResultSet result = statement.executeQuery("SELECT seq, supplier, part, defect, units FROM defect_count")) {
            while (result.next()) {
                rows.computeIfAbsent(result.getLong(1), k -> new ArrayList<>()).add(Migrations.defectRow(
                        result.getString(2), result.getString(3), result.getString(4), result.getLong(5)));
            }
        }
        rows.values().forEach(java.util.Collections::sort);
        return rows;
    }
}
