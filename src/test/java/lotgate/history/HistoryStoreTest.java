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
import java.util.stream.Stream;
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
            assertEquals("the last record was removed (the chain head names record 6, the store ends at record 5)",
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

    /** The first column of every row of a query. */
    private static List<String> query(String location, String queryText) throws SQLException {
        String url = location.startsWith("jdbc:") ? location : "jdbc:sqlite:" + location;
        List<String> values = new ArrayList<>();
        try (Connection connection = DriverManager.getConnection(url); Statement statement = connection.createStatement();
                java.sql.ResultSet rows = statement.executeQuery(queryText)) {
            while (rows.next()) {
                values.add(rows.getString(1));
            }
        }
        return values;
    }

    @ParameterizedTest
    @MethodSource("kinds")
    void supersededRecordsAreFoundThroughAnIndexOfTheCorrectionsAfterMigration(String kind) throws SQLException {
        String location = Stores.fresh(kind, folder);
        Object before;
        try (HistoryStore old = HistoryStore.open(location, 4)) {
            old.append(Stores.lot("Invented Supplier", "P-1", "L-1", false, 5), Stores.now());
            old.append(Stores.lot("Invented Supplier", "P-1", "L-2", true, 1), Stores.now());
            old.append(Stores.lot("Invented Supplier", "P-1", "L-1", true, 2).put("supersedes", 1)
                    .put("reason", "recount (invented)"), Stores.now());
            before = old.defectTypesByLot("Invented Supplier", null);
        }
        try (HistoryStore store = HistoryStore.open(location)) {
            assertEquals(HistoryStore.SCHEMA_VERSION, store.schemaVersion());
            assertEquals(before, store.defectTypesByLot("Invented Supplier", null));
            assertEquals(java.util.Map.of(2L, java.util.Map.of("burr", 1L), 3L, java.util.Map.of("burr", 2L)),
                    store.defectTypesByLot("Invented Supplier", null), "the superseded record's counts are left out");
            assertTrue(store.verify().intact(), store.verify().problem());
        }
        if (kind.equals("sqlite")) {
            assertEquals(List.of("lot_record_supersedes"), query(location, "SELECT name FROM sqlite_master WHERE"
                    + " type = 'index' AND name = 'lot_record_supersedes'"));
            String plan = String.join(" ", planOf(location, "SELECT supersedes FROM lot_record WHERE supersedes > 0"));
            assertTrue(plan.contains("lot_record_supersedes"), plan);
        } else {
            assertEquals(List.of("lot_record_supersedes"), query(location, "SELECT indexname FROM pg_indexes WHERE"
                    + " schemaname = current_schema() AND indexname = 'lot_record_supersedes'"));
        }
    }

    /** SQLite's plan of a query, its detail column joined. */
    private static List<String> planOf(String location, String queryText) throws SQLException {
        List<String> details = new ArrayList<>();
        try (Connection connection = DriverManager.getConnection("jdbc:sqlite:" + location);
                Statement statement = connection.createStatement();
                java.sql.ResultSet rows = statement.executeQuery("EXPLAIN QUERY PLAN " + queryText)) {
            while (rows.next()) {
                details.add(rows.getString("detail"));
            }
        }
        return details;
    }

    @ParameterizedTest
    @MethodSource("kinds")
    void aLotThatReinstatesNormalInspectionIsMarkedAfterMigrationAndOnAppend(String kind) throws SQLException {
        String location = Stores.fresh(kind, folder);
        try (HistoryStore old = HistoryStore.open(location, 3)) {
            old.append(Stores.lot("Invented Supplier", "P-1", "L-1", true, 2).put(RecordContent.REINSTATES_NORMAL, true),
                    Stores.now());
        }
        try (HistoryStore store = HistoryStore.open(location)) {
            store.append(Stores.lot("Invented Supplier", "P-1", "L-2", true, 2).put(RecordContent.REINSTATES_NORMAL, true),
                    Stores.now());
            store.append(Stores.lot("Invented Supplier", "P-1", "L-3", true, 0), Stores.now());
            List<LotRow> rows = store.rows(null, null);
            assertEquals(List.of(true, true, false), rows.stream().map(LotRow::reinstatesNormal).toList());
            assertTrue(store.verify().intact(), store.verify().problem());
        }
        sql(location, "UPDATE lot_record SET reinstates = 0 WHERE lot = 'L-2'");
        try (HistoryStore store = HistoryStore.open(location)) {
            assertFalse(store.verify().intact(), "a changed column is found");
        }
    }

    @ParameterizedTest
    @MethodSource("kinds")
    void aNewerSchemaIsRefused(String kind) throws SQLException {
        String location = Stores.fresh(kind, folder);
        fill(location, 1);
        sql(location, "UPDATE lotgate_schema SET version = 99");
        StoreException refused = assertThrows(StoreException.class, () -> HistoryStore.open(location));
        assertEquals("history store " + StoreLocation.masked(location) + " has schema version 99, newer than this lotgate reads ("
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

    /** The message with which the store refuses to append a new lot, after checking that nothing was appended. */
    private static String refusedAppend(String location) {
        try (HistoryStore store = HistoryStore.open(location)) {
            int before = store.rows(null, null).size();
            StoreException refused = assertThrows(StoreException.class, () -> store.append(Stores.lot(
                    "Invented Supplier", "P-1", "L-5", true, 0), Stores.now()));
            assertEquals(before, store.rows(null, null).size(), "nothing was appended");
            return refused.getMessage();
        }
    }

    @ParameterizedTest
    @MethodSource("kinds")
    void noRecordIsAppendedToAChainWhoseHeadNoLongerMatches(String kind) throws SQLException {
        String location = Stores.fresh(kind, folder);
        fill(location, 4);
        sql(location, "UPDATE lot_record SET content = REPLACE(content, 'L-4', 'L-9') WHERE seq = 4");
        assertEquals("history store " + StoreLocation.masked(location) + " is damaged: the last record 4 no longer"
                + " matches its hash or the chain head; nothing was recorded. Run 'lotgate verify --store "
                + StoreLocation.masked(location) + "' to find the damage", refusedAppend(location));
        String cut = Stores.fresh(kind, folder);
        fill(cut, 4);
        sql(cut, "DELETE FROM lot_record WHERE seq = 4");
        assertTrue(refusedAppend(cut).contains("is damaged: the last record 4, named by the chain head, is missing;"
                + " nothing was recorded"));
        String column = Stores.fresh(kind, folder);
        fill(column, 4);
        sql(column, "UPDATE lot_record SET received = '2025-12-31' WHERE seq = 4");
        assertTrue(refusedAppend(column).contains("is damaged: column received of the last record 4 no longer"
                + " matches its content"));
    }

    @ParameterizedTest
    @MethodSource("kinds")
    void aLotIsRecordedOnceUntilACorrectionSupersedesIt(String kind) {
        String location = Stores.fresh(kind, folder);
        fill(location, 3);
        try (HistoryStore store = HistoryStore.open(location)) {
            StoreException.DuplicateLot duplicate = assertThrows(StoreException.DuplicateLot.class, () -> store.append(
                    Stores.lot("Invented Supplier", "P-1", "L-2", true, 0), Stores.now()));
            assertEquals("lot L-2 of Invented Supplier, part P-1 is already recorded as #2 in "
                    + StoreLocation.masked(location) + " (nothing was recorded)", duplicate.getMessage());
            assertEquals(2, duplicate.existing());
            // The same lot id of another part or supplier is another lot.
            store.append(Stores.lot("Invented Supplier", "P-2", "L-2", true, 0), Stores.now());
            store.append(Stores.lot("Invented Other", "P-1", "L-2", true, 0), Stores.now());
            var correction = Stores.lot("Invented Supplier", "P-1", "L-2", true, 0);
            correction.put("supersedes", 2).put("reason", "recount (invented)");
            assertEquals(6, store.append(correction, Stores.now()).seq());
            var again = Stores.lot("Invented Supplier", "P-1", "L-2", true, 0);
            again.put("supersedes", 2).put("reason", "again (invented)");
            StoreException twice = assertThrows(StoreException.class, () -> store.append(again, Stores.now()));
            assertTrue(twice.getMessage().contains("record 2 is not the current record of a lot (it was already"
                    + " corrected, or is not a lot); supersede its latest correction instead"), twice.getMessage());
            assertThrows(StoreException.DuplicateLot.class, () -> store.append(Stores.lot("Invented Supplier", "P-1",
                    "L-2", true, 0), Stores.now()), "the correction now holds the lot");
            HistoryStore.Verification verification = store.verify();
            assertTrue(verification.intact(), verification.problem());
            assertEquals(6, verification.records());
        }
    }

    @ParameterizedTest
    @MethodSource("kinds")
    void aStoreThatRecordedALotTwiceBeforeTheConstraintMigratesAndKeepsBoth(String kind) {
        String location = Stores.fresh(kind, folder);
        try (HistoryStore old = HistoryStore.open(location, 2)) {
            old.append(Stores.lot("Invented Supplier", "P-1", "L-1", true, 1), Stores.now());
            old.append(Stores.lot("Invented Supplier", "P-1", "L-1", true, 2), Stores.now());
        }
        try (HistoryStore store = HistoryStore.open(location)) {
            assertEquals(HistoryStore.SCHEMA_VERSION, store.schemaVersion());
            HistoryStore.Verification verification = store.verify();
            assertTrue(verification.intact(), verification.problem());
            assertEquals(2, store.rows(null, null).size());
            assertThrows(StoreException.DuplicateLot.class, () -> store.append(Stores.lot("Invented Supplier", "P-1",
                    "L-1", true, 0), Stores.now()));
            assertTrue(store.storeId().matches("[0-9a-f-]{36}"), store.storeId());
        }
    }

    @ParameterizedTest
    @MethodSource("kinds")
    void twoProcessesRecordingTheSameLotsRecordEachOnce(String kind) throws Exception {
        String location = Stores.fresh(kind, folder);
        fill(location, 0);
        Process first = recorder(location, 200, "Invented Twin", "100");
        Process second = recorder(location, 200, "Invented Twin", "100");
        List<String> linesFirst = lines(first);
        List<String> linesSecond = lines(second);
        // Both output streams are read to their end, so the processes have ended: no timer is needed.
        assertEquals(0, first.waitFor(), String.join("\n", linesFirst));
        assertEquals(0, second.waitFor(), String.join("\n", linesSecond));
        long done = Stream.concat(linesFirst.stream(), linesSecond.stream()).filter(l -> l.startsWith("done ")).count();
        long refused = Stream.concat(linesFirst.stream(), linesSecond.stream()).filter(l -> l.startsWith("duplicate "))
                .count();
        System.out.println("concurrency | " + kind + " | 2 processes x 200 attempts on 100 lot ids | recorded " + done
                + " | refused as duplicates " + refused);
        assertEquals(400, done + refused, "every attempt was either recorded or refused as a duplicate");
        assertEquals(100, done);
        try (HistoryStore store = HistoryStore.open(location)) {
            HistoryStore.Verification verification = store.verify();
            assertTrue(verification.intact(), verification.problem());
            assertEquals(100, verification.records());
            assertEquals(100, store.rows(null, null).stream().map(LotRow::lot).distinct().count());
        }
    }

    @ParameterizedTest
    @MethodSource("kinds")
    void aKeptHeadCatchesAStoreCutShortOrReplaced(String kind) throws SQLException {
        String location = Stores.fresh(kind, folder);
        fill(location, 5);
        HistoryStore.Head kept;
        String id;
        try (HistoryStore store = HistoryStore.open(location)) {
            HistoryStore.Verification verification = store.verify();
            kept = verification.head();
            id = verification.storeId();
            assertEquals(5, kept.seq());
            assertEquals(store.record(5).hash(), kept.hash());
            assertTrue(store.verify(List.of(kept, new HistoryStore.Head(2, store.record(2).hash()))).intact());
        }
        // Cut short by someone who also moved the chain head back: the chain alone looks intact.
        sql(location, "DELETE FROM defect_count WHERE seq >= 4");
        sql(location, "DELETE FROM lot_record WHERE seq >= 4");
        sql(location, "UPDATE chain_head SET seq = 3, hash = (SELECT hash FROM lot_record WHERE seq = 3)");
        try (HistoryStore store = HistoryStore.open(location)) {
            assertTrue(store.verify().intact(), "a consistent truncation is not seen without a kept head");
            assertEquals(id, store.verify().storeId());
            HistoryStore.Verification verification = store.verify(List.of(kept));
            assertFalse(verification.intact());
            assertEquals("the kept head " + kept + " names record 5, but the store ends at record 3: records were"
                    + " removed from its end, or the store was replaced", verification.problem());
        }
        // Replaced by a fresh store of the same length.
        String other = Stores.fresh(kind, folder);
        fill(other, 5);
        try (HistoryStore store = HistoryStore.open(other)) {
            HistoryStore.Verification verification = store.verify(List.of(kept));
            assertFalse(verification.intact());
            assertTrue(verification.problem().startsWith("record 5 no longer has the kept hash " + kept.hash()),
                    verification.problem());
            assertFalse(id.equals(verification.storeId()), "each store has its own id");
        }
    }

    @ParameterizedTest
    @MethodSource("kinds")
    void aReadOnlyOpeningRefusesAStoreThatDoesNotExist(String kind) {
        String location = Stores.fresh(kind, folder);
        StoreException.Missing missing = assertThrows(StoreException.Missing.class, () -> HistoryStore.open(location,
                false));
        assertTrue(missing.getMessage().startsWith("history store " + StoreLocation.masked(location)
                + " does not exist"), missing.getMessage());
        try (HistoryStore store = HistoryStore.open(location, true)) {
            assertTrue(store.created());
        }
        try (HistoryStore store = HistoryStore.open(location, false)) {
            assertFalse(store.created());
        }
    }

    private static Process recorder(String location, int count, String supplier, String shared) throws Exception {
        String classpath = System.getProperty("surefire.test.class.path", System.getProperty("java.class.path"));
        return new ProcessBuilder(Path.of(System.getProperty("java.home"), "bin", "java").toString(), "-Xmx128m",
                "-Dlog4j.provider=org.apache.logging.log4j.simple.internal.SimpleProvider", "-cp", classpath,
                Recorder.class.getName(), location, Integer.toString(count), supplier, shared)
                .redirectErrorStream(true).start();
    }

    private static List<String> lines(Process process) throws Exception {
        try (BufferedReader out = new BufferedReader(new InputStreamReader(process.getInputStream(),
                StandardCharsets.UTF_8))) {
            return out.lines().toList();
        }
    }
}
