package lotgate.inspection;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.HashMap;
import java.util.Map;
import javax.xml.parsers.ParserConfigurationException;
import org.apache.poi.ss.usermodel.DateUtil;
import org.apache.poi.util.XMLHelper;
import org.xml.sax.Attributes;
import org.xml.sax.InputSource;
import org.xml.sax.SAXException;
import org.xml.sax.XMLReader;
import org.xml.sax.helpers.DefaultHandler;

/**
 * Which cell styles of an .xlsx workbook show numbers as dates, read by streaming its styles part (only the
 * number formats and the cell formats, at most {@link #MAX_STYLES} of each).
 */
final class DateStyles {
    /** The most cell formats a workbook may hold (64,000 in the common spreadsheet programs). */
    static final int MAX_STYLES = 65_536;

    private final boolean[] date;

    private DateStyles(boolean[] date) {
        this.date = date;
    }

    static DateStyles none() {
        return new DateStyles(new boolean[0]);
    }

    static DateStyles read(Path file, InputStream in) throws IOException, SAXException, ParserConfigurationException {
        Formats formats = new Formats(file);
        XMLReader xml = XMLHelper.newXMLReader();
        xml.setContentHandler(formats);
        xml.parse(new InputSource(in));
        boolean[] date = new boolean[formats.count];
        for (int i = 0; i < formats.count; i++) {
            int id = formats.formatOf[i];
            date[i] = DateUtil.isADateFormat(id, formats.codes.get(id));
        }
        return new DateStyles(date);
    }

    /** Whether cells of the style index show dates. */
    boolean isDate(int style) {
        return style >= 0 && style < date.length && date[style];
    }

    /** Collects the custom number formats and the number format of each cell format (xf inside cellXfs). */
    private static final class Formats extends DefaultHandler {
        private final Path file;
        private final Map<Integer, String> codes = new HashMap<>();
        private int[] formatOf = new int[64];
        private int count;
        private boolean inCellFormats;

        Formats(Path file) {
            this.file = file;
        }

        @Override
        public void startElement(String uri, String localName, String qName, Attributes attributes) {
            switch (localName) {
                case "numFmt" -> {
                    if (codes.size() >= MAX_STYLES) {
                        throw tooMany();
                    }
                    Integer id = number(attributes.getValue("numFmtId"));
                    String code = attributes.getValue("formatCode");
                    if (id != null && code != null && code.length() <= 1000) {
                        codes.put(id, code);
                    }
                }
                case "cellXfs" -> inCellFormats = true;
                case "xf" -> {
                    if (!inCellFormats) {
                        return;
                    }
                    if (count >= MAX_STYLES) {
                        throw tooMany();
                    }
                    if (count == formatOf.length) {
                        formatOf = Arrays.copyOf(formatOf, 2 * count);
                    }
                    Integer id = number(attributes.getValue("numFmtId"));
                    formatOf[count++] = id == null ? 0 : id;
                }
                default -> {
                }
            }
        }

        @Override
        public void endElement(String uri, String localName, String qName) {
            if (localName.equals("cellXfs")) {
                inCellFormats = false;
            }
        }

        private SheetException tooMany() {
            return new SheetException(file, "refused: the workbook holds more than " + MAX_STYLES + " cell formats,"
                    + " far beyond a real inspection sheet");
        }

        private static Integer number(String text) {
            try {
                return text == null ? null : Integer.valueOf(text.trim());
            } catch (NumberFormatException e) {
                return null;
            }
        }
    }
}
