package lotgate.jobs;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.List;
import lotgate.history.HistoryStore;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The jobs around plans and the history, driven directly: compare, show, family, audit, rank, list, verify. */
class HistoryJobsTest {
    private static final Path BOLTS = Path.of("plans/arnwick-af-m8-40.json");
    private static final Path LOTS = Path.of("demo-data/lots-2025.csv");
    private static final String ARNWICK = "Arnwick Fasteners (invented)";

    @TempDir
    Path folder;

    private String newStore() {
        String store = folder.resolve("history.sqlite").toString();
        HistoryStore.open(store).close();
        return store;
    }

    /** A store holding the demo's past lots. */
    private String importedStore() {
        String store = newStore();
        ImportHistory.run(new ImportHistory.Request(LOTS, null, store));
        return store;
    }

    @Test
    void comparingPlansReadsEachAtTheSameLevels() {
        ComparePlans.Result result = ComparePlans.run(new ComparePlans.Request(List.of(BOLTS.toString(), "45,0"),
                null, 5000, null, null, null, null));
        // The levels are the first saved plan's design points (AQL 1%, LTPD 5%: common practice for this demo).
        assertEquals(0.01, result.aql());
        assertEquals(0.05, result.ltpd());
        assertEquals(2, result.rows().size());
        // Common practice: c = 0 pays for its small sample with a far higher producer's risk.
        assertTrue(result.rows().get(1).producerRisk() > result.rows().get(0).producerRisk());
    }

    @Test
    void comparingPlansWithoutLevelsIsRefused() {
        JobException refused = assertThrows(JobException.class, () -> ComparePlans.run(new ComparePlans.Request(
                List.of("132,3", "45,0"), null, null, null, null, null, null)));
        assertEquals("aql", refused.field());
    }

    @Test
    void showingAPlanChecksItsFile() {
        ShowPlan.Result result = ShowPlan.run(new ShowPlan.Request(BOLTS));
        assertEquals(132, result.plan().sampleSize());
    }

    @Test
    void makingAFamilyWritesItsVariantsAndRules() {
        Path family = folder.resolve("bolts-family.json");
        MakePlanFamily.Result result = MakePlanFamily.run(new MakePlanFamily.Request(family, BOLTS.toAbsolutePath(),
                BOLTS.toAbsolutePath(), null, "current", List.of("tightenRejected=3"), false));
        assertTrue(Files.exists(family));
        assertEquals(3, result.switching().get("tightenRejected").asInt());
        JobException refused = assertThrows(JobException.class, () -> MakePlanFamily.run(new MakePlanFamily.Request(
                family, BOLTS, BOLTS, null, "current", List.of(), false)));
        assertEquals("file", refused.field());
    }

    @Test
    void aDecisionRecordOfTheFirstVersionIsReadUnderItsOldNames() throws Exception {
        // Version 1 of the decision record named the counts "found" and "sampleSize"; version 2 names them
        // "nonconforming" and "inspected". Stores keep version-1 records for ever, so the audit reads both.
        String body = "{\"class\": \"any\", \"verdict\": \"reject\", %s, \"rejectionNumber\": 4,"
                + " \"evidence\": {\"pValueAtAql\": 0.01, \"interval\": \"Clopper-Pearson\", \"lowerBound\": 0.01,"
                + " \"upperBound\": 0.09}}";
        String record = "{\"kind\": \"lot\", \"decision\": {\"plan\": {\"name\": \"bolts\"}, \"classes\": [" + body
                + "]}}";
        var json = new com.fasterxml.jackson.databind.ObjectMapper();
        String first = AuditSupplier.evidenceOf(json.readTree(String.format(record,
                "\"found\": 5, \"sampleSize\": 132")));
        String second = AuditSupplier.evidenceOf(json.readTree(String.format(record,
                "\"nonconforming\": 5, \"inspected\": 132")));
        assertTrue(first.startsWith("any: 5 found in 132 (reject at 4)"), first);
        assertEquals(first, second);
    }

    @Test
    void auditingASupplierGivesItsLotsAndProcessAverage() {
        String store = importedStore();
        AuditSupplier.Result result = AuditSupplier.run(new AuditSupplier.Request(ARNWICK, null, null, null,
                "current", 0.95, List.of(), store));
        assertTrue(result.audit().lots() > 0);
        assertEquals(result.audit().rejectedLots().size(), result.evidence().size());
        JobException unknown = assertThrows(JobException.class, () -> AuditSupplier.run(new AuditSupplier.Request(
                "Nobody (invented)", null, null, null, "current", 0.95, List.of(), store)));
        assertEquals(JobException.Kind.NOT_FOUND, unknown.kind());
        JobException backwards = assertThrows(JobException.class, () -> AuditSupplier.run(new AuditSupplier.Request(
                ARNWICK, null, LocalDate.of(2025, 6, 1), LocalDate.of(2025, 1, 1), "current", 0.95, List.of(), store)));
        assertEquals("to", backwards.field());
    }

    @Test
    void rankingAndListingReadTheStore() {
        String store = importedStore();
        RankSuppliers.Result ranking = RankSuppliers.run(new RankSuppliers.Request(0.95, List.of(), store));
        assertEquals(4, ranking.ranking().size());
        ListHistory.Result listed = ListHistory.run(new ListHistory.Request(ARNWICK, null, store));
        assertTrue(listed.rows().stream().allMatch(row -> row.supplier().equals(ARNWICK)));
    }

    @Test
    void aCorrectiveActionIsRecordedAndTheStoreVerifies() {
        String store = importedStore();
        RecordCorrectiveAction.Result action = RecordCorrectiveAction.run(new RecordCorrectiveAction.Request(ARNWICK,
                "AF-M8-40", "heading die replaced", LocalDate.of(2025, 7, 1), store));
        VerifyStore.Result verified = VerifyStore.run(new VerifyStore.Request(store, List.of()));
        assertTrue(verified.intact());
        assertEquals(action.record().seq(), verified.verification().records());
        JobException blank = assertThrows(JobException.class, () -> RecordCorrectiveAction.run(
                new RecordCorrectiveAction.Request(ARNWICK, "AF-M8-40", " ", null, store)));
        assertEquals("reason", blank.field());
    }
}
