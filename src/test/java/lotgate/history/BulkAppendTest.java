package lotgate.history;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.time.LocalDate;
import java.io.BufferedReader;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.concurrent.atomic.AtomicReference;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A bulk load on SQLite (indexes created after the records, a larger page cache, a rollback journal) writes the
 * same rows, hashes and indexes as recording the same lots one by one, and refuses a lot recorded twice in the same
 * words; it leaves the store in its write-ahead log mode, holds nothing back from a store opened during the load,
 * and a load killed on the way records nothing.
 */
class BulkAppendTest {
    private static final int LOTS = (int) HistoryStore.BULK + 200;

    @TempDir
    Path folder;

    private final Instant at = Stores.now();

    /** Two copies of one store holding three lots: one store id, so that both chains start from one hash. */
    private Path[] twins() throws Exception {
        Path first = folder.resolve("one-by-one.sqlite");
        try (HistoryStore store = HistoryStore.open(first.toString())) {
            for (int i = 1; i <= 3; i++) {
                store.append(Stores.lot("Invented Supplier 0", "P-0", "L-" + i, true, i - 1), at);
            }
        }
        assertFalse(Files.exists(Path.of(first + "-wal")), "the store was closed with its log folded in");
        Path second = folder.resolve("bulk.sqlite");
        Files.copy(first, second);
        return new Path[] {first, second};
    }

    /** Invented lots of a few suppliers and parts, with defect counts, and a correction of the store's record 2. */
    private static List<ObjectNode> lots() {
        List<ObjectNode> lots = new ArrayList<>();
        for (int i = 0; i < LOTS; i++) {
            int found = i % 5;
            Map<String, Integer> defects = found == 0 ? Map.of() : i % 2 == 0 ? Map.of("burr", found)
                    : Map.of("crack", 1, "burr", found - 1);
            lots.add(RecordContent.lot(new RecordContent.Lot("Invented Supplier " + i % 13, "P-" + i % 3, "B-" + i,
                    5000, LocalDate.of(2025, 1, 1).plusDays(i / 13), "bench", found <= 3 ? "accept" : "reject", 132,
                    found, defects, i % 11 == 0 ? "tightened" : "normal", "steady", 0, null), null, "import"));
        }
        ObjectNode correction = Stores.lot("Invented Supplier 0", "P-0", "L-2", true, 0);
        correction.put("supersedes", 2).put("reason", "recount (invented)");
        lots.add(LOTS / 2, correction);
        return lots;
    }

    @Test
    void aBulkLoadRecordsTheRowsHashesAndIndexesOfRecordingLotByLot() throws Exception {
        Path[] stores = twins();
        List<ObjectNode> lots = lots();
        try (HistoryStore store = HistoryStore.open(stores[0].toString())) {
            for (ObjectNode lot : lots) {
                store.append(lot, at);
            }
        }
        try (HistoryStore store = HistoryStore.open(stores[1].toString())) {
            assertEquals(lots.size(), store.appendEach(lots, lots.size(), at));
            HistoryStore.Verification verification = store.verify();
            assertTrue(verification.intact(), verification.problem());
            assertEquals(lots.size() + 3, verification.records());
        }
        for (String query : new String[] {"SELECT * FROM lot_record ORDER BY seq",
                "SELECT * FROM defect_count ORDER BY seq, defect", "SELECT * FROM chain_head",
                "SELECT type, name, tbl_name, sql FROM sqlite_master WHERE type = 'index' ORDER BY name"}) {
            assertEquals(Stores.rows(stores[0].toString(), query), Stores.rows(stores[1].toString(), query),
                    query);
        }
        assertEquals(4, Stores.rows(stores[1].toString(), "SELECT name FROM sqlite_master WHERE type = 'index'"
                + " AND sql IS NOT NULL").size(), "the lot key, supplier, corrections and defect indexes");
    }

    /** A new store takes 16 KiB pages; one made with SQLite's default 4 KiB keeps them, and takes loads alike. */
    @Test
    void aNewStoreTakesLargerPagesAndAnOlderStoreKeepsItsOwn() throws Exception {
        Path[] stores = twins();
        assertEquals(List.of(List.of(String.valueOf(HistoryStore.PAGE_SIZE))), pageSize(stores[0]));
        try (var connection = java.sql.DriverManager.getConnection("jdbc:sqlite:" + stores[1]);
                var statement = connection.createStatement()) {
            statement.execute("PRAGMA journal_mode = DELETE");
            statement.execute("PRAGMA page_size = 4096");
            statement.execute("VACUUM");
            statement.execute("PRAGMA journal_mode = WAL");
        }
        assertEquals(List.of(List.of("4096")), pageSize(stores[1]));
        List<ObjectNode> lots = lots();
        try (HistoryStore store = HistoryStore.open(stores[1].toString())) {
            assertEquals(lots.size(), store.appendEach(lots, lots.size(), at));
            store.append(Stores.lot("Invented Supplier 0", "P-0", "L-after", true, 0), at);
            HistoryStore.Verification verification = store.verify();
            assertTrue(verification.intact(), verification.problem());
            assertEquals(lots.size() + 4, verification.records());
        }
        assertEquals(List.of(List.of("4096")), pageSize(stores[1]));
    }

    private static List<List<String>> pageSize(Path store) throws Exception {
        return Stores.rows(store.toString(), "PRAGMA page_size");
    }

    @Test
    void aBulkLoadRefusesALotTheStoreHoldsAsRecordingLotByLotDoes() throws Exception {
        List<ObjectNode> lots = lots();
        lots.add(700, Stores.lot("Invented Supplier 0", "P-0", "L-3", true, 0));
        assertRefusedAlike(lots, "lot L-3 of Invented Supplier 0, part P-0 is already recorded as #3 in ");
    }

    @Test
    void aBulkLoadRefusesALotListedTwiceAsRecordingLotByLotDoes() throws Exception {
        List<ObjectNode> lots = lots();
        lots.add(900, lots.get(400).deepCopy());
        assertRefusedAlike(lots, "lot B-400 of Invented Supplier 10, part P-1 is already recorded as #0 in ");
    }

    @Test
    void aBulkLoadRefusesAControlCharacterInAnIdAsRecordingLotByLotDoes() throws Exception {
        List<ObjectNode> lots = lots();
        lots.get(800).put("inspector", "bench\u0007");
        assertRefusedAlike(lots, StoreException.class, "history store STORE: inspector 'bench");
    }

    @Test
    void aBulkLoadPassesOnWhatItsContentsThrowAndRecordsNothing() throws Exception {
        List<ObjectNode> lots = lots();
        Iterable<ObjectNode> failing = running(lots, 700, () -> {
            throw new IllegalStateException("no lot 700 (invented failure)");
        });
        // Passed on as it is (a list checked as it is read names its bad row so), in both ways of writing.
        assertRefusedAlike(failing, lots.size(), IllegalStateException.class, "no lot 700 (invented failure)");
    }

    private void assertRefusedAlike(List<ObjectNode> lots, String refusal) throws Exception {
        assertRefusedAlike(lots, lots.size(), StoreException.DuplicateLot.class, refusal);
    }

    private void assertRefusedAlike(List<ObjectNode> lots, Class<? extends StoreException> kind, String refusal)
            throws Exception {
        assertRefusedAlike(lots, lots.size(), kind, refusal);
    }

    /** Appends the lots lot by lot to one twin and as a bulk load to the other: both refuse them alike. */
    private void assertRefusedAlike(Iterable<ObjectNode> lots, int count, Class<? extends RuntimeException> kind,
            String refusal) throws Exception {
        Path[] stores = twins();
        List<String> messages = new ArrayList<>();
        for (int i = 0; i < 2; i++) {
            long expected = i == 0 ? 0 : count;
            try (HistoryStore store = HistoryStore.open(stores[i].toString())) {
                RuntimeException refused = assertThrows(kind, () -> store.appendEach(lots, expected, at));
                messages.add(refused.getMessage().replace(stores[i].toString(), "STORE"));
                HistoryStore.Verification verification = store.verify();
                assertTrue(verification.intact(), verification.problem());
                assertEquals(3, verification.records(), "nothing was recorded");
            }
        }
        assertEquals(messages.get(0), messages.get(1));
        assertTrue(messages.get(1).startsWith(refusal), messages.get(1));
        String indexes = "SELECT name, sql FROM sqlite_master WHERE type = 'index' ORDER BY name";
        assertEquals(Stores.rows(stores[0].toString(), indexes), Stores.rows(stores[1].toString(), indexes),
                "the indexes are back");
    }

    /** The lots, running {@code action} as the load asks for the lot at {@code index} (from 0). */
    private static Iterable<ObjectNode> running(List<ObjectNode> lots, int index, Runnable action) {
        return () -> new Iterator<>() {
            private int next;

            @Override
            public boolean hasNext() {
                return next < lots.size();
            }

            @Override
            public ObjectNode next() {
                if (next == index) {
                    action.run();
                }
                return lots.get(next++);
            }
        };
    }

    private static List<String> journalFiles(Path store) {
        List<String> files = new ArrayList<>();
        for (String suffix : new String[] {"-journal", "-wal"}) {
            if (Files.exists(Path.of(store + suffix))) {
                files.add(suffix);
            }
        }
        return files;
    }

    @Test
    void aBulkLoadThatHasTheStoreToItselfWritesThroughARollbackJournalAndLeavesTheLogModeAfter() throws Exception {
        Path file = twins()[1];
        List<ObjectNode> lots = lots();
        List<List<String>> midway = new ArrayList<>();
        try (HistoryStore store = HistoryStore.open(file.toString())) {
            store.appendEach(running(lots, lots.size() / 2, () -> midway.add(journalFiles(file))), lots.size(), at);
            assertEquals(List.of(List.of("wal")), Stores.rows(file.toString(), "PRAGMA journal_mode"));
        }
        assertEquals(List.of(List.of("-journal")), midway, "a rollback journal and no log during the load");
        assertEquals(List.of(), journalFiles(file), "nothing left beside the store");
        try (HistoryStore store = HistoryStore.open(file.toString())) {
            assertEquals(lots.size() + 3, store.verify().records());
        }
    }

    @Test
    void aBulkLoadStaysInTheLogWhileAnotherConnectionHasTheStoreOpen() throws Exception {
        Path file = twins()[1];
        List<ObjectNode> lots = lots();
        List<List<String>> midway = new ArrayList<>();
        try (HistoryStore reader = HistoryStore.open(file.toString());
                HistoryStore store = HistoryStore.open(file.toString())) {
            assertEquals(3, reader.rows(null, null).size());
            store.appendEach(running(lots, lots.size() / 2, () -> midway.add(journalFiles(file))), lots.size(), at);
            assertEquals(lots.size() + 3, reader.rows(null, null).size());
        }
        assertEquals(List.of(List.of("-wal")), midway, "the log, and no rollback journal, during the load");
    }

    @Test
    void aStoreOpenedDuringABulkLoadWaitsForItsCommit() throws Exception {
        Path file = twins()[1];
        List<ObjectNode> lots = lots();
        AtomicReference<Object> seen = new AtomicReference<>();
        Thread opener = new Thread(() -> {
            try (HistoryStore store = HistoryStore.open(file.toString())) {
                seen.set(store.rows(null, null).size());
            } catch (RuntimeException e) {
                seen.set(e);
            }
        });
        try (HistoryStore store = HistoryStore.open(file.toString())) {
            store.appendEach(running(lots, lots.size() / 2, () -> {
                opener.start();
                // The opener finds the store held in rollback-journal mode and waits between its tries.
                while (opener.isAlive() && opener.getState() != Thread.State.TIMED_WAITING) {
                    Thread.onSpinWait();
                }
            }), lots.size(), at);
        }
        opener.join();
        assertEquals(lots.size() + 3, seen.get(), "the opener read the store after the load's commit");
    }

    @Test
    void aBulkLoadKilledOnTheWayRecordsNothingAndTheStoreOpensAsBefore() throws Exception {
        Path file = twins()[1];
        String classpath = System.getProperty("surefire.test.class.path", System.getProperty("java.class.path"));
        Random random = new Random(2859);
        int count = 5000;
        for (int round = 0; round < 3; round++) {
            Process process = new ProcessBuilder(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                    "-Xmx128m", "-Dlog4j.provider=org.apache.logging.log4j.simple.internal.SimpleProvider", "-cp",
                    classpath, BulkRecorder.class.getName(), file.toString(), Integer.toString(count))
                    .redirectErrorStream(true).start();
            // A count of lots handed over, not a time, so that a slow machine moves the kill point nowhere.
            String killAt = "writing " + (1 + random.nextInt(count / 100 - 1));
            try (BufferedReader out = new BufferedReader(new InputStreamReader(process.getInputStream(),
                    StandardCharsets.UTF_8))) {
                String line = out.readLine();
                while (line != null && !line.equals(killAt)) {
                    line = out.readLine();
                }
                assertEquals(killAt, line, "round " + round + ": the load ended before it was killed");
                process.destroyForcibly(); // SIGKILL on Linux
            }
            process.waitFor();
            try (HistoryStore store = HistoryStore.open(file.toString())) {
                HistoryStore.Verification verification = store.verify();
                assertTrue(verification.intact(), "round " + round + ": " + verification.problem());
                assertEquals(3, verification.records(), "round " + round + ": nothing was recorded");
            }
            assertEquals(List.of(List.of("wal")), Stores.rows(file.toString(), "PRAGMA journal_mode"));
            assertEquals(4, Stores.rows(file.toString(), "SELECT name FROM sqlite_master WHERE type = 'index'"
                    + " AND sql IS NOT NULL").size(), "round " + round + ": the indexes are there");
        }
    }
}
