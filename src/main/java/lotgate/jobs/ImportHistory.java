package lotgate.jobs;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.nio.file.Path;
import java.time.Instant;
import java.time.LocalDate;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.function.BiFunction;
import java.util.function.Function;
import java.util.function.LongConsumer;
import java.util.function.Supplier;
import lotgate.history.HistoryStore;
import lotgate.history.Identifiers;
import lotgate.history.RecordContent;
import lotgate.history.Severity;
import lotgate.history.SeverityTracker;
import lotgate.history.SupplierHistory;
import lotgate.history.SwitchingRules;
import lotgate.inspection.Cell;
import lotgate.inspection.Days;
import lotgate.inspection.SampleReader;
import lotgate.inspection.SheetException;
import lotgate.inspection.SheetSource;

/**
 * Importing past lots from a spreadsheet or CSV into the history, all or nothing: every row is checked first
 * ({@link #check}), then the lots are recorded in the file's order in one transaction ({@link #record}), each
 * with the inspection severity the switching rules had its part under. A bad cell or a lot already recorded is
 * a {@link SheetException} naming the file, sheet and cell or row, and records nothing.
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

    private static final List<String> REQUIRED = List.of("lot", "supplier", "part", "received", "sample size",
            "nonconforming", "verdict");
    private static final List<String> OPTIONAL = List.of("lot size", "acceptance number", "inspector", "defects",
            "production");

    private ImportHistory() {
    }

    /** Reads and checks every row (the store must exist); records the lots. */
    public static Result run(Request request) {
        return record(check(request, row -> { }), row -> { });
    }

    /**
     * Reads the header and every row, refusing a missing column, a bad cell, a lot listed twice or an empty
     * list; tells {@code rowsRead} each sheet row read.
     */
    public static Lots check(Request request, LongConsumer rowsRead) {
        Path file = request.file();
        SheetSource source = SheetSource.open(file);
        String sheetName = request.sheet() != null ? request.sheet() : source.sheetNames().get(0);
        List<RecordContent.Lot> lots = new ArrayList<>();
        List<Integer> sheetRows = new ArrayList<>();
        Map<List<String>, Integer> seen = new HashMap<>();
        Map<String, Integer> columns = new HashMap<>();
        Map<Object, Object> shared = new HashMap<>();
        HeaderSearch search = new HeaderSearch();
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
            Integer first = seen.putIfAbsent(List.of(lot.supplier(), lot.part(), lot.lot()), row);
            if (first != null) {
                throw new SheetException(file, source.whereRow(sheetName, row) + ": lot " + lot.lot() + " of "
                        + lot.supplier() + ", part " + lot.part() + " is listed twice (first " + source.whereRow(
                        sheetName, first) + "); a lot is recorded once (nothing was imported)");
            }
            lots.add(lot);
            sheetRows.add(row);
        });
        if (columns.isEmpty()) {
            throw search.refusal(file, source, sheetName);
        }
        if (lots.isEmpty()) {
            throw new SheetException(file, "no lots to import below the header");
        }
        return new Lots(request, source, sheetName, lots, sheetRows);
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
        List<RecordContent.Lot> lots = checked.lots();
        try (HistoryStore store = HistoryStore.open(checked.request().store(), false)) {
            Map<String, Part> parts = new HashMap<>();
            for (int i = 0; i < lots.size(); i++) {
                RecordContent.Lot lot = lots.get(i);
                Part part = parts.computeIfAbsent(key(lot), k -> Part.of(store, lot));
                Long existing = part.recorded().get(lot.lot());
                if (existing != null) {
                    throw new SheetException(checked.request().file(), checked.source().whereRow(checked.sheetName(),
                            checked.rows().get(i)) + ": lot " + lot.lot() + " of " + lot.supplier() + ", part "
                            + lot.part() + " is already recorded as #" + existing + " in " + store.location()
                            + " (nothing was imported)");
                }
            }
            long written = store.appendEach(() -> withSeverities(lots, parts, lotsRecorded), lots.size(),
                    Instant.now().truncatedTo(ChronoUnit.MILLIS));
            return new Result(written, checked.request().file(), store.location());
        }
    }

    private static String key(RecordContent.Lot lot) {
        return lot.supplier() + "\u0000" + lot.part();
    }

    /**
     * A part's recorded history, read once: its current record of each lot, and the switching state
     * after its last record, which the imported lots carry forward in file order.
     */
    private record Part(Map<String, Long> recorded, SeverityTracker tracker) {
        static Part of(HistoryStore store, RecordContent.Lot lot) {
            SupplierHistory history = new SupplierHistory(store.rows(lot.supplier(), lot.part()),
                    SwitchingRules.CURRENT);
            Map<String, Long> recorded = new HashMap<>();
            for (SupplierHistory.Entry entry : history.entries()) {
                recorded.put(entry.row().lot(), entry.row().seq());
            }
            return new Part(recorded, history.continuation());
        }
    }

    /** Each lot, as it is written, with the severity the switching rules had it under. */
    private static Iterator<ObjectNode> withSeverities(List<RecordContent.Lot> lots, Map<String, Part> parts,
            LongConsumer recorded) {
        Iterator<RecordContent.Lot> each = lots.iterator();
        return new Iterator<>() {
            private long done;

            @Override
            public boolean hasNext() {
                return each.hasNext();
            }

            @Override
            public ObjectNode next() {
                RecordContent.Lot lot = each.next();
                recorded.accept(++done);
                SeverityTracker tracker = parts.get(key(lot)).tracker();
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
     * (added there otherwise): a long list repeats each supplier, part, inspector and day many times, and every
     * lot is held until all are checked.
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
