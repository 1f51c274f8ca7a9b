package lotgate.sampling;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** Wald's sequential plan: its lines, its approximate curves and the exact curves of the truncated plan. */
class SequentialPlanTest {
    private static final OcModel BINOMIAL = new OcModel.Binomial();
    private static final WaldSequential TEXTBOOK = new WaldSequential(0.01, 0.05, 0.06, 0.10, false);

    @Test
    void textbookLinesAreH1_1_22H2_1_57AndSlope0_0281() {
        // Montgomery, Introduction to Statistical Quality Control, sequential sampling example (from memory):
        // p1 = 1%, alpha = 5%, p2 = 6%, beta = 10% give h1 = 1.22, h2 = 1.57, s = 0.0281.
        assertEquals(1.22, TEXTBOOK.h1(), 0.005);
        assertEquals(1.57, TEXTBOOK.h2(), 0.005);
        assertEquals(0.0281, TEXTBOOK.slope(), 0.00005);
        // Recomputed by hand from Wald's formulas (SciPy-free, Python 3.11 math.log).
        assertEquals(1.2211492086806142, TEXTBOOK.h1(), 1e-15);
        assertEquals(1.5677999569546845, TEXTBOOK.h2(), 1e-15);
        assertEquals(0.028111034141301176, TEXTBOOK.slope(), 1e-16);
    }

    @Test
    void waldsApproximationGivesTheNominalRisksAtBothPoints() {
        // Wald's OC passes through (p1, 1 - alpha) and (p2, beta) by construction (common practice).
        assertEquals(0.95, TEXTBOOK.acceptance(0.01), 1e-9);
        assertEquals(0.10, TEXTBOOK.acceptance(0.06), 1e-9);
        assertEquals(1.0, TEXTBOOK.acceptance(0.0), 0.0);
        // At p = s the ASN is h1 h2 / (s (1 - s)) (Wald; common practice).
        double s = TEXTBOOK.slope();
        assertEquals(TEXTBOOK.h1() * TEXTBOOK.h2() / (s * (1 - s)), TEXTBOOK.averageSampleNumber(s), 1e-6);
    }

    @Test
    void waldsAsnNearTheSlopeJoinsTheValueAtTheSlope() {
        double s = TEXTBOOK.slope();
        double at = TEXTBOOK.averageSampleNumber(s);
        assertEquals(at, TEXTBOOK.averageSampleNumber(s * (1 + 1e-6)), 1e-3 * at);
        assertEquals(at, TEXTBOOK.averageSampleNumber(s * (1 - 1e-6)), 1e-3 * at);
    }

    @ParameterizedTest(name = "truncated at 180, p={0}")
    @CsvSource({
            // p, P(accept), P(reject), ASN: exact rationals over the whole (units, count) lattice
            "0.01, 0.97062477231570898, 0.02937522768429101, 62.926678418894085",
            "0.03, 0.56798973174032952, 0.43201026825967048, 79.053899953828974",
            "0.06, 0.10476118700821829, 0.89523881299178165, 49.84917935963999",
    })
    void truncatedPlanMatchesExactRationals(double p, double accept, double reject, double asn) {
        SequentialPlan plan = SequentialPlan.wald(TEXTBOOK, 180);
        assertEquals(accept, plan.acceptance(BINOMIAL, p), 1e-12 * accept);
        assertEquals(reject, plan.rejection(BINOMIAL, p), 1e-11 * reject);
        assertEquals(asn, plan.averageSampleNumber(BINOMIAL, p), 1e-11 * asn);
    }

    @ParameterizedTest(name = "Wald at p={0}")
    @CsvSource({
            // p, P(accept), ASN: Wald's parametric OC curve solved for h with SciPy 1.10.1's brentq
            // (staged_reference.py, waldcurve)
            "0.003, 0.99648445364569516, 48.239531744998011",
            "0.03, 0.5154457895957727, 68.951935542678527",
            "0.1, 0.011629172191652102, 21.357474941169439",
    })
    void waldsCurvesMatchTheParametricForm(double p, double accept, double asn) {
        assertEquals(accept, TEXTBOOK.acceptance(p), 1e-10);
        assertEquals(asn, TEXTBOOK.averageSampleNumber(p), 1e-8);
    }

    @Test
    void truncatedPlanAoqAndAtiMatchExactRationals() {
        // Exact rationals over the whole lattice for a lot of 2000 at p = 3% (staged_reference.py, seqaoq).
        SequentialPlan plan = SequentialPlan.wald(TEXTBOOK, 180);
        assertEquals(0.016304530269274899, plan.averageOutgoingQuality(BINOMIAL, 0.03, 2000), 1e-13);
        assertEquals(913.03131538167338, plan.averageTotalInspection(BINOMIAL, 0.03, 2000), 1e-9);
    }

    @Test
    void linesGiveTheAcceptanceAndRejectionNumbers() {
        SequentialPlan plan = SequentialPlan.wald(TEXTBOOK, 180);
        // -h1 + s m first reaches 0 at m = h1 / s = 43.4: the 44th good unit in a row accepts.
        assertEquals(-1, plan.acceptanceNumber(43));
        assertEquals(0, plan.acceptanceNumber(44));
        // h2 + s m: 1.59 after one unit, so 2 nonconforming units in the first 15 reject.
        assertEquals(2, plan.rejectionNumber(1));
        assertEquals(2, plan.rejectionNumber(15));
        assertEquals(3, plan.rejectionNumber(16));
        // At the truncation point: accept with at most floor(180 s) = 5.
        assertEquals(5, plan.acceptanceNumber(180));
        assertEquals(6, plan.rejectionNumber(180));
        assertEquals(SequentialPlan.Step.CONTINUE, plan.step(10, 1));
        assertEquals(SequentialPlan.Step.REJECT, plan.step(10, 2));
        assertEquals(SequentialPlan.Step.ACCEPT, plan.step(44, 0));
    }

    @Test
    void truncationRaisesNoRiskFarAboveWaldsNominalOnes() {
        SequentialPlan plan = SequentialPlan.wald(TEXTBOOK, 180);
        assertTrue(plan.rejection(BINOMIAL, 0.01) < 0.05, "the exact producer's risk here is below alpha");
        assertTrue(plan.acceptance(BINOMIAL, 0.06) < 0.11, "the exact consumer's risk is close to beta");
    }

    @Test
    void noTestOnTwoHundredUnitsBeatsTheRandomisedNeymanPearsonBound() {
        // SciPy 1.10.1: binomial counts of 200 units at 1% and 4%, producer's risk 2.5%: reject above 5 and at 5
        // with chance 0.251295, leaving binom.cdf(5, 200, 0.04) - 0.251295 * binom.pmf(5, 200, 0.04) = 0.162874.
        SequentialPlanDesigner designer = new SequentialPlanDesigner(new OcModel.Binomial());
        RiskPoints points = new RiskPoints(0.01, 0.025, 0.04, 0.10);
        assertEquals(0.16287444332899084, designer.leastConsumerRisk(points, 200), 1e-12);
        int smallest = designer.smallestTruncation(points, 600);
        assertTrue(designer.design(points, smallest).met());
        assertTrue(!designer.design(points, smallest - 1).met());
        assertTrue(designer.leastConsumerRisk(points, smallest) <= 0.10, "the bound never contradicts a met design");
    }
}
