package lotgate.inspection;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import javax.xml.parsers.ParserConfigurationException;
import org.apache.poi.ooxml.POIXMLException;
import org.apache.poi.openxml4j.exceptions.InvalidFormatException;
import org.apache.poi.openxml4j.exceptions.NotOfficeXmlFileException;
import org.apache.poi.openxml4j.exceptions.OpenXML4JException;
import org.apache.poi.openxml4j.opc.OPCPackage;
import org.apache.poi.openxml4j.opc.PackageAccess;
import org.apache.poi.poifs.filesystem.POIFSFileSystem;
import org.apache.poi.util.XMLHelper;
import org.apache.poi.xssf.eventusermodel.ReadOnlySharedStringsTable;
import org.apache.poi.xssf.eventusermodel.XSSFReader;
import org.xml.sax.Attributes;
import org.xml.sax.InputSource;
import org.xml.sax.SAXException;
import org.xml.sax.XMLReader;
import org.xml.sax.helpers.DefaultHandler;

/**
 * Streams the rows of an .xlsx workbook with POI's event (SAX) API, so that memory does not grow
 * with the number of rows. Formulas give their cached values; macros and external links are never
 * run or fetched; POI's guards against zip bombs stay on.
 */
final class XlsxSheets implements SheetSource {
    private final Path file;
    private List<String> sheetNames;

    XlsxSheets(Path file) {
        this.file = file;
    }

    static boolean isEncrypted(Path file) {
        try (POIFSFileSystem fs = new POIFSFileSystem(file.toFile(), true)) {
            return fs.getRoot().hasEntry("EncryptionInfo") || fs.getRoot().hasEntry("EncryptedPackage");
        } catch (IOException | RuntimeException e) {
            return false;
        }
    }

    @Override
    public Path file() {
        return file;
    }

    private interface PackageWork<T> {
        T run(OPCPackage pkg) throws IOException, OpenXML4JException, SAXException, ParserConfigurationException;
    }

    private <T> T withPackage(PackageWork<T> work) {
        try (OPCPackage pkg = OPCPackage.open(file.toFile(), PackageAccess.READ)) {
            return work.run(pkg);
        } catch (SheetException e) {
            throw e;
        } catch (NotOfficeXmlFileException | InvalidFormatException e) {
            throw new SheetException(file, "corrupt or not an .xlsx workbook (" + firstLine(e) + ")", e);
        } catch (IOException | OpenXML4JException | SAXException | ParserConfigurationException | POIXMLException e) {
            throw failure(e);
        } catch (RuntimeException e) {
            if (e.getCause() instanceof SheetException sheet) {
                throw sheet;
            }
            throw failure(e);
        }
    }

    private SheetException failure(Exception e) {
        for (Throwable t = e; t != null; t = t.getCause()) {
            String message = String.valueOf(t.getMessage());
            if (message.contains("Zip bomb") || message.contains("exceeds the max") || message.contains("max entry size")) {
                return new SheetException(file, "refused: the workbook expands far beyond a real inspection sheet"
                        + " (a possible zip bomb)", e);
            }
        }
        return new SheetException(file, "corrupt .xlsx workbook (" + firstLine(e) + ")", e);
    }

    private static String firstLine(Throwable e) {
        String message = e.getMessage() == null ? e.getClass().getSimpleName() : e.getMessage();
        return message.lines().findFirst().orElse(message);
    }

    @Override
    public List<String> sheetNames() {
        if (sheetNames == null) {
            sheetNames = List.copyOf(readSheetNames());
        }
        return sheetNames;
    }

    /** Opening the file is the costly part; a sentence asks for the names several times. */
    private List<String> readSheetNames() {
        return withPackage(pkg -> {
            List<String> names = new ArrayList<>();
            XSSFReader.SheetIterator sheets = (XSSFReader.SheetIterator) new XSSFReader(pkg).getSheetsData();
            while (sheets.hasNext()) {
                try (InputStream ignored = sheets.next()) {
                    names.add(sheets.getSheetName());
                }
            }
            return names;
        });
    }

    @Override
    public void read(String sheet, RowHandler handler) {
        withPackage(pkg -> {
            XSSFReader reader = new XSSFReader(pkg);
            ReadOnlySharedStringsTable strings = new ReadOnlySharedStringsTable(pkg, false);
            XSSFReader.SheetIterator sheets = (XSSFReader.SheetIterator) reader.getSheetsData();
            List<String> seen = new ArrayList<>();
            while (sheets.hasNext()) {
                try (InputStream in = sheets.next()) {
                    String name = sheets.getSheetName();
                    seen.add(name);
                    if (sheet == null || sheet.equals(name)) {
                        XMLReader xml = XMLHelper.newXMLReader();
                        xml.setContentHandler(new SheetHandler(strings, handler));
                        xml.parse(new InputSource(in));
                        return null;
                    }
                }
            }
            throw new SheetException(file, seen.isEmpty() ? "the workbook has no sheets"
                    : "no sheet named '" + sheet + "'; the sheets are " + SheetSource.quoted(seen));
        });
    }

    /** SAX handler for one worksheet part: rows, cells, values, inline strings and formulas. */
    private static final class SheetHandler extends DefaultHandler {
        private final ReadOnlySharedStringsTable strings;
        private final RowHandler handler;
        private final StringBuilder value = new StringBuilder();
        private final StringBuilder formula = new StringBuilder();
        private List<Cell> cells = new ArrayList<>();
        private int row;
        private int column;
        private String type;
        private boolean inValue;
        private boolean inFormula;
        private boolean inInline;
        private boolean inInlineText;
        private boolean hasValue;
        private boolean hasFormula;

        SheetHandler(ReadOnlySharedStringsTable strings, RowHandler handler) {
            this.strings = strings;
            this.handler = handler;
        }

        @Override
        public void startElement(String uri, String localName, String qName, Attributes attributes) {
            switch (localName) {
                case "row" -> {
                    String r = attributes.getValue("r");
                    row = r == null ? row + 1 : Integer.parseInt(r);
                    column = -1;
                    cells = new ArrayList<>();
                }
                case "c" -> {
                    String reference = attributes.getValue("r");
                    column = reference == null ? column + 1 : columnOf(reference);
                    type = attributes.getValue("t");
                    value.setLength(0);
                    formula.setLength(0);
                    hasValue = false;
                    hasFormula = false;
                }
                case "v" -> {
                    inValue = true;
                    hasValue = true;
                }
                case "f" -> {
                    inFormula = true;
                    hasFormula = true;
                }
                case "is" -> {
                    inInline = true;
                    hasValue = true;
                }
                case "t" -> inInlineText = inInline;
                default -> {
                }
            }
        }

        @Override
        public void characters(char[] ch, int start, int length) {
            if (inValue || inInlineText) {
                value.append(ch, start, length);
            } else if (inFormula) {
                formula.append(ch, start, length);
            }
        }

        @Override
        public void endElement(String uri, String localName, String qName) {
            switch (localName) {
                case "v" -> inValue = false;
                case "f" -> inFormula = false;
                case "t" -> inInlineText = false;
                case "is" -> inInline = false;
                case "c" -> {
                    Cell cell = cell();
                    if (cell != null && !cell.isBlank()) {
                        cells.add(cell);
                    }
                }
                case "row" -> {
                    if (!cells.isEmpty()) {
                        handler.row(row, cells);
                    }
                }
                default -> {
                }
            }
        }

        private Cell cell() {
            if (!hasValue) {
                return hasFormula ? new Cell(column, Cell.Kind.FORMULA_WITHOUT_VALUE, "=" + formula, Double.NaN) : null;
            }
            String text = value.toString();
            if (type == null || type.equals("n")) {
                if (text.isEmpty()) {
                    return null;
                }
                try {
                    return Cell.number(column, Double.parseDouble(text));
                } catch (NumberFormatException e) {
                    return Cell.text(column, text);
                }
            }
            return switch (type) {
                case "s" -> Cell.text(column, strings.getItemAt(Integer.parseInt(text.trim())).getString());
                case "b" -> new Cell(column, Cell.Kind.BOOLEAN, text.equals("1") ? "TRUE" : "FALSE", Double.NaN);
                case "e" -> new Cell(column, Cell.Kind.ERROR, text, Double.NaN);
                default -> Cell.text(column, text);
            };
        }

        private static int columnOf(String reference) {
            int column = 0;
            for (int i = 0; i < reference.length(); i++) {
                char ch = reference.charAt(i);
                if (ch < 'A' || ch > 'Z') {
                    break;
                }
                column = column * 26 + (ch - 'A' + 1);
            }
            return column - 1;
        }
    }
}
