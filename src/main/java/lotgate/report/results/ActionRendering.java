package lotgate.report.results;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.List;
import lotgate.jobs.RecordCorrectiveAction;
import lotgate.report.CsvTable;
import lotgate.report.Json;

/** A recorded corrective action as text, JSON or CSV. */
public final class ActionRendering {
    private ActionRendering() {
    }

    public static String text(RecordCorrectiveAction.Result result) {
        return "Corrective action for " + result.supplier() + ", part " + result.part() + " recorded as #"
                + result.record().seq() + " in " + result.store() + " (chain hash " + result.record().hash() + ")."
                + System.lineSeparator();
    }

    public static ObjectNode json(RecordCorrectiveAction.Result result) {
        ObjectNode node = Json.object();
        node.put("supplier", result.supplier());
        node.put("part", result.part());
        node.put("store", result.store());
        node.put("seq", result.record().seq());
        node.put("recordHash", result.record().hash());
        node.put("expect", result.record().seq() + ":" + result.record().hash());
        return node;
    }

    public static String csv(RecordCorrectiveAction.Result result) {
        return CsvTable.table(List.of("supplier", "part", "store", "seq", "recordHash"), List.of(List.of(
                result.supplier(), result.part(), result.store(), result.record().seq(), result.record().hash())));
    }
}
