package lotgate.inspection;

import java.util.List;

/** Receives a sheet's rows in order, each with its non-blank cells. */
@FunctionalInterface
public interface RowHandler {
    /**
     * @param row   the row number as a spreadsheet shows it (1 for the first row, the line for CSV)
     * @param cells the row's non-blank cells in column order
     */
    void row(int row, List<Cell> cells);
}
