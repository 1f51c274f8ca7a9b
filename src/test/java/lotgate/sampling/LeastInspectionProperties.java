package lotgate.sampling;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.IntRange;

/** The least-inspection plans are the least ATI of all protecting plans: a brute-force oracle over every (n, c). */
class LeastInspectionProperties {

    private static OcModel model(int kind, int lotSize) {
        return switch (kind) {
            case 0 -> new OcModel.Binomial();
            case 1 -> new OcModel.Poisson();
            default -> new OcModel.Hypergeometric(lotSize);
        };
    }

    @Property(tries = 60)
    void ltpdPlanHasTheLeastAtiOfAllProtectingPlans(@ForAll @IntRange(min = 2, max = 250) int lotSize,
            @ForAll @IntRange(min = 0, max = 2) int kind, @ForAll @DoubleRange(min = 0.01, max = 0.2) double ltpd,
            @ForAll @DoubleRange(min = 0.0, max = 1.0) double averageShare) {
        OcModel model = model(kind, lotSize);
        double average = averageShare * ltpd * 0.8;
        var result = new LeastInspectionDesigner(model, lotSize).forLtpd(ltpd, 0.10, average);
        double point = model.consumerPoint(ltpd);
        double best = lotSize;
        for (int n = 1; n <= lotSize; n++) {
            for (int c = 0; c < n; c++) {
                if (model.atMost(n, c, point) <= 0.10) {
                    best = Math.min(best, n + (lotSize - n) * model.moreThan(n, c, average));
                }
            }
        }
        assertEquals(best, result.ati(), 1e-9 * lotSize);
        if (!result.inspectEveryUnit()) {
            assertTrue(model.atMost(result.plan().n(), result.plan().c(), point) <= 0.10);
        }
    }

    @Property(tries = 25)
    void aoqlPlanHasTheLeastAtiOfAllProtectingPlans(@ForAll @IntRange(min = 2, max = 120) int lotSize,
            @ForAll @IntRange(min = 0, max = 2) int kind, @ForAll @DoubleRange(min = 0.01, max = 0.1) double target,
            @ForAll @DoubleRange(min = 0.0, max = 1.0) double averageShare) {
        OcModel model = model(kind, lotSize);
        double average = averageShare * target;
        var result = new LeastInspectionDesigner(model, lotSize).forAoql(target, average);
        double best = lotSize;
        for (int n = 1; n <= lotSize; n++) {
            for (int c = 0; c < n; c++) {
                if (exhaustiveAoql(model, new SinglePlan(n, c), lotSize) <= target) {
                    best = Math.min(best, n + (lotSize - n) * model.moreThan(n, c, average));
                }
            }
        }
        assertEquals(best, result.ati(), 1e-9 * lotSize);
    }

    /** The AOQL by brute force: every whole D for a finite lot, a fine grid refined locally otherwise. */
    private static double exhaustiveAoql(OcModel model, SinglePlan plan, int lotSize) {
        OperatingCharacteristic oc = new OperatingCharacteristic(plan, model, lotSize);
        if (model instanceof OcModel.Hypergeometric) {
            double best = 0;
            for (int d = 0; d <= lotSize; d++) {
                best = Math.max(best, oc.aoq((double) d / lotSize));
            }
            return best;
        }
        return oc.aoql().limit();
    }
}
