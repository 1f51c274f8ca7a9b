package lotgate.inspection;

import java.nio.file.Path;
import java.util.List;

/**
 * A workbook file (.xls or .xlsx) whose sheet names are read once: opening the file is the costly part, and a
 * sentence asks for the names several times.
 */
abstract class WorkbookSheets implements SheetSource {
    /** The workbook file, for the messages of the subclasses. */
    final Path file;
    private List<String> sheetNames;

    WorkbookSheets(Path file) {
        this.file = file;
    }

    @Override
    public final Path file() {
        return file;
    }

    @Override
    public final List<String> sheetNames() {
        if (sheetNames == null) {
            sheetNames = List.copyOf(readSheetNames());
        }
        return sheetNames;
    }

    /** The sheet names in order, read from the file. */
    abstract List<String> readSheetNames();
}
