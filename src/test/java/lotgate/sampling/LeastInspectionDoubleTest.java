package lotgate.sampling;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** The double least-inspection plan against exact rationals, and the search's limits. */
class LeastInspectionDoubleTest {

    @Test
    void lotOf5000AtLtpd5PercentMatchesExactRationals() {
        var result = new LeastInspectionDoubleSearch(new OcModel.Hypergeometric(5000), 5000).forLtpd(0.05, 0.10, 0.005);
        assertEquals(DoublePlan.of(51, 0, 134, 4), result.plan());
        // Exact rationals, Python 3.11.2 (src/test/python/double_least_inspection_reference.py): ATI
        // 88.822472388459289; SciPy 1.10.1 hypergeom gives 88.822472388459786.
        assertEquals(88.822472388459289, result.ati(), 1e-9);
        // The same script: P(accept | 5%) 0.099382429780347503, and with n2 = 133 it is 0.10038481626082806.
        var model = new OcModel.Hypergeometric(5000);
        assertEquals(0.099382429780347503, result.plan().acceptance(model, 0.05), 1e-12);
        assertEquals(0.10038481626082806, DoublePlan.of(51, 0, 133, 4).acceptance(model, 0.05), 1e-12);
    }

    @Test
    void aLotOfAMillionIsSearchedExactlyAndInspectsLessThanTheSinglePlan() {
        int lot = 1_000_000;
        var model = new OcModel.Hypergeometric(lot);
        var result = new LeastInspectionDoubleSearch(model, lot).forLtpd(0.01, 0.10, 0.0025);
        var single = new LeastInspectionDesigner(model, lot).forLtpd(0.01, 0.10, 0.0025);
        assertTrue(result.plan().acceptance(model, 0.01) <= 0.10);
        assertTrue(result.ati() < single.ati(), result.ati() + " against " + single.ati());
        // The search's own ATI formula and the plan's lattice walk agree.
        assertEquals(result.plan().averageTotalInspection(model, 0.0025, lot), result.ati(), 1e-9 * lot);
    }

    @Test
    void theSearchStopsAtItsBudgetAndSaysSo() {
        var search = new LeastInspectionDoubleSearch(new OcModel.Hypergeometric(5000), 5000, 100);
        var stop = assertThrows(LeastInspectionDoubleSearch.OverBudget.class, () -> search.forLtpd(0.05, 0.10, 0.005));
        // Each plan costs (c2 - c1) (c2 + 1) units of work, so a budget of 100 stops within 50 plans.
        assertTrue(stop.getMessage().matches("the search stopped after evaluating ([1-4]?[0-9]|50) plans without"
                + " proving one the least \\(a process average this close to the LTPD in a lot this large needs high"
                + " acceptance numbers\\)"), stop.getMessage());
    }

    @Test
    void whenNoDoublePlanBeatsScreeningItSaysSo() {
        // A lot of 20 at LTPD 10% (binomial): even c = 0 alone needs 22 units, and a double plan accepts at least
        // as often as a single plan of n1 + n2 units with acceptance number c2 (common practice: 0.9^22 < 0.1).
        var result = new LeastInspectionDoubleSearch(new OcModel.Binomial(), 20).forLtpd(0.10, 0.10, 0.001);
        assertTrue(result.inspectEveryUnit());
        assertEquals(20, result.ati(), 0);
    }
}
