package lotgate.sampling;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import net.jqwik.api.Example;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.IntRange;

/**
 * The least-inspection double plan is the least ATI of every protecting double plan of its family (c1 < c2,
 * r1 = c2 + 1, n1 + n2 at most the lot): a brute-force oracle over every (n1, c1, n2, c2) of small lots, with the
 * ATI from the plan's own lattice walk rather than the search's formula.
 */
class LeastInspectionDoubleProperties {

    private static OcModel model(int kind, int lotSize) {
        return switch (kind) {
            case 0 -> new OcModel.Binomial();
            case 1 -> new OcModel.Poisson();
            default -> new OcModel.Hypergeometric(lotSize);
        };
    }

    /** The least ATI over the whole family by enumeration (the lot size when no plan protects). */
    static double bruteForce(OcModel model, int lotSize, double ltpd, double beta, double average) {
        double point = model.consumerPoint(ltpd);
        double best = lotSize;
        for (int c2 = 1; c2 < lotSize; c2++) {
            // A double plan accepts at least when the count over both samples is at most c2, and P(that) only falls
            // as the samples grow, so if even the whole lot accepts too often with c2, so does every plan.
            if (model.atMost(lotSize, c2, point) > beta) {
                break;
            }
            for (int c1 = 0; c1 < c2; c1++) {
                for (int n1 = 1; n1 < lotSize; n1++) {
                    for (int n2 = 1; n1 + n2 <= lotSize; n2++) {
                        DoublePlan plan = DoublePlan.of(n1, c1, n2, c2);
                        if (plan.acceptance(model, point) <= beta) {
                            best = Math.min(best, plan.averageTotalInspection(model, average, lotSize));
                        }
                    }
                }
            }
        }
        return best;
    }

    private static void check(OcModel model, int lotSize, double ltpd, double average) {
        var result = new LeastInspectionDoubleSearch(model, lotSize).forLtpd(ltpd, 0.10, average);
        double best = bruteForce(model, lotSize, ltpd, 0.10, average);
        assertEquals(best, result.ati(), 1e-9 * lotSize, "least ATI");
        if (!result.inspectEveryUnit()) {
            DoublePlan plan = result.plan();
            assertTrue(plan.acceptance(model, model.consumerPoint(ltpd)) <= 0.10, "protects at the LTPD");
            assertEquals(plan.c2() + 1, plan.r1());
            assertTrue(plan.n1() + plan.n2() <= lotSize);
        }
    }

    @Property(tries = 15)
    void foundPlanHasTheLeastAtiOfEveryProtectingDoublePlan(@ForAll @IntRange(min = 50, max = 120) int lotSize,
            @ForAll @IntRange(min = 0, max = 2) int kind, @ForAll @DoubleRange(min = 0.06, max = 0.15) double ltpd,
            @ForAll @DoubleRange(min = 0.05, max = 1.0) double averageShare) {
        check(model(kind, lotSize), lotSize, ltpd, averageShare * ltpd * 0.6);
    }

    @Example
    void hypergeometricLotOf150AtLtpd5Percent() {
        check(new OcModel.Hypergeometric(150), 150, 0.05, 0.01);
    }

    @Example
    void hypergeometricLotOf300AtLtpd2_5Percent() {
        check(new OcModel.Hypergeometric(300), 300, 0.025, 0.005);
    }

    @Example
    void poissonLotOf250AtLtpd3Percent() {
        check(new OcModel.Poisson(), 250, 0.03, 0.004);
    }
}
