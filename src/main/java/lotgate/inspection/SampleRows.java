package lotgate.inspection;

import java.util.ArrayList;
import java.util.List;
import java.util.function.Predicate;

/**
 * The rows of a sheet that hold a sample, as a reader sees them one by one: the header row, given or else the
 * first of the top {@link SheetSource#HEADER_SEARCH} rows that the reader recognises, then the units below it
 * within the rows named. It keeps the first rows passed over in the search, so that the message that no header
 * was found shows what they held.
 */
final class SampleRows {
    /** How many rows passed over the message shows. */
    private static final int SHOWN_ROWS = 6;
    /** How many of a row's cells the message shows. */
    private static final int SHOWN_CELLS = 4;

    /** What a row is to the reader. */
    enum Kind { PASSED_OVER, HEADER, UNIT }

    /**
     * What the reader's header row holds.
     *
     * @param test         whether a row's cell texts are the header
     * @param description  for the message, e.g. "a 'value' column"
     * @param example      a --columns mapping that names one's own header, for the message, e.g. "value=Diameter"
     * @param shortenCells whether the message shows each cell's text with its white space folded and cut at 24
     *                     characters, rather than as it stands
     */
    record Header(Predicate<List<String>> test, String description, String example, boolean shortenCells) {
    }

    private final SheetSource source;
    private final String sheet;
    private final Header wanted;
    private final int givenHeaderRow;
    private final int fromRow;
    private final int toRow;

    private boolean headerFound;
    private final List<String> looked = new ArrayList<>();
    private int rowsLookedAt;
    private int lastRowSeen;

    /**
     * @param fromRow the first sheet row of the sample, or 0 for all rows after the header
     * @param toRow   the last sheet row of the sample, or 0 for the end of the sheet
     */
    SampleRows(SheetSource source, String sheet, Header wanted, Columns columns, int fromRow, int toRow) {
        this.source = source;
        this.sheet = sheet;
        this.wanted = wanted;
        givenHeaderRow = columns.headerRow();
        this.fromRow = fromRow;
        this.toRow = toRow;
    }

    /**
     * What the next row read is: before the header, the header or a row passed over (a row past the given
     * header row or past the search is refused with the message that no header was found); after it, a unit or
     * a row outside the rows named (past the last of them, reading stops).
     */
    Kind kind(int row, List<Cell> cells) {
        lastRowSeen = row;
        if (headerFound) {
            if (toRow > 0 && row > toRow) {
                throw new RowHandler.Stop();
            }
            return fromRow > 0 && row < fromRow ? Kind.PASSED_OVER : Kind.UNIT;
        }
        List<String> texts = cells.stream().map(Cell::text).toList();
        if (givenHeaderRow > 0 ? row > givenHeaderRow : row > SheetSource.HEADER_SEARCH) {
            throw headerNotFound();
        }
        if (givenHeaderRow > 0 ? row == givenHeaderRow : wanted.test().test(texts)) {
            headerFound = true;
            return Kind.HEADER;
        }
        rowsLookedAt++;
        if (givenHeaderRow == 0 && looked.size() < SHOWN_ROWS) {
            List<String> shown = new ArrayList<>();
            for (String text : texts.subList(0, Math.min(SHOWN_CELLS, texts.size()))) {
                shown.add(wanted.shortenCells() ? shortened(text) : text);
            }
            looked.add("row " + row + ": " + String.join(", ", shown) + (texts.size() > SHOWN_CELLS ? ", …" : ""));
        }
        return Kind.PASSED_OVER;
    }

    private static String shortened(String text) {
        String trimmed = text.trim().replaceAll("\\s+", " ");
        return trimmed.length() > 24 ? trimmed.substring(0, 23) + "…" : trimmed;
    }

    /** Streams the sheet's rows to the reader, after refusing a sheet name the file does not have. */
    void read(RowHandler reader) {
        source.requireSheet(sheet);
        source.findHeader(wanted.test());
        source.read(sheet, reader);
    }

    /** The last row read. */
    int lastRowSeen() {
        return lastRowSeen;
    }

    /** The number of rows passed over in the search for the header. */
    int rowsLookedAt() {
        return rowsLookedAt;
    }

    /** The sheet for messages: "the file" for a CSV file, else "sheet 'Sample'". */
    String where() {
        return source.sheetNames().size() == 1 && source instanceof CsvSheets ? "the file" : "sheet '" + sheet + "'";
    }

    /**
     * The refusal of a sheet where the header was not found: the given header row is empty, or none of the rows
     * searched has what the reader wants.
     */
    SheetException headerNotFound() {
        if (givenHeaderRow > 0) {
            return new SheetException(source.file(), source.whereRow(sheet, givenHeaderRow) + ", given as the header"
                    + " row, is empty");
        }
        int last = Math.min(lastRowSeen, SheetSource.HEADER_SEARCH);
        return new SheetException(source.file(), "no header row: none of rows 1 to " + last + " of " + where()
                + " has " + wanted.description() + "; the rows looked at are " + String.join("; ", looked)
                + (rowsLookedAt > looked.size() ? "; and " + (rowsLookedAt - looked.size()) + " more" : "")
                + " (name your own headers with --columns, e.g. " + wanted.example() + ", or give the header row"
                + " with --header-row)");
    }
}
