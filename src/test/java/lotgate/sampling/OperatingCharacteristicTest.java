package lotgate.sampling;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** AOQ, AOQL, ATI and the quality levels at given probabilities of acceptance. */
class OperatingCharacteristicTest {

    @Test
    void zeroAcceptancePoissonAoqlIs0_3679OverN() {
        // Common practice: for c = 0 and a large lot, AOQ = p e^{-np} peaks at p = 1/n with AOQL = e^{-1}/n.
        int n = 50;
        OperatingCharacteristic.Aoql aoql =
                OperatingCharacteristic.of(new SinglePlan(n, 0), new OcModel.Poisson()).aoql();
        assertEquals(0.3679 / n, aoql.limit(), 0.00005 / n);
        assertEquals(1.0 / n, aoql.quality(), 1e-6);
    }

    @ParameterizedTest(name = "c = {0}")
    @CsvSource({
            // c, y = n * AOQL for a large lot under Poisson: Dodge and Romig's AOQL factors 0.3679, 0.8400,
            // 1.371, 1.942 (from memory); SciPy 1.10.1 minimize_scalar of x * poisson.cdf(c, x) gives
            // 0.3678794411714424, 0.8399620946571755, 1.3711016049003086, 1.9423809380501504.
            "0, 0.3678794411714424", "1, 0.8399620946571755", "2, 1.3711016049003086", "3, 1.9423809380501504",
    })
    void poissonAoqlMatchesTheKnownFactors(int c, double y) {
        int n = 200;
        OperatingCharacteristic oc = OperatingCharacteristic.of(new SinglePlan(n, c), new OcModel.Poisson());
        assertEquals(y / n, oc.aoql().limit(), 1e-12);
    }

    @Test
    void binomialAoqlForALotAndForAProcess() {
        // n = 132, c = 3: SciPy 1.10.1 minimize_scalar of p * binom.cdf(3, 132, p) [* (N - n) / N].
        OcModel binomial = new OcModel.Binomial();
        SinglePlan plan = new SinglePlan(132, 3);
        OperatingCharacteristic.Aoql process = new OperatingCharacteristic(plan, binomial, 0).aoql();
        assertEquals(0.014718743833191066, process.limit(), 1e-14);
        assertEquals(0.022196939664653012, process.quality(), 1e-8);
        assertEquals(0.014330168995994819, new OperatingCharacteristic(plan, binomial, 5000).aoql().limit(), 1e-14);
    }

    @Test
    void hypergeometricAoqlIsTheLargestOverWholeNumbersOfNonconformingUnits() {
        // N = 500, n = 123, c = 3: max over D of sum_{x <= 3} hypergeom.pmf(x, 500, D, 123) (D - x) / 500
        // is 0.013108810174484474 at D = 12 (SciPy 1.10.1, every D from 0 to 500).
        OperatingCharacteristic oc =
                OperatingCharacteristic.of(new SinglePlan(123, 3), new OcModel.Hypergeometric(500));
        OperatingCharacteristic.Aoql aoql = oc.aoql();
        assertEquals(0.013108810174484474, aoql.limit(), 1e-14);
        assertEquals(12.0 / 500, aoql.quality(), 1e-15);
    }

    @Test
    void qualityLevelsAtTheUsualProbabilitiesOfAcceptance() {
        // n = 132, c = 3: SciPy 1.10.1 brentq on binom.cdf(3, 132, p) - target.
        OperatingCharacteristic oc = OperatingCharacteristic.of(new SinglePlan(132, 3), new OcModel.Binomial());
        assertEquals(0.010415738620057834, oc.qualityAt(0.95), 1e-13);
        assertEquals(0.027747940629990635, oc.qualityAt(0.50), 1e-13);
        assertEquals(0.049909589226913305, oc.qualityAt(0.10), 1e-13);
    }

    @Test
    void averageTotalInspectionAddsTheRejectedLotsRemainder() {
        // ATI = n + (1 - Pa)(N - n); n = 132, c = 3, N = 5000, p = 5%: 4516.956614055289 (SciPy 1.10.1 binom.sf).
        OperatingCharacteristic oc = new OperatingCharacteristic(new SinglePlan(132, 3), new OcModel.Binomial(), 5000);
        assertEquals(4516.956614055289, oc.ati(0.05), 1e-9);
    }
}
