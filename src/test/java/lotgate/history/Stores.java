package lotgate.history;

import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.Instant;
import java.time.LocalDate;
import java.util.Map;
import java.util.UUID;
import java.util.stream.Stream;

/**
 * The stores the history tests run against: a SQLite file, and PostgreSQL when LOTGATE_TEST_POSTGRES
 * names a database (a JDBC URL with user and password). In CI the PostgreSQL tests must run.
 */
public final class Stores {
    private Stores() {
    }

    public static Stream<String> kinds() {
        return Stream.of("sqlite", "postgresql");
    }

    /** A fresh, empty store of the kind, in the folder (SQLite) or in a new schema (PostgreSQL). */
    public static String fresh(String kind, Path folder) {
        if (kind.equals("sqlite")) {
            return folder.resolve("history-" + UUID.randomUUID() + ".sqlite").toString();
        }
        String url = System.getenv("LOTGATE_TEST_POSTGRES");
        if (url == null || url.isBlank()) {
            if ("true".equals(System.getenv("CI"))) {
                throw new IllegalStateException("CI must run the PostgreSQL store tests: set LOTGATE_TEST_POSTGRES");
            }
            assumeTrue(false, "LOTGATE_TEST_POSTGRES is not set: PostgreSQL store tests skipped");
        }
        String schema = "t" + UUID.randomUUID().toString().replace("-", "");
        try (Connection connection = DriverManager.getConnection(url); Statement statement = connection.createStatement()) {
            statement.execute("CREATE SCHEMA " + schema);
        } catch (SQLException e) {
            throw new IllegalStateException("cannot reach the PostgreSQL test database: " + e.getMessage(), e);
        }
        return url + (url.contains("?") ? "&" : "?") + "currentSchema=" + schema;
    }

    /** A lot record's content for tests (invented). */
    public static com.fasterxml.jackson.databind.node.ObjectNode lot(String supplier, String part, String lot,
            boolean accepted, int nonconforming) {
        return RecordContent.lot(new RecordContent.Lot(supplier, part, lot, 1000, LocalDate.of(2026, 1, 5), "test",
                accepted ? "accept" : "reject", 80, nonconforming, nonconforming > 0 ? Map.of("burr", nonconforming)
                        : Map.of(), "normal", "steady", 0, null), null, "import");
    }

    public static Instant now() {
        return Instant.now().truncatedTo(java.time.temporal.ChronoUnit.MILLIS);
    }

    /** Every row a query over a SQLite store's file answers, each column as text. */
    public static java.util.List<java.util.List<String>> rows(String file, String query) throws SQLException {
        java.util.List<java.util.List<String>> rows = new java.util.ArrayList<>();
        try (Connection connection = DriverManager.getConnection("jdbc:sqlite:" + file);
                Statement statement = connection.createStatement();
                java.sql.ResultSet result = statement.executeQuery(query)) {
            int columns = result.getMetaData().getColumnCount();
            while (result.next()) {
                java.util.List<String> row = new java.util.ArrayList<>();
                for (int c = 1; c <= columns; c++) {
                    row.add(result.getString(c));
                }
                rows.add(row);
            }
        }
        return rows;
    }
}
