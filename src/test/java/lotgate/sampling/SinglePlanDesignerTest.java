package lotgate.sampling;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** Designed single plans against independent computations and published tables. */
class SinglePlanDesignerTest {

    private static SingleDesign.Found found(SingleDesign design) {
        return assertInstanceOf(SingleDesign.Found.class, design);
    }

    @ParameterizedTest(name = "{0} AQL {1} LTPD {2} N {3}")
    @CsvSource({
            // model, AQL, LTPD, lot size, n, c, producer's risk, consumer's risk (alpha 5%, beta 10%):
            // SciPy 1.10.1 brute force over every (n, c) with binom/poisson/hypergeom sf and cdf.
            "binomial, 0.01, 0.05, 0, 132, 3, 0.04425250582596621, 0.0992283044257829",
            "poisson, 0.01, 0.05, 0, 134, 3, 0.04719144251165439, 0.09880796540338946",
            "hypergeometric, 0.01, 0.05, 500, 123, 3, 0.014255790936194987, 0.09809229108611835",
            "hypergeometric, 0.01, 0.05, 2000, 130, 3, 0.03658665028602865, 0.09802173819696118",
            "binomial, 0.005, 0.03, 0, 221, 3, 0.025759211071567676, 0.09970043013436662",
            "binomial, 0.025, 0.10, 0, 78, 4, 0.04603257578158231, 0.09939432326731179",
    })
    void designedPlanMatchesAnIndependentExhaustiveSearch(String model, double aql, double ltpd, int lotSize,
            int n, int c, double producerRisk, double consumerRisk) {
        SingleDesign.Found design = found(new SinglePlanDesigner(OcModel.of(model, lotSize), lotSize)
                .design(new RiskPoints(aql, 0.05, ltpd, 0.10)));
        assertEquals(new SinglePlan(n, c), design.plan());
        assertEquals(producerRisk, design.risks().producerRisk(), producerRisk * 1e-10);
        assertEquals(consumerRisk, design.risks().consumerRisk(), consumerRisk * 1e-10);
    }

    @ParameterizedTest(name = "c = {0}")
    @CsvSource({
            // c, np at P(accept) = 0.95, np at P(accept) = 0.10: Cameron (1952), table of unit values
            // (from memory; recomputed as chi-square quantiles with SciPy 1.10.1, agreeing to 3 decimals).
            "0, 0.051, 2.303", "1, 0.355, 3.890", "2, 0.818, 5.322", "3, 1.366, 6.681",
            "4, 1.970, 7.994", "5, 2.613, 9.275", "6, 3.285, 10.532", "7, 3.981, 11.771",
            "8, 4.695, 12.995", "9, 5.425, 14.206", "10, 6.169, 15.407",
    })
    void poissonCurveCrossesCameronsUnitValues(int c, double npAt95, double npAt10) {
        int n = 1000;
        OperatingCharacteristic oc = OperatingCharacteristic.of(new SinglePlan(n, c), new OcModel.Poisson());
        assertEquals(npAt95, n * oc.qualityAt(0.95), 0.0006);
        assertEquals(npAt10, n * oc.qualityAt(0.10), 0.0006);
    }

    @Test
    void poissonDesignTakesTheAcceptanceNumberCameronsRatioGives() {
        // Cameron (1952), from memory: the ratio np(0.10)/np(0.95) is 4.89 at c = 3 and 6.51 at c = 2, so an
        // LTPD/AQL ratio of 5 needs c = 3, and n = ceil(6.681 / 0.05) = 134 (SciPy 1.10.1 agrees: see above).
        SingleDesign.Found design = found(new SinglePlanDesigner(new OcModel.Poisson(), 0)
                .design(new RiskPoints(0.01, 0.05, 0.05, 0.10)));
        assertEquals(3, design.plan().c());
        assertEquals(134, design.plan().n());
    }

    @Test
    void zeroAcceptancePlanIsTheSmallestSampleThatMeetsTheConsumersPoint() {
        // c = 0, beta = 10%, LTPD 5%: n = ceil(ln 0.10 / ln 0.95) = 45 (common practice, by hand).
        SingleDesign.Found design = found(new SinglePlanDesigner(new OcModel.Binomial(), 0)
                .designForAcceptanceNumber(0, new RiskPoints(0.01, 0.05, 0.05, 0.10)));
        assertEquals(new SinglePlan(45, 0), design.plan());
        // Producer's risk 1 - 0.99^45 (by hand).
        assertEquals(1 - Math.pow(0.99, 45), design.risks().producerRisk(), 1e-14);
    }

    @Test
    void alternativesAreTheOtherAcceptanceNumbersThatMeetBothRisksAtTheSameSampleSize() {
        SinglePlanDesigner designer = new SinglePlanDesigner(new OcModel.Binomial(), 0);
        RiskPoints points = new RiskPoints(0.01, 0.05, 0.08, 0.10);
        SingleDesign.Found design = found(designer.design(points));
        for (int c : design.otherAcceptanceNumbers()) {
            assertTrue(PlanRisks.of(new SinglePlan(design.plan().n(), c), new OcModel.Binomial(), points).meets(points));
        }
        int next = design.plan().c() + design.otherAcceptanceNumbers().size() + 1;
        assertTrue(!PlanRisks.of(new SinglePlan(design.plan().n(), next), new OcModel.Binomial(), points).meets(points));
    }

    @Test
    void aLotTooSmallForTheSampleHasNoPlan() {
        SingleDesign design = new SinglePlanDesigner(new OcModel.Binomial(), 100)
                .design(new RiskPoints(0.01, 0.05, 0.05, 0.10));
        assertInstanceOf(SingleDesign.NotFound.class, design);
    }

    @Test
    void aFiniteLotTooSmallToTellTheTwoLevelsApartHasNoPlan() {
        // 11% and 12% of 10 units both stand for 1 nonconforming unit (floor 1.1 and ceil 1.2 - 1 ... = 1, 2?):
        // floor(1.1) = 1 and ceil(1.2) = 2 differ, so take 10% and 10.5% of 10: floor(1.0) = 1, ceil(1.05) = 2.
        // Equal counts need AQL and LTPD inside one unit's step from above: 10% and 10% + 0 is refused earlier,
        // so use N = 1000 with 1.01% and 1.02%: floor(10.1) = 10 and ceil(10.2) = 11 -- still different.
        // A hopeless lot: N = 3 with 34% and 66%: floor(1.02) = 1 and ceil(1.98) = 2, distinguishable at n = 3.
        // Hence only AQL and LTPD with the same count after rounding fail: N = 2, 40% and 45% -> 0 and 1. The
        // rule makes equal counts impossible when AQL < LTPD; the guard exists for safety and is not reachable.
        SingleDesign design = new SinglePlanDesigner(new OcModel.Hypergeometric(3), 3)
                .design(new RiskPoints(0.34, 0.05, 0.66, 0.10));
        assertInstanceOf(SingleDesign.Found.class, design);
    }
}
