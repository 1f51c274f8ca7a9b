package lotgate.jobs;

import static org.junit.jupiter.api.Assertions.assertEquals;

import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import lotgate.history.HistoryStore;
import lotgate.history.LotRow;
import lotgate.history.RecordContent;
import lotgate.history.Stores;
import lotgate.history.SupplierAudit;
import lotgate.report.Json;
import lotgate.report.results.AuditRendering;
import net.jqwik.api.Example;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;

/**
 * The audit reads a supplier's records, contents and defect counts in one pass and one snapshot
 * ({@link HistoryStore#auditReading}); before, it read them query by query, a rejected lot's content by a query of
 * its own. Its result and its text, JSON and CSV are held to those of the query-by-query reading, kept here as the
 * oracle, on the demo's store and on random stores with corrections, corrective actions, measured lots, lots
 * without a received date, case-insensitive names, parts and periods. On those stores the ranking's totals, which
 * SQLite reads in the table's order, are held to those it gave through the supplier index.
 */
class AuditReadingProperties {

    /** The audit as it was read before the one-pass reading: each part of it by a query of its own. */
    static AuditSupplier.Result queryByQuery(AuditSupplier.Request request) {
        lotgate.history.SwitchingRules rules = AuditSupplier.rules(request.switching());
        List<String> evidence = new ArrayList<>();
        try (HistoryStore store = HistoryStore.open(request.store(), false)) {
            RecordedNames.Names names = RecordedNames.of(store, request.supplier(), request.part());
            if (!names.found()) {
                throw RecordedNames.notFound(store, names);
            }
            String supplier = names.supplier();
            String part = names.part();
            List<LotRow> rows = store.rows(supplier, part);
            SupplierAudit audit = SupplierAudit.ofLots(supplier, part, request.from(), request.to(), rows,
                    store.defectTypesByLot(supplier, part), rules, request.confidence(),
                    store.measuredLots(supplier, part));
            for (LotRow lot : audit.rejectedLots()) {
                evidence.add(AuditSupplier.evidenceOf(store.record(lot.seq()).json()));
            }
            return new AuditSupplier.Result(audit, evidence);
        }
    }

    /** Both readings of one request: the same result, the same output in every format, or the same refusal. */
    private static void sameAudit(AuditSupplier.Request request) {
        String expected;
        try {
            expected = shown(queryByQuery(request));
        } catch (JobException refused) {
            expected = "refused: " + refused.kind() + " " + refused.field() + " " + refused.getMessage();
        }
        String actual;
        try {
            AuditSupplier.Result result = AuditSupplier.run(request);
            actual = shown(result);
            AuditSupplier.Result old = queryByQuery(request);
            assertEquals(old.audit(), result.audit(), request.toString());
            assertEquals(old.evidence(), result.evidence(), request.toString());
        } catch (JobException refused) {
            actual = "refused: " + refused.kind() + " " + refused.field() + " " + refused.getMessage();
        }
        assertEquals(expected, actual, request.toString());
    }

    private static String shown(AuditSupplier.Result result) {
        return rendered(() -> AuditRendering.text(result)) + "\n" + rendered(() -> Json.text(AuditRendering.json(result)))
                + "\n" + rendered(() -> AuditRendering.csv(result));
    }

    /** A rendering, or how it failed: a lot without a verdict (no lotgate writes one) fails the CSV either way. */
    private static String rendered(java.util.function.Supplier<String> rendering) {
        try {
            return rendering.get();
        } catch (RuntimeException e) {
            return "fails: " + e;
        }
    }

    private static AuditSupplier.Request request(String supplier, String part, LocalDate from, LocalDate to,
            String switching, double confidence, String store) {
        return new AuditSupplier.Request(supplier, part, from, to, switching, confidence, List.of(), store);
    }

    @Example
    void theDemoStoreAuditsAsBefore() throws Exception {
        Path folder = Files.createTempDirectory("lotgate-audit-demo");
        try {
            StringWriter printed = new StringWriter();
            PrintWriter out = new PrintWriter(printed);
            assertEquals(0, lotgate.cli.Main.run(out, out, "demo", "--out", folder.toString()), printed.toString());
            String store = folder.resolve("history.sqlite").toString();
            Map<String, String[]> names = new LinkedHashMap<>();
            try (HistoryStore history = HistoryStore.open(store, false)) {
                for (LotRow row : history.rows(null, null)) {
                    names.put(row.supplier() + "|" + row.part(), new String[] {row.supplier(), row.part()});
                }
            }
            for (String[] name : names.values()) {
                sameAudit(request(name[0], null, null, null, "current", 0.95, store));
                sameAudit(request(name[0], name[1], LocalDate.of(2025, 3, 1), null, "older", 0.9, store));
                sameAudit(request(name[0].toUpperCase(java.util.Locale.ROOT), null, null, LocalDate.of(2026, 12, 31),
                        "current", 0.99, store));
            }
            sameAudit(request("Nobody (invented)", null, null, null, "current", 0.95, store));
        } finally {
            delete(folder);
        }
    }

    @Property(tries = 40)
    void aRandomSQLiteStoreAuditsAsBefore(@ForAll long seed) throws Exception {
        Path folder = Files.createTempDirectory("lotgate-audit-random");
        try {
            auditsAsBefore(Stores.fresh("sqlite", folder), new Random(seed));
        } finally {
            delete(folder);
        }
    }

    @Property(tries = 15)
    void aRandomPostgreSQLStoreAuditsAsBefore(@ForAll long seed) throws Exception {
        String url = System.getenv("LOTGATE_TEST_POSTGRES");
        if ((url == null || url.isBlank()) && !"true".equals(System.getenv("CI"))) {
            return; // as the store tests: PostgreSQL only where LOTGATE_TEST_POSTGRES names one (always in CI)
        }
        Path folder = Files.createTempDirectory("lotgate-audit-random");
        try {
            auditsAsBefore(Stores.fresh("postgresql", folder), new Random(seed));
        } finally {
            delete(folder);
        }
    }

    private static final String[] SUPPLIERS = {"Invented Supplier A", "Invented Supplier B", "Invented Supplier C"};
    private static final String[] PARTS = {"P-1", "P-2", "P-3"};
    private static final String[] DEFECTS = {"burr", "crack", "dent", "scratch"};

    /** Fills a store with random records, then audits each supplier, some by part and period, both ways. */
    private static void auditsAsBefore(String store, Random random) {
        List<ObjectNode> records = new ArrayList<>();
        Map<String, Integer> current = new LinkedHashMap<>();
        int count = 1 + random.nextInt(60);
        for (int i = 0; i < count; i++) {
            String supplier = SUPPLIERS[random.nextInt(SUPPLIERS.length)];
            String part = PARTS[random.nextInt(1 + random.nextInt(PARTS.length))];
            int kind = random.nextInt(20);
            if (kind == 0) {
                records.add(RecordContent.action(supplier, part, "corrective action " + i + " (invented)",
                        random.nextBoolean() ? null : day(random)));
                continue;
            }
            String lot;
            long supersedes = 0;
            if (kind <= 3 && !current.isEmpty()) {
                // A correction of a lot's current record; rarely one recorded under another supplier.
                List<String> keys = new ArrayList<>(current.keySet());
                String key = keys.get(random.nextInt(keys.size()));
                String[] parts = key.split("\\|");
                supersedes = current.get(key);
                lot = parts[2];
                if (random.nextInt(5) > 0) {
                    supplier = parts[0];
                    part = parts[1];
                } else if (current.containsKey(supplier + "|" + part + "|" + lot)) {
                    continue;
                }
                current.remove(key);
            } else {
                lot = "L-" + i;
            }
            records.add(lot(random, supplier, part, lot, supersedes));
            current.put(supplier + "|" + part + "|" + lot, records.size());
        }
        try (HistoryStore history = HistoryStore.open(store)) {
            history.appendAll(records, Instant.parse("2026-01-05T08:00:00Z"));
            if (!history.isPostgres()) {
                assertEquals(totalsThroughTheSupplierIndex(store), history.supplierTotals());
            }
        }
        for (String supplier : SUPPLIERS) {
            String typed = random.nextInt(4) == 0 ? supplier.toLowerCase(java.util.Locale.ROOT).replace(" ", "  ")
                    : supplier;
            String part = random.nextInt(3) == 0 ? PARTS[random.nextInt(PARTS.length)] : null;
            LocalDate from = random.nextInt(3) == 0 ? day(random) : null;
            LocalDate to = random.nextInt(3) == 0 ? day(random) : null;
            if (from != null && to != null && to.isBefore(from)) {
                LocalDate swap = from;
                from = to;
                to = swap;
            }
            sameAudit(request(typed, part, from, to, random.nextBoolean() ? "current" : "older",
                    random.nextBoolean() ? 0.95 : 0.9, store));
        }
    }

    /** The ranking's totals as SQLite gave them before it was told to read the table in its own order. */
    private static List<HistoryStore.SupplierTotals> totalsThroughTheSupplierIndex(String store) {
        List<HistoryStore.SupplierTotals> totals = new ArrayList<>();
        try (java.sql.Connection connection = java.sql.DriverManager.getConnection("jdbc:sqlite:" + store);
                java.sql.Statement statement = connection.createStatement();
                java.sql.ResultSet result = statement.executeQuery("SELECT supplier, COUNT(*), SUM(CASE WHEN verdict"
                        + " = 'reject' THEN 1 ELSE 0 END), SUM(inspected), SUM(nonconforming) FROM lot_record WHERE"
                        + " kind = 'lot' AND lot_key IS NOT NULL GROUP BY supplier ORDER BY supplier")) {
            while (result.next()) {
                totals.add(new HistoryStore.SupplierTotals(result.getString(1), result.getLong(2), result.getLong(3),
                        result.getLong(4), result.getLong(5)));
            }
        } catch (java.sql.SQLException e) {
            throw new IllegalStateException(e);
        }
        return totals;
    }

    private static LocalDate day(Random random) {
        return LocalDate.of(2025, 1, 1).plusDays(random.nextInt(365));
    }

    /** A lot: imported, sentenced on counts, or judged on measurements, accepted or not. */
    private static ObjectNode lot(Random random, String supplier, String part, String lot, long supersedes) {
        int inspected = 20 + random.nextInt(180);
        int nonconforming = random.nextInt(6);
        Map<String, Integer> types = new LinkedHashMap<>();
        for (int left = nonconforming; left > 0; ) {
            int units = 1 + random.nextInt(left);
            types.merge(DEFECTS[random.nextInt(DEFECTS.length)], units, Integer::sum);
            left -= units;
        }
        String verdict = switch (random.nextInt(10)) {
            case 0 -> null;
            case 1, 2, 3 -> "reject";
            default -> "accept";
        };
        ObjectNode decision = switch (random.nextInt(3)) {
            case 0 -> null;
            case 1 -> countedDecision(random, verdict, inspected, nonconforming);
            default -> measuredDecision(random);
        };
        ObjectNode content = RecordContent.lot(new RecordContent.Lot(supplier, part, lot, 1000 + random.nextInt(9000),
                random.nextInt(8) == 0 ? null : day(random), "inspector (invented)", verdict, inspected, nonconforming,
                types, random.nextBoolean() ? "normal" : "tightened", random.nextInt(6) == 0 ? "irregular" : "steady",
                supersedes, supersedes > 0 ? "recount (invented)" : null), decision, decision == null ? "import"
                        : "sentence");
        if (random.nextInt(10) == 0) {
            content.put(RecordContent.REINSTATES_NORMAL, true);
        }
        return content;
    }

    private static ObjectNode countedDecision(Random random, String verdict, int inspected, int nonconforming) {
        ObjectNode decision = JsonNodeFactory.instance.objectNode();
        decision.putObject("sheet").put("recording", "pass-fail");
        decision.putObject("plan").put("name", "n=" + inspected + ", c=1 (invented)");
        ObjectNode verdictOfClass = decision.putArray("classes").addObject();
        verdictOfClass.put("class", "any");
        verdictOfClass.put("verdict", verdict == null ? "reject" : verdict);
        verdictOfClass.put(random.nextBoolean() ? "nonconforming" : "found", nonconforming);
        verdictOfClass.put(random.nextBoolean() ? "inspected" : "sampleSize", inspected);
        verdictOfClass.put("rejectionNumber", 2);
        ObjectNode evidence = verdictOfClass.putObject("evidence");
        evidence.put("pValueAtAql", random.nextDouble());
        evidence.put("interval", "Clopper-Pearson");
        evidence.put("lowerBound", random.nextDouble() / 10);
        evidence.put("upperBound", 0.1 + random.nextDouble() / 10);
        return decision;
    }

    /** A decision on measurements, or, rarely, a record that says so but holds no measurement. */
    private static ObjectNode measuredDecision(Random random) {
        ObjectNode decision = JsonNodeFactory.instance.objectNode();
        decision.putObject("sheet").put("recording", "measurements");
        decision.putObject("plan").put("name", "variables n=10, k=1.72 (invented)");
        if (random.nextInt(8) == 0) {
            return decision;
        }
        ObjectNode measured = decision.putObject("measurement");
        measured.put("characteristic", "bore");
        measured.put("unit", random.nextBoolean() ? "mm" : "");
        measured.put("n", 2 + random.nextInt(20));
        measured.put("mean", 10 + random.nextGaussian() / 100);
        measured.put("sampleStandardDeviation", 0.001 + random.nextDouble() / 100);
        measured.put("standardDeviation", 0.001 + random.nextDouble() / 100);
        measured.put("sigmaKnown", random.nextBoolean());
        measured.put("statisticUpper", 1 + random.nextDouble());
        measured.put("k", 1.72);
        measured.put("estimate", random.nextDouble() / 50);
        measured.put("upperBound", random.nextDouble() / 10);
        return decision;
    }

    private static void delete(Path folder) throws java.io.IOException {
        try (var files = Files.walk(folder)) {
            for (Path file : files.sorted(Comparator.reverseOrder()).toList()) {
                Files.delete(file);
            }
        }
    }
}
