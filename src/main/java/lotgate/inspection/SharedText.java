package lotgate.inspection;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import javax.xml.parsers.ParserConfigurationException;
import org.apache.poi.util.XMLHelper;
import org.xml.sax.Attributes;
import org.xml.sax.InputSource;
import org.xml.sax.SAXException;
import org.xml.sax.XMLReader;
import org.xml.sax.helpers.DefaultHandler;

/**
 * A workbook's shared strings, held compactly (all characters in blocks, one offset per string) and capped,
 * so that a crafted table cannot exhaust memory: a string longer than a cell holds, or a table beyond
 * {@link #MAX_CHARACTERS} characters or {@link #MAX_STRINGS} strings, is refused.
 */
final class SharedText {
    /** 32 million characters (64 MB): several times what a sheet of a million units needs. */
    static final long MAX_CHARACTERS = 32L << 20;
    /** Two strings for each row a sheet can have. */
    static final int MAX_STRINGS = 2 * Cell.MAX_ROW;
    private static final int BLOCK = 1 << 16;

    private final List<char[]> blocks = new ArrayList<>();
    private long[] starts = new long[1024];
    private int count;
    private long length;

    private SharedText() {
        starts[0] = 0;
    }

    static SharedText empty() {
        return new SharedText();
    }

    static SharedText read(Path file, InputStream in) throws IOException, SAXException, ParserConfigurationException {
        SharedText text = new SharedText();
        XMLReader xml = XMLHelper.newXMLReader();
        xml.setContentHandler(text.new Handler(file));
        xml.parse(new InputSource(in));
        return text;
    }

    int size() {
        return count;
    }

    /** The string at an index, or null when there is none. */
    String get(int index) {
        if (index < 0 || index >= count) {
            return null;
        }
        long from = starts[index];
        long to = starts[index + 1];
        StringBuilder out = new StringBuilder((int) (to - from));
        for (long at = from; at < to; at++) {
            out.append(blocks.get((int) (at / BLOCK))[(int) (at % BLOCK)]);
        }
        return out.toString();
    }

    private void append(char[] ch, int start, int n) {
        for (int i = 0; i < n; i++) {
            int block = (int) (length / BLOCK);
            if (block == blocks.size()) {
                blocks.add(new char[BLOCK]);
            }
            blocks.get(block)[(int) (length % BLOCK)] = ch[start + i];
            length++;
        }
    }

    private void end() {
        count++;
        if (count + 1 >= starts.length) {
            starts = java.util.Arrays.copyOf(starts, starts.length * 2);
        }
        starts[count] = length;
    }

    /** Text runs of each <si>, leaving out phonetic guides (<rPh>). */
    private final class Handler extends DefaultHandler {
        private final Path file;
        private boolean inText;
        private int phonetic;
        private long stringStart;

        Handler(Path file) {
            this.file = file;
        }

        @Override
        public void startElement(String uri, String localName, String qName, Attributes attributes) {
            switch (localName) {
                case "si" -> {
                    if (count >= MAX_STRINGS) {
                        throw new SheetException(file, "refused: the workbook's shared strings hold more than "
                                + String.format(Locale.ROOT, "%,d", MAX_STRINGS) + " entries, far beyond a real inspection sheet");
                    }
                    stringStart = length;
                }
                case "rPh" -> phonetic++;
                case "t" -> inText = phonetic == 0;
                default -> {
                }
            }
        }

        @Override
        public void characters(char[] ch, int start, int n) {
            if (!inText) {
                return;
            }
            if (length - stringStart + n > Cell.MAX_TEXT) {
                throw new SheetException(file, "refused: shared string " + (count + 1) + " holds more than "
                        + String.format(Locale.ROOT, "%,d", Cell.MAX_TEXT) + " characters, more than a spreadsheet cell holds");
            }
            if (length + n > MAX_CHARACTERS) {
                throw new SheetException(file, "refused: the workbook's shared strings hold more than "
                        + String.format(Locale.ROOT, "%,d", MAX_CHARACTERS) + " characters, far beyond a real inspection sheet");
            }
            append(ch, start, n);
        }

        @Override
        public void endElement(String uri, String localName, String qName) {
            switch (localName) {
                case "si" -> end();
                case "rPh" -> phonetic--;
                case "t" -> inText = false;
                default -> {
                }
            }
        }
    }
}
