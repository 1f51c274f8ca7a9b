package lotgate.inspection;

import java.time.DateTimeException;
import java.time.LocalDate;
import lotgate.files.IsoText;
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
                day = IsoText.day(cell.text().trim());
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
}
