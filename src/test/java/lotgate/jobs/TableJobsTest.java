package lotgate.jobs;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import lotgate.plan.PlanFamily;
import lotgate.plan.PlanFormat;
import lotgate.plan.SavedPlan;
import lotgate.sampling.DoublePlan;
import lotgate.sampling.SinglePlan;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The table look-up and least-inspection jobs driven directly: requests in, results or typed refusals out. */
class TableJobsTest {
    @TempDir
    Path folder;

    private static PlanFromTables.Request lookup(int lotSize, String level, double aql, String severity,
            String scheme) {
        return new PlanFromTables.Request(lotSize, level, aql, severity, scheme, null, null, null);
    }

    @Test
    void levelIiAql0_65LotOf2000GivesTheTablesPlanWithItsRisks() {
        PlanFromTables.Result result = PlanFromTables.run(lookup(2000, "II", 0.65, "normal", "single"));
        // MIL-STD-105E Tables I and II-A (from memory): code letter K, n = 125, Ac 2, Re 3.
        assertEquals('K', result.lookup().letter());
        assertEquals(new SinglePlan(125, 2), result.lookup().plan());
        // SciPy 1.10.1 binom (src/test/python/tables_reference.py): P(X > 2 | n = 125, p = 0.65%).
        assertEquals(0.048668543676648267, result.risks().producerRisk(), 1e-13);
        assertEquals(0.042015908363532452, result.risks().ltpd10(), 1e-10);
        assertEquals(0.010272494803923648, result.risks().aoql(), 1e-10);
        assertEquals("binomial", result.model().name());
        assertEquals(0.0065, result.aql(), 0);
        assertNull(result.saved());
    }

    @Test
    void anArrowIsFollowedAndSaid() {
        // Lot 1,000 at S-2 is code letter C; AQL 0.65 at C is a down arrow to F: 20, 0/1 (MIL-STD-105E, from memory).
        PlanFromTables.Result result = PlanFromTables.run(lookup(1000, "S-2", 0.65, "normal", "single"));
        assertEquals('C', result.lookup().letter());
        assertEquals('F', result.lookup().usedLetter());
        assertTrue(result.lookup().arrowFollowed());
        assertEquals(new SinglePlan(20, 0), result.lookup().plan());
    }

    @Test
    void aSampleThatReachesTheLotIsHundredPercentInspectionWithoutRisks() {
        PlanFromTables.Result result = PlanFromTables.run(lookup(10, "II", 0.65, "normal", "single"));
        assertTrue(result.lookup().hundredPercent());
        assertNull(result.risks());
        JobException refused = assertThrows(JobException.class, () -> PlanFromTables.run(new PlanFromTables.Request(
                10, "II", 0.65, "normal", "single", null, new SaveTarget(folder.resolve("p.json"), "", false), null)));
        assertEquals("save", refused.field());
        assertFalse(Files.exists(folder.resolve("p.json")));
    }

    @Test
    void aDoublePlanHasItsAsnAtTheAql() {
        PlanFromTables.Result result = PlanFromTables.run(lookup(2000, "II", 0.65, "normal", "double"));
        // MIL-STD-105E Table III-A (from memory): K, 80 + 80, 0/3 then 3/4.
        assertEquals(new DoublePlan(80, 0, 3, 80, 3), result.lookup().plan());
        // SciPy 1.10.1: 80 + 80 P(0 < d1 < 3) at 0.65%.
        assertEquals(111.27405291321543, result.risks().asnAtAql(), 1e-9);
    }

    @Test
    void aqlsAboveTenAreNonconformitiesPerHundredUnits() {
        PlanFromTables.Result result = PlanFromTables.run(lookup(2000, "II", 25, "normal", "single"));
        assertEquals("poisson", result.model().name());
        JobException refused = assertThrows(JobException.class, () -> PlanFromTables.run(new PlanFromTables.Request(
                2000, "II", 25, "normal", "single", "binomial", null, null)));
        assertEquals("model", refused.field());
    }

    @Test
    void badValuesAreRefusedByTheirField() {
        assertEquals("level", assertThrows(JobException.class,
                () -> PlanFromTables.run(lookup(2000, "IV", 0.65, "normal", "single"))).field());
        assertEquals("aql", assertThrows(JobException.class,
                () -> PlanFromTables.run(lookup(2000, "II", 0.5, "normal", "single"))).field());
        assertEquals("severity", assertThrows(JobException.class,
                () -> PlanFromTables.run(lookup(2000, "II", 0.65, "strict", "single"))).field());
        assertEquals("scheme", assertThrows(JobException.class,
                () -> PlanFromTables.run(lookup(2000, "II", 0.65, "normal", "multiple"))).field());
        assertEquals("lotSize", assertThrows(JobException.class,
                () -> PlanFromTables.run(new PlanFromTables.Request(null, "II", 0.65, "normal", "single", null, null,
                        null))).field());
    }

    @Test
    void theFamilyIsSavedInOneStepAndReadsBack() {
        Path family = folder.resolve("clips.json");
        PlanFromTables.Result result = PlanFromTables.run(new PlanFromTables.Request(2000, "II", 0.65, "normal",
                "single", null, null, new PlanFromTables.FamilyTarget(family, "snap clips (invented)", false)));
        assertEquals(3, result.family().size());
        PlanFamily read = PlanFamily.read(family);
        // MIL-STD-105E Tables II-A, II-B, II-C at K and 0.65 (from memory): 125 2/3, 125 1/2, 50 1/3.
        assertEquals(new SinglePlan(125, 2), read.variants().get("normal").plan());
        assertEquals(new SinglePlan(125, 1), read.variants().get("tightened").plan());
        assertEquals(new SinglePlan(50, 1, 3), read.variants().get("reduced").plan());
        assertEquals(SavedPlan.ATTRIBUTE_TABLES, read.variants().get("reduced").classes().get(0).method());
        assertEquals(folder.resolve("clips-reduced.json"), read.files().get("reduced"));
        assertEquals(new SinglePlan(50, 1, 3), PlanFormat.read(folder.resolve("clips-reduced.json")).plan());
        assertEquals("current", read.switching().path("edition").asText());
        // A second time without leave to replace, nothing is written.
        JobException refused = assertThrows(JobException.class, () -> PlanFromTables.run(new PlanFromTables.Request(
                2000, "II", 0.65, "normal", "single", null, null,
                new PlanFromTables.FamilyTarget(family, "", false))));
        assertEquals("family", refused.field());
    }

    @Test
    void theLeastInspectionPlanForLtpd5PercentAtAverage0_5PercentLotOf5000() {
        DesignLeastInspection.Result result = DesignLeastInspection.run(new DesignLeastInspection.Request(5000, 0.05,
                0.10, null, 0.005, null, new SaveTarget(folder.resolve("least.json"), "", false)));
        assertEquals("hypergeometric", result.model().name());
        // Exact rationals, Python 3.11 fractions and math.comb (src/test/python/tables_reference.py): 131, 3,
        // ATI 149.07929926040518.
        assertEquals(new SinglePlan(131, 3), result.found().plan());
        assertEquals(149.07929926040518, result.found().ati(), 1e-9);
        assertTrue(result.found().ltpd10() <= 0.05);
        SavedPlan saved = PlanFormat.read(folder.resolve("least.json"));
        assertEquals(new SinglePlan(131, 3), saved.plan());
        assertEquals(SavedPlan.LEAST_INSPECTION, saved.classes().get(0).method());
        // design for AQL 0.5% (alpha 5%) and the same LTPD point needs a larger sample and inspects more.
        assertTrue(result.comparison().ati() >= result.found().ati());
    }

    @Test
    void theAoqlProtectionAndItsRefusals() {
        DesignLeastInspection.Result result = DesignLeastInspection.run(new DesignLeastInspection.Request(5000, null,
                0.10, 0.02, 0.005, "binomial", null));
        // SciPy 1.10.1 brute force (LeastInspectionTest): n = 68, c = 2.
        assertEquals(new SinglePlan(68, 2), result.found().plan());
        assertFalse(result.byLtpd());
        for (Object[] bad : List.of(
                new Object[] {"ltpd", new DesignLeastInspection.Request(5000, 0.05, 0.1, 0.02, 0.005, null, null)},
                new Object[] {"ltpd", new DesignLeastInspection.Request(5000, null, 0.1, null, 0.005, null, null)},
                new Object[] {"processAverage", new DesignLeastInspection.Request(5000, 0.05, 0.1, null, null, null,
                        null)},
                new Object[] {"processAverage", new DesignLeastInspection.Request(5000, 0.05, 0.1, null, 0.06, null,
                        null)},
                new Object[] {"lotSize", new DesignLeastInspection.Request(2_000_000, 0.05, 0.1, null, 0.005, null,
                        null)})) {
            JobException refused = assertThrows(JobException.class,
                    () -> DesignLeastInspection.run((DesignLeastInspection.Request) bad[1]));
            assertEquals(bad[0], refused.field(), refused.getMessage());
        }
    }

    @Test
    void theDoubleLeastInspectionPlanIsSavedAsAnOrdinaryDoublePlan() {
        Path file = folder.resolve("least-double.json");
        DesignLeastInspection.Result result = DesignLeastInspection.run(new DesignLeastInspection.Request(5000, 0.05,
                0.10, null, 0.005, null, new SaveTarget(file, "", false), "double"));
        // Exact rationals, Python 3.11.2 (src/test/python/double_least_inspection_reference.py): 51, 0, 134, 4 with
        // ATI 88.822472388459289; the single plan beside it is 131, 3 (ATI 149.07929926040518, tables_reference.py).
        DoublePlan plan = DoublePlan.of(51, 0, 134, 4);
        assertEquals(plan, result.doubleFound().found().plan());
        assertEquals(88.822472388459289, result.doubleFound().found().ati(), 1e-9);
        assertEquals(new SinglePlan(131, 3), result.found().plan());
        assertNull(result.comparison());
        SavedPlan saved = PlanFormat.read(file);
        assertEquals(plan, saved.plan());
        assertEquals(SavedPlan.LEAST_INSPECTION, saved.classes().get(0).method());
    }

    @Test
    void theDoubleSearchCountsEachPlanItEvaluatesForAProgressLine() {
        java.util.List<Long> told = new java.util.ArrayList<>();
        DesignLeastInspection.Result result = DesignLeastInspection.run(new DesignLeastInspection.Request(5000, 0.05,
                0.10, null, 0.005, null, null, "double"), told::add);
        long compared = result.doubleFound().found().plansCompared();
        assertEquals(compared, told.size());
        for (int i = 0; i < told.size(); i++) {
            assertEquals(i + 1, told.get(i));
        }
        java.util.List<Long> single = new java.util.ArrayList<>();
        DesignLeastInspection.run(new DesignLeastInspection.Request(5000, 0.05, 0.10, null, 0.005, null, null, null),
                single::add);
        assertTrue(single.isEmpty(), "the single search tells nothing");
    }

    @Test
    void theDoubleSchemeRefusesAnAoqlProtectionAndAnUnknownSchemeBeforeSaving() {
        Path file = folder.resolve("none.json");
        for (DesignLeastInspection.Request bad : List.of(
                new DesignLeastInspection.Request(5000, null, 0.1, 0.02, 0.005, null, new SaveTarget(file, "", false),
                        "double"),
                new DesignLeastInspection.Request(5000, 0.05, 0.1, null, 0.005, null, new SaveTarget(file, "", false),
                        "sequential"))) {
            JobException refused = assertThrows(JobException.class, () -> DesignLeastInspection.run(bad));
            assertEquals("scheme", refused.field(), refused.getMessage());
        }
        assertFalse(Files.exists(file));
    }
}
