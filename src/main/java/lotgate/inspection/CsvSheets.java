package lotgate.inspection;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.io.Reader;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import lotgate.files.MadeAhead;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;

/**
 * Streams the rows of a CSV file through Commons CSV: UTF-8 with or without a byte-order mark, separated by
 * commas, semicolons or tabs. The separator is given, or decided from the header row alone: the one that
 * splits a row of the first {@link SheetSource#HEADER_SEARCH} into the header a reader looks for (failing
 * that, whichever of comma and semicolon the first non-empty line uses more of, outside quotes). A record
 * longer than {@link #MAX_RECORD} characters is refused, so that memory stays bounded.
 */
final class CsvSheets implements SheetSource {
    /** The longest record read, in characters: far more than a row of an inspection sheet. */
    static final int MAX_RECORD = 1 << 20;
    private final Path file;
    private Character delimiter;

    CsvSheets(Path file) {
        this.file = file;
    }

    @Override
    public Path file() {
        return file;
    }

    @Override
    public List<String> sheetNames() {
        return List.of(sheetName());
    }

    private String sheetName() {
        return file.getFileName().toString();
    }

    @Override
    public void useDelimiter(char given) {
        delimiter = given;
    }

    @Override
    public void findHeader(java.util.function.Predicate<List<String>> isHeader) {
        if (delimiter != null) {
            return;
        }
        int bestLine = Integer.MAX_VALUE;
        for (char candidate : new char[] {',', ';', '\t'}) {
            int line = headerLine(candidate, isHeader);
            if (line < bestLine) {
                bestLine = line;
                delimiter = candidate;
            }
        }
    }

    /** The line of the first of the first rows that, split by the candidate, is a header; else MAX_VALUE. */
    private int headerLine(char candidate, java.util.function.Predicate<List<String>> isHeader) {
        CSVFormat format = CSVFormat.RFC4180.builder().setDelimiter(candidate).setIgnoreEmptyLines(false).get();
        try (Reader reader = reader(); CSVParser parser = CSVParser.builder().setReader(reader).setFormat(format).get()) {
            int line = 0;
            for (CSVRecord record : parser) {
                line++;
                if (line > HEADER_SEARCH) {
                    break;
                }
                if (isHeader.test(record.toList())) {
                    return line;
                }
            }
        } catch (IOException | RuntimeException e) {
            // The full read reports what is wrong with the file.
        }
        return Integer.MAX_VALUE;
    }

    private Reader reader() throws IOException {
        var decoder = StandardCharsets.UTF_8.newDecoder()
                .onMalformedInput(CodingErrorAction.REPORT)
                .onUnmappableCharacter(CodingErrorAction.REPORT);
        BufferedReader reader = new BufferedReader(new InputStreamReader(Files.newInputStream(file), decoder), 1 << 16);
        reader.mark(1);
        if (reader.read() != '\uFEFF') {
            reader.reset();
        }
        return new BoundedRecords(reader);
    }

    private char delimiter() throws IOException {
        if (delimiter != null) {
            return delimiter;
        }
        try (BufferedReader reader = new BufferedReader(reader())) {
            for (String line = reader.readLine(); line != null; line = reader.readLine()) {
                if (line.indexOf('\0') >= 0) {
                    throw new SheetException(file, "not a text file (it holds NUL bytes)");
                }
                if (line.isBlank()) {
                    continue;
                }
                int commas = 0;
                int semicolons = 0;
                boolean quoted = false;
                for (char ch : line.toCharArray()) {
                    if (ch == '"') {
                        quoted = !quoted;
                    } else if (!quoted && ch == ',') {
                        commas++;
                    } else if (!quoted && ch == ';') {
                        semicolons++;
                    }
                }
                return semicolons > commas ? ';' : ',';
            }
        }
        return ',';
    }

    @Override
    public void read(String sheet, RowHandler handler) {
        if (sheet != null && !sheet.equals(sheetName())) {
            throw new SheetException(file, "a CSV file has no sheets to choose from; leave out --sheet");
        }
        try {
            CSVFormat format = CSVFormat.RFC4180.builder().setDelimiter(delimiter()).setIgnoreEmptyLines(false).get();
            try (Reader reader = reader(); CSVParser parser = CSVParser.builder().setReader(reader).setFormat(format).get();
                    MadeAhead<Row> rows = new MadeAhead<>(parser.iterator(), new Rows(), Files.size(file) >= AHEAD)) {
                while (rows.hasNext()) {
                    Row row = rows.next();
                    if (!row.cells().isEmpty()) {
                        try {
                            handler.row(row.line(), row.cells());
                        } catch (RowHandler.Stop e) {
                            return;
                        }
                    }
                }
            }
        } catch (CharacterCodingException e) {
            throw new SheetException(file, "not UTF-8 text; save the CSV as UTF-8", e);
        } catch (java.io.UncheckedIOException e) {
            if (e.getCause() instanceof CharacterCodingException) {
                throw new SheetException(file, "not UTF-8 text; save the CSV as UTF-8", e);
            }
            throw new SheetException(file, "malformed CSV (" + e.getMessage() + ")", e);
        } catch (IOException e) {
            throw new SheetException(file, "cannot be read (" + e.getMessage() + ")", e);
        } catch (IllegalStateException e) {
            throw new SheetException(file, "malformed CSV (" + e.getMessage() + ")", e);
        }
    }

    /**
     * A file at least this long (1 MiB, some 10,000 rows) is parsed on a thread of its own while its rows are
     * handled: an import of 100,000 lots spends as long parsing as checking.
     */
    private static final long AHEAD = 1 << 20;

    /** A record's number and its non-blank cells. */
    private record Row(int line, List<Cell> cells) {
    }

    /** Each record, numbered, as its non-blank cells; refuses a file that holds NUL bytes. */
    private final class Rows implements java.util.function.Function<CSVRecord, Row> {
        private int line;

        @Override
        public Row apply(CSVRecord record) {
            line++;
            List<Cell> cells = new ArrayList<>(record.size());
            for (int i = 0; i < record.size(); i++) {
                String text = record.get(i);
                if (text.indexOf('\0') >= 0) {
                    throw new SheetException(file, "not a text file (it holds NUL bytes)");
                }
                if (!text.isBlank()) {
                    cells.add(Cell.text(i, text));
                }
            }
            return new Row(line, cells);
        }
    }

    /** Counts the characters of each record (up to a line end outside quotes) and refuses an overlong one. */
    private final class BoundedRecords extends java.io.FilterReader {
        private boolean quoted;
        private int length;

        BoundedRecords(Reader in) {
            super(in);
        }

        @Override
        public int read() throws IOException {
            char[] one = new char[1];
            return read(one, 0, 1) < 0 ? -1 : one[0];
        }

        @Override
        public int read(char[] buffer, int offset, int count) throws IOException {
            int n = super.read(buffer, offset, count);
            for (int i = offset; i < offset + n; i++) {
                char ch = buffer[i];
                if (ch == '"') {
                    quoted = !quoted;
                }
                if (ch == '\n' && !quoted) {
                    length = 0;
                } else if (++length > MAX_RECORD) {
                    throw new SheetException(file, "refused: a record longer than " + MAX_RECORD + " characters, far"
                            + " beyond a row of a real inspection sheet");
                }
            }
            return n;
        }
    }

    @Override
    public String where(String sheet, int row, int column) {
        return "row " + row + ", column " + Cell.columnName(column);
    }

    @Override
    public String whereRow(String sheet, int row) {
        return "row " + row;
    }
}
