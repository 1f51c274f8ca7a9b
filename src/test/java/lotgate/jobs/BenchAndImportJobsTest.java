package lotgate.jobs;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import lotgate.history.HistoryStore;
import lotgate.history.Stores;
import lotgate.inspection.ResultWords;
import lotgate.inspection.SheetException;
import lotgate.sentencing.Stopping;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The bench inspection and history import jobs, driven directly: a unit at a time, a sheet of past lots. */
class BenchAndImportJobsTest {
    private static final Path BOLTS = Path.of("plans/arnwick-af-m8-40.json");
    private static final ResultWords WORDS = ResultWords.standard();

    @TempDir
    Path folder;

    private static InspectAtBench.Bench bolts(Path sheet) {
        return InspectAtBench.start(new InspectAtBench.Request(BOLTS, sheet, "B-"));
    }

    @Test
    void aSinglePlanRejectsAsSoonAsTheCountReachesItsRejectionNumber() {
        // The bolts plan is n = 132, c = 3 (the demo's saved plan); common practice: curtailed inspection of a single
        // plan rejects at the (c + 1)th nonconforming unit without inspecting the rest.
        InspectAtBench.Bench bench = bolts(null);
        for (String line : new String[] {"pass", "fail", "ok", "ng burr", "FAIL", "pass"}) {
            bench = bench.with(bench.parse(line, WORDS));
            assertFalse(bench.state().decided(), line);
        }
        bench = bench.with(bench.parse("bad thread damage", WORDS));
        InspectAtBench.State state = bench.state();
        assertEquals(7, state.units());
        assertEquals(4, state.found());
        assertEquals(Stopping.Verdict.REJECT, state.decision().verdict());
        assertEquals("thread damage", state.last().defect());
    }

    @Test
    void aCleanSampleIsAcceptedAtItsLastUnitAndNotBefore() {
        InspectAtBench.Bench bench = bolts(null);
        for (int i = 1; i < 132; i++) {
            bench = bench.with(new InspectAtBench.Unit(0, ""));
        }
        assertFalse(bench.state().decided());
        bench = bench.with(new InspectAtBench.Unit(0, ""));
        assertEquals(Stopping.Verdict.ACCEPT, bench.state().decision().verdict());
    }

    @Test
    void undoTakesBackTheLastUnitOnly() {
        InspectAtBench.Bench bench = bolts(null).with(new InspectAtBench.Unit(1, "burr"));
        bench = bench.with(new InspectAtBench.Unit(0, "")).withoutLast();
        assertEquals(1, bench.units().size());
        assertEquals(1, bench.state().found());
        InspectAtBench.Bench empty = bolts(null);
        assertEquals(empty, empty.withoutLast());
    }

    @Test
    void aLineThatIsNeitherAResultNorACountIsRefusedAsTheUnit() {
        InspectAtBench.Bench bench = bolts(null);
        JobException refused = assertThrows(JobException.class, () -> bench.parse("fial", WORDS));
        assertEquals("unit", refused.field());
        assertEquals(JobException.Kind.BAD_INPUT, refused.kind());
        // A pass/fail plan takes a count of 0 or 1 for a unit, never more.
        assertThrows(JobException.class, () -> bench.parse("2 burr", WORDS));
    }

    @Test
    void theUnitsAreWrittenAsASheetThatSentencingReads() throws IOException {
        Path sheet = folder.resolve("bench.csv");
        InspectAtBench.Bench bench = bolts(sheet).with(new InspectAtBench.Unit(0, ""))
                .with(new InspectAtBench.Unit(1, "burr"));
        assertEquals(sheet, bench.keep());
        assertEquals("unit,result,defect|B-1,pass,|B-2,fail,burr|", Files.readString(sheet)
                .replace("\r\n", "|").replace("\n", "|"));
        assertNull(bolts(sheet).keep());
    }

    @Test
    void aSheetThatIsNotCsvAndAPlanPerDefectClassAreRefused() {
        JobException sheet = assertThrows(JobException.class, () -> bolts(folder.resolve("bench.xlsx")));
        assertEquals("sheet", sheet.field());
        JobException classes = assertThrows(JobException.class, () -> InspectAtBench.start(
                new InspectAtBench.Request(Path.of("plans/kestrune-kc-114-classes.json"), null, "")));
        assertEquals("plan", classes.field());
        assertTrue(classes.getMessage().contains("criteria per defect class"), classes.getMessage());
    }

    private String newStore() {
        String store = folder.resolve("history.sqlite").toString();
        HistoryStore.open(store).close();
        return store;
    }

    @Test
    void importingPastLotsRecordsEachRowOnceAndTellsHowFarItIs() {
        String store = newStore();
        long[] rowsRead = {0};
        long[] recorded = {0};
        ImportHistory.Request request = new ImportHistory.Request(Path.of("demo-data/lots-2025.csv"), null, store);
        ImportHistory.Lots lots = ImportHistory.check(request, row -> rowsRead[0] = row);
        // The demo's invented list holds 49 lots under its header row.
        assertEquals(49, lots.lots().size());
        assertEquals(50, rowsRead[0]);
        ImportHistory.Result result = ImportHistory.record(lots, done -> recorded[0] = done);
        assertEquals(49, result.recorded());
        assertEquals(49, recorded[0]);
        SheetException again = assertThrows(SheetException.class, () -> ImportHistory.run(request));
        assertTrue(again.getMessage().contains("is already recorded as #1"), again.getMessage());
        assertTrue(again.getMessage().endsWith("(nothing was imported)"), again.getMessage());
    }

    @Test
    void aBadCellIsRefusedByItsPlaceBeforeAnythingIsRecorded() throws IOException {
        Path file = folder.resolve("past.csv");
        Files.writeString(file, "lot,supplier,part,received,sample size,nonconforming,verdict\n"
                + "L1,Sup (invented),P1,2025-02-03,50,1,accept\n"
                + "L2,Sup (invented),P1,2025-02-04,50,60,reject\n");
        String store = newStore();
        SheetException refused = assertThrows(SheetException.class, () -> ImportHistory.run(
                new ImportHistory.Request(file, null, store)));
        assertTrue(refused.getMessage().contains("60 nonconforming in a sample of 50"), refused.getMessage());
        try (HistoryStore opened = HistoryStore.open(store, false)) {
            assertEquals(0, opened.verify().records());
        }
    }
    @Test
    void aLongListIsRecordedAsTheSameLotsAreInTwoShortLists() throws Exception {
        // A list of at least HistoryStore's bulk size is written as a bulk load; two halves are written lot by lot.
        String header = "lot,supplier,part,received,lot size,sample size,nonconforming,verdict,acceptance number,"
                + "defects,production\n";
        StringBuilder first = new StringBuilder(header);
        StringBuilder second = new StringBuilder(header);
        java.util.Random random = new java.util.Random(1100);
        for (int i = 0; i < 1100; i++) {
            int found = random.nextInt(10) < 8 ? random.nextInt(2) : 2 + random.nextInt(3);
            String defects = found == 0 ? "" : found == 1 ? "burr:1" : "crack:1; burr:" + (found - 1);
            (i < 550 ? first : second).append("L-" + i + ",Invented Supplier " + i % 5 + ",P-" + i % 2 + ","
                    + java.time.LocalDate.of(2025, 1, 1).plusDays(i / 10) + ",2000,50," + found + ","
                    + (found <= 2 ? "accept" : "reject") + ",2," + defects + "," + (i % 97 == 0 ? "irregular" : "steady")
                    + "\n");
        }
        Path whole = folder.resolve("whole.csv");
        Files.writeString(whole, first + second.substring(header.length()));
        Path[] halves = {folder.resolve("first.csv"), folder.resolve("second.csv")};
        Files.writeString(halves[0], first);
        Files.writeString(halves[1], second);
        String bulk = folder.resolve("bulk.sqlite").toString();
        String byLot = folder.resolve("by-lot.sqlite").toString();
        HistoryStore.open(bulk).close();
        HistoryStore.open(byLot).close();
        assertEquals(1100, ImportHistory.run(new ImportHistory.Request(whole, null, bulk)).recorded());
        for (Path half : halves) {
            assertEquals(550, ImportHistory.run(new ImportHistory.Request(half, null, byLot)).recorded());
        }
        String records = "SELECT seq, kind, supplier, part, lot, lot_size, received, verdict, inspected, nonconforming,"
                + " supersedes, content, severity, production, lot_key, reinstates FROM lot_record ORDER BY seq";
        String defects = "SELECT seq, supplier, part, defect, units FROM defect_count ORDER BY seq, defect";
        for (String query : new String[] {records, defects}) {
            assertEquals(Stores.rows(byLot, query), Stores.rows(bulk, query), query);
        }
        assertTrue(Stores.rows(bulk, "SELECT seq FROM lot_record WHERE severity = 'tightened'").size() > 10,
                "the switching rules tightened inspection on some parts");
        for (String store : new String[] {bulk, byLot}) {
            try (HistoryStore opened = HistoryStore.open(store, false)) {
                assertTrue(opened.verify().intact());
            }
        }
    }

    private static final String HEADER = "lot,supplier,part,received,lot size,sample size,nonconforming,verdict\n";

    /** Invented past lots L-from to L-(to - 1) of three parts, one in ten rejected. */
    private static String lots(int from, int to) {
        StringBuilder rows = new StringBuilder();
        for (int i = from; i < to; i++) {
            boolean rejected = i % 10 == 3 || i % 10 == 6;
            rows.append("L-" + i + ",Invented Supplier,P-" + i % 3 + ","
                    + java.time.LocalDate.of(2025, 1, 1).plusDays(i / 10) + ",2000,50," + (rejected ? 4 : i % 2) + ","
                    + (rejected ? "reject" : "accept") + "\n");
        }
        return rows.toString();
    }

    private Path csv(String name, String rows) throws IOException {
        Path file = folder.resolve(name);
        Files.writeString(file, HEADER + rows);
        return file;
    }

    @Test
    void aLongListIntoAStoreWithLotsCarriesEachPartsSwitchingStateOnAsShortListsDo() throws Exception {
        // 600 lots first, then a list of 1,200 (more than the store holds: checked while it is recorded, each
        // part's history read in one pass); the twin store takes the same lots in lists of 600.
        Path start = csv("start.csv", lots(0, 600));
        Path longList = csv("long.csv", lots(600, 1800));
        String streamed = folder.resolve("streamed.sqlite").toString();
        String inShortLists = folder.resolve("short.sqlite").toString();
        HistoryStore.open(streamed).close();
        HistoryStore.open(inShortLists).close();
        assertEquals(600, ImportHistory.run(new ImportHistory.Request(start, null, streamed)).recorded());
        assertEquals(1200, ImportHistory.run(new ImportHistory.Request(longList, null, streamed)).recorded());
        for (int from = 0; from < 1800; from += 600) {
            Path part = csv("short-" + from + ".csv", lots(from, from + 600));
            assertEquals(600, ImportHistory.run(new ImportHistory.Request(part, null, inShortLists)).recorded());
        }
        String records = "SELECT seq, supplier, part, lot, verdict, nonconforming, severity, content, lot_key"
                + " FROM lot_record ORDER BY seq";
        assertEquals(Stores.rows(inShortLists, records), Stores.rows(streamed, records));
        assertTrue(Stores.rows(streamed, "SELECT seq FROM lot_record WHERE seq > 600 AND severity <> 'normal'")
                .size() > 10, "the switching rules moved some parts off normal inspection in the long list");
    }

    @Test
    void aBadRowFarDownALongListRecordsNothingAndRemovesTheStoreItCreated() throws Exception {
        Path file = csv("bad.csv", lots(0, 1500) + "L-1500,Invented Supplier,P-0,2025-13-01,2000,50,0,accept\n"
                + lots(1501, 1600));
        Path created = folder.resolve("new").resolve("history.sqlite");
        SheetException refused = assertThrows(SheetException.class, () -> ImportHistory.run(
                new ImportHistory.Request(file, null, created.toString()),
                () -> HistoryStore.openStaged(created.toString(), true), ImportHistory.Watch.NONE));
        assertTrue(refused.getMessage().contains("row 1502"), refused.getMessage());
        try (var left = Files.list(created.getParent())) {
            assertEquals(java.util.List.of(), left.toList(), "the store this import created is removed");
        }
        // Into a store that was there: nothing recorded, the store kept.
        String store = newStore();
        assertThrows(SheetException.class, () -> ImportHistory.run(new ImportHistory.Request(file, null, store)));
        try (HistoryStore opened = HistoryStore.open(store, false)) {
            assertEquals(0, opened.verify().records());
        }
    }

    @Test
    void aLotListedTwiceFarApartOrAlreadyRecordedIsRefusedByItsRowsInALongList() throws Exception {
        Path twice = csv("twice.csv", lots(0, 1400) + lots(7, 8));
        String store = newStore();
        SheetException refused = assertThrows(SheetException.class, () -> ImportHistory.run(
                new ImportHistory.Request(twice, null, store)));
        assertEquals(twice + ": row 1402: lot L-7 of Invented Supplier, part P-1 is listed twice (first row 9); a lot"
                + " is recorded once (nothing was imported)", refused.getMessage());
        assertEquals(50, ImportHistory.run(new ImportHistory.Request(csv("some.csv", lots(0, 50)), null, store))
                .recorded());
        SheetException recorded = assertThrows(SheetException.class, () -> ImportHistory.run(
                new ImportHistory.Request(csv("again.csv", lots(50, 1300) + lots(20, 21)), null, store)));
        assertTrue(recorded.getMessage().contains("row 1252: lot L-20 of Invented Supplier, part P-2 is already"
                + " recorded as #21 in "), recorded.getMessage());
        try (HistoryStore opened = HistoryStore.open(store, false)) {
            assertEquals(50, opened.verify().records());
        }
    }

    @Test
    void lotsThatOnlyShareAHashAreAllTakenAndATrueRepeatIsStillFound() throws Exception {
        // Every lot given the same hash: each is told apart from the earlier ones by reading their rows again.
        ImportHistory.Request distinct = new ImportHistory.Request(csv("distinct.csv", lots(0, 40)), null, "unused");
        assertEquals(40, ImportHistory.check(distinct, row -> { }, lot -> 42L).lots().size());
        ImportHistory.Request repeated = new ImportHistory.Request(csv("repeated.csv", lots(0, 40) + lots(12, 13)),
                null, "unused");
        SheetException refused = assertThrows(SheetException.class, () -> ImportHistory.check(repeated, row -> { },
                lot -> 42L));
        assertTrue(refused.getMessage().contains("row 42: lot L-12 of Invented Supplier, part P-0 is listed twice"
                + " (first row 14)"), refused.getMessage());
    }

    @Test
    void theTableOfSeenLotsGivesBackTheEarlierRowsOfAHashInOrder() {
        ImportHistory.SeenLots seen = new ImportHistory.SeenLots();
        for (int row = 2; row < 20_000; row++) {
            assertEquals(java.util.List.of(), seen.add(row * 0x9E3779B97F4A7C15L, row));
        }
        assertEquals(java.util.List.of(5), seen.add(5 * 0x9E3779B97F4A7C15L, 30_000));
        assertEquals(java.util.List.of(5, 30_000), seen.add(5 * 0x9E3779B97F4A7C15L, 30_001));
        assertEquals(java.util.List.of(), seen.add(0, 30_002));
        assertEquals(java.util.List.of(30_002), seen.add(1, 30_003), "0 is kept as 1: both are one hash");
    }

    @Test
    void aNewStoreTakesItsPlaceOnlyOnceTheImportIsDoneAndNeverReplacesOneMadeMeanwhile() throws Exception {
        Path file = csv("long.csv", lots(0, 1500));
        Path place = folder.resolve("history.sqlite");
        boolean[] absentWhileRecording = {false};
        ImportHistory.Watch looking = new ImportHistory.Watch() {
            @Override
            public void recorded(long lots) {
                if (lots == 700) {
                    absentWhileRecording[0] = !Files.exists(place);
                }
            }
        };
        ImportHistory.Result result = ImportHistory.run(new ImportHistory.Request(file, null, place.toString()),
                () -> HistoryStore.openStaged(place.toString(), true), looking);
        assertEquals(1500, result.recorded());
        assertTrue(absentWhileRecording[0], "no other command can open the new store before it is done");
        try (var files = Files.list(folder)) {
            assertEquals(java.util.List.of(place.getFileName().toString(), "long.csv"), files.map(f -> f.getFileName()
                    .toString()).sorted().toList(), "nothing of the hidden store is left");
        }
        try (HistoryStore opened = HistoryStore.open(place.toString(), false)) {
            assertEquals(1500, opened.verify().records());
        }
        // Another command makes a store at the place while a second import into a new store runs there.
        Path other = folder.resolve("other.sqlite");
        ImportHistory.Watch makingOne = new ImportHistory.Watch() {
            @Override
            public void recorded(long lots) {
                if (lots == 700) {
                    HistoryStore.open(other.toString(), true).close();
                }
            }
        };
        lotgate.history.StoreException refused = assertThrows(lotgate.history.StoreException.class,
                () -> ImportHistory.run(new ImportHistory.Request(file, null, other.toString()),
                        () -> HistoryStore.openStaged(other.toString(), true), makingOne));
        assertEquals("history store " + other + " was created by another command while this one ran; nothing was"
                + " recorded", refused.getMessage());
        try (HistoryStore kept = HistoryStore.open(other.toString(), false)) {
            assertEquals(0, kept.verify().records(), "the other command's store is kept as it made it");
        }
        try (var files = Files.list(folder)) {
            assertEquals(3, files.count(), "the refused import left nothing beside the stores and the list");
        }
        // A store named by its JDBC address, with a setting: made hidden with the setting, published at its path.
        Path addressed = folder.resolve("addressed.sqlite");
        String url = "jdbc:sqlite:" + addressed + "?busy_timeout=5000";
        assertEquals(20, ImportHistory.run(new ImportHistory.Request(csv("short.csv", lots(0, 20)), null, url),
                () -> HistoryStore.openStaged(url, true), ImportHistory.Watch.NONE).recorded());
        try (HistoryStore opened = HistoryStore.open(addressed.toString(), false)) {
            assertEquals(20, opened.verify().records());
        }
    }

    @Test
    void theWatchIsToldTheCommitOnceAfterTheLastLotOfALongOrAShortList() throws Exception {
        for (int count : new int[] {1200, 30}) {
            String store = folder.resolve("watched-" + count + ".sqlite").toString();
            HistoryStore.open(store).close();
            java.util.List<String> told = new java.util.ArrayList<>();
            ImportHistory.Watch watch = new ImportHistory.Watch() {
                private long last;

                @Override
                public synchronized void recorded(long lots) {
                    last = lots;
                }

                @Override
                public synchronized void committing(long lots) {
                    told.add("committing " + lots + " after " + last);
                }
            };
            ImportHistory.run(new ImportHistory.Request(csv("watched-" + count + ".csv", lots(0, count)), null, store),
                    () -> HistoryStore.open(store, false), watch);
            assertEquals(java.util.List.of("committing " + count + " after " + count), told);
        }
    }
}
