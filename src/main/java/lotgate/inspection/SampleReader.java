package lotgate.inspection;

import java.util.ArrayList;
import java.util.EnumSet;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import lotgate.plan.DefectClass;

/**
 * Reads an inspection sheet into an {@link InspectionSample}: the header is the first of the top
 * {@link SheetSource#HEADER_SEARCH} rows that names a result column or defect class count columns (rows above it,
 * such as a form's title block, are passed over), or the row given; each later non-blank row is one inspected unit.
 * Every bad value is refused with the cell it stands in; a merged cell that would hide a unit's value is refused
 * with its range.
 */
public final class SampleReader implements RowHandler {
    private java.util.function.LongConsumer rowsRead = row -> { };
    /** Nonconforming units kept for reports; the counts cover all of them. */
    public static final int KEPT_UNITS = 1000;
    /** Distinct defect types kept; more are counted under "(other types)". */
    private static final int KEPT_TYPES = 1000;
    /** The most nonconformities one unit may have of a class: far more than any real unit, and sums stay exact. */
    public static final int MAX_COUNT = 1_000_000;

    private final SheetSource source;
    private final String sheet;
    private final Columns columns;
    private final int[] cutoffs;
    private final int fromRow;
    private final int toRow;
    private final ResultWords words;

    private final SampleRows rows;
    private int headerRow = -1;
    private final List<String> headers = new ArrayList<>();
    private Columns.Role[] roleByColumn = new Columns.Role[0];
    private final Map<Columns.Role, Integer> columnByRole = new HashMap<>();
    private boolean passFail;
    private final Set<DefectClass> classColumns = EnumSet.noneOf(DefectClass.class);

    private int units;
    private int unitLimit = Integer.MAX_VALUE;
    private boolean stoppedAtLimit;
    private int firstRow = -1;
    private int lastRow = -1;
    private final int[] unitCounts = new int[DefectClass.values().length];
    private final long[] nonconformityCounts = new long[DefectClass.values().length];
    private final Map<Integer, Tally> tallies = new TreeMap<>();
    private final List<InspectedUnit> kept = new ArrayList<>();
    private int nonconformingTotal;
    private final Map<String, Integer> defectTypes = new LinkedHashMap<>();
    private int firstCriticalRow = -1;
    private final UnitIds unitIds = new UnitIds();
    private final java.util.BitSet nonconformingRows = new java.util.BitSet();
    private int[] sequence;

    /**
     * @param sheet   the sheet to read, or null for the first sheet not named "lot"
     * @param columns the column names, the header row (or 0 to search), the CSV separator and the result words
     * @param cutoffs the sample prefixes to count separately (each class's n)
     * @param fromRow the first sheet row of the sample, or 0 for all rows after the header
     * @param toRow   the last sheet row of the sample, or 0 for the end of the sheet
     */
    public SampleReader(SheetSource source, String sheet, Columns columns, int[] cutoffs, int fromRow, int toRow) {
        this.source = source;
        this.sheet = sheet != null ? sheet : source.firstSampleSheet();
        this.columns = columns;
        this.cutoffs = cutoffs.clone();
        this.fromRow = fromRow;
        this.toRow = toRow;
        this.words = columns.resultWords();
        this.rows = new SampleRows(source, this.sheet, new SampleRows.Header(this::isHeader, wanted(), "result=Outcome",
                true), columns, fromRow, toRow);
        if (columns.delimiter() != null) {
            source.useDelimiter(columns.delimiter());
        }
    }

    /** Tells {@code rowsRead} the number of each sheet row read, for a progress line. */
    public SampleReader telling(java.util.function.LongConsumer rowsRead) {
        this.rowsRead = rowsRead;
        return this;
    }

    /**
     * Stops reading once the sheet has shown more units than the limit: a sheet far larger than any sample of
     * the plan is refused without reading its every row ({@link #stoppedAtLimit()} then says so).
     */
    public SampleReader stopAfter(int limit) {
        unitLimit = limit;
        return this;
    }

    /** Whether reading stopped past the unit limit, so that the sheet holds more units than that. */
    public boolean stoppedAtLimit() {
        return stoppedAtLimit;
    }

    /**
     * Also keeps every unit's count of nonconformities in sheet order (1 for a failed unit of a pass/fail
     * sheet), for plans that decide unit by unit.
     */
    public SampleReader keepSequence() {
        sequence = new int[64];
        return this;
    }

    /** Reads the whole sheet and checks unit identifiers for repeats. */
    public InspectionSample read() {
        rows.read(this);
        if (headerRow < 0) {
            if (rows.rowsLookedAt() == 0) {
                throw new SheetException(source.file(), where() + " is empty: there is no header row");
            }
            throw rows.headerNotFound();
        }
        confirmRepeats();
        return new InspectionSample(source.file(), sheet, headerRow, List.copyOf(headers), passFail,
                Set.copyOf(classColumns), units, firstRow, lastRow, Map.copyOf(tallies),
                new Tally(units, unitCounts, nonconformityCounts), List.copyOf(kept), nonconformingTotal,
                Map.copyOf(defectTypes), firstCriticalRow, nonconformingRows,
                sequence == null ? null : java.util.Arrays.copyOf(sequence, units));
    }

    private String where() {
        return rows.where();
    }

    /** Whether a row's cell texts name a result column or a defect class count column. */
    private boolean isHeader(List<String> texts) {
        for (String text : texts) {
            Columns.Role role = columns.roleOf(text);
            if (role == Columns.Role.RESULT || role == Columns.Role.CRITICAL || role == Columns.Role.MAJOR
                    || role == Columns.Role.MINOR) {
                return true;
            }
        }
        return false;
    }

    @Override
    public void row(int row, List<Cell> cells) {
        rowsRead.accept(row);
        switch (rows.kind(row, cells)) {
            case HEADER -> header(row, cells);
            case UNIT -> unitRow(row, cells);
            default -> {
            }
        }
    }

    private void unitRow(int row, List<Cell> cells) {
        if (units >= Cell.MAX_ROW) {
            throw new SheetException(source.file(), where() + " holds more than " + Cell.MAX_ROW + " units, more"
                    + " rows than a spreadsheet has; name the sample's rows");
        }
        unit(row, cells);
        if (units > unitLimit) {
            stoppedAtLimit = true;
            throw new RowHandler.Stop();
        }
    }

    private String wanted() {
        return "a '" + columns.nameOf(Columns.Role.RESULT) + "' column or defect class count columns ("
                + columns.nameOf(Columns.Role.CRITICAL) + ", " + columns.nameOf(Columns.Role.MAJOR) + ", "
                + columns.nameOf(Columns.Role.MINOR) + ")";
    }

    private void header(int row, List<Cell> cells) {
        headerRow = row;
        if (fromRow > 0 && fromRow <= row) {
            throw new SheetException(source.file(), "the sample rows start at " + fromRow + ", but the header is "
                    + source.whereRow(sheet, row));
        }
        int width = cells.get(cells.size() - 1).column() + 1;
        roleByColumn = new Columns.Role[width];
        for (Cell cell : cells) {
            headers.add(cell.text().trim());
            Columns.Role role = columns.roleOf(cell.text());
            if (role == null) {
                continue;
            }
            Integer earlier = columnByRole.put(role, cell.column());
            if (earlier != null) {
                throw new SheetException(source.file(), "two columns are named '" + cell.text().trim() + "': "
                        + source.where(sheet, row, earlier) + " and " + source.where(sheet, row, cell.column()));
            }
            roleByColumn[cell.column()] = role;
        }
        boolean result = columnByRole.containsKey(Columns.Role.RESULT);
        for (Columns.Role role : new Columns.Role[] {Columns.Role.CRITICAL, Columns.Role.MAJOR, Columns.Role.MINOR}) {
            if (columnByRole.containsKey(role)) {
                classColumns.add(DefectClass.valueOf(role.name()));
            }
        }
        if (!result && classColumns.isEmpty()) {
            throw new SheetException(source.file(), "the header row, " + source.whereRow(sheet, row) + ", has no "
                    + wanted().substring(2) + "; the headers found are " + String.join(", ", headers)
                    + " (name your own with --columns, e.g. result=Outcome)");
        }
        if (result && !classColumns.isEmpty()) {
            throw new SheetException(source.file(), "the header, " + source.whereRow(sheet, row) + ", has both a '"
                    + columns.nameOf(Columns.Role.RESULT) + "' column and defect class count columns; keep one way of"
                    + " recording");
        }
        passFail = result;
    }

    /**
     * Refuses a merged range that covers a unit's unit, result, count or defect cell other than the range's
     * top-left cell: such a cell holds no value of its own, and a sheet read row by row would take it as blank.
     */
    @Override
    public void merged(List<MergedRange> ranges) {
        if (headerRow < 0) {
            return;
        }
        int first = Math.max(headerRow + 1, fromRow);
        int last = toRow > 0 ? Math.min(toRow, rows.lastRowSeen()) : rows.lastRowSeen();
        for (MergedRange range : ranges) {
            for (int column = range.firstColumn(); column <= range.lastColumn() && column < roleByColumn.length;
                    column++) {
                Columns.Role role = roleByColumn[column];
                if (role == null || role == Columns.Role.NOTE) {
                    continue;
                }
                int row = Math.max(first, range.firstRow());
                if (!range.hides(row, column)) {
                    row++;
                }
                if (row <= last && range.hides(row, column)) {
                    throw new SheetException(source.file(), source.where(sheet, row, column) + " is part of the"
                            + " merged range " + range.text() + ", so it holds no " + columns.nameOf(role) + " of its"
                            + " own; unmerge the cells and give every unit its own value on its own row");
                }
            }
        }
    }

    private void unit(int row, List<Cell> cells) {
        String unit = "";
        boolean failed = false;
        boolean hasResult = false;
        int critical = 0;
        int major = 0;
        int minor = 0;
        String defect = "";
        String note = "";
        for (Cell cell : cells) {
            Columns.Role role = cell.column() < roleByColumn.length ? roleByColumn[cell.column()] : null;
            if (role == null) {
                continue;
            }
            if (cell.kind() == Cell.Kind.FORMULA_WITHOUT_VALUE && (role == Columns.Role.DEFECT
                    || role == Columns.Role.NOTE)) {
                continue;
            }
            if (cell.kind() == Cell.Kind.FORMULA_WITHOUT_VALUE) {
                throw bad(row, cell, "the formula " + cell.text() + " has no saved value; open the sheet in a"
                        + " spreadsheet program, let it calculate, and save it");
            }
            if (cell.kind() == Cell.Kind.ERROR) {
                throw bad(row, cell, "the cell holds the error " + cell.text());
            }
            switch (role) {
                case UNIT -> unit = cell.text().trim();
                case RESULT -> {
                    Boolean word = cell.kind() == Cell.Kind.TEXT ? words.failed(cell.text()) : null;
                    if (word == null) {
                        throw bad(row, cell, columns.nameOf(role) + " '" + cell.text().trim() + "' is not a result"
                                + " word; the words are " + words.accepted() + " (add your own with --result-words)");
                    }
                    failed = word;
                    hasResult = true;
                }
                case CRITICAL -> critical = count(row, cell, role);
                case MAJOR -> major = count(row, cell, role);
                case MINOR -> minor = count(row, cell, role);
                case DEFECT -> defect = cell.text().trim();
                case NOTE -> note = cell.text().trim();
                default -> {
                }
            }
        }
        if (passFail && !hasResult) {
            int column = columnByRole.get(Columns.Role.RESULT);
            throw new SheetException(source.file(), source.where(sheet, row, column) + ": no "
                    + columns.nameOf(Columns.Role.RESULT) + " (pass or fail) for this unit");
        }
        if (!unit.isEmpty()) {
            unitIds.add(unit, row);
        }
        if (firstRow < 0) {
            firstRow = row;
        }
        lastRow = row;
        boolean nonconforming;
        if (passFail) {
            nonconforming = failed;
            if (failed) {
                unitCounts[DefectClass.ANY.ordinal()]++;
                nonconformityCounts[DefectClass.ANY.ordinal()]++;
            }
        } else {
            add(DefectClass.CRITICAL, critical);
            add(DefectClass.MAJOR, major);
            add(DefectClass.MINOR, minor);
            nonconforming = critical + major + minor > 0;
            if (nonconforming) {
                unitCounts[DefectClass.ANY.ordinal()]++;
                nonconformityCounts[DefectClass.ANY.ordinal()] += (long) critical + major + minor;
            }
            if (critical > 0 && firstCriticalRow < 0) {
                firstCriticalRow = row;
            }
        }
        if (nonconforming) {
            nonconformingTotal++;
            nonconformingRows.set(row);
            if (kept.size() < KEPT_UNITS) {
                kept.add(new InspectedUnit(row, unit, true, critical, major, minor, defect, note));
            }
            if (!defect.isEmpty()) {
                String type = defectTypes.size() < KEPT_TYPES || defectTypes.containsKey(defect)
                        ? defect : "(other types)";
                defectTypes.merge(type, 1, Integer::sum);
            }
        }
        if (sequence != null) {
            if (units == sequence.length) {
                sequence = java.util.Arrays.copyOf(sequence, 2 * units);
            }
            sequence[units] = passFail ? (failed ? 1 : 0) : critical + major + minor;
        }
        units++;
        for (int cutoff : cutoffs) {
            if (cutoff == units) {
                tallies.put(cutoff, new Tally(units, unitCounts, nonconformityCounts));
            }
        }
    }

    private void add(DefectClass defectClass, int count) {
        if (count > 0) {
            unitCounts[defectClass.ordinal()]++;
            nonconformityCounts[defectClass.ordinal()] += count;
        }
    }

    private int count(int row, Cell cell, Columns.Role role) {
        if (cell.kind() == Cell.Kind.DATE) {
            throw bad(row, cell, columns.nameOf(role) + " count cell is formatted as a date (it holds " + cell.text()
                    + "); a count is a plain whole number: format the cell as a number");
        }
        double value = cell.number();
        if (cell.kind() == Cell.Kind.TEXT) {
            try {
                value = Double.parseDouble(cell.text().trim());
            } catch (NumberFormatException e) {
                value = Double.NaN;
            }
        }
        if (value > MAX_COUNT && value == Math.rint(value)) {
            throw bad(row, cell, columns.nameOf(role) + " count '" + cell.text().trim() + "' is more than "
                    + String.format(Locale.ROOT, "%,d", MAX_COUNT) + " nonconformities in one unit");
        }
        if (cell.kind() == Cell.Kind.BOOLEAN || !(value >= 0) || value != Math.rint(value)) {
            throw bad(row, cell, columns.nameOf(role) + " count '" + cell.text().trim()
                    + "' is not a whole number of 0 or more");
        }
        return (int) value;
    }

    private SheetException bad(int row, Cell cell, String problem) {
        return new SheetException(source.file(), source.where(sheet, row, cell.column()) + ": " + problem);
    }

    /** Reads the suspected rows' identifiers again and refuses the first true repeat. */
    private void confirmRepeats() {
        if (!unitIds.suspects().isEmpty()) {
            unitIds.confirm(source, sheet, columnByRole.get(Columns.Role.UNIT));
        }
    }
}
