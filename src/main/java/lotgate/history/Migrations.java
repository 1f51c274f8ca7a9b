package lotgate.history;

import com.fasterxml.jackson.databind.JsonNode;
import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.Instant;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.UUID;

/**
 * The store's versioned schema. Each version is a step applied in the opening transaction, in order,
 * and recorded in {@code lotgate_schema}; a store newer than the last step is refused. Steps never
 * change a record's content or hash: they add tables and columns, and fill them from the content.
 *
 * <ol>
 * <li>the records and the chain head;
 * <li>the severity and production columns, and the defect counts per record for the audit;
 * <li>the store's identity (a random id, to which a new store's chain is anchored) and the lot key,
 * unique among records, that holds each lot (supplier, part, lot id) to one current record;
 * <li>the column that marks a lot accepted with a count between a reduced plan's acceptance and rejection
 * numbers, which reinstates normal inspection;
 * <li>an index of the corrections by the record each supersedes, so that finding a supplier's superseded
 * records reads the corrections only, not every record of the store.
 * </ol>
 */
final class Migrations {
    private Migrations() {
    }

    static void apply(int version, Connection connection, boolean postgres) throws SQLException {
        switch (version) {
            case 1 -> version1(connection);
            case 2 -> version2(connection);
            case 3 -> version3(connection);
            case 4 -> version4(connection);
            case 5 -> version5(connection);
            default -> throw new IllegalArgumentException("no schema version " + version);
        }
    }

    private static void version1(Connection connection) throws SQLException {
        try (Statement statement = connection.createStatement()) {
            statement.execute("CREATE TABLE lot_record ("
                    + " seq BIGINT PRIMARY KEY,"
                    + " recorded_at TEXT NOT NULL,"
                    + " kind TEXT NOT NULL,"
                    + " supplier TEXT NOT NULL,"
                    + " part TEXT NOT NULL,"
                    + " lot TEXT NOT NULL,"
                    + " lot_size INTEGER NOT NULL,"
                    + " received TEXT,"
                    + " verdict TEXT,"
                    + " inspected INTEGER NOT NULL,"
                    + " nonconforming INTEGER NOT NULL,"
                    + " supersedes BIGINT NOT NULL,"
                    + " content TEXT NOT NULL,"
                    + " previous_hash TEXT NOT NULL,"
                    + " hash TEXT NOT NULL)");
            statement.execute("CREATE TABLE chain_head (id INTEGER PRIMARY KEY, seq BIGINT NOT NULL, hash TEXT NOT NULL)");
            statement.execute("INSERT INTO chain_head (id, seq, hash) VALUES (1, 0, '" + HistoryStore.GENESIS + "')");
            statement.execute("CREATE INDEX lot_record_supplier ON lot_record (supplier, part, seq)");
        }
    }

    private static void version2(Connection connection) throws SQLException {
        try (Statement statement = connection.createStatement()) {
            statement.execute("ALTER TABLE lot_record ADD COLUMN severity TEXT");
            statement.execute("ALTER TABLE lot_record ADD COLUMN production TEXT");
            statement.execute("CREATE TABLE defect_count (seq BIGINT NOT NULL, supplier TEXT NOT NULL,"
                    + " part TEXT NOT NULL, defect TEXT NOT NULL, units BIGINT NOT NULL)");
            statement.execute("CREATE INDEX defect_count_supplier ON defect_count (supplier, part)");
        }
        List<long[]> seqs = new ArrayList<>();
        List<String> contents = new ArrayList<>();
        try (Statement statement = connection.createStatement();
                ResultSet rows = statement.executeQuery("SELECT seq, content FROM lot_record ORDER BY seq")) {
            while (rows.next()) {
                seqs.add(new long[] {rows.getLong(1)});
                contents.add(rows.getString(2));
            }
        }
        try (PreparedStatement update = connection.prepareStatement("UPDATE lot_record SET severity = ?,"
                + " production = ? WHERE seq = ?")) {
            for (int i = 0; i < seqs.size(); i++) {
                JsonNode content = new StoredRecord(seqs.get(i)[0], null, contents.get(i), null, null).json();
                update.setString(1, text(content, "severity"));
                update.setString(2, text(content, "production"));
                update.setLong(3, seqs.get(i)[0]);
                update.executeUpdate();
                insertDefects(connection, seqs.get(i)[0], content);
            }
        }
    }

    private static void version3(Connection connection) throws SQLException {
        try (Statement statement = connection.createStatement()) {
            statement.execute("ALTER TABLE lot_record ADD COLUMN lot_key TEXT");
        }
        Map<String, Long> keyHolder = new HashMap<>();
        Map<Long, String> heldKey = new HashMap<>();
        try (Statement statement = connection.createStatement();
                ResultSet rows = statement.executeQuery("SELECT seq, content FROM lot_record ORDER BY seq")) {
            while (rows.next()) {
                long seq = rows.getLong(1);
                claimKey(seq, new StoredRecord(seq, null, rows.getString(2), null, null).json(), keyHolder, heldKey);
            }
        }
        try (PreparedStatement update = connection.prepareStatement("UPDATE lot_record SET lot_key = ? WHERE seq = ?")) {
            for (Map.Entry<Long, String> held : heldKey.entrySet()) {
                update.setString(1, held.getValue());
                update.setLong(2, held.getKey());
                update.addBatch();
            }
            update.executeBatch();
        }
        String id = UUID.randomUUID().toString();
        long records;
        try (Statement statement = connection.createStatement()) {
            statement.execute("CREATE UNIQUE INDEX lot_record_one_per_lot ON lot_record (lot_key)");
            statement.execute("CREATE TABLE lotgate_store (id TEXT NOT NULL, recorded_at TEXT NOT NULL,"
                    + " genesis TEXT NOT NULL)");
            try (ResultSet head = statement.executeQuery("SELECT seq FROM chain_head WHERE id = 1")) {
                head.next();
                records = head.getLong(1);
            }
        }
        // A new store's chain starts from its id; an older store keeps the start its records already link to.
        String genesis = records == 0 ? HistoryStore.genesisOf(id) : HistoryStore.GENESIS;
        try (PreparedStatement insert = connection.prepareStatement("INSERT INTO lotgate_store (id, recorded_at,"
                + " genesis) VALUES (?, ?, ?)")) {
            insert.setString(1, id);
            insert.setString(2, Instant.now().truncatedTo(java.time.temporal.ChronoUnit.MILLIS).toString());
            insert.setString(3, genesis);
            insert.executeUpdate();
        }
        if (records == 0) {
            try (PreparedStatement update = connection.prepareStatement("UPDATE chain_head SET hash = ? WHERE id = 1")) {
                update.setString(1, genesis);
                update.executeUpdate();
            }
        }
    }

    private static void version4(Connection connection) throws SQLException {
        try (Statement statement = connection.createStatement()) {
            statement.execute("ALTER TABLE lot_record ADD COLUMN reinstates INTEGER NOT NULL DEFAULT 0");
        }
        List<Long> marked = new ArrayList<>();
        try (Statement statement = connection.createStatement();
                ResultSet rows = statement.executeQuery("SELECT seq, content FROM lot_record ORDER BY seq")) {
            while (rows.next()) {
                long seq = rows.getLong(1);
                if (reinstates(new StoredRecord(seq, null, rows.getString(2), null, null).json()) != 0) {
                    marked.add(seq);
                }
            }
        }
        try (PreparedStatement update = connection.prepareStatement("UPDATE lot_record SET reinstates = 1 WHERE seq = ?")) {
            for (long seq : marked) {
                update.setLong(1, seq);
                update.executeUpdate();
            }
        }
    }

    private static void version5(Connection connection) throws SQLException {
        try (Statement statement = connection.createStatement()) {
            // Partial: a store holds few corrections, and the index costs the other records nothing.
            statement.execute("CREATE INDEX lot_record_supersedes ON lot_record (supersedes) WHERE supersedes > 0");
        }
    }

    /** 1 for a lot whose content says it reinstates normal inspection, else 0. */
    static int reinstates(JsonNode content) {
        return content.path(RecordContent.REINSTATES_NORMAL).asBoolean(false) ? 1 : 0;
    }

    /**
     * Replays one record into the current holders of lot keys: a correction frees the key of the record it
     * supersedes, and a lot takes its key when no current record holds it. (Before schema 3 a lot could be
     * recorded twice; the second record then holds no key.)
     */
    static void claimKey(long seq, JsonNode content, Map<String, Long> keyHolder, Map<Long, String> heldKey) {
        if (!"lot".equals(text(content, "kind"))) {
            return;
        }
        long supersedes = content.path("supersedes").asLong(0);
        if (supersedes > 0) {
            String freed = heldKey.remove(supersedes);
            if (freed != null) {
                keyHolder.remove(freed);
            }
        }
        String key = HistoryStore.lotKey(text(content, "supplier"), text(content, "part"), text(content, "lot"));
        if (!keyHolder.containsKey(key)) {
            keyHolder.put(key, seq);
            heldKey.put(seq, key);
        }
    }

    static String text(JsonNode content, String field) {
        JsonNode value = content.get(field);
        return value == null || value.isNull() ? null : value.asText();
    }

    private static int number(JsonNode content, String field) {
        JsonNode value = content.get(field);
        return value == null || value.isNull() ? 0 : value.asInt();
    }

    /** Writes a record's row in the columns of the given schema version, extracted from its content. */
    static void insertRecord(Connection connection, int version, long seq, Instant recordedAt, String text,
            JsonNode content, String previous, String hash, String lotKey) throws SQLException {
        try (RecordInserter inserter = new RecordInserter(connection, version)) {
            inserter.insert(seq, recordedAt, text, content, previous, hash, lotKey);
        }
    }

    /**
     * Inserts records with statements prepared once, for appends of many records in one transaction. A bulk
     * load's inserter writes {@link #BULK_ROWS} records (and defect counts) to a statement, which saves the
     * driver's work per statement; a row that breaks a constraint then fails a whole statement, so it is only for
     * a load that fails as a whole anyway (see {@code HistoryStore.appendEach}). Its rows reach the database at
     * {@link #flush}, at the latest.
     */
    static final class RecordInserter implements AutoCloseable {
        static final int BULK_ROWS = 16;
        private static final String DEFECT_MARKS = "(?, ?, ?, ?, ?)";
        private final int version;
        private final int rows;
        private final int width;
        private final PreparedStatement record;
        private final PreparedStatement defects;
        private final PreparedStatement records;
        private final PreparedStatement defectRows;
        private final Object[][] pendingRecords;
        private final Object[][] pendingDefects;
        private int recordsPending;
        private int defectsPending;

        RecordInserter(Connection connection, int version) throws SQLException {
            this(connection, version, false);
        }

        RecordInserter(Connection connection, int version, boolean bulk) throws SQLException {
            this.version = version;
            this.rows = bulk ? BULK_ROWS : 1;
            String columns = "seq, recorded_at, kind, supplier, part, lot, lot_size, received, verdict, inspected,"
                    + " nonconforming, supersedes, content, previous_hash, hash";
            if (version >= 2) {
                columns += ", severity, production";
            }
            if (version >= 3) {
                columns += ", lot_key";
            }
            if (version >= 4) {
                columns += ", reinstates";
            }
            width = columns.split(",").length;
            String marks = "(" + String.join(", ", java.util.Collections.nCopies(width, "?")) + ")";
            String insertRecords = "INSERT INTO lot_record (" + columns + ") VALUES ";
            String insertDefects = "INSERT INTO defect_count (seq, supplier, part, defect, units) VALUES ";
            record = connection.prepareStatement(insertRecords + marks);
            defects = version >= 2 ? connection.prepareStatement(insertDefects + DEFECT_MARKS) : null;
            records = bulk ? connection.prepareStatement(insertRecords + String.join(", ",
                    java.util.Collections.nCopies(rows, marks))) : null;
            defectRows = bulk && version >= 2 ? connection.prepareStatement(insertDefects + String.join(", ",
                    java.util.Collections.nCopies(rows, DEFECT_MARKS))) : null;
            pendingRecords = new Object[rows][];
            pendingDefects = new Object[rows][];
        }

        /** A record's row and its defect counts' rows, ready to be written. */
        record Row(long seq, JsonNode content, Object[] values, Object[][] defects) {
        }

        void insert(long seq, Instant recordedAt, String text, JsonNode content, String previous, String hash,
                String lotKey) throws SQLException {
            insert(row(seq, recordedAt.toString(), text, content, previous, hash, lotKey));
        }

        /**
         * The values of a record's row and of its defect counts' rows; touches no connection, so that a bulk load
         * makes them on a thread of its own while the rows before are written.
         */
        Row row(long seq, String recordedAt, String text, JsonNode content, String previous, String hash,
                String lotKey) {
            Object[] values = new Object[width];
            values[0] = seq;
            values[1] = recordedAt;
            values[2] = text(content, "kind");
            values[3] = text(content, "supplier");
            values[4] = text(content, "part");
            values[5] = text(content, "lot");
            values[6] = number(content, "lotSize");
            values[7] = text(content, "received");
            values[8] = text(content, "verdict");
            values[9] = number(content, "inspected");
            values[10] = number(content, "nonconforming");
            values[11] = content.path("supersedes").asLong(0);
            values[12] = text;
            values[13] = previous;
            values[14] = hash;
            if (version >= 2) {
                values[15] = text(content, "severity");
                values[16] = text(content, "production");
            }
            if (version >= 3) {
                values[17] = lotKey;
            }
            if (version >= 4) {
                values[18] = reinstates(content);
            }
            return new Row(seq, content, values, version >= 2 ? defectCounts(seq, content) : NO_ROWS);
        }

        /** Writes a row made by {@link #row} (in a bulk load, once enough rows are pending to fill a statement). */
        void insert(Row row) throws SQLException {
            if (rows == 1) {
                bind(record, 0, row.values());
                record.executeUpdate();
                insertDefects(defects, row.defects());
                return;
            }
            pendingRecords[recordsPending++] = row.values();
            if (recordsPending == rows) {
                recordsPending = write(records, record, pendingRecords, recordsPending);
            }
            for (Object[] defect : row.defects()) {
                pendingDefects[defectsPending++] = defect;
                if (defectsPending == rows) {
                    defectsPending = write(defectRows, defects, pendingDefects, defectsPending);
                }
            }
        }

        /** Writes the rows not yet written. */
        void flush() throws SQLException {
            recordsPending = write(records, record, pendingRecords, recordsPending);
            defectsPending = write(defectRows, defects, pendingDefects, defectsPending);
        }

        /** Writes pending rows, all in one statement when they fill it, else one by one; returns 0. */
        private static int write(PreparedStatement full, PreparedStatement one, Object[][] pending, int count)
                throws SQLException {
            if (count == pending.length && full != null) {
                for (int i = 0; i < count; i++) {
                    bind(full, i * pending[i].length, pending[i]);
                }
                full.executeUpdate();
            } else {
                for (int i = 0; i < count; i++) {
                    bind(one, 0, pending[i]);
                    one.executeUpdate();
                }
            }
            java.util.Arrays.fill(pending, null);
            return 0;
        }

        /** Binds a row's values from parameter {@code offset + 1} on: whole numbers as such, the rest as text. */
        private static void bind(PreparedStatement statement, int offset, Object[] values) throws SQLException {
            for (int i = 0; i < values.length; i++) {
                Object value = values[i];
                if (value instanceof Integer number) {
                    statement.setInt(offset + i + 1, number);
                } else if (value instanceof Long number) {
                    statement.setLong(offset + i + 1, number);
                } else {
                    statement.setString(offset + i + 1, (String) value);
                }
            }
        }

        @Override
        public void close() throws SQLException {
            for (PreparedStatement statement : new PreparedStatement[] {record, defects, records, defectRows}) {
                if (statement != null) {
                    statement.close();
                }
            }
        }
    }

    private static void insertDefects(Connection connection, long seq, JsonNode content) throws SQLException {
        try (PreparedStatement insert = connection.prepareStatement("INSERT INTO defect_count (seq, supplier, part,"
                + " defect, units) VALUES (?, ?, ?, ?, ?)")) {
            insertDefects(insert, defectCounts(seq, content));
        }
    }

    private static void insertDefects(PreparedStatement insert, Object[][] rows) throws SQLException {
        if (rows.length == 0) {
            return;
        }
        for (Object[] row : rows) {
            RecordInserter.bind(insert, 0, row);
            insert.addBatch();
        }
        insert.executeBatch();
    }

    private static final Object[][] NO_ROWS = new Object[0][];

    /** The defect_count rows of a record: seq, supplier, part, defect type and units, one per type it counts. */
    private static Object[][] defectCounts(long seq, JsonNode content) {
        JsonNode types = content.get("defectTypes");
        if (types == null || !types.isObject() || types.isEmpty()) {
            return NO_ROWS;
        }
        Object[][] rows = new Object[types.size()][];
        int i = 0;
        var fields = types.fields();
        while (fields.hasNext()) {
            var entry = fields.next();
            rows[i++] = new Object[] {seq, text(content, "supplier"), text(content, "part"), entry.getKey(),
                    entry.getValue().asLong()};
        }
        return rows;
    }

    /** The columns verification reads, in this order, for a schema version. */
    static String columns(int version) {
        return "seq, recorded_at, content, previous_hash, hash, kind, supplier, part, lot, verdict, inspected,"
                + " nonconforming, supersedes, lot_size, received" + (version >= 2 ? ", severity, production" : "")
                + (version >= 3 ? ", lot_key" : "") + (version >= 4 ? ", reinstates" : "");
    }

    /** The index of lot_key among {@link #columns}. */
    static final int LOT_KEY_COLUMN = 18;

    /**
     * The first column read by queries that no longer matches the record's content, or null. Numbers are
     * compared as the database gives them as text, so that 1000.4 in an integer column is not read as 1000.
     */
    static String columnsMismatch(ResultSet row, int version, JsonNode content) throws SQLException {
        List<String[]> pairs = new ArrayList<>(List.of(
                new String[] {"kind", text(content, "kind"), row.getString(6)},
                new String[] {"supplier", text(content, "supplier"), row.getString(7)},
                new String[] {"part", text(content, "part"), row.getString(8)},
                new String[] {"lot", text(content, "lot"), row.getString(9)},
                new String[] {"verdict", text(content, "verdict"), row.getString(10)},
                new String[] {"inspected", Integer.toString(number(content, "inspected")), row.getString(11)},
                new String[] {"nonconforming", Integer.toString(number(content, "nonconforming")), row.getString(12)},
                new String[] {"supersedes", Long.toString(content.path("supersedes").asLong(0)), row.getString(13)},
                new String[] {"lot_size", Integer.toString(number(content, "lotSize")), row.getString(14)},
                new String[] {"received", text(content, "received"), row.getString(15)}));
        if (version >= 2) {
            pairs.add(new String[] {"severity", text(content, "severity"), row.getString(16)});
            pairs.add(new String[] {"production", text(content, "production"), row.getString(17)});
        }
        if (version >= 4) {
            pairs.add(new String[] {"reinstates", Integer.toString(reinstates(content)), row.getString(19)});
        }
        for (String[] pair : pairs) {
            if (pair[1] == null ? pair[2] != null : !pair[1].equals(pair[2])) {
                return pair[0];
            }
        }
        return null;
    }

    /** The defect-count rows a record's content calls for, as comparable text, sorted. */
    static List<String> defectRows(JsonNode content) {
        List<String> rows = new ArrayList<>();
        JsonNode types = content.get("defectTypes");
        if (types != null && types.isObject()) {
            types.fields().forEachRemaining(entry -> rows.add(defectRow(text(content, "supplier"),
                    text(content, "part"), entry.getKey(), entry.getValue().asLong())));
        }
        java.util.Collections.sort(rows);
        return rows;
    }

    static String defectRow(String supplier, String part, String defect, long units) {
        return com.fasterxml.jackson.databind.node.JsonNodeFactory.instance.arrayNode().add(supplier).add(part)
                .add(defect).add(units).toString();
    }
}
