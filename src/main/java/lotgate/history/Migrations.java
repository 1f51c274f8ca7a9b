package lotgate.history;

import com.fasterxml.jackson.databind.JsonNode;
import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;

/**
 * The store's versioned schema. Each version is a step applied in the opening transaction, in order,
 * and recorded in {@code lotgate_schema}; a store newer than the last step is refused. Steps never
 * change a record's content or hash: they add tables and columns, and fill them from the content.
 *
 * <ol>
 * <li>the records and the chain head;
 * <li>the severity and production columns, and the defect counts per record for the audit.
 * </ol>
 */
final class Migrations {
    private Migrations() {
    }

    static void apply(int version, Connection connection, boolean postgres) throws SQLException {
        switch (version) {
            case 1 -> version1(connection);
            case 2 -> version2(connection);
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

    private static String text(JsonNode content, String field) {
        JsonNode value = content.get(field);
        return value == null || value.isNull() ? null : value.asText();
    }

    private static int number(JsonNode content, String field) {
        JsonNode value = content.get(field);
        return value == null || value.isNull() ? 0 : value.asInt();
    }

    /** Writes a record's row in the columns of the given schema version, extracted from its content. */
    static void insertRecord(Connection connection, int version, long seq, Instant recordedAt, String text,
            JsonNode content, String previous, String hash) throws SQLException {
        String columns = "seq, recorded_at, kind, supplier, part, lot, lot_size, received, verdict, inspected,"
                + " nonconforming, supersedes, content, previous_hash, hash";
        String marks = "?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?";
        if (version >= 2) {
            columns += ", severity, production";
            marks += ", ?, ?";
        }
        try (PreparedStatement insert = connection.prepareStatement("INSERT INTO lot_record (" + columns
                + ") VALUES (" + marks + ")")) {
            insert.setLong(1, seq);
            insert.setString(2, recordedAt.toString());
            insert.setString(3, text(content, "kind"));
            insert.setString(4, text(content, "supplier"));
            insert.setString(5, text(content, "part"));
            insert.setString(6, text(content, "lot"));
            insert.setInt(7, number(content, "lotSize"));
            insert.setString(8, text(content, "received"));
            insert.setString(9, text(content, "verdict"));
            insert.setInt(10, number(content, "inspected"));
            insert.setInt(11, number(content, "nonconforming"));
            insert.setLong(12, content.path("supersedes").asLong(0));
            insert.setString(13, text);
            insert.setString(14, previous);
            insert.setString(15, hash);
            if (version >= 2) {
                insert.setString(16, text(content, "severity"));
                insert.setString(17, text(content, "production"));
            }
            insert.executeUpdate();
        }
        if (version >= 2) {
            insertDefects(connection, seq, content);
        }
    }

    private static void insertDefects(Connection connection, long seq, JsonNode content) throws SQLException {
        JsonNode types = content.get("defectTypes");
        if (types == null || !types.isObject() || types.isEmpty()) {
            return;
        }
        try (PreparedStatement insert = connection.prepareStatement("INSERT INTO defect_count (seq, supplier, part,"
                + " defect, units) VALUES (?, ?, ?, ?, ?)")) {
            var fields = types.fields();
            while (fields.hasNext()) {
                var entry = fields.next();
                insert.setLong(1, seq);
                insert.setString(2, text(content, "supplier"));
                insert.setString(3, text(content, "part"));
                insert.setString(4, entry.getKey());
                insert.setLong(5, entry.getValue().asLong());
                insert.addBatch();
            }
            insert.executeBatch();
        }
    }

    /** The first extracted column that no longer matches the record's content, or null. */
    static String columnsMismatch(ResultSet row, JsonNode content) throws SQLException {
        String[][] texts = {{"kind", row.getString(6)}, {"supplier", row.getString(7)}, {"part", row.getString(8)},
                {"lot", row.getString(9)}, {"verdict", row.getString(10)}};
        for (String[] pair : texts) {
            String expected = text(content, pair[0]);
            if (expected == null ? pair[1] != null : !expected.equals(pair[1])) {
                return pair[0];
            }
        }
        if (row.getInt(11) != number(content, "inspected")) {
            return "inspected";
        }
        if (row.getInt(12) != number(content, "nonconforming")) {
            return "nonconforming";
        }
        if (row.getLong(13) != content.path("supersedes").asLong(0)) {
            return "supersedes";
        }
        return null;
    }
}
