package lotgate.report;

import java.io.IOException;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.util.List;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;

/** CSV output that a spreadsheet opens safely: text cells that would start a formula are quoted inert. */
public final class CsvTable {
    private CsvTable() {
    }

    public static String table(List<String> header, List<List<Object>> rows) {
        StringWriter out = new StringWriter();
        try (CSVPrinter printer = new CSVPrinter(out, CSVFormat.RFC4180.builder().setRecordSeparator("\n").get())) {
            printer.printRecord(header);
            for (List<Object> row : rows) {
                printer.printRecord(row.stream().map(CsvTable::cell).toList());
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return out.toString();
    }

    /** Numbers stay numbers; text starting with = + - @ (or a tab or carriage return) gets a leading quote. */
    public static Object cell(Object value) {
        if (value == null) {
            return "";
        }
        if (value instanceof String text && LotReport.looksLikeFormula(text)) {
            return "'" + text;
        }
        return value;
    }
}
