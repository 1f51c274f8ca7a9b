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
import org.apache.poi.openxml4j.opc.PackagePart;
import org.apache.poi.poifs.filesystem.POIFSFileSystem;
import org.apache.poi.util.XMLHelper;
import org.apache.poi.xssf.eventusermodel.XSSFReader;
import org.apache.poi.xssf.usermodel.XSSFRelation;
import org.xml.sax.Attributes;
import org.xml.sax.InputSource;
import org.xml.sax.SAXException;
import org.xml.sax.XMLReader;
import org.xml.sax.helpers.DefaultHandler;

/**
 * Streams the rows of an .xlsx workbook with POI's event (SAX) API, so that memory does not grow
 * with the number of rows. Formulas give their cached values; macros and external links are never
 * run or fetched; POI's guards against zip bombs stay on, and the shared strings, cell formats and cell
 * texts are held within caps of their own (see {@link SharedText}, {@link DateStyles}).
 */
final class XlsxSheets extends WorkbookSheets {
    XlsxSheets(Path file) {
        super(file);
    }

    static boolean isEncrypted(Path file) {
        try (POIFSFileSystem fs = new POIFSFileSystem(file.toFile(), true)) {
            return fs.getRoot().hasEntry("EncryptionInfo") || fs.getRoot().hasEntry("EncryptedPackage");
        } catch (IOException | RuntimeException e) {
            return false;
        }
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
    List<String> readSheetNames() {
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
            XSSFReader.SheetIterator sheets = (XSSFReader.SheetIterator) reader.getSheetsData();
            List<String> seen = new ArrayList<>();
            while (sheets.hasNext()) {
                try (InputStream in = sheets.next()) {
                    String name = sheets.getSheetName();
                    seen.add(name);
                    if (sheet == null || sheet.equals(name)) {
                        SheetHandler rows = new SheetHandler(file, name,
                                part(pkg, XSSFRelation.SHARED_STRINGS, SharedText::read, SharedText.empty()),
                                part(pkg, XSSFRelation.STYLES, DateStyles::read, DateStyles.none()), handler);
                        XMLReader xml = XMLHelper.newXMLReader();
                        xml.setContentHandler(rows);
                        xml.parse(new InputSource(in));
                        rows.finish();
                        return null;
                    }
                }
            }
            throw new SheetException(file, seen.isEmpty() ? "the workbook has no sheets"
                    : "no sheet named '" + sheet + "'; the sheets are " + SheetSource.quoted(seen));
        });
    }

    private interface PartReader<T> {
        T read(Path file, InputStream in) throws IOException, SAXException, ParserConfigurationException;
    }

    /** The workbook's first part of a kind (shared strings, styles) as read, or {@code absent} without one. */
    private <T> T part(OPCPackage pkg, XSSFRelation kind, PartReader<T> reader, T absent)
            throws IOException, SAXException, ParserConfigurationException {
        List<PackagePart> parts = pkg.getPartsByContentType(kind.getContentType());
        if (parts.isEmpty()) {
            return absent;
        }
        try (InputStream in = parts.get(0).getInputStream()) {
            return reader.read(file, in);
        }
    }

    /**
     * SAX handler for one worksheet part: rows, cells, values, inline strings, formulas, date styles and merged
     * cells. Rows past the last a spreadsheet has, columns past XFD and text longer than a cell holds are refused,
     * so that memory stays bounded whatever the part holds. After the handler refuses a row or stops, the rest of
     * the part is only scanned for its merged cells.
     */
    private static final class SheetHandler extends DefaultHandler {
        /** Merged ranges kept; a real sheet has a handful. */
        private static final int MAX_MERGED = 100_000;
        private final Path file;
        private final String sheet;
        private final SharedText strings;
        private final DateStyles styles;
        private final RowHandler handler;
        private final StringBuilder value = new StringBuilder();
        private final StringBuilder formula = new StringBuilder();
        private final List<MergedRange> merged = new ArrayList<>();
        private List<Cell> cells = new ArrayList<>();
        private int row;
        private int column;
        private String type;
        private int style;
        private boolean inValue;
        private boolean inFormula;
        private boolean inInline;
        private boolean inInlineText;
        private boolean hasValue;
        private boolean hasFormula;
        private boolean skipping;
        private SheetException refusal;

        SheetHandler(Path file, String sheet, SharedText strings, DateStyles styles, RowHandler handler) {
            this.file = file;
            this.sheet = sheet;
            this.strings = strings;
            this.styles = styles;
            this.handler = handler;
        }

        @Override
        public void startElement(String uri, String localName, String qName, Attributes attributes) {
            if (localName.equals("mergeCell")) {
                MergedRange range = MergedRange.parse(attributes.getValue("ref"));
                if (range != null && merged.size() < MAX_MERGED) {
                    merged.add(range);
                }
                return;
            }
            if (skipping) {
                return;
            }
            switch (localName) {
                case "row" -> {
                    String r = attributes.getValue("r");
                    row = r == null ? row + 1 : parseRow(r);
                    if (row < 1 || row > Cell.MAX_ROW) {
                        throw new SheetException(file, "refused: sheet '" + sheet + "' has a row numbered " + r
                                + ", beyond the " + Cell.MAX_ROW + " rows a sheet has");
                    }
                    column = -1;
                    cells = new ArrayList<>();
                }
                case "c" -> {
                    String reference = attributes.getValue("r");
                    column = reference == null ? column + 1 : columnOf(reference);
                    if (column < 0 || column > Cell.MAX_COLUMN || cells.size() > Cell.MAX_COLUMN) {
                        throw new SheetException(file, "refused: sheet '" + sheet + "' row " + row + " has cells beyond column "
                                + Cell.columnName(Cell.MAX_COLUMN) + ", the last a sheet has");
                    }
                    type = attributes.getValue("t");
                    String s = attributes.getValue("s");
                    style = s == null ? 0 : parseRow(s);
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

        private static int parseRow(String text) {
            try {
                return Integer.parseInt(text.trim());
            } catch (NumberFormatException e) {
                return -1;
            }
        }

        @Override
        public void characters(char[] ch, int start, int length) {
            if (skipping) {
                return;
            }
            StringBuilder target = inValue || inInlineText ? value : inFormula ? formula : null;
            if (target == null) {
                return;
            }
            if (target.length() + length > Cell.MAX_TEXT) {
                throw new SheetException(file, "refused: sheet '" + sheet + "' cell " + Cell.columnName(column) + row
                        + " holds more than " + String.format(java.util.Locale.ROOT, "%,d", Cell.MAX_TEXT) + " characters, more than a spreadsheet cell holds");
            }
            target.append(ch, start, length);
        }

        @Override
        public void endElement(String uri, String localName, String qName) {
            if (skipping) {
                return;
            }
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
                        deliver();
                    }
                }
                default -> {
                }
            }
        }

        private void deliver() {
            try {
                handler.row(row, cells);
            } catch (SheetException e) {
                refusal = e;
                skipping = true;
            } catch (RowHandler.Stop e) {
                skipping = true;
            }
        }

        /** Passes on the merged cells, then the handler's refusal of a row, if any. */
        void finish() {
            handler.merged(List.copyOf(merged));
            if (refusal != null) {
                throw refusal;
            }
        }

        private Cell cell() {
            if (hasFormula && (!hasValue || value.length() == 0)) {
                return new Cell(column, Cell.Kind.FORMULA_WITHOUT_VALUE, "=" + formula, Double.NaN);
            }
            if (!hasValue) {
                return null;
            }
            String text = value.toString();
            if (type == null || type.equals("n")) {
                if (text.isEmpty()) {
                    return null;
                }
                try {
                    double number = Double.parseDouble(text);
                    return styles.isDate(style) ? Cell.date(column, number) : Cell.number(column, number);
                } catch (NumberFormatException e) {
                    return Cell.text(column, text);
                }
            }
            return switch (type) {
                case "s" -> {
                    String shared = strings.get(parseRow(text));
                    if (shared == null) {
                        throw new SheetException(file, "corrupt .xlsx workbook (cell " + Cell.columnName(column) + row
                                + " refers to shared string " + text.trim() + ", which does not exist)");
                    }
                    yield Cell.text(column, shared);
                }
                case "b" -> new Cell(column, Cell.Kind.BOOLEAN, text.equals("1") ? "TRUE" : "FALSE", Double.NaN);
                case "e" -> new Cell(column, Cell.Kind.ERROR, text, Double.NaN);
                default -> Cell.text(column, text);
            };
        }

        private static int columnOf(String reference) {
            int column = 0;
            for (int i = 0; i < reference.length() && i < 4; i++) {
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
