package lotgate.cli;

import java.io.IOException;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.util.List;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;

/** CSV output that a spreadsheet opens safely: text cells that would start a formula are quoted inert. */
final class Csv {
    private Csv() {
    }

    static String table(List<String> header, List<List<Object>> rows) {
        StringWriter out = new StringWriter();
        try (CSVPrinter printer = new CSVPrinter(out, CSVFormat.RFC4180.builder().setRecordSeparator("\n").get())) {
            printer.printRecord(header);
            for (List<Object> row : rows) {
                printer.printRecord(row.stream().map(Csv::cell).toList());
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return out.toString();
    }

    /** Numbers stay numbers; text starting with = + - @ (or a tab or carriage return) gets a leading quote. */
    static Object cell(Object value) {
        if (value == null) {
            return "";
        }
        if (value instanceof String text && !text.isEmpty() && "=+-@\t\r".indexOf(text.charAt(0)) >= 0) {
            return "'" + text;
        }
        return value;
    }
}
