package lotgate.jobs;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import lotgate.demo.DemoData;
import lotgate.files.OutputFileException;
import lotgate.history.HistoryStore;
import lotgate.inspection.Columns;
import lotgate.inspection.LotDetails;
import lotgate.plan.DefectClass;
import lotgate.plan.PlanFormat;
import lotgate.sampling.DoublePlan;
import lotgate.sampling.OcModel;
import lotgate.sampling.SequentialPlan;
import lotgate.sampling.SinglePlan;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Each job driven directly, without the command line: requests in, results or typed refusals out. */
class JobsTest {
    private static final Path BOLTS = Path.of("plans/arnwick-af-m8-40.json");

    @TempDir
    Path folder;

    @BeforeEach
    void demoData() throws IOException {
        DemoData.main(new String[] {folder.resolve("demo").toString()});
    }

    private Path demo(String name) {
        return folder.resolve("demo").resolve(name);
    }

    private static DesignSinglePlan.Criteria plain(double aql, double ltpd) {
        return new DesignSinglePlan.Criteria(DefectClass.ANY, null, aql, 0.05, ltpd, 0.10, null, null);
    }

    @Test
    void designingASinglePlanGivesTheSmallestSampleAndSavesIt() {
        Path file = folder.resolve("bolts.json");
        DesignSinglePlan.Result result = DesignSinglePlan.run(new DesignSinglePlan.Request(new OcModel.Binomial(), 0,
                List.of(plain(0.01, 0.05)), new SaveTarget(file, "M8 bolts (invented)", false)));
        assertNull(result.noPlanReason());
        // n = 132, c = 3: SciPy 1.10.1 brute force over every (n, c) (see SinglePlanDesignerTest).
        assertEquals(new SinglePlan(132, 3), result.classes().get(0).found().plan());
        assertTrue(Files.exists(file));
        assertEquals(result.saved().fingerprint(), PlanFormat.read(file).fingerprint());
    }

    @Test
    void aSinglePlanRequestWithAnAqlAboveItsLtpdIsRefusedByItsField() {
        JobException refused = assertThrows(JobException.class, () -> DesignSinglePlan.run(
                new DesignSinglePlan.Request(new OcModel.Binomial(), 0, List.of(plain(0.05, 0.01)), null)));
        assertEquals(JobException.Kind.INVALID_REQUEST, refused.kind());
        assertEquals("aql", refused.field());
        assertEquals("--aql 5% must be below --ltpd 1%", refused.getMessage());
    }

    @Test
    void anExistingPlanFileIsNotReplacedUnlessAsked() throws IOException {
        Path file = Files.writeString(folder.resolve("taken.json"), "{}");
        JobException refused = assertThrows(JobException.class, () -> DesignSinglePlan.run(
                new DesignSinglePlan.Request(new OcModel.Binomial(), 0, List.of(plain(0.01, 0.05)),
                        new SaveTarget(file, "", false))));
        assertEquals("save", refused.field());
        assertEquals("{}", Files.readString(file));
    }

    @Test
    void designingADoublePlanMinimisesTheAsnBesideTheSinglePlan() {
        DesignStagedPlan.Result result = DesignStagedPlan.run(new DesignStagedPlan.Request(
                DesignStagedPlan.Scheme.DOUBLE, new OcModel.Binomial(), 0, 0.01, 0.05, 0.05, 0.10, List.of(),
                new lotgate.sampling.DoublePlanDesigner.Space(1.0, null), null, null, false, false, null));
        // (69, 0, 4; 69, 3): SciPy 1.10.1 (see StagedPlanCommandsTest); the single plan n = 132, c = 3.
        assertEquals(new DoublePlan(69, 0, 4, 69, 3), result.plan());
        assertEquals(new SinglePlan(132, 3), result.single());
        assertTrue(result.risks().meets(result.points()));
    }

    @Test
    void aSequentialPlanIsTruncatedAtThreeTimesTheSingleSample() {
        DesignStagedPlan.Result result = DesignStagedPlan.run(new DesignStagedPlan.Request(
                DesignStagedPlan.Scheme.SEQUENTIAL, new OcModel.Binomial(), 0, 0.01, 0.05, 0.05, 0.10, List.of(),
                null, null, null, false, false, null));
        assertEquals(3 * 132, ((SequentialPlan) result.plan()).truncation());
        assertTrue(result.risks().meets(result.points()));
    }

    @Test
    void aSequentialPlanLongerThanTheLotIsRefused() {
        JobException refused = assertThrows(JobException.class, () -> DesignStagedPlan.run(
                new DesignStagedPlan.Request(DesignStagedPlan.Scheme.SEQUENTIAL, new OcModel.Binomial(), 100, 0.01,
                        0.05, 0.05, 0.10, List.of(), null, null, 500, false, false, null)));
        assertEquals("truncateAt", refused.field());
        assertEquals("--truncate-at 500 exceeds --lot-size 100", refused.getMessage());
    }

    @Test
    void designingAVariablesPlanGivesTheExactUnknownSigmaPlan() {
        DesignVariablesPlan.Result result = DesignVariablesPlan.run(new DesignVariablesPlan.Request(
                new OcModel.Binomial(), 0, 0.01, 0.05, 0.06, 0.10, null, 10.05, null, null, "bore", "mm", null, null,
                null, null, null));
        // n = 42 and the attribute plan n = 110: SciPy 1.10.1 (see VariablesCommandsTest).
        assertEquals(42, result.design().plan().n());
        assertEquals(110, result.single().n());
        assertFalse(result.given());
    }

    @Test
    void aVariablesPlanWithoutALimitIsRefused() {
        JobException refused = assertThrows(JobException.class, () -> DesignVariablesPlan.run(
                new DesignVariablesPlan.Request(new OcModel.Binomial(), 0, 0.01, 0.05, 0.06, 0.10, null, null, null,
                        null, null, null, null, null, null, null, null)));
        assertEquals("lower", refused.field());
    }

    @Test
    void evaluatingASavedPlanGivesItsCurveAndKeyLevels() {
        EvaluatePlan.Result result = EvaluatePlan.run(new EvaluatePlan.Request(BOLTS, null, null, null, null, null,
                null, null, null, 20, EvaluatePlan.ChartFiles.NONE, false));
        assertEquals(21, result.table().size());
        // Common practice: P(accept) falls as quality worsens, and the plan meets its design points.
        for (int i = 1; i < result.table().size(); i++) {
            assertTrue(result.table().get(i).acceptance() <= result.table().get(i - 1).acceptance());
        }
        assertTrue(result.acceptanceAtAql() >= 0.95);
        assertTrue(result.acceptanceAtLtpd() <= 0.10);
        assertTrue(result.keys().at95() < result.keys().at50() && result.keys().at50() < result.keys().at10());
    }

    @Test
    void aPlanGivenTwiceIsRefused() {
        JobException refused = assertThrows(JobException.class, () -> EvaluatePlan.run(new EvaluatePlan.Request(
                BOLTS, null, 50, 1, null, null, null, null, null, 20, EvaluatePlan.ChartFiles.NONE, false)));
        assertEquals("planFile", refused.field());
    }

    /** A new, empty store: a job records only into a store that exists (the face decides where one is created). */
    private String newStore() {
        String store = folder.resolve("history.sqlite").toString();
        HistoryStore.open(store).close();
        return store;
    }

    private SentenceLot.Request sentence(String sheet, boolean record, String store, SentenceLot.Outputs outputs) {
        return new SentenceLot.Request(BOLTS, demo(sheet), null, Columns.standard(), 0, 0,
                new LotDetails(null, null, null, 0, null, null), null, 0.95, record, null, null, "steady", store,
                outputs);
    }

    @Test
    void sentencingALotRecordsItAndWritesItsOutputs() {
        String store = newStore();
        Path report = folder.resolve("out").resolve("lot.html");
        Path record = folder.resolve("out").resolve("lot.json");
        SentenceLot.Result result = SentenceLot.run(sentence("arnwick-af2611.xlsx", true, store,
                new SentenceLot.Outputs(record, null, List.of(report))));
        SentenceLot.Decided decided = assertInstanceOf(SentenceLot.Decided.class, result);
        assertTrue(decided.accepted());
        assertEquals(1, decided.recording().record().seq());
        assertTrue(Files.exists(report) && Files.exists(record));
        try (HistoryStore opened = HistoryStore.open(store)) {
            assertEquals(1, opened.rows(decided.decision().lot().supplier(), decided.decision().lot().part()).size());
        }
    }

    @Test
    void sentencingTellsTheFaceEachSheetRowItReads() {
        List<Long> rows = new java.util.ArrayList<>();
        SentenceLot.run(sentence("arnwick-af2611.xlsx", false, null, SentenceLot.Outputs.NONE), rows::add);
        assertEquals(1L, rows.get(0), "the header search starts at the first row");
        assertTrue(rows.size() >= 133, "the header and the 132 units: " + rows.size());
        for (int i = 1; i < rows.size(); i++) {
            assertTrue(rows.get(i) > rows.get(i - 1), "rows in order");
        }
    }

    @Test
    void aLotAlreadyRecordedIsAConflict() {
        String store = newStore();
        SentenceLot.run(sentence("arnwick-af2611.xlsx", true, store, SentenceLot.Outputs.NONE));
        JobException refused = assertThrows(JobException.class, () -> SentenceLot.run(
                sentence("arnwick-af2611.xlsx", true, store, SentenceLot.Outputs.NONE)));
        assertEquals(JobException.Kind.CONFLICT, refused.kind());
        assertEquals("lot", refused.field());
    }

    @Test
    void anOutputThatCannotBeWrittenLeavesNoRecordAndNoFile() throws IOException {
        String store = newStore();
        Path blocker = Files.writeString(folder.resolve("blocker"), "a file, not a folder");
        Path record = folder.resolve("record.json");
        assertThrows(OutputFileException.class, () -> SentenceLot.run(sentence("arnwick-af2611.xlsx", true, store,
                new SentenceLot.Outputs(record, null, List.of(blocker.resolve("lot.html"))))));
        assertFalse(Files.exists(record), "a staged output is removed when the lot is not recorded");
        try (HistoryStore opened = HistoryStore.open(store)) {
            assertEquals(0, opened.supplierTotals().size(), "nothing recorded");
        }
        try (Stream<Path> files = Files.list(folder)) {
            assertEquals(0, files.filter(f -> f.getFileName().toString().startsWith(".")).count(),
                    "no staged file left behind");
        }
    }

    @Test
    void aSampleSmallerThanThePlansIsIncomplete() throws IOException {
        Path sheet = folder.resolve("short.csv");
        Files.writeString(sheet, "unit,result\n1,pass\n2,pass\n");
        SentenceLot.Request request = new SentenceLot.Request(BOLTS, sheet, null, Columns.standard(), 0, 0,
                new LotDetails("S-1", null, null, 0, null, null), null, 0.95, false, null, null, "steady", "unused",
                SentenceLot.Outputs.NONE);
        JobException refused = assertThrows(JobException.class, () -> SentenceLot.run(request));
        assertEquals(JobException.Kind.INCOMPLETE_SAMPLE, refused.kind());
        assertEquals("sheet", refused.field());
        assertTrue(refused.getMessage().startsWith("incomplete sample: 2 of 132 units in " + sheet), refused.getMessage());
    }
}
