package lotgate.tables;

import static org.junit.jupiter.api.Assertions.assertEquals;

import lotgate.sampling.DoublePlan;
import lotgate.sampling.OcModel;
import lotgate.sampling.SinglePlan;
import org.junit.jupiter.api.Test;

/** The risks the tables do not print, against SciPy 1.10.1 (src/test/python/tables_reference.py). */
class TableRisksTest {

    @Test
    void levelIiAql0_65LotOf2000() {
        // K: n = 125, Ac 2, Re 3 at AQL 0.65%, binomial, AOQL with (N - n)/N for N = 2,000 (SciPy 1.10.1).
        TableRisks risks = TableRisks.of(new SinglePlan(125, 2), new OcModel.Binomial(), 0.0065, 2000);
        assertEquals(0.048668543676648267, risks.producerRisk(), 1e-13);
        assertEquals(0.042015908363532452, risks.ltpd10(), 1e-10);
        assertEquals(0.049507837291373737, risks.ltpd5(), 1e-10);
        assertEquals(0.021334903795140948, risks.indifference(), 1e-10);
        assertEquals(0.010272494803923648, risks.aoql(), 1e-10);
        assertEquals(125, risks.asnAtAql(), 0);
    }

    @Test
    void theIssuesExampleLevelIiAql1_5LotOf200() {
        // G: n = 32, Ac 1 at AQL 1.5%: 11.6% nonconforming passes one time in ten, and a lot at the AQL is
        // rejected about one time in twelve (SciPy 1.10.1: 0.11619507645219035 and 0.083018085736344505).
        TableRisks risks = TableRisks.of(new SinglePlan(32, 1), new OcModel.Binomial(), 0.015, 200);
        assertEquals(0.083018085736344505, risks.producerRisk(), 1e-13);
        assertEquals(0.11619507645219035, risks.ltpd10(), 1e-10);
        assertEquals(0.13984946027422607, risks.ltpd5(), 1e-10);
        assertEquals(0.051896235669052243, risks.indifference(), 1e-10);
        assertEquals(0.021842610266224805, risks.aoql(), 1e-10);
    }

    @Test
    void aReducedPlanWithAGapAcceptsBelowItsRejectionNumber() {
        // Reduced K: n = 50, Ac 1, Re 3 at 0.65%: P(reject) = P(X >= 3); P(X = 2) reinstates normal (SciPy 1.10.1).
        TableRisks risks = TableRisks.of(new SinglePlan(50, 1, 3), new OcModel.Binomial(), 0.0065, 2000);
        assertEquals(0.0042855683342902543, risks.producerRisk(), 1e-13);
        assertEquals(0.037846056325686273, risks.reinstateAtAql(), 1e-13);
        assertEquals(0.10295920853671924, risks.ltpd10(), 1e-10);
        assertEquals(0.026669639749996064, risks.aoql(), 1e-10);
    }

    @Test
    void aDoublePlansAsnAtTheAql() {
        // Double K: 80 + 80, 0/3 then 3/4 at 0.65%: ASN = 80 + 80 P(0 < d1 < 3) (SciPy 1.10.1).
        TableRisks risks = TableRisks.of(new DoublePlan(80, 0, 3, 80, 3), new OcModel.Binomial(), 0.0065, 2000);
        assertEquals(111.27405291321543, risks.asnAtAql(), 1e-9);
        assertEquals(1 - 0.97190945542583684, risks.producerRisk(), 1e-12);
    }
}
