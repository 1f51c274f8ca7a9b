package lotgate.jobs;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.nio.file.Path;
import java.time.Instant;
import java.time.LocalDate;
import java.time.temporal.ChronoUnit;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.function.BiFunction;
import java.util.function.Consumer;
import java.util.function.Function;
import java.util.function.LongConsumer;
import java.util.function.Supplier;
import java.util.function.ToLongFunction;
import lotgate.files.MadeAhead;
import lotgate.history.HistoryStore;
import lotgate.history.Identifiers;
import lotgate.history.LotRow;
import lotgate.history.RecordContent;
import lotgate.history.Severity;
import lotgate.history.SeverityTracker;
import lotgate.history.SupplierHistory;
import lotgate.history.SwitchingRules;
import lotgate.inspection.Cell;
import lotgate.inspection.Days;
import lotgate.inspection.RowHandler;
import lotgate.inspection.SampleReader;
import lotgate.inspection.SheetException;
import lotgate.inspection.SheetSource;

/**
 * Importing past lots from a spreadsheet or CSV into the history, all or nothing: every row is checked, and the
 * lots are recorded in the file's order in one transaction, each with the inspection severity the switching rules
 * had its part under. A bad cell or a lot already recorded is a {@link SheetException} naming the file, sheet and
 * cell or row, and records nothing.
 *
 * <p>A short list is checked whole before the store is touched. A long one, of at least as many lots as a bulk load
 * takes ({@link HistoryStore#bulkLoadFrom}), is checked on a thread of its own while the lots before are recorded,
 * so that no more than the first of its lots are held at once; a bad row far down then rolls the transaction back,
 * and a store that this import created is removed again.
 */
public final class ImportHistory {

    /** The list of past lots (.xlsx, .xls or .csv), its sheet (null: the first), and the store to record into. */
    public record Request(Path file, String sheet, String store) {
    }

    /** The lots read from the file, checked, with the sheet row each came from. */
    public record Lots(Request request, SheetSource source, String sheetName, List<RecordContent.Lot> lots,
            List<Integer> rows) {
        public Lots {
            lots = List.copyOf(lots);
            rows = List.copyOf(rows);
        }
    }

    /** How many lots were recorded, from which file, into which store. */
    public record Result(long recorded, Path file, String store) {
    }

    /** What an import tells as it goes (from any of its threads, one call at a time); each is ignored by default. */
    public interface Watch {
        /** A sheet row was read. */
        default void rowRead(long row) {
        }

        /** The lots begin to be recorded: this many, or 0 while the rest of the list is still being checked. */
        default void recording(long lots) {
        }

        /** This many lots are recorded so far (committed only when the import returns). */
        default void recorded(long lots) {
        }

        /** All of the list's lots are on their way to the store: the store's indexes and commit come next. */
        default void committing(long lots) {
        }

        /** Told nothing. */
        Watch NONE = new Watch() {
        };
    }

    /** A checked lot and the sheet row it came from. */
    private record Checked(RecordContent.Lot lot, int row) {
    }

    /** Where the rows were read: to name a row in a message. */
    private record Origin(Path file, SheetSource source, String sheetName) {
        String where(int row) {
            return source.whereRow(sheetName, row);
        }
    }

    private static final List<String> REQUIRED = List.of("lot", "supplier", "part", "received", "sample size",
            "nonconforming", "verdict");
    private static final List<String> OPTIONAL = List.of("lot size", "acceptance number", "inspector", "defects",
            "production");

    private ImportHistory() {
    }

    /** Imports into a store that must exist. */
    public static Result run(Request request) {
        return run(request, () -> HistoryStore.open(request.store(), false), Watch.NONE);
    }

    /**
     * Imports the list into the store {@code open} opens, telling {@code watch} how far it is. A store it may
     * create should be opened by {@link HistoryStore#openStaged}: the import publishes it when all is recorded,
     * and removes it when the import fails.
     */
    public static Result run(Request request, Supplier<HistoryStore> open, Watch watch) {
        Origin[] origin = new Origin[1];
        HistoryStore store = null;
        try (MadeAhead<Checked> rows = MadeAhead.pushed(sink -> check(request, watch::rowRead, opened ->
                origin[0] = opened, sink, ImportHistory::hash), "lotgate-import-check")) {
            List<Checked> lead = new ArrayList<>();
            long bulkFrom = HistoryStore.BULK;
            while (lead.size() < bulkFrom && rows.hasNext()) {
                lead.add(rows.next());
                if (lead.size() == HistoryStore.BULK && store == null) {
                    store = open.get();
                    bulkFrom = store.bulkLoadFrom();
                }
            }
            if (store == null) {
                store = open.get();
            }
            Result result = lead.size() < bulkFrom
                    ? record(store, origin[0], lead, watch)
                    : recordStreaming(store, origin[0], lead, rows, watch);
            store.publish();
            return result;
        } catch (RuntimeException | Error e) {
            if (store != null) {
                store.discardIfCreated();
            }
            throw e;
        }
    }

    /**
     * Reads the header and every row, refusing a missing column, a bad cell, a lot listed twice or an empty
     * list; tells {@code rowsRead} each sheet row read.
     */
    public static Lots check(Request request, LongConsumer rowsRead) {
        return check(request, rowsRead, ImportHistory::hash);
    }

    /** Checks every row as {@link #check(Request, LongConsumer)} does, with a lot's hash given (tests make it weak). */
    static Lots check(Request request, LongConsumer rowsRead, ToLongFunction<RecordContent.Lot> hash) {
        Origin[] origin = new Origin[1];
        List<RecordContent.Lot> lots = new ArrayList<>();
        List<Integer> rows = new ArrayList<>();
        check(request, rowsRead, opened -> origin[0] = opened, checked -> {
            lots.add(checked.lot());
            rows.add(checked.row());
        }, hash);
        return new Lots(request, origin[0].source(), origin[0].sheetName(), lots, rows);
    }

    /**
     * Checks every row, handing each lot to {@code lots} in the file's order and telling {@code opened} where
     * they are read before the first; refuses a missing column, a bad cell, a lot listed twice or an empty list.
     */
    private static void check(Request request, LongConsumer rowsRead, Consumer<Origin> opened,
            Consumer<Checked> lots, ToLongFunction<RecordContent.Lot> hash) {
        Path file = request.file();
        SheetSource source = SheetSource.open(file);
        String sheetName = request.sheet() != null ? request.sheet() : source.sheetNames().get(0);
        opened.accept(new Origin(file, source, sheetName));
        SeenLots seen = new SeenLots();
        Map<String, Integer> columns = new HashMap<>();
        Map<Object, Object> shared = new HashMap<>();
        HeaderSearch search = new HeaderSearch();
        long[] count = new long[1];
        source.findHeader(texts -> search.missing(texts).isEmpty());
        source.read(request.sheet(), (row, cells) -> {
            rowsRead.accept(row);
            if (columns.isEmpty()) {
                List<String> texts = cells.stream().map(Cell::text).toList();
                if (!search.missing(texts).isEmpty()) {
                    search.look(row, texts);
                    if (row >= SheetSource.HEADER_SEARCH) {
                        throw search.refusal(file, source, sheetName);
                    }
                    return;
                }
                for (Cell cell : cells) {
                    String name = cell.text().trim().toLowerCase(Locale.ROOT);
                    if (REQUIRED.contains(name) || OPTIONAL.contains(name)) {
                        columns.putIfAbsent(name, cell.column());
                    }
                }
                return;
            }
            RecordContent.Lot lot = lot(file, source, sheetName, row, cells, shared, columns);
            List<Integer> alike = seen.add(hash.applyAsLong(lot), row);
            Integer first = alike.isEmpty() ? null : listedAt(request, columns, alike, lot);
            if (first != null) {
                throw new SheetException(file, source.whereRow(sheetName, row) + ": lot " + lot.lot() + " of "
                        + lot.supplier() + ", part " + lot.part() + " is listed twice (first " + source.whereRow(
                        sheetName, first) + "); a lot is recorded once (nothing was imported)");
            }
            count[0]++;
            lots.accept(new Checked(lot, row));
        });
        if (columns.isEmpty()) {
            throw search.refusal(file, source, sheetName);
        }
        if (count[0] == 0) {
            throw new SheetException(file, "no lots to import below the header");
        }
    }

    /**
     * The lots listed so far, each by a 64-bit hash of its supplier, part and lot and the row it came on: 12 bytes
     * a lot in a table at most half full, where the texts themselves took about 170 (a list of 400,000 lots held 68
     * MB). Two lots of one hash are told apart by reading the earlier rows again ({@link #listedAt}): a lot listed
     * twice is refused naming both rows, and two lots that only share a hash are both taken.
     */
    static final class SeenLots {
        private long[] hashes = new long[1 << 12];
        private int[] rows = new int[hashes.length];
        private int size;
        /** The later rows of each hash that more than one row had. */
        private final Map<Long, List<Integer>> more = new HashMap<>();

        /** Notes the row's lot by its hash; returns the earlier rows of the same hash, in order (empty: none). */
        List<Integer> add(long hash, int row) {
            long key = hash == 0 ? 1 : hash; // 0 marks an empty place
            int mask = hashes.length - 1;
            for (int i = place(key) & mask; ; i = (i + 1) & mask) {
                if (hashes[i] == 0) {
                    hashes[i] = key;
                    rows[i] = row;
                    if (++size * 2 > hashes.length) {
                        grow();
                    }
                    return List.of();
                }
                if (hashes[i] == key) {
                    List<Integer> earlier = new ArrayList<>();
                    earlier.add(rows[i]);
                    List<Integer> later = more.computeIfAbsent(key, k -> new ArrayList<>());
                    earlier.addAll(later);
                    later.add(row);
                    return earlier;
                }
            }
        }

        private static int place(long key) {
            // MurmurHash3's finalizer, so that nearby hashes spread over the table.
            long h = key;
            h = (h ^ (h >>> 33)) * 0xff51afd7ed558ccdL;
            h = (h ^ (h >>> 33)) * 0xc4ceb9fe1a85ec53L;
            return (int) (h ^ (h >>> 33));
        }

        private void grow() {
            long[] oldHashes = hashes;
            int[] oldRows = rows;
            hashes = new long[oldHashes.length * 2];
            rows = new int[hashes.length];
            int mask = hashes.length - 1;
            for (int j = 0; j < oldHashes.length; j++) {
                if (oldHashes[j] != 0) {
                    int i = place(oldHashes[j]) & mask;
                    while (hashes[i] != 0) {
                        i = (i + 1) & mask;
                    }
                    hashes[i] = oldHashes[j];
                    rows[i] = oldRows[j];
                }
            }
        }
    }

    /** A lot's 64-bit FNV-1a hash of its supplier, part and lot, each text ended by a character no name holds. */
    static long hash(RecordContent.Lot lot) {
        long h = 0xcbf29ce484222325L;
        for (String text : new String[] {lot.supplier(), lot.part(), lot.lot()}) {
            for (int i = 0; i < text.length(); i++) {
                h = (h ^ text.charAt(i)) * 0x100000001b3L;
            }
            h = (h ^ 0xffff) * 0x100000001b3L;
        }
        return h;
    }

    /**
     * The first of the earlier rows (in order) that lists the same lot, read again from the file, or null when
     * they only share its hash.
     */
    private static Integer listedAt(Request request, Map<String, Integer> columns, List<Integer> rows,
            RecordContent.Lot lot) {
        SheetSource again = SheetSource.open(request.file());
        String sheetName = request.sheet() != null ? request.sheet() : again.sheetNames().get(0);
        HeaderSearch search = new HeaderSearch();
        again.findHeader(texts -> search.missing(texts).isEmpty());
        int last = rows.get(rows.size() - 1);
        Integer[] found = new Integer[1];
        again.read(request.sheet(), (row, cells) -> {
            if (row > last || found[0] != null) {
                throw new RowHandler.Stop();
            }
            if (rows.contains(row)) {
                RecordContent.Lot earlier = lot(request.file(), again, sheetName, row, cells, new HashMap<>(), columns);
                if (earlier.supplier().equals(lot.supplier()) && earlier.part().equals(lot.part())
                        && earlier.lot().equals(lot.lot())) {
                    found[0] = row;
                }
            }
        });
        return found[0];
    }

    /**
     * The search for the header row: the first of the top rows that names every required column, so that a
     * title block above the table is passed over; the row that came closest is kept for the message.
     */
    private static final class HeaderSearch {
        private int looked;
        private int closestRow;
        private List<String> closestMissing = REQUIRED;

        /** The required columns the row does not name. */
        List<String> missing(List<String> texts) {
            List<String> names = texts.stream().map(t -> t.trim().toLowerCase(Locale.ROOT)).toList();
            return REQUIRED.stream().filter(name -> !names.contains(name)).toList();
        }

        void look(int row, List<String> texts) {
            looked++;
            List<String> missing = missing(texts);
            if (missing.size() < closestMissing.size()) {
                closestRow = row;
                closestMissing = missing;
            }
        }

        SheetException refusal(Path file, SheetSource source, String sheetName) {
            if (looked == 0) {
                return new SheetException(file, "there is no header row: the file is empty");
            }
            String closest = closestRow == 0 ? "none of them names any of these"
                    : "the closest, " + source.whereRow(sheetName, closestRow) + ", lacks '"
                            + String.join("', '", closestMissing) + "'";
            return new SheetException(file, "no header row: none of the first " + looked + " non-empty rows (up to "
                    + SheetSource.HEADER_SEARCH + " are looked at) names every column a list of past lots needs ("
                    + String.join(", ", REQUIRED) + "); " + closest);
        }
    }

    /**
     * Records the checked lots in one transaction, refusing a lot the store holds already; tells
     * {@code lotsRecorded} each lot as it is written. The store must exist.
     */
    public static Result record(Lots checked, LongConsumer lotsRecorded) {
        List<Checked> lots = new ArrayList<>();
        for (int i = 0; i < checked.lots().size(); i++) {
            lots.add(new Checked(checked.lots().get(i), checked.rows().get(i)));
        }
        try (HistoryStore store = HistoryStore.open(checked.request().store(), false)) {
            return record(store, new Origin(checked.request().file(), checked.source(), checked.sheetName()), lots,
                    new Watch() {
                        @Override
                        public void recorded(long lots) {
                            lotsRecorded.accept(lots);
                        }
                    });
        }
    }

    /** Records lots all checked: each part's history is read as the part first comes. */
    private static Result record(HistoryStore store, Origin origin, List<Checked> lots, Watch watch) {
        Map<PartKey, Part> parts = new HashMap<>();
        for (Checked checked : lots) {
            Part part = parts.computeIfAbsent(key(checked.lot()), k -> Part.of(store, checked.lot()));
            part.refuseRecorded(store, origin, checked);
        }
        watch.recording(lots.size());
        long written = store.appendEach(() -> withSeverities(lots.iterator(), parts, store, origin, watch),
                lots.size(), Instant.now().truncatedTo(ChronoUnit.MILLIS));
        return new Result(written, origin.file(), store.location());
    }

    /**
     * Records the lots of a long list while the rest of it is still being checked (on the threads of the bulk
     * load): every part's history is read first, in one pass, since the store holds no more lots than the list.
     */
    private static Result recordStreaming(HistoryStore store, Origin origin, List<Checked> lead,
            Iterator<Checked> rest, Watch watch) {
        Map<PartKey, Part> parts = Part.all(store);
        long expected = lead.size();
        ArrayDeque<Checked> first = new ArrayDeque<>(lead);
        lead.clear();
        Iterator<Checked> all = new Iterator<>() {
            @Override
            public boolean hasNext() {
                return !first.isEmpty() || rest.hasNext();
            }

            @Override
            public Checked next() {
                Checked next = first.poll();
                return next != null ? next : rest.next();
            }
        };
        watch.recording(0);
        long written = store.appendEach(() -> withSeverities(all, parts, store, origin, watch), expected,
                Instant.now().truncatedTo(ChronoUnit.MILLIS));
        return new Result(written, origin.file(), store.location());
    }

    /** A supplier's part. */
    private record PartKey(String supplier, String part) {
    }

    private static PartKey key(RecordContent.Lot lot) {
        return new PartKey(lot.supplier(), lot.part());
    }

    /**
     * A part's recorded history, read once: its current record of each lot, and the switching state
     * after its last record, which the imported lots carry forward in file order.
     */
    private record Part(Map<String, Long> recorded, SeverityTracker tracker) {
        static Part of(HistoryStore store, RecordContent.Lot lot) {
            return of(store.rows(lot.supplier(), lot.part()));
        }

        private static Part of(List<LotRow> rows) {
            SupplierHistory history = new SupplierHistory(rows, SwitchingRules.CURRENT);
            Map<String, Long> recorded = new HashMap<>();
            for (SupplierHistory.Entry entry : history.entries()) {
                recorded.put(entry.row().lot(), entry.row().seq());
            }
            return new Part(recorded, history.continuation());
        }

        /** Every part the store holds lots of, from one reading of all its records. */
        static Map<PartKey, Part> all(HistoryStore store) {
            Map<PartKey, List<LotRow>> byPart = new LinkedHashMap<>();
            for (LotRow row : store.rows(null, null)) {
                byPart.computeIfAbsent(new PartKey(row.supplier(), row.part()), k -> new ArrayList<>()).add(row);
            }
            Map<PartKey, Part> parts = new HashMap<>();
            byPart.forEach((key, rows) -> parts.put(key, of(rows)));
            return parts;
        }

        /** A part the store holds no lot of. */
        static Part none() {
            return of(List.of());
        }

        void refuseRecorded(HistoryStore store, Origin origin, Checked checked) {
            RecordContent.Lot lot = checked.lot();
            Long existing = recorded.get(lot.lot());
            if (existing != null) {
                throw new SheetException(origin.file(), origin.where(checked.row()) + ": lot " + lot.lot() + " of "
                        + lot.supplier() + ", part " + lot.part() + " is already recorded as #" + existing + " in "
                        + store.location() + " (nothing was imported)");
            }
        }
    }

    /**
     * Each lot, as it is written, with the severity the switching rules had it under; a part not in {@code parts}
     * has no lot in the store, and a lot the store holds is refused.
     */
    private static Iterator<ObjectNode> withSeverities(Iterator<Checked> lots, Map<PartKey, Part> parts,
            HistoryStore store, Origin origin, Watch watch) {
        return new Iterator<>() {
            private long done;
            private boolean told;

            @Override
            public boolean hasNext() {
                boolean more = lots.hasNext();
                if (!more && !told) {
                    told = true;
                    watch.committing(done);
                }
                return more;
            }

            @Override
            public ObjectNode next() {
                Checked checked = lots.next();
                RecordContent.Lot lot = checked.lot();
                Part part = parts.computeIfAbsent(key(lot), k -> Part.none());
                part.refuseRecorded(store, origin, checked);
                watch.recorded(++done);
                SeverityTracker tracker = part.tracker();
                Severity severity = tracker.severity();
                if (severity != Severity.DISCONTINUED) {
                    tracker.lot(lot.lot(), "accept".equals(lot.verdict()), lot.nonconforming(),
                            !"irregular".equals(lot.production()));
                }
                RecordContent.Lot placed = new RecordContent.Lot(lot.supplier(), lot.part(), lot.lot(), lot.lotSize(),
                        lot.received(), lot.inspector(), lot.verdict(), lot.inspected(), lot.nonconforming(),
                        lot.defectTypes(), severity.label(), lot.production(), 0, null);
                return RecordContent.lot(placed, null, "import");
            }
        };
    }

    /**
     * One checked lot. Its names, days and words are taken from {@code shared} where an earlier lot had them
     * (added there otherwise): a long list repeats each supplier, part, inspector and day many times, and a short
     * list is held whole until all of it is checked.
     */
    private static RecordContent.Lot lot(Path file, SheetSource source, String sheetName, int row, List<Cell> cells,
            Map<Object, Object> shared, Map<String, Integer> columns) {
        int widest = 0;
        for (Cell c : cells) {
            widest = Math.max(widest, c.column());
        }
        Cell[] byColumn = new Cell[widest + 1];
        cells.forEach(c -> byColumn[c.column()] = c);
        Function<String, Cell> cell = name -> {
            Integer column = columns.get(name);
            return column == null || column >= byColumn.length ? null : byColumn[column];
        };
        BiFunction<String, String, SheetException> bad = (name, problem) -> new SheetException(file,
                source.where(sheetName, row, columns.get(name)) + ": " + problem);
        for (String name : REQUIRED) {
            if (cell.apply(name) == null) {
                throw bad.apply(name, name + " is missing");
            }
        }
        int inspected = whole(cell.apply("sample size"), 1, () -> bad.apply("sample size", "sample size '"
                + cell.apply("sample size").text() + "' is not a whole number of 1 or more"));
        int found = whole(cell.apply("nonconforming"), 0, () -> bad.apply("nonconforming", "nonconforming '"
                + cell.apply("nonconforming").text() + "' is not a whole number of 0 or more"));
        if (found > inspected) {
            throw bad.apply("nonconforming", found + " nonconforming in a sample of " + inspected);
        }
        String verdict = cell.apply("verdict").text().trim().toLowerCase(Locale.ROOT);
        if (!verdict.equals("accept") && !verdict.equals("reject")) {
            throw bad.apply("verdict", "verdict '" + cell.apply("verdict").text().trim() + "' is neither accept nor reject");
        }
        Cell acceptance = cell.apply("acceptance number");
        if (acceptance != null) {
            int c = whole(acceptance, 0, () -> bad.apply("acceptance number", "acceptance number '" + acceptance.text()
                    + "' is not a whole number of 0 or more"));
            if ((found <= c) != verdict.equals("accept")) {
                throw bad.apply("verdict", "verdict " + verdict + " does not follow from " + found
                        + " nonconforming with acceptance number " + c);
            }
        }
        Cell sizeCell = cell.apply("lot size");
        int lotSize = sizeCell == null ? 0 : whole(sizeCell, inspected, () -> bad.apply("lot size", "lot size '"
                + sizeCell.text() + "' is not a whole number of at least the sample size " + inspected));
        LocalDate received;
        try {
            received = Days.of(cell.apply("received"), "received");
        } catch (IllegalArgumentException e) {
            throw bad.apply("received", e.getMessage());
        }
        Map<String, Integer> defects = new LinkedHashMap<>();
        Cell defectCell = cell.apply("defects");
        if (defectCell != null) {
            for (String item : defectCell.text().split(";")) {
                if (item.isBlank()) {
                    continue;
                }
                int colon = item.lastIndexOf(':');
                try {
                    long count = Long.parseLong(item.substring(colon + 1).trim());
                    if (colon < 1 || count < 0) {
                        throw new NumberFormatException();
                    }
                    long sum = count + defects.getOrDefault(item.substring(0, colon).trim(), 0);
                    if (sum > SampleReader.MAX_COUNT) {
                        throw bad.apply("defects", "defects '" + item.trim() + "': more than "
                                + String.format(Locale.ROOT, "%,d", SampleReader.MAX_COUNT) + " of one type in a lot");
                    }
                    defects.put(sharedValue(shared, item.substring(0, colon).trim()), (int) sum);
                } catch (NumberFormatException | StringIndexOutOfBoundsException e) {
                    throw bad.apply("defects", "defects '" + item.trim() + "' is not type:count, as in burr:2");
                }
            }
        }
        Cell productionCell = cell.apply("production");
        String production = productionCell == null ? "steady" : productionCell.text().trim().toLowerCase(Locale.ROOT);
        if (!production.equals("steady") && !production.equals("irregular")) {
            throw bad.apply("production", "production '" + productionCell.text() + "' is neither steady nor irregular");
        }
        Cell inspector = cell.apply("inspector");
        for (String name : new String[] {"lot", "supplier", "part", "inspector"}) {
            String problem = cell.apply(name) == null ? null
                    : Identifiers.problem(name, cell.apply(name).text().trim());
            if (problem != null) {
                throw bad.apply(name, problem);
            }
        }
        return new RecordContent.Lot(sharedValue(shared, cell.apply("supplier").text().trim()),
                sharedValue(shared, cell.apply("part").text().trim()), cell.apply("lot").text().trim(), lotSize,
                sharedValue(shared, received), inspector == null ? null : sharedValue(shared, inspector.text().trim()),
                sharedValue(shared, verdict), inspected, found, compact(defects), null,
                sharedValue(shared, production), 0, null);
    }

    /** The defect counts in less memory where there are none or one (a linked map of one costs 170 bytes). */
    private static Map<String, Integer> compact(Map<String, Integer> defects) {
        if (defects.size() > 1) {
            return defects;
        }
        return defects.isEmpty() ? Map.of() : Map.copyOf(defects);
    }

    @SuppressWarnings("unchecked")
    private static <T> T sharedValue(Map<Object, Object> shared, T value) {
        return (T) shared.computeIfAbsent(value, v -> v);
    }

    private static int whole(Cell cell, int least, Supplier<SheetException> bad) {
        double value = cell.kind() == Cell.Kind.NUMBER ? cell.number()
                : cell.kind() == Cell.Kind.TEXT ? parse(cell.text()) : Double.NaN;
        if (!(value >= least) || value != Math.rint(value) || value > Integer.MAX_VALUE) {
            throw bad.get();
        }
        return (int) value;
    }

    private static double parse(String text) {
        try {
            return Double.parseDouble(text.trim());
        } catch (NumberFormatException e) {
            return Double.NaN;
        }
    }
}
