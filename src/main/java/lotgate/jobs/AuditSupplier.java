package lotgate.jobs;

import com.fasterxml.jackson.databind.JsonNode;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import lotgate.history.HistoryStore;
import lotgate.history.LotRow;
import lotgate.history.SupplierAudit;
import lotgate.history.SwitchingRules;
import lotgate.plan.PlanFamily;
import lotgate.report.SentenceText;
import lotgate.report.SupplierReport;

/** Auditing a supplier: its lots, acceptance, process average, p-chart, Pareto, severity and rejected lots. */
public final class AuditSupplier {

    /**
     * The supplier, one part (or null: all), the period of received dates (each null: open), the switching rules
     * to replay (an edition name or a plan family file), the confidence of the intervals, the report files, and
     * the store.
     */
    public record Request(String supplier, String part, LocalDate from, LocalDate to, String switching,
            double confidence, List<Path> reports, String store) {
        public Request {
            reports = List.copyOf(reports);
        }
    }

    /** The audit and, for each rejected lot in order, its evidence in one line. */
    public record Result(SupplierAudit audit, List<String> evidence) {
        public Result {
            evidence = List.copyOf(evidence);
        }
    }

    private AuditSupplier() {
    }

    /** Checks the request, reads the supplier's lots, computes the audit and writes the reports asked for. */
    public static Result run(Request request) {
        Checks.supplierReports(request.reports(), "an audit report");
        if (request.from() != null && request.to() != null && request.to().isBefore(request.from())) {
            throw JobException.invalid("to", "--to " + request.to() + " is before --from " + request.from());
        }
        SwitchingRules rules = rules(request.switching());
        String supplier = request.supplier();
        String part = request.part();
        SupplierAudit audit;
        List<String> evidence = new ArrayList<>();
        try (HistoryStore store = HistoryStore.open(request.store(), false)) {
            HistoryStore.AuditReading reading = store.auditReading(supplier, part);
            if (reading.rows().isEmpty()) {
                // Nothing under the names as typed: the store's own spelling of them, if it has one.
                RecordedNames.Names names = RecordedNames.of(store, supplier, part);
                if (!names.found()) {
                    throw RecordedNames.notFound(store, names);
                }
                supplier = names.supplier();
                part = names.part();
                reading = store.auditReading(supplier, part);
            }
            audit = SupplierAudit.ofLots(supplier, part, request.from(), request.to(), reading.rows(),
                    reading.defectsByLot(), rules, request.confidence(), reading.measured());
            for (LotRow lot : audit.rejectedLots()) {
                evidence.add(evidenceOf(reading.content(lot.seq())));
            }
        }
        for (Path report : request.reports()) {
            SupplierReport.write(audit, evidence, report);
        }
        return new Result(audit, evidence);
    }

    /** The switching rules of an edition ("current", "older") or of a plan family file. */
    public static SwitchingRules rules(String switching) {
        if (switching.endsWith(".json")) {
            return SwitchingRules.fromJson(PlanFamily.read(Path.of(switching)).switching());
        }
        try {
            return SwitchingRules.edition(switching);
        } catch (IllegalArgumentException e) {
            throw JobException.invalid("switching", "--switching: " + e.getMessage() + ", or a plan family file");
        }
    }

    /** A rejected lot's evidence in one line, from its decision record. */
    static String evidenceOf(JsonNode content) {
        JsonNode decision = content.path("decision");
        if (decision.isMissingNode() || decision.isNull()) {
            return "imported lot: " + content.path("nonconforming").asInt() + " nonconforming in "
                    + content.path("inspected").asInt() + " (no evidence recorded)";
        }
        if (decision.has("measurement")) {
            return SupplierReport.measuredEvidence(decision);
        }
        List<String> parts = new ArrayList<>();
        for (JsonNode verdict : decision.path("classes")) {
            if (!"reject".equals(verdict.path("verdict").asText())) {
                continue;
            }
            JsonNode proof = verdict.path("evidence");
            // Records written before the shared vocabulary name the counts "found" and "sampleSize".
            int found = verdict.has("nonconforming") ? verdict.path("nonconforming").asInt() : verdict.path("found").asInt();
            int inspected = verdict.has("inspected") ? verdict.path("inspected").asInt()
                    : verdict.path("sampleSize").asInt();
            parts.add(verdict.path("class").asText() + ": " + found + " found in " + inspected + " (reject at " + verdict.path("rejectionNumber").asInt()
                    + "), p-value " + SentenceText.percent(proof.path("pValueAtAql").asDouble()) + " at the AQL, "
                    + proof.path("interval").asText() + " " + SentenceText.percent(proof.path("lowerBound").asDouble())
                    + " to " + SentenceText.percent(proof.path("upperBound").asDouble()) + "; plan "
                    + decision.path("plan").path("name").asText());
        }
        return String.join("; ", parts);
    }
}
