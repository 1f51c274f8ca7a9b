package lotgate.inspection;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Reads a sheet of measurements, one measured unit per row under a header with a value column (and
 * optionally unit and note columns): the values in sheet order with their rows. The header is the first of the
 * top {@link SheetSource#HEADER_SEARCH} rows that names the value column, or the row given. Every bad value is
 * refused by its cell; a repeated unit identifier is refused with both rows; a merged cell that would hide a
 * value is refused with its range.
 */
public final class MeasurementReader implements RowHandler {
    private java.util.function.LongConsumer rowsRead = row -> { };
    private final SheetSource source;
    private final String sheet;
    private final Columns columns;
    private final int fromRow;
    private final int toRow;

    private final int givenHeaderRow;
    private final SampleRows sampleRows;
    private int headerRow = -1;
    private int valueColumn = -1;
    private int unitColumn = -1;
    private final List<String> headers = new ArrayList<>();
    private double[] values = new double[64];
    private int[] rows = new int[64];
    private int count;
    private final UnitIds unitIds = new UnitIds();
    private final Map<Integer, String> units = new HashMap<>();

    /** The measurements read, in sheet order, with the first rows' unit identifiers and notes for reports. */
    public record Measurements(java.nio.file.Path file, String sheet, int headerRow, double[] values, int[] rows,
            Map<Integer, String> units, List<String> headers) {
        public int count() {
            return values.length;
        }

        public int firstRow() {
            return rows.length == 0 ? -1 : rows[0];
        }

        public int lastRow() {
            return rows.length == 0 ? -1 : rows[rows.length - 1];
        }

        /**
         * The sample as a sheet of pass/fail units, for the history and the reports: a unit outside the
         * specification limits counts as nonconforming.
         *
         * @param outside the indexes of the measurements outside the limits, in sample order
         */
        public InspectionSample asSample(List<Integer> outside, String label) {
            int[] unitCounts = new int[lotgate.plan.DefectClass.values().length];
            long[] nonconformities = new long[unitCounts.length];
            unitCounts[lotgate.plan.DefectClass.ANY.ordinal()] = outside.size();
            nonconformities[lotgate.plan.DefectClass.ANY.ordinal()] = outside.size();
            Tally all = new Tally(values.length, unitCounts, nonconformities);
            List<InspectedUnit> kept = new ArrayList<>();
            java.util.BitSet marked = new java.util.BitSet();
            for (int index : outside) {
                marked.set(rows[index]);
                if (kept.size() < SampleReader.KEPT_UNITS) {
                    kept.add(new InspectedUnit(rows[index], units.getOrDefault(rows[index], ""), true, 0, 0, 0, label,
                            Cell.shortest(values[index])));
                }
            }
            Map<String, Integer> types = outside.isEmpty() ? Map.of() : Map.of(label, outside.size());
            return new InspectionSample(file, sheet, headerRow, List.copyOf(headers), true, java.util.Set.of(),
                    values.length, firstRow(), lastRow(), Map.of(values.length, all), all, kept, outside.size(), types,
                    -1, marked, null);
        }
    }

    /** Unit identifiers kept for listing measurements outside the limits. */
    private static final int KEPT_UNITS = 100_000;

    public MeasurementReader(SheetSource source, String sheet, Columns columns, int fromRow, int toRow) {
        this.source = source;
        String first = source.firstSampleSheet(); // refuses a workbook without sheets, whatever sheet is named
        this.sheet = sheet != null ? sheet : first;
        this.columns = columns;
        this.fromRow = fromRow;
        this.toRow = toRow;
        this.givenHeaderRow = columns.headerRow();
        this.sampleRows = new SampleRows(source, this.sheet, new SampleRows.Header(this::isHeader,
                "a '" + columns.nameOf(Columns.Role.VALUE) + "' column", "value=Diameter", false), columns, fromRow, toRow);
        if (columns.delimiter() != null) {
            source.useDelimiter(columns.delimiter());
        }
    }

    /** Tells {@code rowsRead} the number of each sheet row read, for a progress line. */
    public MeasurementReader telling(java.util.function.LongConsumer rowsRead) {
        this.rowsRead = rowsRead;
        return this;
    }

    public Measurements read() {
        sampleRows.read(this);
        if (headerRow < 0) {
            if (givenHeaderRow > 0 || sampleRows.rowsLookedAt() == 0) {
                throw new SheetException(source.file(), "sheet '" + sheet + "' is empty: there is no header row");
            }
            throw sampleRows.headerNotFound();
        }
        confirmRepeats();
        return new Measurements(source.file(), sheet, headerRow, Arrays.copyOf(values, count),
                Arrays.copyOf(rows, count), Map.copyOf(units), List.copyOf(headers));
    }

    private boolean isHeader(List<String> texts) {
        return texts.stream().anyMatch(t -> columns.roleOf(t) == Columns.Role.VALUE);
    }

    @Override
    public void merged(List<MergedRange> ranges) {
        if (headerRow < 0) {
            return;
        }
        int last = toRow > 0 ? Math.min(toRow, sampleRows.lastRowSeen()) : sampleRows.lastRowSeen();
        for (MergedRange range : ranges) {
            int row = Math.max(Math.max(headerRow + 1, fromRow), range.firstRow());
            if (!range.hides(row, valueColumn)) {
                row++;
            }
            if (row <= last && range.hides(row, valueColumn)) {
                throw new SheetException(source.file(), source.where(sheet, row, valueColumn) + " is part of the"
                        + " merged range " + range.text() + ", so it holds no " + columns.nameOf(Columns.Role.VALUE)
                        + " of its own; unmerge the cells and give every unit its own value on its own row");
            }
        }
    }

    @Override
    public void row(int row, List<Cell> cells) {
        rowsRead.accept(row);
        switch (sampleRows.kind(row, cells)) {
            case HEADER -> header(row, cells);
            case UNIT -> unit(row, cells);
            default -> {
            }
        }
    }

    private void unit(int row, List<Cell> cells) {
        if (count >= Cell.MAX_ROW) {
            throw new SheetException(source.file(), "sheet '" + sheet + "' holds more than " + Cell.MAX_ROW
                    + " measurements, more rows than a spreadsheet has; name the sample's rows");
        }
        Cell value = null;
        String unit = "";
        for (Cell cell : cells) {
            if (cell.column() == valueColumn) {
                value = cell;
            } else if (cell.column() == unitColumn) {
                unit = cell.text().trim();
            }
        }
        if (value == null) {
            throw new SheetException(source.file(), source.where(sheet, row, valueColumn) + ": no "
                    + columns.nameOf(Columns.Role.VALUE) + " for this unit");
        }
        double number = switch (value.kind()) {
            case NUMBER -> value.number();
            case DATE -> throw bad(row, value, columns.nameOf(Columns.Role.VALUE) + " cell is formatted as a date (it"
                    + " holds " + value.text() + "); format it as a number");
            case TEXT -> parse(value.text());
            case FORMULA_WITHOUT_VALUE -> throw bad(row, value, "the formula " + value.text() + " has no saved value;"
                    + " open the sheet in a spreadsheet program, let it calculate, and save it");
            default -> Double.NaN;
        };
        if (!Double.isFinite(number)) {
            throw bad(row, value, columns.nameOf(Columns.Role.VALUE) + " '" + value.text().trim()
                    + "' is not a number");
        }
        if (!unit.isEmpty()) {
            unitIds.add(unit, row);
            if (units.size() < KEPT_UNITS) {
                units.put(row, unit);
            }
        }
        if (count == values.length) {
            values = Arrays.copyOf(values, 2 * count);
            rows = Arrays.copyOf(rows, 2 * count);
        }
        values[count] = number;
        rows[count] = row;
        count++;
    }

    private static double parse(String text) {
        try {
            return Double.parseDouble(text.trim().replace(',', '.'));
        } catch (NumberFormatException e) {
            return Double.NaN;
        }
    }

    private SheetException bad(int row, Cell cell, String problem) {
        return new SheetException(source.file(), source.where(sheet, row, cell.column()) + ": " + problem);
    }

    private void header(int row, List<Cell> cells) {
        headerRow = row;
        for (Cell cell : cells) {
            headers.add(cell.text().trim());
            Columns.Role role = columns.roleOf(cell.text());
            if (role == Columns.Role.VALUE) {
                if (valueColumn >= 0) {
                    throw new SheetException(source.file(), "two columns are named '" + cell.text().trim() + "': "
                            + source.where(sheet, row, valueColumn) + " and " + source.where(sheet, row, cell.column()));
                }
                valueColumn = cell.column();
            } else if (role == Columns.Role.UNIT) {
                unitColumn = cell.column();
            }
        }
        if (valueColumn < 0) {
            throw new SheetException(source.file(), "no '" + columns.nameOf(Columns.Role.VALUE) + "' column in the"
                    + " header row, " + source.whereRow(sheet, row) + ", so the sheet holds no measurements; the headers"
                    + " found are " + String.join(", ", headers) + " (name your own with --columns, e.g."
                    + " value=Diameter)");
        }
    }

    private void confirmRepeats() {
        if (!unitIds.suspects().isEmpty()) {
            unitIds.confirm(source, sheet, unitColumn);
        }
    }
}
