package lotgate.tables;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.fail;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import lotgate.sampling.DoublePlan;
import lotgate.sampling.OcModel;
import lotgate.sampling.Plan;
import lotgate.sampling.SinglePlan;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The attribute sampling tables as shipped: their structure, and entries checked one by one against the
 * published tables of MIL-STD-105E (1989). Every check value below is from memory: the printed tables
 * were not at hand when these tests were written.
 */
class AttributeTablesTest {
    private static final AttributeTables TABLES = AttributeTables.standard();
    private static final String LETTERS = "ABCDEFGHJKLMNPQR";

    private static int aql(String percent) {
        return TABLES.aqlIndex(Double.parseDouble(percent));
    }

    // ---------------------------------------------------------------- structure

    @Test
    void theFileNamesItsSourceForEveryTable() {
        assertTrue(TABLES.codeLetterSource().startsWith("MIL-STD-105E Table I "));
        for (AttributeTables.Grid grid : TABLES.grids().values()) {
            assertTrue(grid.source().startsWith("MIL-STD-105E Table I"), grid.name());
            assertTrue(grid.source().endsWith("from memory"), grid.name());
        }
        assertEquals(List.of("single-normal", "single-tightened", "single-reduced", "double-normal",
                "double-tightened"), List.copyOf(TABLES.grids().keySet()));
    }

    @Test
    void theAqlSeriesRunsFrom0_010To1000InTheTablesSteps() {
        // The preferred series of the tables (from memory): each step about 1.6 times the last.
        assertEquals(26, TABLES.aqls().size());
        assertEquals("0.010", TABLES.aqls().get(0));
        assertEquals("1000", TABLES.aqls().get(25));
        for (int i = 1; i < 26; i++) {
            double ratio = Double.parseDouble(TABLES.aqls().get(i)) / Double.parseDouble(TABLES.aqls().get(i - 1));
            assertTrue(ratio > 1.45 && ratio < 1.7, TABLES.aqls().get(i));
        }
    }

    @Test
    void lotSizeBandsAreContiguousAndLettersGrowWithLotAndLevel() {
        int next = 2;
        char[] last = new char[InspectionLevel.values().length];
        for (AttributeTables.LotBand band : TABLES.lotBands()) {
            assertEquals(next, band.from());
            char previousLevel = 'A';
            for (InspectionLevel level : InspectionLevel.values()) {
                char letter = band.letters().get(level);
                assertTrue(letter >= last[level.ordinal()], band + " " + level);
                assertTrue(letter >= previousLevel, band + " " + level);
                last[level.ordinal()] = letter;
                previousLevel = letter;
            }
            next = band.to() + 1;
        }
        assertEquals(-1, TABLES.lotBands().get(TABLES.lotBands().size() - 1).to());
    }

    @Test
    void sampleSizesByCodeLetter() {
        // MIL-STD-105E Tables II-A/II-B (single), II-C (reduced), III-A/III-B (double, per stage), from memory.
        List<Integer> single = List.of(2, 3, 5, 8, 13, 20, 32, 50, 80, 125, 200, 315, 500, 800, 1250, 2000);
        assertEquals(single, TABLES.grid(TableScheme.SINGLE, TableSeverity.NORMAL).sampleSizes());
        List<Integer> tightened = new ArrayList<>(single);
        tightened.add(3150);
        assertEquals(tightened, TABLES.grid(TableScheme.SINGLE, TableSeverity.TIGHTENED).sampleSizes());
        assertEquals(List.of(2, 2, 2, 3, 5, 8, 13, 20, 32, 50, 80, 125, 200, 315, 500, 800),
                TABLES.grid(TableScheme.SINGLE, TableSeverity.REDUCED).sampleSizes());
        // Each stage of a double plan is the single sample of the letter before; letter A has none.
        List<Integer> perStage = new ArrayList<>(List.of(0));
        perStage.addAll(single.subList(0, 15));
        assertEquals(perStage, TABLES.grid(TableScheme.DOUBLE, TableSeverity.NORMAL).sampleSizes());
        perStage.add(2000);
        assertEquals(perStage, TABLES.grid(TableScheme.DOUBLE, TableSeverity.TIGHTENED).sampleSizes());
        // The sample sizes themselves step by about 1.6, like the AQLs, which is what makes the tables diagonal.
        for (int i = 1; i < single.size(); i++) {
            double ratio = (double) single.get(i) / single.get(i - 1);
            assertTrue(ratio > 1.45 && ratio < 1.7, "letter " + LETTERS.charAt(i));
        }
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource({
            // table, acceptance/rejection pairs along the diagonals from the smallest (MIL-STD-105E, from memory)
            "single-normal, 0/1 1/2 2/3 3/4 5/6 7/8 10/11 14/15 21/22 30/31 44/45",
            "single-tightened, 0/1 1/2 2/3 3/4 5/6 8/9 12/13 18/19 27/28 41/42",
            "single-reduced, 0/1 0/2 1/3 1/4 2/5 3/6 5/8 7/10 10/13 14/17 21/24",
            "double-normal, 0/2;1/2 0/3;3/4 1/3;4/5 2/5;6/7 3/7;8/9 5/9;12/13 7/11;18/19 11/16;26/27 17/22;37/38"
                    + " 25/31;56/57",
            "double-tightened, 0/2;1/2 0/3;3/4 1/4;4/5 2/5;6/7 3/7;11/12 6/10;15/16 9/14;23/24 15/20;34/35"
                    + " 23/29;52/53",
    })
    void acceptanceNumbersFollowTheSeriesAlongTheDiagonals(String table, String series) {
        AttributeTables.Grid grid = TABLES.grids().get(table);
        List<String> expected = List.of(series.replace(';', ',').split(" "));
        // Along a diagonal (code letter one down, AQL one left) every plan cell holds the same numbers.
        Map<Integer, String> byDiagonal = new TreeMap<>();
        for (int row = 0; row < grid.letters().size(); row++) {
            String lastInRow = null;
            for (int col = 0; col < 26; col++) {
                String cell = grid.cell(row, col);
                if (!cell.contains("/")) {
                    continue;
                }
                String before = byDiagonal.putIfAbsent(row + col, cell);
                assertTrue(before == null || before.equals(cell), table + " diagonal " + (row + col) + ": " + before
                        + " and " + cell);
                // Across a row the plans come in the order of the series.
                assertTrue(lastInRow == null || expected.indexOf(cell) > expected.indexOf(lastInRow),
                        table + " row " + grid.letters().get(row));
                lastInRow = cell;
            }
        }
        assertEquals(expected, List.copyOf(byDiagonal.values()));
    }

    @Test
    void everyArrowLandsOnAPlan() {
        int cells = 0;
        for (TableScheme scheme : TableScheme.values()) {
            for (TableSeverity severity : TableSeverity.values()) {
                AttributeTables.Grid grid = TABLES.grid(scheme, severity);
                if (grid == null) {
                    continue;
                }
                for (char letter : LETTERS.toCharArray()) {
                    for (int aql = 0; aql < 26; aql++) {
                        TableLookup found = TABLES.plan(letter, 0, aql, severity, scheme);
                        assertTrue(found.plan().maxSampleSize() >= 2);
                        String cell = grid.cell(grid.row(letter), aql);
                        if (cell.equals("v")) {
                            assertTrue(found.usedLetter() > letter, grid.name() + " " + letter + " " + aql);
                        } else if (cell.equals("^")) {
                            assertTrue(found.usedLetter() < letter, grid.name() + " " + letter + " " + aql);
                        } else {
                            assertEquals(letter, found.usedLetter());
                        }
                        cells++;
                    }
                }
            }
        }
        assertEquals(5 * 16 * 26, cells);
    }

    @Test
    void tightenedIsNeverLooserThanNormalAndReducedNeverSamplesMore() {
        for (TableScheme scheme : TableScheme.values()) {
            for (char letter : LETTERS.toCharArray()) {
                for (int aql = 0; aql < 26; aql++) {
                    double percent = Double.parseDouble(TABLES.aqls().get(aql));
                    OcModel model = percent > 10 ? new OcModel.Poisson() : new OcModel.Binomial();
                    Plan normal = TABLES.plan(letter, 0, aql, TableSeverity.NORMAL, scheme).plan();
                    Plan tightened = TABLES.plan(letter, 0, aql, TableSeverity.TIGHTENED, scheme).plan();
                    String where = scheme + " " + letter + " AQL " + percent;
                    assertTrue(tightened.acceptance(model, percent / 100)
                            <= normal.acceptance(model, percent / 100) + 1e-12, where);
                    if (scheme == TableScheme.SINGLE) {
                        SinglePlan n = (SinglePlan) normal;
                        SinglePlan t = (SinglePlan) tightened;
                        assertTrue(t.n() >= n.n() || t.c() <= n.c(), where);
                        Plan reduced = TABLES.plan(letter, 0, aql, TableSeverity.REDUCED, scheme).plan();
                        assertTrue(reduced.maxSampleSize() <= normal.maxSampleSize(), where);
                    }
                }
            }
        }
    }

    @Test
    void reducedPlansWithAGapAreTheOnlyOnesWithRejectionAboveAcPlusOne() {
        int gaps = 0;
        for (TableSeverity severity : TableSeverity.values()) {
            for (char letter : LETTERS.toCharArray()) {
                for (int aql = 0; aql < 26; aql++) {
                    SinglePlan plan = (SinglePlan) TABLES.plan(letter, 0, aql, severity, TableScheme.SINGLE).plan();
                    if (plan.hasGap()) {
                        assertEquals(TableSeverity.REDUCED, severity);
                        gaps++;
                    }
                }
            }
        }
        assertTrue(gaps > 100, "gaps " + gaps);
    }

    // ---------------------------------------------------------------- entries one by one (all from memory)

    @ParameterizedTest(name = "lot {0}, level {1}: {2}")
    @CsvSource({
            // MIL-STD-105E Table I, from memory
            "2000, II, K", "200, II, G", "5000, II, L", "50, II, D", "100000, III, P", "1000, I, G", "500, S-4, E",
            "10000, S-3, F", "600000, S-1, D", "5, III, B", "1300, S-2, D", "40000, I, L",
    })
    void codeLetters(int lotSize, String level, char letter) {
        assertEquals(letter, TABLES.codeLetter(lotSize, InspectionLevel.parse(level)));
    }

    @ParameterizedTest(name = "{0} {1} {2} AQL {3}: {4} n = {5}, {6}")
    @CsvSource({
            // severity, scheme, code letter, AQL %, letter used, n (per stage), Ac/Re (per stage); the table named.
            // MIL-STD-105E Table II-A, single, normal (from memory)
            "normal, single, K, 0.65, K, 125, 2/3",
            "normal, single, K, 1.0, K, 125, 3/4",
            "normal, single, G, 1.5, G, 32, 1/2",
            "normal, single, J, 0.65, J, 80, 1/2",
            "normal, single, K, 10, K, 125, 21/22",
            "normal, single, D, 6.5, D, 8, 1/2",
            "normal, single, A, 6.5, A, 2, 0/1",
            "normal, single, A, 1000, A, 2, 30/31",
            "normal, single, K, 0.10, K, 125, 0/1",
            "normal, single, H, 0.65, J, 80, 1/2", // down arrow
            "normal, single, G, 0.65, F, 20, 0/1", // up arrow
            "normal, single, R, 0.010, Q, 1250, 0/1", // up arrow at the smallest AQL
            "normal, single, F, 2.5, F, 20, 1/2",
            "normal, single, L, 0.65, L, 200, 3/4",
            "normal, single, M, 1.0, M, 315, 7/8",
            "normal, single, F, 4.0, F, 20, 2/3",
            "normal, single, L, 15, J, 80, 21/22", // up arrow past the table's largest acceptance number
            // MIL-STD-105E Table II-B, single, tightened (from memory)
            "tightened, single, K, 1.0, K, 125, 2/3",
            "tightened, single, K, 0.65, K, 125, 1/2",
            "tightened, single, K, 4.0, K, 125, 8/9",
            "tightened, single, K, 10, K, 125, 18/19",
            "tightened, single, R, 0.010, R, 2000, 0/1", // smallest AQL
            "tightened, single, R, 0.025, S, 3150, 1/2", // down arrow to the tightened table's own letter S
            "tightened, single, A, 1000, A, 2, 27/28",
            "tightened, single, Q, 0.010, R, 2000, 0/1",
            // MIL-STD-105E Table II-C, single, reduced (from memory); Re > Ac + 1 in most
            "reduced, single, K, 0.65, K, 50, 1/3",
            "reduced, single, K, 1.0, K, 50, 1/4",
            "reduced, single, K, 2.5, K, 50, 3/6",
            "reduced, single, K, 4.0, K, 50, 5/8",
            "reduced, single, G, 1.5, G, 13, 0/2",
            "reduced, single, K, 0.10, K, 50, 0/1",
            "reduced, single, L, 0.65, L, 80, 1/4",
            "reduced, single, K, 10, K, 50, 10/13",
            // MIL-STD-105E Table III-A, double, normal (from memory)
            "normal, double, K, 0.65, K, 80, 0/3 3/4",
            "normal, double, K, 1.0, K, 80, 1/3 4/5",
            "normal, double, L, 1.5, L, 125, 3/7 8/9",
            "normal, double, K, 2.5, K, 80, 3/7 8/9",
            // MIL-STD-105E Table III-B, double, tightened (from memory)
            "tightened, double, K, 1.0, K, 80, 0/3 3/4",
            "tightened, double, K, 4.0, K, 80, 3/7 11/12",
            "tightened, double, K, 6.5, K, 80, 6/10 15/16",
    })
    void plans(String severity, String scheme, char letter, String aql, char used, int n, String numbers) {
        TableLookup found = TABLES.plan(letter, 0, aql(aql), TableSeverity.parse(severity), TableScheme.parse(scheme));
        assertEquals(used, found.usedLetter());
        assertEquals(used != letter, found.arrowFollowed());
        assertEquals(numbers, describe(found.plan()));
        assertEquals(n, found.plan() instanceof DoublePlan d ? d.n1() : found.plan().maxSampleSize());
    }

    @Test
    void aDoubleTableWithoutAPlanSendsToTheSinglePlan() {
        // MIL-STD-105E Table III-A (from memory): where the single plan is 0/1 the double table says "*".
        TableLookup found = TABLES.plan('K', 0, aql("0.10"), TableSeverity.NORMAL, TableScheme.DOUBLE);
        assertEquals(TableScheme.SINGLE, found.scheme());
        assertEquals(new SinglePlan(125, 0), found.plan());
        assertTrue(found.steps().get(0).contains("use the single plan"), found.steps().toString());
    }

    @Test
    void specialLevelWithAnArrow() {
        // Lot 2,000 at S-2 is code letter D (Table I); AQL 4.0 at D is a down arrow to E: n = 13, Ac 1, Re 2
        // (Table II-A). From memory.
        TableLookup found = TABLES.plan(2000, InspectionLevel.S2, aql("4.0"), TableSeverity.NORMAL,
                TableScheme.SINGLE);
        assertEquals('D', found.letter());
        assertEquals('E', found.usedLetter());
        assertEquals(new SinglePlan(13, 1), found.plan());
        assertEquals(List.of("the table's arrow at code letter D and AQL 4.0 points down to the first plan below it,"
                + " at code letter E"), found.steps());
        assertFalse(found.hundredPercent());
    }

    @Test
    void aSampleThatReachesTheLotMeansEveryUnitIsInspected() {
        // Lot 10, level II: B; AQL 0.65 is a down arrow to F (n = 20), more than the lot (the tables' note).
        TableLookup found = TABLES.plan(10, InspectionLevel.II, aql("0.65"), TableSeverity.NORMAL, TableScheme.SINGLE);
        assertEquals('B', found.letter());
        assertEquals('F', found.usedLetter());
        assertTrue(found.hundredPercent());
    }

    @Test
    void theIssueExampleLotOf2000AtLevelIiAndAql0_65() {
        TableLookup normal = TABLES.plan(2000, InspectionLevel.II, aql("0.65"), TableSeverity.NORMAL,
                TableScheme.SINGLE);
        TableLookup tightened = TABLES.plan(2000, InspectionLevel.II, aql("0.65"), TableSeverity.TIGHTENED,
                TableScheme.SINGLE);
        TableLookup reduced = TABLES.plan(2000, InspectionLevel.II, aql("0.65"), TableSeverity.REDUCED,
                TableScheme.SINGLE);
        // MIL-STD-105E Tables I, II-A, II-B, II-C (from memory): K; 125 2/3; 125 1/2; 50 1/3.
        assertEquals(new SinglePlan(125, 2), normal.plan());
        assertEquals(new SinglePlan(125, 1), tightened.plan());
        assertEquals(new SinglePlan(50, 1, 3), reduced.plan());
    }

    @Test
    void badRequestsAreRefusedByName() {
        assertEquals("AQL 0.5% is not in the tables' preferred series: 0.010, 0.015, 0.025, 0.040, 0.065, 0.10,"
                        + " 0.15, 0.25, 0.40, 0.65, 1.0, 1.5, 2.5, 4.0, 6.5, 10, 15, 25, 40, 65, 100, 150, 250, 400, 650,"
                        + " 1000",
                assertThrows(IllegalArgumentException.class, () -> TABLES.aqlIndex(0.5)).getMessage());
        assertEquals("'S-5' is not an inspection level; use I, II, III (general) or S-1, S-2, S-3, S-4 (special)",
                assertThrows(IllegalArgumentException.class, () -> InspectionLevel.parse("S-5")).getMessage());
        assertEquals("lotgate does not hold the double plans for reduced inspection (not confirmed); use the single"
                + " plans", assertThrows(IllegalArgumentException.class, () -> TABLES.plan('K', 0, 9,
                TableSeverity.REDUCED, TableScheme.DOUBLE)).getMessage());
        assertEquals("the tables start at a lot of 2 units, got 1",
                assertThrows(IllegalArgumentException.class, () -> TABLES.codeLetter(1, InspectionLevel.II))
                        .getMessage());
    }

    private static String describe(Plan plan) {
        if (plan instanceof SinglePlan s) {
            return s.c() + "/" + s.rejectionNumber();
        }
        if (plan instanceof DoublePlan d) {
            return d.c1() + "/" + d.r1() + " " + d.c2() + "/" + (d.c2() + 1);
        }
        fail("unexpected plan " + plan);
        return "";
    }
}
