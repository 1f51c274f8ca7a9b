package lotgate.sampling;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;

/**
 * Tails of the three OC models against published values and an independent computation.
 * "SciPy 1.10.1" means Debian's python3-scipy 1.10.1-2: scipy.stats binom and poisson cdf and sf.
 */
class OcModelReferenceTest {
    private static final double RELATIVE = 1e-10;

    private static void assertRelative(double expected, double actual) {
        assertEquals(expected, actual, Math.abs(expected) * RELATIVE, "relative error above " + RELATIVE);
    }

    @Test
    void textbookPlan89And2AcceptsOnePercentWithProbability0_9397() {
        // Montgomery, Introduction to Statistical Quality Control, single plan n = 89, c = 2 (from memory).
        assertEquals(0.9397, new OcModel.Binomial().atMost(89, 2, 0.01), 5e-5);
    }

    @Test
    void sevenOrMoreOfEightAtOneHalfIs0_0352AndAllEightIs0_0039() {
        // Common practice: 9/256 = 0.0352 and 1/256 = 0.0039.
        OcModel binomial = new OcModel.Binomial();
        assertEquals(9.0 / 256, binomial.moreThan(8, 6, 0.5), 1e-15);
        assertEquals(1.0 / 256, binomial.moreThan(8, 7, 0.5), 1e-15);
        assertEquals(0.0352, binomial.moreThan(8, 6, 0.5), 5e-5);
        assertEquals(0.0039, binomial.moreThan(8, 7, 0.5), 5e-5);
    }

    @ParameterizedTest(name = "Binomial n={0} c={1} p={2}")
    @CsvSource({
            // n, c, p, P(X <= c), P(X > c): SciPy 1.10.1 binom.cdf / binom.sf
            "89, 2, 0.01, 0.9396899183135595, 0.06031008168644052",
            "134, 3, 0.05, 0.09305166288616408, 0.9069483371138359",
            "50000, 10, 0.0001, 0.9863092644401008, 0.013690735559899235",
            "50000, 10, 0.001, 6.3470983533209174e-12, 0.9999999999936529",
            "200, 0, 0.05, 3.5052666248828984e-05, 0.9999649473337512",
            "1000, 30, 0.01, 0.999999935800714, 6.419928603137628e-08",
    })
    void binomialTailsMatchSciPy(int n, int c, double p, double atMost, double moreThan) {
        OcModel model = new OcModel.Binomial();
        assertRelative(atMost, model.atMost(n, c, p));
        assertRelative(moreThan, model.moreThan(n, c, p));
    }

    @ParameterizedTest(name = "Poisson c={0} mean={1}")
    @CsvSource({
            // c, mean, P(X <= c), P(X > c): SciPy 1.10.1 poisson.cdf / poisson.sf
            "3, 1.34, 0.9528085574883456, 0.04719144251165439",
            "3, 20.0, 3.203719780476998e-06, 0.9999967962802195",
            "0, 0.051, 0.950278670532427, 0.04972132946757306",
            "10, 0.5, 0.9999999999922592, 7.740840739228265e-12",
            "10, 60.0, 1.744235654642229e-15, 0.9999999999999982",
    })
    void poissonTailsMatchSciPy(int c, double mean, double atMost, double moreThan) {
        OcModel model = new OcModel.Poisson();
        int n = 100;
        assertRelative(atMost, model.atMost(n, c, mean / n));
        assertRelative(moreThan, model.moreThan(n, c, mean / n));
    }

    @ParameterizedTest(name = "Hypergeometric N={0} D={1} n={2} c={3}")
    @CsvSource({
            // N, D, n, c, P(X <= c), P(X > c): exact rational arithmetic, sum of comb(D, x) comb(N - D, n - x)
            // over comb(N, n) with Python 3.11 fractions and math.comb, rounded once to double. (SciPy 1.10.1
            // hypergeom.sf is off by 1e-9 relative at N = 10^7, so it is not the reference here.)
            "500, 5, 100, 0, 0.32603460178734, 0.67396539821266",
            "500, 25, 100, 2, 0.09246748036688675, 0.9075325196331132",
            "10000000, 1000, 20000, 5, 0.9835500252267604, 0.01644997477323965",
            "10000000, 5000, 20000, 5, 0.06684954450175906, 0.9331504554982409",
            "2000, 20, 150, 1, 0.5505735041864586, 0.44942649581354144",
            "100, 29, 10, 8, 0.9999577653209009, 4.223467909916588e-05",
    })
    void hypergeometricTailsMatchExactRationalArithmetic(int lotSize, int defectives, int n, int c, double atMost, double moreThan) {
        OcModel model = new OcModel.Hypergeometric(lotSize);
        double p = (double) defectives / lotSize;
        assertRelative(atMost, model.atMost(n, c, p));
        assertRelative(moreThan, model.moreThan(n, c, p));
    }

    @Test
    void finiteLotDesignPointsRoundTowardsTheGuaranteedSide() {
        // Documented rule: D at the AQL rounds down, D at the LTPD rounds up; 29% of 100 is 29 units.
        OcModel.Hypergeometric lot = new OcModel.Hypergeometric(1000);
        assertEquals(0.012, lot.producerPoint(0.0125), 1e-15);
        assertEquals(0.013, lot.consumerPoint(0.0125), 1e-15);
        OcModel.Hypergeometric hundred = new OcModel.Hypergeometric(100);
        assertEquals(29, hundred.defectives(hundred.producerPoint(0.29)));
        assertEquals(29, hundred.defectives(hundred.consumerPoint(0.29)));
    }
}
