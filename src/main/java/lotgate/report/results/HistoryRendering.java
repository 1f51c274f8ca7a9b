package lotgate.report.results;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.List;
import lotgate.history.LotRow;
import lotgate.jobs.ListHistory;
import lotgate.report.CsvTable;
import lotgate.report.Json;

/** The history store's records as text, JSON or CSV. */
public final class HistoryRendering {
    /** The digits of a chain hash that the text listing shows. */
    private static final int SHORT_HASH = 12;

    private HistoryRendering() {
    }

    /** Text cut to a column's width, its last character a tilde where it was cut. */
    public static String clip(String text, int width) {
        return text.length() <= width ? text : text.substring(0, width - 1) + "~";
    }

    /** The records as JSON. */
    public static ObjectNode json(ListHistory.Result result) {
        ObjectNode node = Json.object();
        node.put("store", result.store());
        var list = node.putArray("records");
        for (LotRow row : result.rows()) {
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
            if (row.supersedes() > 0) {
                item.put("supersedes", row.supersedes());
            } else {
                item.putNull("supersedes");
            }
            item.put("hash", row.hash());
        }
        return node;
    }

    /** The records as CSV. */
    public static String csv(ListHistory.Result result) {
        List<List<Object>> table = new ArrayList<>();
        for (LotRow row : result.rows()) {
            table.add(List.of(row.seq(), row.recordedAt().toString(), row.kind(), row.supplier(), row.part(),
                    row.lot(), row.received() == null ? "" : row.received().toString(),
                    row.verdict() == null ? "" : row.verdict(), row.inspected(), row.nonconforming(),
                    row.severity() == null ? "" : row.severity(), row.supersedes() > 0 ? row.supersedes() : "", row.hash()));
        }
        return CsvTable.table(List.of("seq", "recordedAt", "kind", "supplier", "part", "lot", "received",
                "verdict", "inspected", "nonconforming", "severity", "supersedes", "hash"), table);
    }

    /** The records as text. */
    public static String text(ListHistory.Result result) {
        return Text.of(out -> {
            List<LotRow> rows = result.rows();
            out.println("History store " + result.store() + ": " + lotgate.report.Words.count(rows.size(), "record"));
            out.printf("  %6s  %-12s  %-10s  %-28s %-12s %-14s %-7s %9s %6s  %-10s%n", "#", "chain hash",
                    "received", "supplier", "part", "lot", "verdict", "inspected", "found", "severity");
            for (LotRow row : rows) {
                String lot = row.isLot() ? row.lot() : "(corrective action)";
                out.printf("  %6d  %-12s  %-10s  %-28s %-12s %-14s %-7s %9d %6d  %-10s%s%n", row.seq(),
                        row.hash().substring(0, SHORT_HASH), row.received() == null ? "" : row.received().toString(), clip(row.supplier(), 28),
                        clip(row.part(), 12), clip(lot, 14), row.verdict() == null ? "" : row.verdict(),
                        row.inspected(), row.nonconforming(), row.severity() == null ? "" : row.severity(),
                        row.supersedes() > 0 ? "  corrects #" + row.supersedes() : "");
            }
            if (!rows.isEmpty()) {
                out.println("  (chain hashes shortened to their first " + SHORT_HASH + " of 64 digits; --format json or"
                        + " csv gives them whole, for 'lotgate verify --expect SEQ:HASH')");
            }
        });
    }
}
