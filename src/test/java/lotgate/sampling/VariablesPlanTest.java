package lotgate.sampling;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.IntRange;
import net.jqwik.api.constraints.Scale;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Variables plans: the noncentral t, the k-method's design and OC, the M-method's estimates and the normality
 * test. "SciPy 1.10.1" is Debian's python3-scipy 1.10.1-2 (scipy.stats.nct is Boost's implementation), from
 * src/test/python/variables_reference.py.
 */
class VariablesPlanTest {
    private static final OcModel BINOMIAL = new OcModel.Binomial();

    @ParameterizedTest(name = "t={0} df={1} delta={2}")
    @CsvSource({
            // t, degrees of freedom, noncentrality, CDF, survival: SciPy 1.10.1 nct.cdf and nct.sf
            "1.5, 10, 1.0, 0.66951684821535484, 0.3304831517846451",
            "2.0, 5, 0.5, 0.88473225068617067, 0.11526774931382934",
            "-1.0, 20, 0.3, 0.10167852213614603, 0.89832147786385397",
            "0.5, 3, 2.0, 0.065478985564616801, 0.93452101443538316",
            "10.0, 40, 9.0, 0.73279401859923932, 0.26720598140076068",
            "25.0, 99, 23.0, 0.82894986362884771, 0.17105013637115227",
            "30.0, 149, 28.0, 0.83461517388812712, 0.16538482611187283",
            "3.0, 14, 4.5, 0.088371775285015441, 0.9116282247149845",
            "-0.5, 7, -1.2, 0.7615982345156711, 0.2384017654843289",
            "0.0, 12, 1.0, 0.15865525393145707, 0.84134474606854293",
            "6.0, 200, 7.3, 0.10522927810153654, 0.89477072189846352",
            "2.5, 2, 1.0, 0.78161347627216038, 0.21838652372783959",
            "40.0, 300, 39.5, 0.59475093536340129, 0.40524906463659877",
            "12.0, 60, 14.0, 0.084101619859325183, 0.91589838014067482",
    })
    void noncentralTMatchesSciPyTo1e10(double t, double df, double delta, double cdf, double sf) {
        assertEquals(cdf, NoncentralT.cdf(t, df, delta), 1e-10);
        assertEquals(sf, NoncentralT.survival(t, df, delta), 1e-10);
    }

    @ParameterizedTest(name = "q={0} df={1} delta={2}")
    @CsvSource({
            // probability, degrees of freedom, noncentrality, quantile: SciPy 1.10.1 nct.ppf
            "0.05, 41, 15.0, 12.280796118935051",
            "0.9, 41, 10.0, 12.211342029538681",
            "0.5, 9, 2.0, 2.0600833549825772",
    })
    void noncentralTQuantilesMatchSciPy(double p, double df, double delta, double quantile) {
        assertEquals(quantile, NoncentralT.quantile(p, df, delta), 1e-9);
    }

    @Test
    void noncentralTWithNoNoncentralityIsStudentsT() {
        // Common practice: the central t with 10 degrees of freedom has its 97.5% point at 2.228139.
        assertEquals(0.975, NoncentralT.cdf(2.2281388519649385, 10, 0), 1e-12);
    }

    @Test
    void knownSigmaDesignIsTheTextbookClosedForm() {
        // p1 = 1%, alpha = 5%, p2 = 6%, beta = 10%: n = 14.4, so 15, and k = 1.89 (common practice; recomputable
        // from normal quantiles: ((1.6449 + 1.2816) / (2.3263 - 1.5548))^2 and (1.6449 * 1.5548 + 1.2816 * 2.3263) / 2.9265).
        VariablesDesigner.Design design = VariablesDesigner.design(new RiskPoints(0.01, 0.05, 0.06, 0.10), true);
        assertEquals(14.4, design.exactSize(), 0.05);
        assertEquals(15, design.plan().n());
        assertEquals(1.89, design.closedFormK(), 0.005);
        assertEquals(1.89, design.plan().k(), 0.005);
        assertTrue(design.risks().meets(new RiskPoints(0.01, 0.05, 0.06, 0.10)));
        // Wallis's approximation n_sigma (1 + k^2 / 2) = 40.2 for an unknown sigma.
        assertEquals(40.15, design.wallis(), 0.01);
    }

    @ParameterizedTest(name = "unknown sigma {0} {1} {2} {3}")
    @CsvSource({
            // AQL, alpha, LTPD, beta, n, lowest k, highest k: SciPy 1.10.1 nct.ppf, scanning n upward
            "0.01, 0.05, 0.06, 0.10, 42, 1.8975622710155622, 1.905285051640105",
            "0.001, 0.05, 0.005, 0.10, 161, 2.8041868699750481, 2.8042019252593966",
            "0.025, 0.05, 0.10, 0.10, 43, 1.5847999083561553, 1.5873976424662599",
    })
    void unknownSigmaDesignMatchesAnIndependentSearch(double aql, double alpha, double ltpd, double beta, int n,
            double low, double high) {
        RiskPoints points = new RiskPoints(aql, alpha, ltpd, beta);
        VariablesDesigner.Design design = VariablesDesigner.design(points, false);
        assertEquals(n, design.plan().n());
        assertEquals(low, design.lowestK(), 1e-9);
        assertEquals(high, design.highestK(), 1e-9);
        assertTrue(design.risks().meets(points));
        // One unit fewer meets no k: both risks recomputed at the ends of its range.
        VariablesPlan fewer = new VariablesPlan(n - 1, design.lowestK(), false);
        VariablesPlan fewerHigh = new VariablesPlan(n - 1, design.highestK(), false);
        assertTrue(!PlanRisks.of(fewer, BINOMIAL, points).meets(points)
                && !PlanRisks.of(fewerHigh, BINOMIAL, points).meets(points));
    }

    @Test
    void unknownSigmaRisksMatchSciPy() {
        // SciPy 1.10.1: nct.cdf(k sqrt(n), n - 1, sqrt(n) z_0.01) and nct.sf(k sqrt(n), n - 1, sqrt(n) z_0.06) with
        // n = 42 and k the middle of the range above.
        VariablesPlan plan = new VariablesPlan(42, (1.8975622710155622 + 1.905285051640105) / 2, false);
        assertEquals(0.048324570812693805, plan.rejection(BINOMIAL, 0.01), 1e-10);
        assertEquals(0.097661975454225031, plan.acceptance(BINOMIAL, 0.06), 1e-10);
    }

    @Property(tries = 200)
    void ocFallsAsMoreProductLiesBeyondTheLimit(@ForAll @IntRange(min = 2, max = 200) int n,
            @ForAll @DoubleRange(min = 0.5, max = 3.5) @Scale(4) double k,
            @ForAll @DoubleRange(min = 0.0001, max = 0.4) @Scale(6) double p,
            @ForAll @DoubleRange(min = 0.0001, max = 0.05) @Scale(6) double step) {
        for (boolean known : new boolean[] {true, false}) {
            VariablesPlan plan = new VariablesPlan(n, k, known);
            double here = plan.acceptance(BINOMIAL, p);
            assertTrue(plan.acceptance(BINOMIAL, p + step) <= here + 1e-12, "P(accept) rose");
            assertEquals(1.0, here + plan.rejection(BINOMIAL, p), 1e-12);
        }
    }

    @Test
    void mMethodLimitEqualsTheEstimateAtK() {
        // With sigma known, M = Phi(-k sqrt(n / (n - 1))) (the M-method's estimate; from memory).
        VariablesPlan known = new VariablesPlan(15, 1.8937, true);
        assertEquals(NoncentralT.phi(-1.8937 * Math.sqrt(15 / 14.0)), known.maxEstimate(), 1e-15);
        // With sigma unknown, the estimate falls as Q grows and is 0 once x = 1/2 - Q sqrt(n) / (2 (n - 1)) <= 0.
        VariablesPlan unknown = new VariablesPlan(42, 1.9014, false);
        assertTrue(unknown.estimateBeyond(1.5) > unknown.estimateBeyond(2.0));
        assertEquals(0.0, unknown.estimateBeyond(2 * 41 / Math.sqrt(42) + 0.01));
        // The unbiased estimate of the fraction beyond the limit for a normal sample is about Phi(-Q) for large n.
        VariablesPlan large = new VariablesPlan(2000, 2, false);
        assertEquals(NoncentralT.phi(-2.0), large.estimateBeyond(2.0), 2e-4);
    }

    @ParameterizedTest(name = "n={0} Q={1}")
    @CsvSource({
            // n, Q, estimate, 95% upper bound: SciPy 1.10.1 beta.cdf for the M-method's estimate and brentq on
            // nct.sf for the bound (variables_reference.py, mvue)
            "42, 1.9, 0.026650364666969684, 0.071425423712458261",
            "42, 2.5, 0.0047979944587859483, 0.024274366136103235",
            "10, 1.2, 0.11244458156556902, 0.31462541609725941",
    })
    void estimateAndBoundMatchSciPy(int n, double q, double estimate, double bound) {
        VariablesPlan plan = new VariablesPlan(n, 2.0, false);
        assertEquals(estimate, plan.estimateBeyond(q), 1e-12);
        assertEquals(bound, plan.upperBoundBeyond(q, 0.95), 1e-9);
    }

    @Test
    void upperBoundOnTheFractionBeyondTheLimitIsExact() {
        VariablesPlan plan = new VariablesPlan(20, 2.0, false);
        double q = 2.5;
        double bound = plan.upperBoundBeyond(q, 0.95);
        // At the bound's fraction p_u, a statistic at least as large as the one observed has probability 5%.
        double z = VariablesPlan.standardDistance(bound);
        assertEquals(0.05, NoncentralT.survival(q * Math.sqrt(20), 19, Math.sqrt(20) * z), 1e-9);
        VariablesPlan known = new VariablesPlan(20, 2.0, true);
        // Known sigma: Phi(-(Q - 1.6449 / sqrt(n))) (common practice).
        assertEquals(NoncentralT.phi(-(q - 1.6448536269514729 / Math.sqrt(20))), known.upperBoundBeyond(q, 0.95),
                1e-12);
    }

    @ParameterizedTest(name = "sample {0}")
    @CsvSource(delimiter = '|', value = {
            // values | A^2: SciPy 1.10.1 scipy.stats.anderson(x, 'norm').statistic
            "9.98 10.02 10.01 9.97 10.00 10.03 9.99 10.04 9.96 10.01 10.00 9.98 | 0.14312590566476935",
            "1 1 1 2 2 3 5 8 13 21 | 0.9970227108668599",
    })
    void andersonDarlingStatisticMatchesSciPy(String values, double statistic) {
        double[] x = java.util.Arrays.stream(values.trim().split(" ")).mapToDouble(Double::parseDouble).toArray();
        Normality.Result result = Normality.andersonDarling(x);
        assertEquals(statistic, result.statistic(), 1e-12);
    }

    @Test
    void andersonDarlingPValueFollowsTheCriticalValues() {
        // Stephens' case 3 critical values of A* (D'Agostino and Stephens 1986, table 4.7; from memory): 0.752 at
        // 5% and 1.035 at 1%; the p-value formulas give about those levels there.
        assertEquals(0.05, Normality.pValue(0.752), 0.003);
        assertEquals(0.01, Normality.pValue(1.035), 0.001);
        assertTrue(Normality.pValue(0.2) > 0.5);
    }
}
