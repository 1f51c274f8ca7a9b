package lotgate.inspection;

/**
 * One non-blank cell as read from a sheet.
 *
 * @param column 0-based column index
 * @param text   the cell's text as shown (numbers in their shortest form), or the formula for
 *               {@link Kind#FORMULA_WITHOUT_VALUE}
 * @param number the number of a {@link Kind#NUMBER} or {@link Kind#DATE} cell (a date as the spreadsheet's day
 *               number), else NaN
 */
public record Cell(int column, Kind kind, String text, double number) {

    /** DATE: a number shown in a date or time format. */
    public enum Kind { TEXT, NUMBER, DATE, BOOLEAN, ERROR, FORMULA_WITHOUT_VALUE }

    /** The most characters a spreadsheet cell holds (32,767 in the common spreadsheet programs). */
    public static final int MAX_TEXT = 32_767;
    /** The last column a spreadsheet has (XFD), 0-based. */
    public static final int MAX_COLUMN = 16_383;
    /** The last row a spreadsheet has. */
    public static final int MAX_ROW = 1_048_576;

    static Cell text(int column, String text) {
        return new Cell(column, Kind.TEXT, text, Double.NaN);
    }

    static Cell number(int column, double value) {
        return new Cell(column, Kind.NUMBER, shortest(value), value);
    }

    static Cell date(int column, double value) {
        return new Cell(column, Kind.DATE, shortest(value), value);
    }

    /** 3.0 as "3", 2.5 as "2.5": how a spreadsheet shows a general number. */
    static String shortest(double value) {
        if (value == Math.rint(value) && Math.abs(value) < 1e15) {
            return Long.toString((long) value);
        }
        return Double.toString(value);
    }

    /** Whether the cell holds nothing but white space. */
    public boolean isBlank() {
        return kind == Kind.TEXT && text.isBlank();
    }

    /** Spreadsheet column letters for a 0-based index: 0 is A, 26 is AA. */
    public static String columnName(int column) {
        StringBuilder name = new StringBuilder();
        for (int c = column + 1; c > 0; c = (c - 1) / 26) {
            name.insert(0, (char) ('A' + (c - 1) % 26));
        }
        return name.toString();
    }
}
