package lotgate.jobs;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import lotgate.inspection.ResultWords;
import lotgate.sentencing.Stopping;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The bench inspection and history import jobs, driven directly: a unit at a time, a sheet of past lots. */
class BenchAndImportJobsTest {
    private static final Path BOLTS = Path.of("plans/arnwick-af-m8-40.json");
    private static final ResultWords WORDS = ResultWords.standard();

    @TempDir
    Path folder;

    private static InspectAtBench.Bench bolts(Path sheet) {
        return InspectAtBench.start(new InspectAtBench.Request(BOLTS, sheet, "B-"));
    }

    @Test
    void aSinglePlanRejectsAsSoonAsTheCountReachesItsRejectionNumber() {
        // The bolts plan is n = 132, c = 3 (the demo's saved plan); common practice: curtailed inspection of a single
        // plan rejects at the (c + 1)th nonconforming unit without inspecting the rest.
        InspectAtBench.Bench bench = bolts(null);
        for (String line : new String[] {"pass", "fail", "ok", "ng burr", "FAIL", "pass"}) {
            bench = bench.with(bench.parse(line, WORDS));
            assertFalse(bench.state().decided(), line);
        }
        bench = bench.with(bench.parse("bad thread damage", WORDS));
        InspectAtBench.State state = bench.state();
        assertEquals(7, state.units());
        assertEquals(4, state.found());
        assertEquals(Stopping.Verdict.REJECT, state.decision().verdict());
        assertEquals("thread damage", state.last().defect());
    }

    @Test
    void aCleanSampleIsAcceptedAtItsLastUnitAndNotBefore() {
        InspectAtBench.Bench bench = bolts(null);
        for (int i = 1; i < 132; i++) {
            bench = bench.with(new InspectAtBench.Unit(0, ""));
        }
        assertFalse(bench.state().decided());
        bench = bench.with(new InspectAtBench.Unit(0, ""));
        assertEquals(Stopping.Verdict.ACCEPT, bench.state().decision().verdict());
    }

    @Test
    void undoTakesBackTheLastUnitOnly() {
        InspectAtBench.Bench bench = bolts(null).with(new InspectAtBench.Unit(1, "burr"));
        bench = bench.with(new InspectAtBench.Unit(0, "")).withoutLast();
        assertEquals(1, bench.units().size());
        assertEquals(1, bench.state().found());
        InspectAtBench.Bench empty = bolts(null);
        assertEquals(empty, empty.withoutLast());
    }

    @Test
    void aLineThatIsNeitherAResultNorACountIsRefusedAsTheUnit() {
        InspectAtBench.Bench bench = bolts(null);
        JobException refused = assertThrows(JobException.class, () -> bench.parse("fial", WORDS));
        assertEquals("unit", refused.field());
        assertEquals(JobException.Kind.BAD_INPUT, refused.kind());
        // A pass/fail plan takes a count of 0 or 1 for a unit, never more.
        assertThrows(JobException.class, () -> bench.parse("2 burr", WORDS));
    }

    @Test
    void theUnitsAreWrittenAsASheetThatSentencingReads() throws IOException {
        Path sheet = folder.resolve("bench.csv");
        InspectAtBench.Bench bench = bolts(sheet).with(new InspectAtBench.Unit(0, ""))
                .with(new InspectAtBench.Unit(1, "burr"));
        assertEquals(sheet, bench.keep());
        assertEquals("unit,result,defect|B-1,pass,|B-2,fail,burr|", Files.readString(sheet)
                .replace("\r\n", "|").replace("\n", "|"));
        assertNull(bolts(sheet).keep());
    }

    @Test
    void aSheetThatIsNotCsvAndAPlanPerDefectClassAreRefused() {
        JobException sheet = assertThrows(JobException.class, () -> bolts(folder.resolve("bench.xlsx")));
        assertEquals("sheet", sheet.field());
        JobException classes = assertThrows(JobException.class, () -> InspectAtBench.start(
                new InspectAtBench.Request(Path.of("plans/kestrune-kc-114-classes.json"), null, "")));
        assertEquals("plan", classes.field());
        assertTrue(classes.getMessage().contains("criteria per defect class"), classes.getMessage());
    }
}
