package lotgate.cli;

import lotgate.report.Json;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import lotgate.history.HistoryStore;
import lotgate.history.LotRow;
import lotgate.history.QualityStatistics;
import lotgate.history.SeverityTracker;
import lotgate.history.SupplierAudit;
import lotgate.history.SwitchingRules;
import lotgate.plan.PlanFamily;
import lotgate.report.SentenceText;
import lotgate.report.SupplierReport;
import lotgate.report.CsvTable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

/** The supplier audit: one supplier's lots, acceptance, process average, p-chart, Pareto and severity. */
@Command(name = "supplier", mixinStandardHelpOptions = true, sortOptions = false, usageHelpAutoWidth = true,
        header = "Audit one supplier's lot history.",
        description = {"For a supplier (optionally one part and a period of received dates): lots received,"
                + " accepted and rejected; the process average pooled over lots with its exact interval; the"
                + " p-chart of lot fractions with their control limits; the Pareto of defect types; the severity"
                + " timeline with every switch and its reason; and the rejected lots with their evidence.", ""})
final class SupplierCommand implements Runnable {
    @Parameters(index = "0", paramLabel = "SUPPLIER", description = "The supplier, as recorded.")
    String supplier;

    @Option(names = "--part", paramLabel = "PART", description = "Only this part.")
    String part;

    @Option(names = "--from", paramLabel = "DATE", converter = Values.Day.class, description = "First received date of the period (2026-01-01).")
    LocalDate from;

    @Option(names = "--to", paramLabel = "DATE", converter = Values.Day.class, description = "Last received date of the period.")
    LocalDate to;

    @Option(names = "--switching", paramLabel = "EDITION-OR-FAMILY", defaultValue = "current",
            description = "The switching rules to replay: current (default), older, or a plan family file's rules.")
    String switching;

    @Option(names = "--confidence", paramLabel = "LEVEL", defaultValue = "95%", converter = Values.Risk.class,
            description = "Confidence level of the intervals (default ${DEFAULT-VALUE}).")
    double confidence;

    @Option(names = "--report", paramLabel = "FILE",
            description = "Write the audit report: .xlsx (data sheets and native charts) or .html; repeatable.")
    List<Path> reports = new ArrayList<>();

    @Mixin
    StoreOption storeOption;

    @Mixin
    OutputFormat format;

    @Spec
    CommandSpec spec;

    static SwitchingRules rules(CommandSpec spec, String switching) {
        if (switching.endsWith(".json")) {
            return SwitchingRules.fromJson(PlanFamily.read(Path.of(switching)).switching());
        }
        try {
            return SwitchingRules.edition(switching);
        } catch (IllegalArgumentException e) {
            throw new ParameterException(spec.commandLine(), "--switching: " + e.getMessage()
                    + ", or a plan family file");
        }
    }

    @Override
    public void run() {
        for (Path report : reports) {
            if (!SupplierReport.supported(report)) {
                throw new ParameterException(spec.commandLine(), "--report " + report + ": an audit report is a .xlsx"
                        + " or .html file");
            }
        }
        if (from != null && to != null && to.isBefore(from)) {
            throw new ParameterException(spec.commandLine(), "--to " + to + " is before --from " + from);
        }
        SwitchingRules rules = rules(spec, switching);
        SupplierAudit audit;
        List<String> evidence = new ArrayList<>();
        try (HistoryStore store = storeOption.open()) {
            List<LotRow> rows = store.rows(supplier, part);
            if (rows.isEmpty()) {
                throw new Main.Failure(ExitCode.USAGE, "the history store " + store.location() + " has no lots of '"
                        + supplier + "'" + (part == null ? "" : ", part '" + part + "'") + " (see 'lotgate history')");
            }
            audit = SupplierAudit.of(supplier, part, from, to, rows, store.defectTypes(supplier, part), rules, confidence,
                    store.measuredLots(supplier, part));
            for (LotRow lot : audit.rejectedLots()) {
                evidence.add(evidenceOf(store.record(lot.seq()).json()));
            }
        }
        for (Path report : reports) {
            SupplierReport.write(audit, evidence, report);
        }
        PrintWriter out = spec.commandLine().getOut();
        switch (format.kind) {
            case json -> out.println(Json.text(json(audit, evidence)));
            case csv -> out.print(csv(audit));
            case text -> printText(out, audit, evidence);
        }
        out.flush();
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
            parts.add(verdict.path("class").asText() + ": " + verdict.path("found").asInt() + " found in "
                    + verdict.path("sampleSize").asInt() + " (reject at " + verdict.path("rejectionNumber").asInt()
                    + "), p-value " + SentenceText.percent(proof.path("pValueAtAql").asDouble()) + " at the AQL, "
                    + proof.path("interval").asText() + " " + SentenceText.percent(proof.path("lowerBound").asDouble())
                    + " to " + SentenceText.percent(proof.path("upperBound").asDouble()) + "; plan "
                    + decision.path("plan").path("name").asText());
        }
        return String.join("; ", parts);
    }

    private static void printText(PrintWriter out, SupplierAudit audit, List<String> evidence) {
        out.println(SupplierReport.title(audit));
        for (String line : SupplierReport.summary(audit)) {
            out.println("  " + line);
        }
        out.println();
        out.println("  Severity timeline");
        for (SupplierAudit.Part part : audit.parts()) {
            if (part.switches().isEmpty()) {
                out.println("    " + part.part() + ": normal throughout");
            }
            for (SeverityTracker.Switch change : part.switches()) {
                out.println("    " + part.part() + ", after lot " + (change.lot() == null ? "-" : change.lot()) + ": "
                        + change.from().label() + " to " + change.to().label() + " (" + change.reason() + ")");
            }
        }
        List<QualityStatistics.PChartPoint> beyond = audit.pChart().stream()
                .filter(QualityStatistics.PChartPoint::outOfControl).toList();
        if (!beyond.isEmpty()) {
            out.println();
            out.println("  Lots outside the p-chart limits");
            for (QualityStatistics.PChartPoint point : beyond) {
                out.println("    " + point.lot() + ": " + SentenceText.percent(point.fraction()) + " (limits "
                        + SentenceText.percent(point.lower()) + " to " + SentenceText.percent(point.upper()) + ")");
            }
        }
        if (!audit.pareto().isEmpty()) {
            out.println();
            out.println("  Defect types (Pareto)");
            for (QualityStatistics.ParetoBar bar : audit.pareto()) {
                out.printf("    %-30s %6d   cumulative %s%n", HistoryCommand.clip(bar.defect(), 30), bar.count(),
                        SentenceText.percent(bar.cumulativeShare()));
            }
        }
        if (!audit.rejectedLots().isEmpty()) {
            out.println();
            out.println("  Rejected lots");
            for (int i = 0; i < audit.rejectedLots().size(); i++) {
                LotRow lot = audit.rejectedLots().get(i);
                out.println("    " + SupplierReport.heading(lot) + ": " + evidence.get(i));
            }
        }
    }

    private static ObjectNode average(QualityStatistics.ProcessAverage average) {
        ObjectNode node = Json.object();
        node.put("estimate", average.average());
        node.put("lowerBound", average.lower());
        node.put("upperBound", average.upper());
        node.put("of", average.inspected());
        node.put("count", average.nonconforming());
        return node;
    }

    private static ObjectNode json(SupplierAudit audit, List<String> evidence) {
        ObjectNode node = Json.object();
        node.put("supplier", audit.supplier());
        node.put("part", audit.part());
        node.put("from", audit.from() == null ? null : audit.from().toString());
        node.put("to", audit.to() == null ? null : audit.to().toString());
        node.put("confidence", audit.confidence());
        node.put("lots", audit.lots());
        node.put("accepted", audit.accepted());
        node.put("rejected", audit.rejected());
        node.set("acceptanceRate", average(audit.acceptanceRate()));
        node.set("processAverage", average(audit.processAverage()));
        var parts = node.putArray("parts");
        for (SupplierAudit.Part part : audit.parts()) {
            ObjectNode item = parts.addObject();
            item.put("part", part.part());
            item.put("severity", part.current().label());
            var switches = item.putArray("switches");
            for (SeverityTracker.Switch change : part.switches()) {
                ObjectNode entry = switches.addObject();
                entry.put("afterLot", change.lot());
                entry.put("from", change.from().label());
                entry.put("to", change.to().label());
                entry.put("reason", change.reason());
            }
        }
        var chart = node.putArray("pChart");
        for (QualityStatistics.PChartPoint point : audit.pChart()) {
            ObjectNode item = chart.addObject();
            item.put("lot", point.lot());
            item.put("inspected", point.inspected());
            item.put("fraction", point.fraction());
            item.put("centre", point.centre());
            item.put("lowerLimit", point.lower());
            item.put("upperLimit", point.upper());
            item.put("outOfControl", point.outOfControl());
        }
        var pareto = node.putArray("defectTypes");
        for (QualityStatistics.ParetoBar bar : audit.pareto()) {
            ObjectNode item = pareto.addObject();
            item.put("defect", bar.defect());
            item.put("count", bar.count());
            item.put("cumulativeShare", bar.cumulativeShare());
        }
        var rejected = node.putArray("rejectedLots");
        for (int i = 0; i < audit.rejectedLots().size(); i++) {
            LotRow lot = audit.rejectedLots().get(i);
            ObjectNode item = rejected.addObject();
            item.put("seq", lot.seq());
            item.put("lot", lot.lot());
            item.put("part", lot.part());
            item.put("received", lot.received() == null ? null : lot.received().toString());
            item.put("evidence", evidence.get(i));
        }
        return node;
    }

    private static String csv(SupplierAudit audit) {
        List<List<Object>> rows = new ArrayList<>();
        for (int i = 0; i < audit.pChart().size(); i++) {
            QualityStatistics.PChartPoint point = audit.pChart().get(i);
            LotRow lot = audit.lotsInOrder().get(i);
            rows.add(List.of(lot.seq(), lot.supplier(), lot.part(), lot.lot(),
                    lot.received() == null ? "" : lot.received().toString(), lot.verdict(), point.inspected(),
                    lot.nonconforming(), point.fraction(), point.centre(), point.lower(), point.upper(),
                    lot.severity() == null ? "" : lot.severity()));
        }
        return CsvTable.table(List.of("seq", "supplier", "part", "lot", "received", "verdict", "inspected", "nonconforming",
                "fraction", "centre", "lowerLimit", "upperLimit", "severity"), rows);
    }
}
