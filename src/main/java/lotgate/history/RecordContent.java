package lotgate.history;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.time.LocalDate;
import java.util.Map;

/**
 * The content of history records: a lot (sentenced, or imported from a past list), or a supplier's
 * corrective action. The store hashes this content; its columns are copies for queries.
 */
public final class RecordContent {
    /** The field of a lot accepted with a count between a reduced plan's Ac and Re (present only then, as true). */
    public static final String REINSTATES_NORMAL = "reinstatesNormal";

    private RecordContent() {
    }

    /** What every lot record holds, however it came. */
    public record Lot(String supplier, String part, String lot, int lotSize, LocalDate received, String inspector,
            String verdict, int inspected, int nonconforming, Map<String, Integer> defectTypes, String severity,
            String production, long supersedes, String reason) {
    }

    /**
     * A lot record.
     *
     * @param decision the decision record of a sentenced lot, or null for an imported lot
     * @param source   "sentence" or "import"
     */
    public static ObjectNode lot(Lot lot, JsonNode decision, String source) {
        ObjectNode node = JsonNodeFactory.instance.objectNode();
        node.put("kind", "lot");
        node.put("source", source);
        node.put("supplier", lot.supplier());
        node.put("part", lot.part());
        node.put("lot", lot.lot());
        node.put("lotSize", lot.lotSize());
        node.put("received", lot.received() == null ? null : lot.received().toString());
        node.put("inspector", lot.inspector());
        node.put("verdict", lot.verdict());
        node.put("inspected", lot.inspected());
        node.put("nonconforming", lot.nonconforming());
        ObjectNode types = node.putObject("defectTypes");
        lot.defectTypes().forEach(types::put);
        node.put("severity", lot.severity());
        node.put("production", lot.production());
        node.put("supersedes", lot.supersedes());
        node.put("reason", lot.reason());
        node.set("decision", decision);
        return node;
    }

    /** A supplier's corrective action, which lifts a discontinuation of inspection. */
    public static ObjectNode action(String supplier, String part, String reason, LocalDate day) {
        ObjectNode node = JsonNodeFactory.instance.objectNode();
        node.put("kind", "action");
        node.put("supplier", supplier);
        node.put("part", part);
        node.put("lot", "");
        node.put("received", day == null ? null : day.toString());
        node.put("reason", reason);
        node.put("inspected", 0);
        node.put("nonconforming", 0);
        node.put("supersedes", 0);
        return node;
    }
}
