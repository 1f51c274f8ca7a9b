package lotgate.web;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import lotgate.history.LotRow;
import lotgate.history.QualityStatistics;
import lotgate.history.StoreException;
import lotgate.history.SupplierAudit;
import lotgate.jobs.AuditSupplier;
import lotgate.jobs.JobException;
import lotgate.jobs.RankSuppliers;
import lotgate.jobs.StoreStatus;
import lotgate.report.SentenceText;
import lotgate.report.SupplierRanking;
import lotgate.report.results.AuditRendering;

/** Supplier answers: the ranking, one supplier's audit, its report downloads, and the store's state. */
final class SupplierApi {
    private static final double CONFIDENCE = 0.95;
    private static final List<String> SEVERITIES = List.of("reduced", "normal", "tightened", "discontinued");
    private final Workbench.Settings settings;

    SupplierApi(Workbench.Settings settings) {
        this.settings = settings;
    }

    Reply ranking() {
        RankSuppliers.Result result;
        try {
            result = RankSuppliers.run(new RankSuppliers.Request(CONFIDENCE, List.of(), settings.store()));
        } catch (StoreException | JobException e) {
            return JsonText.refused(503, null, e.getMessage());
        }
        List<List<String>> rows = new ArrayList<>();
        List<String> names = new ArrayList<>();
        int rank = 0;
        for (QualityStatistics.Ranked ranked : result.ranking()) {
            rank++;
            names.add(ranked.supplier());
            rows.add(List.of(Integer.toString(rank), ranked.supplier(), Long.toString(ranked.lots()),
                    Long.toString(ranked.rejected()), SupplierRanking.interval(ranked.average()),
                    SupplierRanking.interval(ranked.rejection())));
        }
        Map<String, Object> members = new LinkedHashMap<>();
        members.put("headers", List.of("rank", "supplier", "lots", "rejected", "process average (interval)",
                "rejection rate (interval)"));
        members.put("numeric", List.of(true, false, true, true, true, true));
        members.put("nameColumn", 1);
        members.put("names", names);
        members.put("rows", rows);
        members.put("note", "Suppliers ranked by the upper " + SentenceText.percent(CONFIDENCE) + " bound of their"
                + " process average (exact intervals): a supplier with few lots cannot rank as if it had many.");
        return JsonText.ok(members);
    }

    Reply audit(String name) {
        if (name == null || name.isBlank()) {
            return JsonText.refused(400, null, "name a supplier");
        }
        AuditSupplier.Result result;
        try {
            result = AuditSupplier.run(new AuditSupplier.Request(name, null, null, null, "current", CONFIDENCE,
                    List.of(), settings.store()));
        } catch (JobException e) {
            return JsonText.refused(404, null, e.getMessage());
        } catch (StoreException e) {
            return JsonText.refused(503, null, e.getMessage());
        }
        SupplierAudit audit = result.audit();
        Map<String, Object> members = new LinkedHashMap<>();
        members.put("name", audit.supplier());
        List<List<String>> facts = new ArrayList<>();
        facts.add(List.of("lots", audit.lots() + " (" + audit.accepted() + " accepted, " + audit.rejected()
                + " rejected)"));
        facts.add(List.of("process average", SupplierRanking.interval(audit.processAverage()) + ", "
                + SentenceText.percent(audit.confidence()) + " confidence"));
        for (SupplierAudit.Part part : audit.parts()) {
            facts.add(List.of("part " + part.part(), part.lots() + " lots, now under " + part.current().label()
                    + " inspection"));
        }
        members.put("facts", facts);
        List<Integer> x = new ArrayList<>();
        List<String> lots = new ArrayList<>();
        List<Double> p = new ArrayList<>();
        List<String> labels = new ArrayList<>();
        List<Double> centre = new ArrayList<>();
        List<Double> upper = new ArrayList<>();
        List<Double> lower = new ArrayList<>();
        List<Boolean> flags = new ArrayList<>();
        int i = 0;
        for (QualityStatistics.PChartPoint point : audit.pChart()) {
            x.add(++i);
            lots.add(point.lot());
            p.add(point.fraction());
            labels.add(SentenceText.percent(point.fraction()) + " (" + point.inspected() + " inspected)");
            centre.add(point.centre());
            upper.add(point.upper());
            lower.add(point.lower());
            flags.add(point.outOfControl());
        }
        members.put("pchart", Map.of("x", x, "lots", lots, "p", p, "labels", labels, "center", centre,
                "upper", upper, "lower", lower, "flags", flags));
        List<String> categories = new ArrayList<>();
        List<Long> counts = new ArrayList<>();
        List<Double> cumulative = new ArrayList<>();
        for (QualityStatistics.ParetoBar bar : audit.pareto()) {
            categories.add(bar.defect());
            counts.add(bar.count());
            cumulative.add(bar.cumulativeShare());
        }
        members.put("pareto", Map.of("categories", categories, "values", counts, "cumulative", cumulative));
        List<Integer> sx = new ArrayList<>();
        List<String> slots = new ArrayList<>();
        List<Integer> sy = new ArrayList<>();
        List<String> slabels = new ArrayList<>();
        int j = 0;
        for (LotRow row : audit.lotsInOrder()) {
            j++;
            int level = SEVERITIES.indexOf(row.severity());
            if (level < 0) {
                continue;
            }
            sx.add(j);
            slots.add(row.lot());
            sy.add(level);
            slabels.add(row.severity() + (row.part() == null ? "" : ", part " + row.part()));
        }
        members.put("severity", Map.of("x", sx, "lots", slots, "y", sy, "labels", slabels, "ticks", SEVERITIES));
        List<List<String>> rejected = new ArrayList<>();
        for (int k = 0; k < audit.rejectedLots().size(); k++) {
            LotRow row = audit.rejectedLots().get(k);
            rejected.add(List.of(row.lot(), orEmpty(row.part()), row.received() == null ? "" : row.received().toString(),
                    Integer.toString(row.inspected()), Integer.toString(row.nonconforming()),
                    k < result.evidence().size() ? result.evidence().get(k) : ""));
        }
        members.put("rejected", Map.of("headers", List.of("lot", "part", "received", "inspected", "found", "evidence"),
                "numeric", List.of(false, false, false, true, true, false), "rows", rejected));
        String query = "/download/supplier?name=" + java.net.URLEncoder.encode(audit.supplier(),
                java.nio.charset.StandardCharsets.UTF_8);
        members.put("text", AuditRendering.text(result));
        members.put("reports", List.of(Map.of("label", "Audit report (xlsx)", "href", query + "&as=xlsx"),
                Map.of("label", "Audit report (HTML, printable)", "href", query + "&as=html")));
        return JsonText.ok(members);
    }

    Reply store() {
        StoreStatus.Result status;
        try {
            status = StoreStatus.run(new StoreStatus.Request(settings.store()));
        } catch (StoreException e) {
            return JsonText.refused(503, null, e.getMessage());
        }
        List<List<String>> facts = new ArrayList<>();
        facts.add(List.of("store", status.location()));
        facts.add(List.of("store id", orEmpty(status.storeId())));
        facts.add(List.of("records", Long.toString(status.records())));
        if (status.head() != null) {
            facts.add(List.of("head (keep it to prove later that nothing was cut or replaced)", status.head()));
        }
        Map<String, Object> members = new LinkedHashMap<>();
        members.put("intact", status.intact());
        members.put("headline", status.intact() ? "Chain intact: no record altered or removed"
                : "Damaged: " + status.problem());
        members.put("facts", facts);
        return JsonText.ok(members);
    }

    /** The audit report of a supplier, written now into the reports folder and sent. */
    Reply report(String name, String as) throws IOException {
        if (name == null || name.isBlank() || !("xlsx".equals(as) || "html".equals(as))) {
            return Reply.text(404, "no such report");
        }
        Files.createDirectories(settings.work());
        Path file = settings.work().resolve("audit-" + Long.toHexString(Double.doubleToLongBits(Math.random())) + "." + as);
        try {
            AuditSupplier.run(new AuditSupplier.Request(name, null, null, null, "current", CONFIDENCE, List.of(file),
                    settings.store()));
        } catch (JobException e) {
            return Reply.text(404, e.getMessage());
        } catch (StoreException e) {
            return Reply.text(503, e.getMessage());
        }
        byte[] body = Files.readAllBytes(file);
        if (as.equals("html")) {
            return new Reply(200, Reply.HTML, body, Map.of("Content-Security-Policy",
                    "default-src 'none'; style-src 'unsafe-inline'; img-src data:; base-uri 'none'; form-action 'none'"));
        }
        return Reply.download("application/vnd.openxmlformats-officedocument.spreadsheetml.sheet", body,
                "audit-" + name + ".xlsx");
    }

    private static String orEmpty(String text) {
        return text == null ? "" : text;
    }
}
