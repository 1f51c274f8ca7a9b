package lotgate.inspection;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.apache.poi.EncryptedDocumentException;
import org.apache.poi.hssf.usermodel.HSSFWorkbook;
import org.apache.poi.poifs.filesystem.POIFSFileSystem;
import org.apache.poi.ss.usermodel.CellType;
import org.apache.poi.ss.usermodel.DateUtil;
import org.apache.poi.ss.util.CellRangeAddress;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;

/** Reads the rows of an old-style .xls workbook (at most 65,536 rows a sheet) through POI's HSSF. */
final class XlsSheets extends WorkbookSheets {
    XlsSheets(Path file) {
        super(file);
    }

    /** An old-style workbook is read whole; 32 MB is many times a full sheet of 65,536 units. */
    static final long MAX_BYTES = 32L << 20;

    private HSSFWorkbook open() {
        try {
            if (java.nio.file.Files.size(file) > MAX_BYTES) {
                throw new SheetException(file, "refused: an .xls workbook of more than " + (MAX_BYTES >> 20) + " MB,"
                        + " far beyond a real inspection sheet; save it as .xlsx");
            }
            return new HSSFWorkbook(new POIFSFileSystem(file.toFile(), true).getRoot(), true);
        } catch (EncryptedDocumentException e) {
            throw new SheetException(file, "the workbook is password-protected; save a copy without a password and"
                    + " sentence that", e);
        } catch (SheetException e) {
            throw e;
        } catch (IOException | RuntimeException e) {
            throw new SheetException(file, "corrupt .xls workbook (" + e.getMessage() + ")", e);
        }
    }

    @Override
    List<String> readSheetNames() {
        try (HSSFWorkbook workbook = open()) {
            List<String> names = new ArrayList<>();
            for (int i = 0; i < workbook.getNumberOfSheets(); i++) {
                names.add(workbook.getSheetName(i));
            }
            return names;
        } catch (IOException e) {
            throw new SheetException(file, "cannot be read (" + e.getMessage() + ")", e);
        }
    }

    @Override
    public void read(String sheetName, RowHandler handler) {
        try (HSSFWorkbook workbook = open()) {
            if (workbook.getNumberOfSheets() == 0) {
                throw new SheetException(file, "the workbook has no sheets");
            }
            Sheet sheet = sheetName == null ? workbook.getSheetAt(0) : workbook.getSheet(sheetName);
            if (sheet == null) {
                throw new SheetException(file, "no sheet named '" + sheetName + "'; the sheets are "
                        + SheetSource.quoted(sheetNames()));
            }
            SheetException refusal = null;
            for (Row row : sheet) {
                List<Cell> cells = new ArrayList<>();
                for (org.apache.poi.ss.usermodel.Cell cell : row) {
                    Cell value = value(cell);
                    if (value != null && !value.isBlank()) {
                        cells.add(value);
                    }
                }
                if (!cells.isEmpty()) {
                    try {
                        handler.row(row.getRowNum() + 1, cells);
                    } catch (SheetException e) {
                        refusal = e;
                        break;
                    } catch (RowHandler.Stop e) {
                        break;
                    }
                }
            }
            List<MergedRange> merged = new ArrayList<>();
            for (CellRangeAddress range : sheet.getMergedRegions()) {
                merged.add(new MergedRange(range.getFirstRow() + 1, range.getLastRow() + 1, range.getFirstColumn(),
                        range.getLastColumn()));
            }
            handler.merged(List.copyOf(merged));
            if (refusal != null) {
                throw refusal;
            }
        } catch (IOException e) {
            throw new SheetException(file, "cannot be read (" + e.getMessage() + ")", e);
        }
    }

    private static Cell value(org.apache.poi.ss.usermodel.Cell cell) {
        int column = cell.getColumnIndex();
        CellType type = cell.getCellType() == CellType.FORMULA ? cell.getCachedFormulaResultType() : cell.getCellType();
        return switch (type) {
            case NUMERIC -> DateUtil.isCellDateFormatted(cell) ? Cell.date(column, cell.getNumericCellValue())
                    : Cell.number(column, cell.getNumericCellValue());
            case STRING -> Cell.text(column, cell.getStringCellValue());
            case BOOLEAN -> new Cell(column, Cell.Kind.BOOLEAN, cell.getBooleanCellValue() ? "TRUE" : "FALSE", Double.NaN);
            case ERROR -> new Cell(column, Cell.Kind.ERROR, "#ERROR", Double.NaN);
            default -> null;
        };
    }
}
