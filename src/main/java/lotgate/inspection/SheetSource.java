package lotgate.inspection;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import org.apache.poi.poifs.filesystem.FileMagic;

/**
 * A spreadsheet or CSV file whose rows can be streamed, one sheet at a time. The kind follows the
 * file's extension, and a file whose content is of another kind is refused.
 */
public interface SheetSource {

    /** How many rows from the top a reader searches for its header row. */
    int HEADER_SEARCH = 50;

    /** The file read. */
    Path file();

    /** The names of the file's sheets in order (one, named after the file, for CSV). */
    List<String> sheetNames();

    /** Streams the rows of a sheet (null: the first) to the handler. */
    void read(String sheet, RowHandler handler);

    /** Splits a CSV file's records at this character instead of deciding; other kinds ignore it. */
    default void useDelimiter(char delimiter) {
    }

    /**
     * Tells a source that must decide how to split its rows (CSV) what a header row looks like: a row whose
     * cell texts pass the test. Other kinds ignore it.
     */
    default void findHeader(java.util.function.Predicate<List<String>> isHeader) {
    }

    /** A position for messages: "sheet 'Sample' cell C17" ("row 17, column C" for CSV). */
    default String where(String sheet, int row, int column) {
        return "sheet '" + sheet + "' cell " + Cell.columnName(column) + row;
    }

    /** A row for messages: "sheet 'Sample' row 17" ("row 17" for CSV). */
    default String whereRow(String sheet, int row) {
        return "sheet '" + sheet + "' row " + row;
    }

    /**
     * The sheet a reader takes when none is named: the first not named "lot" (a lot's details), else the first.
     */
    default String firstSampleSheet() {
        List<String> names = sheetNames();
        if (names.isEmpty()) {
            throw new SheetException(file(), "the workbook has no sheets");
        }
        return names.stream().filter(n -> !n.equalsIgnoreCase(LotDetails.SHEET)).findFirst().orElse(names.get(0));
    }

    /** Refuses a sheet name that the file does not have, naming the sheets it has. */
    default void requireSheet(String sheet) {
        if (!sheetNames().contains(sheet)) {
            throw new SheetException(file(), "no sheet named '" + sheet + "'; the sheets are "
                    + quoted(sheetNames()));
        }
    }

    /** Sheet names for messages: 'Sample', 'lot'. */
    static String quoted(List<String> names) {
        return String.join(", ", names.stream().map(n -> "'" + n + "'").toList());
    }

    /** Opens a file by its extension: .xlsx or .xlsm, .xls, or .csv. */
    static SheetSource open(Path file) {
        String name = file.getFileName().toString().toLowerCase(Locale.ROOT);
        if (!Files.isRegularFile(file)) {
            throw new SheetException(file, Files.exists(file) ? "not a file" : "no such file");
        }
        try {
            if (Files.size(file) == 0) {
                throw new SheetException(file, "the file is empty");
            }
        } catch (IOException e) {
            throw new SheetException(file, "cannot be read (" + e.getMessage() + ")", e);
        }
        if (name.endsWith(".csv")) {
            // Checked without POI: its file-type sniffing starts a logging framework, a tenth of a second.
            if (isWorkbook(file)) {
                throw new SheetException(file, "this is a spreadsheet workbook, not CSV text; give it the"
                        + " extension .xlsx or .xls");
            }
            return new CsvSheets(file);
        }
        FileMagic magic;
        try (InputStream in = FileMagic.prepareToCheckMagic(Files.newInputStream(file))) {
            magic = FileMagic.valueOf(in);
        } catch (IOException | RuntimeException e) {
            throw new SheetException(file, "cannot be read (" + e.getMessage() + ")", e);
        }
        if (name.endsWith(".xlsx") || name.endsWith(".xlsm")) {
            if (magic == FileMagic.OLE2) {
                if (XlsxSheets.isEncrypted(file)) {
                    throw new SheetException(file, "the workbook is password-protected; save a copy without a"
                            + " password and sentence that");
                }
                throw new SheetException(file, "this is an old-style .xls workbook, not .xlsx; rename it to .xls");
            }
            if (magic != FileMagic.OOXML) {
                throw new SheetException(file, "not an .xlsx workbook (the content is " + describe(magic) + ")");
            }
            return new XlsxSheets(file);
        }
        if (name.endsWith(".xls")) {
            if (magic == FileMagic.OOXML) {
                throw new SheetException(file, "this is an .xlsx workbook, not .xls; rename it to .xlsx");
            }
            if (magic != FileMagic.OLE2) {
                throw new SheetException(file, "not an .xls workbook (the content is " + describe(magic) + ")");
            }
            return new XlsSheets(file);
        }
        throw new SheetException(file, "unknown kind of inspection sheet; use .xlsx, .xls or .csv");
    }

    /** Whether the file starts as a zip package (.xlsx) or an OLE2 compound file (.xls) does. */
    private static boolean isWorkbook(Path file) {
        byte[] head = new byte[8];
        int read = 0;
        try (InputStream in = Files.newInputStream(file)) {
            for (int n = 0; read < head.length && n >= 0; read += n) {
                n = in.read(head, read, head.length - read);
                if (n < 0) {
                    break;
                }
            }
        } catch (IOException e) {
            throw new SheetException(file, "cannot be read (" + e.getMessage() + ")", e);
        }
        boolean zip = read >= 4 && head[0] == 'P' && head[1] == 'K' && head[2] == 3 && head[3] == 4;
        byte[] ole2 = {(byte) 0xD0, (byte) 0xCF, 0x11, (byte) 0xE0, (byte) 0xA1, (byte) 0xB1, 0x1A, (byte) 0xE1};
        return zip || read == head.length && java.util.Arrays.equals(head, ole2);
    }

    private static String describe(FileMagic magic) {
        return switch (magic) {
            case PDF -> "a PDF document";
            case HTML -> "an HTML page";
            case XML -> "plain XML";
            case OOXML -> "an .xlsx workbook";
            case OLE2 -> "an .xls workbook";
            default -> "something else";
        };
    }
}
