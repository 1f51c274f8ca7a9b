package lotgate.sampling;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** Exact confidence bounds against an independent computation. */
class ConfidenceBoundsTest {

    @ParameterizedTest(name = "{0} of {1} at {2}")
    @CsvSource({
            // x, n, confidence, lower, upper: SciPy 1.10.1 beta.ppf(a, x, n - x + 1) and beta.ppf(1 - a, x + 1, n - x)
            // with a = (1 - confidence) / 2, the Clopper-Pearson bounds as quantiles of the beta distribution.
            "0, 125, 0.95, 0.0, 0.02907983713643152",
            "3, 125, 0.95, 0.004976989749053449, 0.06853631611067006",
            "3, 132, 0.95, 0.004711659031655993, 0.06498149536917237",
            "10, 50, 0.90, 0.11272161341407588, 0.31559606142001384",
            "132, 132, 0.95, 0.9724408222765425, 1.0",
            "1, 2000, 0.99, 2.506267771077825e-06, 0.0037090983904222346",
    })
    void clopperPearsonMatchesBetaQuantiles(int found, int n, double confidence, double lower, double upper) {
        ConfidenceBounds.Interval interval = ConfidenceBounds.clopperPearson(found, n, confidence);
        assertEquals(lower, interval.lower(), lower * 1e-9);
        assertEquals(upper, interval.upper(), upper * 1e-9);
    }

    @Test
    void zeroFoundInNGivesTheRuleOfThreeRoughly() {
        // Common practice: with none found in n, the 95% upper bound is about 3/n (exactly 1 - 0.025^(1/n) two-sided).
        double upper = ConfidenceBounds.clopperPearson(0, 300, 0.95).upper();
        assertEquals(1 - Math.pow(0.025, 1.0 / 300), upper, 1e-14);
    }

    @ParameterizedTest(name = "{0} in {1} units at {2}")
    @CsvSource({
            // x, n, confidence, lower, upper: SciPy 1.10.1 chi2.ppf(a, 2x) / 2n and chi2.ppf(1 - a, 2x + 2) / 2n
            // (Garwood's interval for a Poisson count, per unit).
            "0, 84, 0.95, 0.0, 0.04391523159659447",
            "5, 84, 0.95, 0.019327218929981203, 0.1389087152300318",
            "12, 200, 0.90, 0.03462106256792556, 0.09721284664957514",
    })
    void garwoodMatchesChiSquareQuantiles(int found, int n, double confidence, double lower, double upper) {
        ConfidenceBounds.Interval interval = ConfidenceBounds.garwood(found, n, confidence);
        assertEquals(lower, interval.lower(), lower * 1e-9);
        assertEquals(upper, interval.upper(), upper * 1e-9);
    }

    @ParameterizedTest(name = "{0} of {1} from a lot of {2}")
    @CsvSource({
            // x, n, N, confidence, D upper: the largest D with P(X <= x | N, D, n) > 1 - confidence, by exact rational
            // arithmetic over every D (Python 3.11 fractions and math.comb).
            "0, 82, 400, 0.95, 12", "2, 82, 400, 0.95, 27", "1, 50, 200, 0.90, 13", "3, 132, 5000, 0.95, 286",
    })
    void lotUpperBoundMatchesExactArithmetic(int found, int n, int lotSize, double confidence, int bound) {
        assertEquals(bound, ConfidenceBounds.lotUpperBound(found, n, lotSize, confidence));
    }

    @Test
    void pValueIsTheUpperTailFromTheCountUp() {
        // P(X >= 4 | n = 132, p = 1%) = binom.sf(3, 132, 0.01) = 0.04425250582596621 (SciPy 1.10.1).
        assertEquals(0.04425250582596621, ConfidenceBounds.pValue(new OcModel.Binomial(), 132, 4, 0.01), 1e-14);
        assertEquals(1.0, ConfidenceBounds.pValue(new OcModel.Binomial(), 132, 0, 0.01));
    }
}
