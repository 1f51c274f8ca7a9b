package lotgate.sampling;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** Least-inspection (Dodge-Romig) plans against SciPy and against the published Dodge-Romig tables. */
class LeastInspectionTest {

    @Test
    void ltpdProtectionMatchesABruteForceInSciPy() {
        // SciPy 1.10.1 (src/test/python/tables_reference.py), brute force over every (n, c) with binom:
        // N = 5,000, LTPD 5%, consumer's risk 10%, process average 0.5% -> n = 132, c = 3, ATI 154.13360161079586.
        var result = new LeastInspectionDesigner(new OcModel.Binomial(), 5000).forLtpd(0.05, 0.10, 0.005);
        assertEquals(new SinglePlan(132, 3), result.plan());
        assertEquals(154.13360161079586, result.ati(), 1e-9);
    }

    @Test
    void ltpdProtectionForAFiniteLotMatchesSciPysHypergeometric() {
        // SciPy 1.10.1 hypergeom, brute force: N = 2,000, LTPD 1% (D = 20), average 0.25% (D = 5) -> 489, 2,
        // ATI 636.3802261833137.
        var result = new LeastInspectionDesigner(new OcModel.Hypergeometric(2000), 2000).forLtpd(0.01, 0.10, 0.0025);
        assertEquals(new SinglePlan(489, 2), result.plan());
        assertEquals(636.3802261833137, result.ati(), 1e-8);
    }

    @Test
    void aoqlProtectionMatchesABruteForceInSciPy() {
        // SciPy 1.10.1 brute force with minimize_scalar for each AOQL: N = 5,000, AOQL 2%, average 0.5% ->
        // n = 68, c = 2, ATI 92.25042928811244, AOQL 0.019851715961707848.
        var result = new LeastInspectionDesigner(new OcModel.Binomial(), 5000).forAoql(0.02, 0.005);
        assertEquals(new SinglePlan(68, 2), result.plan());
        assertEquals(92.25042928811244, result.ati(), 1e-9);
        assertEquals(0.019851715961707848, result.aoql(), 1e-9);
    }

    /**
     * Dodge and Romig, Sampling Inspection Tables (2nd ed., 1959), single sampling, LTPD 1.0%, first process
     * average column (0 to 0.010%): n for the upper end of each lot-size band, all with c = 0 (from memory).
     * Their tables rounded n (to 5 units) and computed with approximations to the hypergeometric, so n may
     * differ from the exact answer by a few per cent; c must agree.
     */
    @ParameterizedTest(name = "N = {0}: n = {1}")
    @CsvSource({"200, 140", "300, 165", "400, 175", "500, 180", "600, 190", "800, 200", "1000, 205", "2000, 220",
            "3000, 220", "4000, 225", "5000, 225", "7000, 230"})
    void dodgeRomigLtpd1PercentAtAVeryLowProcessAverage(int lotSize, int tabled) {
        var result = new LeastInspectionDesigner(new OcModel.Hypergeometric(lotSize), lotSize)
                .forLtpd(0.01, 0.10, 0.00005);
        assertEquals(0, result.plan().c());
        assertEquals(tabled, result.plan().n(), 0.03 * tabled);
    }

    @Test
    void dodgeRomigLtpd1PercentLotOf5000AtAverage0_25Percent() {
        // Dodge-Romig LTPD 1.0% table, lots 4,001-5,000, process average 0.21-0.30%: n = 770, c = 4, AOQL 0.28%
        // (from memory). Exact at N = 5,000 and 0.25%: 766, 4, AOQL 0.30% (the table's AOQL used the
        // binomial approximation and rounded n).
        var result = new LeastInspectionDesigner(new OcModel.Hypergeometric(5000), 5000).forLtpd(0.01, 0.10, 0.0025);
        assertEquals(4, result.plan().c());
        assertEquals(770, result.plan().n(), 10);
        assertEquals(0.0028, result.aoql(), 0.0003);
    }

    @Test
    void dodgeRomigAoql3PercentLotOf5000AtAverage1Percent() {
        // Dodge-Romig AOQL 3.0% table, lots 4,001-5,000, process average 0.61-1.20%: n = 65, c = 3,
        // LTPD 10.3% (from memory). Exact at N = 5,000 and 0.9%: the same plan; its LTPD 9.9% is the
        // hypergeometric one (the table's LTPD is by the binomial/Poisson approximation).
        var result = new LeastInspectionDesigner(new OcModel.Hypergeometric(5000), 5000).forAoql(0.03, 0.009);
        assertEquals(new SinglePlan(65, 3), result.plan());
        assertEquals(0.103, result.ltpd10(), 0.005);
    }

    @Test
    void theIssueExampleLtpd5PercentAverage0_5PercentLotOf5000() {
        // hypergeometric (the default for a lot), checked against the binomial brute force above: same plan.
        var result = new LeastInspectionDesigner(new OcModel.Hypergeometric(5000), 5000).forLtpd(0.05, 0.10, 0.005);
        assertEquals(new SinglePlan(131, 3), result.plan());
        assertTrue(result.ati() < 150 && result.ati() > 148, "ATI " + result.ati());
    }

    @Test
    void whenNoPlanBeatsScreeningEveryUnitItSaysSo() {
        // A lot of 20 at LTPD 10% under the binomial model: even c = 0 needs 22 units (0.9^22 < 0.1 < 0.9^21).
        var result = new LeastInspectionDesigner(new OcModel.Binomial(), 20).forLtpd(0.10, 0.10, 0.001);
        assertTrue(result.inspectEveryUnit());
        assertEquals(20, result.ati(), 0);
    }

    @Test
    void badArgumentsAreRefused() {
        assertEquals("the lot size must be at least 2, got 1",
                assertThrows(IllegalArgumentException.class,
                        () -> new LeastInspectionDesigner(new OcModel.Binomial(), 1)).getMessage());
        assertEquals("the hypergeometric model is tied to lot size 100, not 200",
                assertThrows(IllegalArgumentException.class,
                        () -> new LeastInspectionDesigner(new OcModel.Hypergeometric(100), 200)).getMessage());
    }
}
