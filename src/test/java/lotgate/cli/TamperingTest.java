package lotgate.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.Instant;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import lotgate.history.HistoryStore;
import lotgate.history.RecordContent;
import lotgate.history.Stores;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Every stored fact is covered: each column of a record and each side-table row is edited, one at a
 * time, on SQLite and PostgreSQL, and verify names the record with exit code 7. Each case prints a
 * line of the tamper table ("tamper | case | database | detected").
 */
class TamperingTest {
    @TempDir
    Path folder;

    /** One way to tamper with the store, and what verify must name. */
    record Case(String name, String names, String... statements) {
        @Override
        public String toString() {
            return name;
        }
    }

    static List<Case> cases() {
        return List.of(
                new Case("lot_record.recorded_at", "record 4", "UPDATE lot_record SET recorded_at = '2026-01-01T00:00:00Z' WHERE seq = 4"),
                new Case("lot_record.kind", "record 4", "UPDATE lot_record SET kind = 'action' WHERE seq = 4"),
                new Case("lot_record.supplier", "record 4", "UPDATE lot_record SET supplier = 'Invented Other' WHERE seq = 4"),
                new Case("lot_record.part", "record 4", "UPDATE lot_record SET part = 'P-9' WHERE seq = 4"),
                new Case("lot_record.lot", "record 4", "UPDATE lot_record SET lot = 'L-99' WHERE seq = 4"),
                new Case("lot_record.lot_size", "record 4", "UPDATE lot_record SET lot_size = 999 WHERE seq = 4"),
                new Case("lot_record.received (changed)", "record 4", "UPDATE lot_record SET received = '2026-01-06' WHERE seq = 4"),
                new Case("lot_record.received (emptied)", "record 4", "UPDATE lot_record SET received = NULL WHERE seq = 4"),
                new Case("lot_record.verdict", "record 4", "UPDATE lot_record SET verdict = 'reject' WHERE seq = 4"),
                new Case("lot_record.inspected", "record 4", "UPDATE lot_record SET inspected = 81 WHERE seq = 4"),
                new Case("lot_record.nonconforming", "record 4", "UPDATE lot_record SET nonconforming = 0 WHERE seq = 4"),
                new Case("lot_record.supersedes", "record 4", "UPDATE lot_record SET supersedes = 1 WHERE seq = 4"),
                new Case("lot_record.severity", "record 4", "UPDATE lot_record SET severity = 'reduced' WHERE seq = 4"),
                new Case("lot_record.production", "record 4", "UPDATE lot_record SET production = 'irregular' WHERE seq = 4"),
                new Case("lot_record.content", "record 4", "UPDATE lot_record SET content = REPLACE(content, 'L-3', 'L-7') WHERE seq = 4"),
                new Case("lot_record.previous_hash", "record 4", "UPDATE lot_record SET previous_hash = hash WHERE seq = 4"),
                new Case("lot_record.hash", "record 4", "UPDATE lot_record SET hash = previous_hash WHERE seq = 4"),
                new Case("lot_record.lot_key (emptied)", "record 4", "UPDATE lot_record SET lot_key = NULL WHERE seq = 4"),
                new Case("lot_record.lot_key (moved to the superseded record)", "record 2",
                        "UPDATE lot_record SET lot_key = NULL WHERE seq = 5",
                        "UPDATE lot_record SET lot_key = 'KEY OF 5' WHERE seq = 2"),
                new Case("lot_record.seq", "record 4", "UPDATE lot_record SET seq = 40 WHERE seq = 4"),
                new Case("lot_record: a middle record deleted", "record 4", "DELETE FROM lot_record WHERE seq = 4"),
                new Case("lot_record: the last record deleted", "record 6", "DELETE FROM lot_record WHERE seq = 6"),
                new Case("lot_record: every record deleted", "record 6", "DELETE FROM defect_count",
                        "DELETE FROM lot_record"),
                new Case("defect_count.units", "record 2", "UPDATE defect_count SET units = 1 WHERE seq = 2 AND defect = 'scratch'"),
                new Case("defect_count.defect", "record 2", "UPDATE defect_count SET defect = 'dent' WHERE seq = 2 AND defect = 'scratch'"),
                new Case("defect_count.supplier", "record 2", "UPDATE defect_count SET supplier = 'Invented Other' WHERE seq = 2"),
                new Case("defect_count.part", "record 2", "UPDATE defect_count SET part = 'P-9' WHERE seq = 2"),
                new Case("defect_count.seq", "record 1", "UPDATE defect_count SET seq = 4 WHERE seq = 1"),
                new Case("defect_count: a row deleted", "record 2", "DELETE FROM defect_count WHERE seq = 2 AND defect = 'burr'"),
                new Case("defect_count: a row added", "record 4", "INSERT INTO defect_count (seq, supplier, part, defect, units)"
                        + " VALUES (4, 'Invented Supplier', 'P-1', 'burr', 7)"),
                new Case("defect_count: a row for no record", "record 99", "INSERT INTO defect_count (seq, supplier, part,"
                        + " defect, units) VALUES (99, 'Invented Supplier', 'P-1', 'burr', 7)"),
                new Case("defect_count: every row deleted", "record 1", "DELETE FROM defect_count"),
                new Case("chain_head.seq", "record 6", "UPDATE chain_head SET seq = 5"),
                new Case("chain_head.hash", "record 6", "UPDATE chain_head SET hash = (SELECT hash FROM lot_record WHERE seq = 5)"),
                new Case("chain_head: deleted", "chain head", "DELETE FROM chain_head"),
                new Case("lotgate_store.id", "store's id", "UPDATE lotgate_store SET id = 'a0000000-0000-4000-8000-000000000000'"));
    }

    static Stream<Arguments> casesOnEachDatabase() {
        List<Arguments> all = new ArrayList<>();
        for (String kind : Stores.kinds().toList()) {
            for (Case tamper : cases()) {
                all.add(Arguments.of(kind, tamper));
            }
        }
        return all.stream();
    }

    static void sql(String location, String... statements) throws SQLException {
        String url = location.startsWith("jdbc:") ? location : "jdbc:sqlite:" + location;
        try (Connection connection = DriverManager.getConnection(url); Statement statement = connection.createStatement()) {
            for (String text : statements) {
                statement.execute(text);
            }
        }
    }

    private static RecordContent.Lot lot(String id, String verdict, int found, Map<String, Integer> defects,
            long supersedes, String reason) {
        return new RecordContent.Lot("Invented Supplier", "P-1", id, 1000, LocalDate.of(2026, 1, 5), "tester",
                verdict, 80, found, defects, "normal", "steady", supersedes, reason);
    }

    /** Six records: lots with defects, a corrective action, a correction, and a lot with none. */
    static String sixRecords(String kind, Path folder) {
        String location = Stores.fresh(kind, folder);
        try (HistoryStore store = HistoryStore.open(location)) {
            Instant now = Stores.now();
            store.append(RecordContent.lot(lot("L-1", "accept", 1, Map.of("burr", 1), 0, null), null, "import"), now);
            store.append(RecordContent.lot(lot("L-2", "reject", 5, Map.of("burr", 3, "scratch", 2), 0, null), null,
                    "import"), now);
            store.append(RecordContent.action("Invented Supplier", "P-1", "new die (invented)", LocalDate.of(2026, 1, 6)),
                    now);
            store.append(RecordContent.lot(lot("L-3", "accept", 2, Map.of("burr", 2), 0, null), null, "import"), now);
            store.append(RecordContent.lot(lot("L-2", "accept", 1, Map.of("burr", 1), 2, "recount (invented)"), null,
                    "import"), now);
            store.append(RecordContent.lot(lot("L-4", "accept", 0, Map.of(), 0, null), null, "import"), now);
        }
        return location;
    }

    @ParameterizedTest(name = "{0}: {1}")
    @MethodSource("casesOnEachDatabase")
    void everyEditIsCaughtAndNamed(String kind, Case tamper) throws Exception {
        String location = sixRecords(kind, folder);
        Cli.Result before = Cli.run("verify", "--store", location);
        assertEquals(0, before.exitCode(), before.err());
        String keyOf5 = keyOf(location, 5);
        sql(location, Stream.of(tamper.statements()).map(s -> s.replace("KEY OF 5", keyOf5)).toArray(String[]::new));
        Cli.Result after = Cli.run("verify", "--store", location);
        boolean detected = after.exitCode() == ExitCode.STORE;
        System.out.println("tamper | " + tamper.name() + " | " + kind + " | " + (detected ? "detected" : "NOT detected"));
        assertEquals(ExitCode.STORE, after.exitCode(), after.out() + after.err());
        assertTrue(after.err().contains(tamper.names()), after.err());
        assertTrue(after.err().startsWith("lotgate: history store "), after.err());
        assertFalse(after.out().contains("intact"), after.out());
    }

    private static String keyOf(String location, long seq) throws SQLException {
        String url = location.startsWith("jdbc:") ? location : "jdbc:sqlite:" + location;
        try (Connection connection = DriverManager.getConnection(url); Statement statement = connection.createStatement();
                var result = statement.executeQuery("SELECT lot_key FROM lot_record WHERE seq = " + seq)) {
            result.next();
            return result.getString(1);
        }
    }
}
