package lotgate.cli;

import static lotgate.demo.DemoData.row;
import static org.junit.jupiter.api.Assertions.assertEquals;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import lotgate.demo.DemoData;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** A supplier audit over a period counts only the period's lots in every table and chart; names match loosely. */
class AuditPeriodTest {
    private static final ObjectMapper JSON = new ObjectMapper();
    private static final String SUPPLIER = "Arnwick Fasteners (invented)";

    @TempDir
    Path folder;

    /** Five invented past lots, one a month; the period February to March holds lots 2 and 3. */
    private String store() throws Exception {
        List<List<Object>> rows = new ArrayList<>();
        rows.add(row("lot", "supplier", "part", "received", "sample size", "nonconforming", "verdict",
                "acceptance number", "defects"));
        rows.add(row("P-1", SUPPLIER, "AF-M8-40", LocalDate.of(2026, 1, 10).toString(), 132, 2, "accept", 3,
                "burr:2"));
        rows.add(row("P-2", SUPPLIER, "AF-M8-40", LocalDate.of(2026, 2, 10).toString(), 132, 4, "reject", 3,
                "burr:1; scratch:3"));
        rows.add(row("P-3", SUPPLIER, "AF-M8-40", LocalDate.of(2026, 3, 10).toString(), 132, 3, "accept", 3,
                "dent:3"));
        rows.add(row("P-4", SUPPLIER, "AF-M8-40", LocalDate.of(2026, 4, 10).toString(), 132, 5, "reject", 3,
                "burr:5"));
        rows.add(row("P-5", SUPPLIER, "AF-M8-40", LocalDate.of(2026, 5, 10).toString(), 132, 0, "accept", 3, null));
        Path file = folder.resolve("past.csv");
        DemoData.csv(file, ',', false, rows);
        String store = folder.resolve("history.sqlite").toString();
        Cli.Result imported = Cli.run("import", file.toString(), "--store", store, "--create-store");
        assertEquals(ExitCode.OK, imported.exitCode(), imported.err());
        return store;
    }

    @Test
    void everyTableAndChartOfAnAuditHonoursThePeriod() throws Exception {
        String store = store();
        Cli.Result result = Cli.run("supplier", SUPPLIER, "--from", "2026-02-01", "--to", "2026-03-31", "--store",
                store, "--format", "json");
        assertEquals(ExitCode.OK, result.exitCode(), result.err());
        JsonNode audit = JSON.readTree(result.out());
        // Hand count over lots P-2 and P-3: 2 lots, 1 accepted, 1 rejected (P-2); 7 nonconforming in 264 inspected;
        // p-chart points P-2 and P-3; Pareto dent 3, scratch 3, burr 1 (ties by name), 7 in all.
        assertEquals(2, audit.get("lots").asInt());
        assertEquals(1, audit.get("accepted").asInt());
        assertEquals(1, audit.get("rejected").asInt());
        assertEquals(264, audit.get("processAverage").get("of").asInt());
        assertEquals(7, audit.get("processAverage").get("count").asInt());
        assertEquals(List.of("P-2", "P-3"), names(audit.get("pChart"), "lot"));
        assertEquals(List.of("dent", "scratch", "burr"), names(audit.get("defectTypes"), "defect"));
        assertEquals(List.of("3", "3", "1"), names(audit.get("defectTypes"), "count"));
        assertEquals(List.of("P-2"), names(audit.get("rejectedLots"), "lot"));
        JsonNode all = JSON.readTree(Cli.run("supplier", SUPPLIER, "--store", store, "--format", "json").out());
        // All five lots: burr 2 + 1 + 5 = 8, dent 3, scratch 3.
        assertEquals(List.of("8", "3", "3"), names(all.get("defectTypes"), "count"));
    }

    @Test
    void supplierNamesMatchWhateverTheCaseAndCloseNamesAreSuggested() throws Exception {
        String store = store();
        Cli.Result lower = Cli.run("supplier", "arnwick fasteners (invented)", "--store", store, "--format", "json");
        assertEquals(ExitCode.OK, lower.exitCode(), lower.err());
        assertEquals(SUPPLIER, JSON.readTree(lower.out()).get("supplier").asText());
        Cli.Result typo = Cli.run("supplier", "Arnwik Fasteners (invented)", "--store", store);
        assertEquals("lotgate: the history store " + store + " has no lots of 'Arnwik Fasteners (invented)'; did you"
                + " mean '" + SUPPLIER + "'? (see 'lotgate history')", typo.err().strip());
    }

    private static List<String> names(JsonNode array, String field) {
        List<String> names = new ArrayList<>();
        array.forEach(item -> names.add(item.get(field).asText()));
        return names;
    }
}
