package lotgate.inspection;

import java.time.LocalDate;
import java.time.DateTimeException;
import org.apache.poi.ss.usermodel.DateUtil;

/**
 * Calendar days read from sheet cells: a cell formatted as a date, or text written as 2026-03-14. A plain
 * number is not taken for a day (it may be a count or a lot size in the wrong place), nor is a day outside
 * {@link #FIRST} to {@link #LAST}.
 */
public final class Days {
    public static final LocalDate FIRST = LocalDate.of(1900, 1, 1);
    public static final LocalDate LAST = LocalDate.of(2199, 12, 31);

    private Days() {
    }

    /**
     * The day a cell holds.
     *
     * @param what the cell's meaning for messages, as in "received"
     * @throws IllegalArgumentException with the problem, to be prefixed by the cell's position
     */
    public static LocalDate of(Cell cell, String what) {
        LocalDate day;
        if (cell.kind() == Cell.Kind.DATE) {
            if (!(cell.number() >= DateUtil.getExcelDate(FIRST) && cell.number() < DateUtil.getExcelDate(LAST) + 1)) {
                throw new IllegalArgumentException(what + " '" + cell.text() + "' is not a day from " + FIRST + " to "
                        + LAST + "; write the date as 2026-03-14");
            }
            day = DateUtil.getLocalDateTime(cell.number()).toLocalDate();
        } else if (cell.kind() == Cell.Kind.NUMBER) {
            throw new IllegalArgumentException(what + " '" + cell.text() + "' is a plain number, not a date; write"
                    + " the date as 2026-03-14 or format the cell as a date");
        } else {
            try {
                day = parse(cell.text().trim());
            } catch (DateTimeException e) {
                throw new IllegalArgumentException(what + " '" + cell.text().trim() + "' is not a date such as"
                        + " 2026-03-14");
            }
        }
        if (day.isBefore(FIRST) || day.isAfter(LAST)) {
            throw new IllegalArgumentException(what + " " + day + " is outside " + FIRST + " to " + LAST);
        }
        return day;
    }

    /**
     * A day written as 2026-03-14, read directly: the general ISO parser costs an import of a hundred
     * thousand lots half a second. Other forms the parser accepts go to it.
     */
    private static LocalDate parse(String text) {
        if (text.length() == 10 && text.charAt(4) == '-' && text.charAt(7) == '-') {
            int year = digits(text, 0, 4);
            int month = digits(text, 5, 7);
            int day = digits(text, 8, 10);
            if (year >= 0 && month >= 0 && day >= 0) {
                return LocalDate.of(year, month, day);
            }
        }
        return LocalDate.parse(text);
    }

    /** The number the characters from start to end write in decimal digits, or -1 when one is not a digit. */
    private static int digits(String text, int start, int end) {
        int value = 0;
        for (int i = start; i < end; i++) {
            char ch = text.charAt(i);
            if (ch < '0' || ch > '9') {
                return -1;
            }
            value = value * 10 + (ch - '0');
        }
        return value;
    }
}
