package lotgate.inspection;

/**
 * A block of merged cells: only its top-left cell holds a value.
 *
 * @param firstRow    first row, numbered as a spreadsheet shows it
 * @param lastRow     last row
 * @param firstColumn first column, 0-based
 * @param lastColumn  last column
 */
public record MergedRange(int firstRow, int lastRow, int firstColumn, int lastColumn) {

    /** Parses a reference such as "B12:B14" (a single cell also counts); null when it is not one. */
    static MergedRange parse(String reference) {
        if (reference == null) {
            return null;
        }
        String[] ends = reference.trim().split(":");
        int[] first = cell(ends[0]);
        int[] last = ends.length > 1 ? cell(ends[1]) : first;
        if (first == null || last == null) {
            return null;
        }
        return new MergedRange(Math.min(first[0], last[0]), Math.max(first[0], last[0]), Math.min(first[1], last[1]),
                Math.max(first[1], last[1]));
    }

    /** {row, column} of "B12", or null. */
    private static int[] cell(String reference) {
        int column = 0;
        int i = 0;
        String text = reference.replace("$", "");
        while (i < text.length() && text.charAt(i) >= 'A' && text.charAt(i) <= 'Z' && i < 4) {
            column = column * 26 + (text.charAt(i) - 'A' + 1);
            i++;
        }
        if (i == 0 || i == text.length() || text.length() - i > 8) {
            return null;
        }
        try {
            return new int[] {Integer.parseInt(text.substring(i)), column - 1};
        } catch (NumberFormatException e) {
            return null;
        }
    }

    /** Whether the range covers the cell. */
    public boolean covers(int row, int column) {
        return row >= firstRow && row <= lastRow && column >= firstColumn && column <= lastColumn;
    }

    /** Whether the cell is covered by the range but is not the top-left cell that holds its value. */
    public boolean hides(int row, int column) {
        return covers(row, column) && (row != firstRow || column != firstColumn);
    }

    /** "B12:B14". */
    public String text() {
        return Cell.columnName(firstColumn) + firstRow + ":" + Cell.columnName(lastColumn) + lastRow;
    }
}
