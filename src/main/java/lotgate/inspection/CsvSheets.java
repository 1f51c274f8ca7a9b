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
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;

/**
 * Streams the rows of a CSV file through Commons CSV: UTF-8 with or without a byte-order mark, comma
 * or semicolon separated (whichever the first non-empty line uses more of, outside quotes).
 */
final class CsvSheets implements SheetSource {
    private final Path file;

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

    private Reader reader() throws IOException {
        var decoder = StandardCharsets.UTF_8.newDecoder()
                .onMalformedInput(CodingErrorAction.REPORT)
                .onUnmappableCharacter(CodingErrorAction.REPORT);
        BufferedReader reader = new BufferedReader(new InputStreamReader(Files.newInputStream(file), decoder), 1 << 16);
        reader.mark(1);
        if (reader.read() != '\uFEFF') {
            reader.reset();
        }
        return reader;
    }

    private char delimiter() throws IOException {
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
            try (Reader reader = reader(); CSVParser parser = CSVParser.builder().setReader(reader).setFormat(format).get()) {
                int line = 0;
                for (CSVRecord record : parser) {
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
                    if (!cells.isEmpty()) {
                        handler.row(line, cells);
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

    @Override
    public String where(String sheet, int row, int column) {
        return "row " + row + ", column " + Cell.columnName(column);
    }

    @Override
    public String whereRow(String sheet, int row) {
        return "row " + row;
    }
}
