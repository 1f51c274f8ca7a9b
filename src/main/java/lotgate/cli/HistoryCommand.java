package lotgate.cli;

import lotgate.report.Json;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.List;
import lotgate.history.HistoryStore;
import lotgate.history.LotRow;
import lotgate.report.CsvTable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** Lists the recorded lots, corrections and corrective actions of the history store. */
@Command(name = "history", mixinStandardHelpOptions = true, sortOptions = false, usageHelpAutoWidth = true,
        header = "List the lots recorded in the history store.",
        description = {"Lists every record of the history store in order, or those of one supplier and part:"
                + " sentenced and imported lots, corrections (with the record they supersede) and corrective"
                + " actions.", ""})
final class HistoryCommand implements Runnable {
    @Option(names = "--supplier", paramLabel = "NAME", description = "Only this supplier's records.")
    String supplier;

    @Option(names = "--part", paramLabel = "PART", description = "Only this part's records.")
    String part;

    @Mixin
    StoreOption storeOption;

    @Mixin
    OutputFormat format;

    @Spec
    CommandSpec spec;

    @Override
    public void run() {
        List<LotRow> rows;
        String location;
        try (HistoryStore store = storeOption.open()) {
            rows = store.rows(supplier, part);
            location = store.location();
        }
        PrintWriter out = spec.commandLine().getOut();
        switch (format.kind) {
            case json -> {
                ObjectNode node = Json.object();
                node.put("store", location);
                var list = node.putArray("records");
                for (LotRow row : rows) {
                    ObjectNode item = list.addObject();
                    item.put("seq", row.seq());
                    item.put("recordedAt", row.recordedAt().toString());
                    item.put("kind", row.kind());
                    item.put("supplier", row.supplier());
                    item.put("part", row.part());
                    item.put("lot", row.lot());
                    item.put("received", row.received() == null ? null : row.received().toString());
                    item.put("verdict", row.verdict());
                    item.put("inspected", row.inspected());
                    item.put("nonconforming", row.nonconforming());
                    item.put("severity", row.severity());
                    item.put("supersedes", row.supersedes());
                }
                out.println(Json.text(node));
            }
            case csv -> {
                List<List<Object>> table = new ArrayList<>();
                for (LotRow row : rows) {
                    table.add(List.of(row.seq(), row.recordedAt().toString(), row.kind(), row.supplier(), row.part(),
                            row.lot(), row.received() == null ? "" : row.received().toString(),
                            row.verdict() == null ? "" : row.verdict(), row.inspected(), row.nonconforming(),
                            row.severity() == null ? "" : row.severity(), row.supersedes()));
                }
                out.print(CsvTable.table(List.of("seq", "recordedAt", "kind", "supplier", "part", "lot", "received",
                        "verdict", "inspected", "nonconforming", "severity", "supersedes"), table));
            }
            case text -> {
                out.println("History store " + location + ": " + rows.size() + " records");
                out.printf("  %6s  %-10s  %-28s %-12s %-14s %-7s %9s %6s  %-10s%n", "#", "received", "supplier",
                        "part", "lot", "verdict", "inspected", "found", "severity");
                for (LotRow row : rows) {
                    String lot = row.isLot() ? row.lot() : "(corrective action)";
                    out.printf("  %6d  %-10s  %-28s %-12s %-14s %-7s %9d %6d  %-10s%s%n", row.seq(),
                            row.received() == null ? "" : row.received().toString(), clip(row.supplier(), 28),
                            clip(row.part(), 12), clip(lot, 14), row.verdict() == null ? "" : row.verdict(),
                            row.inspected(), row.nonconforming(), row.severity() == null ? "" : row.severity(),
                            row.supersedes() > 0 ? "  corrects #" + row.supersedes() : "");
                }
            }
        }
        out.flush();
    }

    static String clip(String text, int width) {
        return text.length() <= width ? text : text.substring(0, width - 1) + "~";
    }
}
