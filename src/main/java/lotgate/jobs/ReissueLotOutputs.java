package lotgate.jobs;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.nio.file.Path;
import java.time.Instant;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import lotgate.files.CanonicalJson;
import lotgate.files.StagedFiles;
import lotgate.history.HistoryStore;
import lotgate.history.StoredRecord;
import lotgate.inspection.Columns;
import lotgate.inspection.LotDetails;
import lotgate.plan.PlanFormat;
import lotgate.plan.SavedPlan;
import lotgate.report.DecisionJson;
import lotgate.report.HistoryPlace;
import lotgate.sentencing.LotDecision;

/**
 * Writing a recorded lot's outputs again (its reports, decision record and sampling chart) from the
 * history store: for a run killed between the commit and its outputs, or for a report lost since.
 * The record names the plan and the sheet; the plan's fingerprint and the sheet's SHA-256 must still
 * be those recorded, and applying the plan again must give the recorded decision exactly.
 */
public final class ReissueLotOutputs {

    /**
     * The store, the record (its number, or else the lot id, with supplier and part when the id alone is
     * ambiguous), where the sheet and plan are now (null: where the record says), the sheet's column names,
     * and the outputs to write.
     */
    public record Request(String store, Long seq, String lot, String supplier, String part, Path sheetFile,
            Path planFile, Columns columns, SentenceLot.Outputs outputs) {
    }

    /** The record the outputs were written from, with its place in the chain. */
    public record Result(HistoryPlace place, LotDecision decision, SentenceLot.Outputs outputs) {
    }

    private ReissueLotOutputs() {
    }

    public static Result run(Request request) {
        SentenceLot.checkOutputs(request.outputs());
        StoredRecord record;
        String location;
        try (HistoryStore store = HistoryStore.open(request.store(), false)) {
            location = store.location();
            HistoryStore.Verification verification = store.verify();
            if (!verification.intact()) {
                throw new lotgate.history.StoreException("history store " + location + " is damaged: "
                        + verification.problem() + "; its records cannot vouch for new outputs (nothing was written)");
            }
            long seq = request.seq() != null ? request.seq() : find(store, request);
            record = store.record(seq);
            if (record == null) {
                throw new JobException(JobException.Kind.CONFLICT, "record", "the store " + location
                        + " has no record " + seq);
            }
        }
        JsonNode content = record.json();
        JsonNode recorded = content.path("decision");
        if (!"lot".equals(content.path("kind").asText()) || !recorded.isObject()) {
            throw new JobException(JobException.Kind.CONFLICT, "record", "record " + record.seq() + " is "
                    + ("lot".equals(content.path("kind").asText()) ? "a lot imported from a list of past lots"
                    : "a corrective action") + ": it holds no decision to write reports from");
        }
        Path planFile = request.planFile() != null ? request.planFile() : Path.of(recorded.path("plan").path("file")
                .asText());
        Path sheetFile = request.sheetFile() != null ? request.sheetFile() : Path.of(recorded.path("sheet")
                .path("file").asText());
        SavedPlan plan = PlanFormat.read(planFile);
        if (!plan.fingerprint().equals(recorded.path("plan").path("fingerprint").asText())) {
            throw new JobException(JobException.Kind.CONFLICT, "planFile", planFile + " is not the plan record "
                    + record.seq() + " was decided by (its fingerprint differs); name that plan's file");
        }
        String sha = lotgate.files.Sha256.of(sheetFile);
        if (!sha.equals(recorded.path("sheet").path("sha256").asText())) {
            throw new JobException(JobException.Kind.CONFLICT, "sheetFile", sheetFile + " is not the sheet record "
                    + record.seq() + " was decided from (its SHA-256 differs); name that sheet");
        }
        JsonNode lotNode = recorded.path("lot");
        String received = lotNode.path("received").isTextual() ? lotNode.path("received").asText() : null;
        LotDetails lot = new LotDetails(lotNode.path("lot").asText(), text(lotNode, "supplier"), text(lotNode, "part"),
                lotNode.path("lotSize").asInt(0), received == null ? null : LocalDate.parse(received),
                text(lotNode, "inspector"));
        JsonNode sheet = recorded.path("sheet");
        SentenceLot.Request again = new SentenceLot.Request(planFile, sheetFile, text(sheet, "sheet"),
                request.columns() == null ? Columns.standard() : request.columns(), sheet.path("firstRow").asInt(0),
                sheet.path("lastRow").asInt(0), lot, null, recorded.path("confidence").asDouble(), false, null, null,
                "steady", request.store(), request.outputs());
        LotDecision fresh = SentenceLot.decideAgain(again, plan, lot);
        List<String> notices = new ArrayList<>();
        recorded.path("notices").forEach(n -> notices.add(n.asText()));
        LotDecision decision = new LotDecision(fresh.lot(), fresh.plan(), fresh.planFile(), fresh.sample(),
                fresh.sheetSha256(), fresh.sentence(), fresh.confidence(),
                Instant.parse(recorded.path("decidedAt").asText()), recorded.path("tool").path("version").asText(),
                notices, fresh.measured());
        ObjectNode now = DecisionJson.of(decision);
        ObjectNode then = ((ObjectNode) recorded).deepCopy();
        // The files may be named by other paths now; everything else must be what was recorded.
        for (ObjectNode node : List.of(now, then)) {
            ((ObjectNode) node.path("plan")).remove("file");
            ((ObjectNode) node.path("sheet")).remove("file");
        }
        if (!CanonicalJson.text(now).equals(CanonicalJson.text(then))) {
            throw new JobException(JobException.Kind.CONFLICT, "record", "applying plan " + plan.name() + " to "
                    + sheetFile + " again does not give the decision record " + record.seq() + " holds (nothing was"
                    + " written)");
        }
        HistoryPlace place = new HistoryPlace(record.seq(), record.hash(), location);
        try (StagedFiles staged = new StagedFiles()) {
            SentenceLot.stage(staged, request.outputs(), decision, place);
            staged.publish();
        }
        return new Result(place, decision, request.outputs());
    }

    private static String text(JsonNode node, String field) {
        JsonNode value = node.get(field);
        return value == null || value.isNull() ? null : value.asText();
    }

    /** The current record of the lot id: the only one, or the one of the supplier and part given. */
    private static long find(HistoryStore store, Request request) {
        if (request.lot() == null) {
            throw JobException.invalid("record", "name the record by its number or its lot id");
        }
        if (request.supplier() != null && request.part() != null) {
            long seq = store.currentRecord(request.supplier(), request.part(), request.lot());
            if (seq == 0) {
                throw new JobException(JobException.Kind.CONFLICT, "lot", "the store " + store.location()
                        + " holds no lot " + request.lot() + " of " + request.supplier() + ", part " + request.part());
            }
            return seq;
        }
        List<Long> seqs = store.currentRecords(request.lot());
        if (seqs.isEmpty()) {
            throw new JobException(JobException.Kind.CONFLICT, "lot", "the store " + store.location()
                    + " holds no lot " + request.lot());
        }
        if (seqs.size() > 1) {
            throw new JobException(JobException.Kind.CONFLICT, "lot", "lot " + request.lot() + " is recorded for"
                    + " several suppliers or parts (records " + seqs.stream().map(s -> "#" + s).toList()
                    + "); give its record number, or --supplier and --part");
        }
        return seqs.get(0);
    }
}
