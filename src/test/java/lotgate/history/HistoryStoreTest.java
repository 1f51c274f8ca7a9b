package lotgate.history;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedReader;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Random;
import java.util.Set;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/** The history store on SQLite and PostgreSQL: the chain, tampering, migration, concurrency, crashes. */
class HistoryStoreTest {
    @TempDir
    Path folder;

    static java.util.stream.Stream<String> kinds() {
        return Stores.kinds();
    }

    private static void sql(String location, String statementText) throws SQLException {
        String url = location.startsWith("jdbc:") ? location : "jdbc:sqlite:" + location;
        try (Connection connection = DriverManager.getConnection(url); Statement statement = connection.createStatement()) {
            statement.execute(statementText);
        }
    }

    private static void fill(String location, int lots) {
        try (HistoryStore store = HistoryStore.open(location)) {
            for (int i = 1; i <= lots; i++) {
                store.append(Stores.lot("Invented Supplier", "P-1", "L-" + i, i != 3, i == 3 ? 5 : 1), Stores.now());
            }
        }
    }

    @ParameterizedTest
    @MethodSource("kinds")
    void recordsChainAndVerify(String kind) {
        String location = Stores.fresh(kind, folder);
        fill(location, 12);
        try (HistoryStore store = HistoryStore.open(location)) {
            HistoryStore.Verification verification = store.verify();
            assertTrue(verification.intact(), verification.problem());
            assertEquals(12, verification.records());
            assertEquals(12, store.rows("Invented Supplier", "P-1").size());
            assertEquals(1, store.supplierTotals().get(0).rejected());
            assertEquals(Long.valueOf(16), store.defectTypes("Invented Supplier", null).get("burr"));
        }
    }

    @ParameterizedTest
    @MethodSource("kinds")
    void anAlteredRecordIsNamed(String kind) throws SQLException {
        String location = Stores.fresh(kind, folder);
        fill(location, 6);
        sql(location, "UPDATE lot_record SET content = REPLACE(content, '\"nonconforming\":1', '\"nonconforming\":0')"
                + " WHERE seq = 4");
        try (HistoryStore store = HistoryStore.open(location)) {
            assertEquals("record 4 was altered: its content no longer matches its hash", store.verify().problem());
        }
    }

    @ParameterizedTest
    @MethodSource("kinds")
    void anAlteredColumnIsNamed(String kind) throws SQLException {
        String location = Stores.fresh(kind, folder);
        fill(location, 6);
        sql(location, "UPDATE lot_record SET verdict = 'accept' WHERE seq = 3");
        try (HistoryStore store = HistoryStore.open(location)) {
            assertEquals("record 3 was altered: column verdict no longer matches its content", store.verify().problem());
        }
    }

    @ParameterizedTest
    @MethodSource("kinds")
    void aRemovedRecordIsNamed(String kind) throws SQLException {
        String location = Stores.fresh(kind, folder);
        fill(location, 6);
        sql(location, "DELETE FROM lot_record WHERE seq = 2");
        try (HistoryStore store = HistoryStore.open(location)) {
            assertEquals("record 2 was removed (the chain goes on at record 3)", store.verify().problem());
        }
        sql(location, "DELETE FROM lot_record WHERE seq >= 5");
        sql(location, "INSERT INTO lot_record SELECT * FROM lot_record WHERE 1 = 0");
        String tail = Stores.fresh(kind, folder);
        fill(tail, 6);
        sql(tail, "DELETE FROM lot_record WHERE seq = 6");
        try (HistoryStore store = HistoryStore.open(tail)) {
            assertEquals("the last 1 record(s) were removed (the chain head names record 6, the store ends at record 5)",
                    store.verify().problem());
        }
    }

    @ParameterizedTest
    @MethodSource("kinds")
    void anOlderSchemaMigratesWithoutLoss(String kind) {
        String location = Stores.fresh(kind, folder);
        try (HistoryStore old = HistoryStore.open(location, 1)) {
            assertEquals(1, old.schemaVersion());
            for (int i = 1; i <= 5; i++) {
                old.append(Stores.lot("Invented Supplier", "P-1", "L-" + i, true, i), Stores.now());
            }
        }
        try (HistoryStore store = HistoryStore.open(location)) {
            assertEquals(HistoryStore.SCHEMA_VERSION, store.schemaVersion());
            assertTrue(store.verify().intact(), store.verify().problem());
            List<LotRow> rows = store.rows(null, null);
            assertEquals(5, rows.size());
            assertEquals("normal", rows.get(0).severity(), "filled from the content");
            assertEquals(Long.valueOf(15), store.defectTypes("Invented Supplier", "P-1").get("burr"));
        }
    }

    @ParameterizedTest
    @MethodSource("kinds")
    void aNewerSchemaIsRefused(String kind) throws SQLException {
        String location = Stores.fresh(kind, folder);
        fill(location, 1);
        sql(location, "UPDATE lotgate_schema SET version = 99");
        StoreException refused = assertThrows(StoreException.class, () -> HistoryStore.open(location));
        assertEquals("history store " + location + " has schema version 99, newer than this lotgate reads ("
                + HistoryStore.SCHEMA_VERSION + "); use a newer lotgate", refused.getMessage());
    }

    private static Process recorder(String location, int count, String supplier) throws Exception {
        String classpath = System.getProperty("surefire.test.class.path", System.getProperty("java.class.path"));
        return new ProcessBuilder(Path.of(System.getProperty("java.home"), "bin", "java").toString(), "-Xmx128m",
                "-Dlog4j.provider=org.apache.logging.log4j.simple.internal.SimpleProvider", "-cp", classpath,
                Recorder.class.getName(), location, Integer.toString(count), supplier).redirectErrorStream(true).start();
    }

    private static List<Long> reported(Process process) throws Exception {
        List<Long> done = new ArrayList<>();
        try (BufferedReader out = new BufferedReader(new InputStreamReader(process.getInputStream(),
                StandardCharsets.UTF_8))) {
            for (String line = out.readLine(); line != null; line = out.readLine()) {
                if (line.startsWith("done ")) {
                    done.add(Long.parseLong(line.substring(5)));
                }
            }
        }
        return done;
    }

    @ParameterizedTest
    @MethodSource("kinds")
    void anIdleOpenStoreDoesNotBlockAnotherRecorder(String kind) throws Exception {
        String location = Stores.fresh(kind, folder);
        fill(location, 1);
        try (HistoryStore idle = HistoryStore.open(location)) {
            assertEquals(1, idle.rows(null, null).size());
            Process other = recorder(location, 5, "Invented Other");
            List<Long> done = reported(other);
            // Liveness, not speed: with a lock held by the idle connection the recorder would wait out the
            // store's busy timeout and fail, so fewer than 5 writes would be reported done.
            assertEquals(0, other.waitFor(), "the second recorder was blocked");
            assertEquals(5, done.size());
            assertEquals(6, idle.rows(null, null).size(), "the open store sees the new records");
        }
    }

    @ParameterizedTest
    @MethodSource("kinds")
    void twoProcessesRecordingAtOnceLeaveOneValidChain(String kind) throws Exception {
        String location = Stores.fresh(kind, folder);
        fill(location, 0);
        Process first = recorder(location, 500, "Invented A");
        Process second = recorder(location, 500, "Invented B");
        List<Long> doneFirst = reported(first);
        List<Long> doneSecond = reported(second);
        // Both output streams are read to their end, so the processes have ended: no timer is needed.
        assertEquals(0, first.waitFor());
        assertEquals(0, second.waitFor());
        assertEquals(500, doneFirst.size());
        assertEquals(500, doneSecond.size());
        try (HistoryStore store = HistoryStore.open(location)) {
            HistoryStore.Verification verification = store.verify();
            assertTrue(verification.intact(), verification.problem());
            assertEquals(1000, verification.records());
            assertEquals(500, store.rows("Invented A", null).size());
        }
    }

    @ParameterizedTest
    @MethodSource("kinds")
    void aRecorderKilledAtRandomMomentsLosesNothingItReportedDone(String kind) throws Exception {
        String location = Stores.fresh(kind, folder);
        fill(location, 0);
        Random random = new Random(2859);
        Set<Long> reportedDone = new HashSet<>();
        for (int round = 0; round < 12; round++) {
            Process process = recorder(location, 100_000, "Invented K");
            // The kill point is a count of reported writes, not a time, so that a slow machine moves it
            // nowhere: the recorder is killed while it works on its next write, whatever its speed.
            int killAfter = 1 + random.nextInt(40);
            try (BufferedReader out = new BufferedReader(new InputStreamReader(process.getInputStream(),
                    StandardCharsets.UTF_8))) {
                int seen = 0;
                String line = out.readLine();
                while (line != null && seen < killAfter) {
                    if (line.startsWith("done ")) {
                        reportedDone.add(Long.parseLong(line.substring(5)));
                        seen++;
                    }
                    line = seen < killAfter ? out.readLine() : null;
                }
                assertEquals(killAfter, seen, "round " + round + ": the recorder ended before it was killed");
                process.destroyForcibly(); // SIGKILL on Linux
                // Lines written just before the kill were reported too. The JDK may close the pipe under
                // this reader once the process has died; what was read up to then is still checked.
                try {
                    for (line = out.readLine(); line != null; line = out.readLine()) {
                        if (line.startsWith("done ")) {
                            reportedDone.add(Long.parseLong(line.substring(5)));
                        }
                    }
                } catch (java.io.IOException closedByTheJdk) {
                    // The stream ended with the process.
                }
            }
            process.waitFor();
            try (HistoryStore store = HistoryStore.open(location)) {
                HistoryStore.Verification verification = store.verify();
                assertTrue(verification.intact(), "round " + round + ": " + verification.problem());
                Set<Long> stored = new HashSet<>();
                store.rows(null, null).forEach(r -> stored.add(r.seq()));
                assertTrue(stored.containsAll(reportedDone), "round " + round + ": a reported record is missing");
            }
        }
        assertFalse(reportedDone.isEmpty());
    }
}
