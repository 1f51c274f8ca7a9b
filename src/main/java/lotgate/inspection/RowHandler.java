package lotgate.inspection;

import java.util.List;

/** Receives a sheet's rows in order, each with its non-blank cells, then the sheet's merged cells. */
@FunctionalInterface
public interface RowHandler {
    /**
     * @param row   the row number as a spreadsheet shows it (1 for the first row, the line for CSV)
     * @param cells the row's non-blank cells in column order
     */
    void row(int row, List<Cell> cells);

    /**
     * The sheet's merged cells, once all rows are read (a workbook lists them after its rows). Called also
     * when a row was refused, before that refusal is passed on, so that a merged cell can be named as its cause.
     */
    default void merged(List<MergedRange> ranges) {
    }

    /** Thrown by a handler that has read all it needs: the source stops reading quietly. */
    final class Stop extends RuntimeException {
        private static final long serialVersionUID = 1L;

        public Stop() {
            super(null, null, false, false);
        }
    }
}
