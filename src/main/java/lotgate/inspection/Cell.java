package lotgate.inspection;

/**
 * One non-blank cell as read from a sheet.
 *
 * @param column 0-based column index
 * @param text   the cell's text as shown (numbers in their shortest form), or the formula for
 *               {@link Kind#FORMULA_WITHOUT_VALUE}
 */
public record Cell(int column, Kind kind, String text, double number) {

    public enum Kind { TEXT, NUMBER, BOOLEAN, ERROR, FORMULA_WITHOUT_VALUE }

    static Cell text(int column, String text) {
        return new Cell(column, Kind.TEXT, text, Double.NaN);
    }

    static Cell number(int column, double value) {
        return new Cell(column, Kind.NUMBER, shortest(value), value);
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
