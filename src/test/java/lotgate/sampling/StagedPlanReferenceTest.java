package lotgate.sampling;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Double and multiple plans against published examples and independent computations. "SciPy 1.10.1" is
 * Debian's python3-scipy 1.10.1-2; "exact rationals" is Python 3.11's fractions over the whole lattice. Both
 * come from src/test/python/staged_reference.py.
 */
class StagedPlanReferenceTest {
    private static final double RELATIVE = 1e-10;
    private static final OcModel BINOMIAL = new OcModel.Binomial();

    private static void assertRelative(double expected, double actual) {
        assertEquals(expected, actual, Math.abs(expected) * RELATIVE, "relative error above " + RELATIVE);
    }

    @Test
    void textbookDoublePlanAcceptsFivePercentAboutTwentyNinePercentOfTheTime() {
        // Montgomery, Introduction to Statistical Quality Control: n1 = 50, c1 = 1, n2 = 100, c2 = 3 at p = 5%
        // gives P(accept) of about 0.29 (from memory; the book sums rounded table values).
        DoublePlan plan = DoublePlan.of(50, 1, 100, 3);
        assertEquals(0.29, plan.acceptance(BINOMIAL, 0.05), 0.005);
    }

    @ParameterizedTest(name = "n1=50 c1=1 n2=100 c2=3 at p={0}")
    @CsvSource({
            // p, P(accept), P(reject), ASN: SciPy 1.10.1 binom.cdf, binom.sf and binom.pmf
            "0.005, 0.99695452025270437, 0.0030454797472956761, 52.601173714307173",
            "0.01, 0.97067488434211469, 0.029325115657885256, 58.783914000529776",
            "0.02, 0.81874560838483623, 0.1812543916151638, 74.647052484030212",
            "0.05, 0.29041548229667347, 0.70958451770332598, 98.097620862940431",
            "0.08, 0.083091973281483753, 0.91690802671851568, 84.258364729857945",
    })
    void textbookDoublePlanMatchesSciPy(double p, double accept, double reject, double asn) {
        DoublePlan plan = DoublePlan.of(50, 1, 100, 3);
        assertRelative(accept, plan.acceptance(BINOMIAL, p));
        assertRelative(reject, plan.rejection(BINOMIAL, p));
        assertRelative(asn, plan.averageSampleNumber(BINOMIAL, p));
    }

    @ParameterizedTest(name = "curtailed ASN at p={0}")
    @CsvSource({
            // p, ASN with the second sample curtailed on rejection: SciPy 1.10.1 and the negative binomial sum
            // over every stopping position of the second sample
            "0.01, 57.566833577966918",
            "0.05, 64.590959815186579",
            "0.08, 56.06789599273251",
    })
    void curtailedAsnMatchesAnEnumerationOfStoppingPositions(double p, double asn) {
        DoublePlan plan = DoublePlan.of(50, 1, 100, 3);
        assertRelative(asn, plan.curtailedAverageSampleNumber(BINOMIAL, p));
    }

    @ParameterizedTest(name = "Poisson double plan at {0} per unit")
    @CsvSource({
            // nonconformities per unit, P(accept), P(reject): SciPy 1.10.1 poisson.cdf, sf and pmf
            "0.01, 0.91127541556540115, 0.088724584434599019",
            "0.03, 0.43234807965920635, 0.5676519203407937",
    })
    void poissonDoublePlanMatchesSciPy(double perUnit, double accept, double reject) {
        DoublePlan plan = DoublePlan.of(40, 0, 80, 2);
        assertRelative(accept, plan.acceptance(new OcModel.Poisson(), perUnit));
        assertRelative(reject, plan.rejection(new OcModel.Poisson(), perUnit));
    }

    @Test
    void poissonCurtailedAsnMatchesSciPy() {
        // SciPy 1.10.1: 40 + sum over d1 of P(d1) sum over j < 80 of P(Poisson(0.03 j) < 3 - d1)
        // (staged_reference.py, curtpoisson).
        assertRelative(66.083319315255991, DoublePlan.of(40, 0, 80, 2).curtailedAverageSampleNumber(new OcModel.Poisson(),
                0.03));
    }

    @ParameterizedTest(name = "finite lot of 500 with D={0}")
    @CsvSource({
            // D, P(accept), P(reject), AOQ: exact rationals, the second sample drawn from what is left of the lot
            "5, 0.96917812441084472, 0.030821875589155258, 0.009019653910085924",
            "20, 0.4056338689302601, 0.5943661310697399, 0.015787884285183212",
            "40, 0.08281559445915837, 0.91718440554084169, 0.0065985777956082368",
    })
    void hypergeometricDoublePlanMatchesExactRationals(int defectives, double accept, double reject, double aoq) {
        OcModel model = new OcModel.Hypergeometric(500);
        DoublePlan plan = DoublePlan.of(30, 0, 60, 2);
        double p = defectives / 500.0;
        assertRelative(accept, plan.acceptance(model, p));
        assertRelative(reject, plan.rejection(model, p));
        assertRelative(aoq, plan.averageOutgoingQuality(model, p, 500));
    }

    @ParameterizedTest(name = "four-stage plan at p={0}")
    @CsvSource({
            // p, P(accept), P(reject), ASN: exact rationals over the whole lattice
            "0.01, 0.99780698220480868, 0.0021930177951913167, 41.47653462945636",
            "0.05, 0.65983695831635736, 0.34016304168364259, 52.872224465021539",
            "0.1, 0.13203821138747451, 0.86796178861252549, 42.898718513741152",
    })
    void multiplePlanMatchesExactRationals(double p, double accept, double reject, double asn) {
        MultiplePlan plan = new MultiplePlan(List.of(new Stage(20, Stage.NO_ACCEPTANCE, 3), new Stage(20, 1, 4),
                new Stage(20, 2, 5), new Stage(20, 4, 5)));
        assertRelative(accept, plan.acceptance(BINOMIAL, p));
        assertRelative(reject, plan.rejection(BINOMIAL, p));
        assertRelative(asn, plan.averageSampleNumber(BINOMIAL, p));
    }

    @Test
    void doublePlanAoqAndAtiFollowTheTextbookFormulas() {
        // Common practice (Montgomery, from memory): AOQ = [Pa1 (N - n1) + Pa2 (N - n1 - n2)] p / N and
        // ATI = n1 Pa1 + (n1 + n2) Pa2 + N (1 - Pa) for a type B double plan with rectifying inspection.
        DoublePlan plan = DoublePlan.of(50, 1, 100, 3);
        int lot = 5000;
        double p = 0.02;
        double first = BINOMIAL.atMost(50, 1, p);
        double second = plan.acceptance(BINOMIAL, p) - first;
        double aoq = (first * (lot - 50) + second * (lot - 150)) * p / lot;
        double ati = 50 * first + 150 * second + lot * (1 - first - second);
        assertEquals(aoq, plan.averageOutgoingQuality(BINOMIAL, p, lot), 1e-15);
        assertEquals(ati, plan.averageTotalInspection(BINOMIAL, p, lot), 1e-9);
    }
}
