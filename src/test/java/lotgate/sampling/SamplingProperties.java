package lotgate.sampling;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.IntRange;
import net.jqwik.api.constraints.Scale;

/** Properties that hold for every plan and request, over many random cases. */
class SamplingProperties {

    record Case(String model, int lotSize, RiskPoints points) {
        OcModel oc() {
            return OcModel.of(model, lotSize);
        }
    }

    @Provide
    Arbitrary<Case> requests() {
        Arbitrary<String> models = Arbitraries.of("binomial", "poisson", "hypergeometric");
        Arbitrary<Double> aql = Arbitraries.doubles().between(0.002, 0.05).ofScale(5);
        Arbitrary<Double> ratio = Arbitraries.doubles().between(2.5, 12).ofScale(3);
        Arbitrary<Double> alpha = Arbitraries.doubles().between(0.01, 0.2).ofScale(4);
        Arbitrary<Double> beta = Arbitraries.doubles().between(0.01, 0.2).ofScale(4);
        Arbitrary<Integer> lot = Arbitraries.integers().between(50, 20_000);
        return Combinators.combine(models, aql, ratio, alpha, beta, lot).as((m, a, r, al, be, n) ->
                new Case(m, m.equals("hypergeometric") ? n : 0, new RiskPoints(a, al, Math.min(0.9, a * r), be)));
    }

    @Property(tries = 150)
    void designedPlanMeetsBothRisksAndNoSmallerSampleDoes(@ForAll("requests") Case request) {
        OcModel model = request.oc();
        SingleDesign design = new SinglePlanDesigner(model, request.lotSize()).design(request.points());
        int limit = request.lotSize() > 0 ? request.lotSize() : 5000;
        int oracle = BruteForce.smallestSample(model, request.points(), limit);
        if (design instanceof SingleDesign.Found found) {
            assertTrue(found.risks().meets(request.points()), "designed plan must meet both risks");
            if (found.plan().n() <= limit) {
                assertEquals(oracle, found.plan().n(), "smallest sample size");
            }
            // The chosen c is the smallest that works at that n.
            SinglePlan plan = found.plan();
            if (plan.c() > 0) {
                assertTrue(!PlanRisks.of(new SinglePlan(plan.n(), plan.c() - 1), model, request.points())
                        .meets(request.points()));
            }
        } else {
            assertEquals(-1, oracle, "the oracle found a plan the design missed");
        }
    }

    @Property(tries = 300)
    void ocCurveFallsAsQualityWorsens(@ForAll @IntRange(min = 1, max = 2000) int n,
            @ForAll @IntRange(min = 0, max = 40) int c,
            @ForAll @DoubleRange(min = 0.0, max = 0.5) @Scale(6) double p,
            @ForAll @DoubleRange(min = 0.0001, max = 0.05) @Scale(6) double step,
            @ForAll("models") String modelName) {
        if (c >= n) {
            return;
        }
        OcModel model = OcModel.of(modelName, Math.max(n, 3000));
        double worse = Math.min(1.0, p + step);
        if (model instanceof OcModel.Hypergeometric h && h.defectives(worse) == h.defectives(p)) {
            worse = Math.min(1.0, p + 1.0 / h.lotSize());
        }
        double here = model.atMost(n, c, p);
        double there = model.atMost(n, c, worse);
        assertTrue(there <= here + 1e-15, "P(accept) rose from " + here + " to " + there);
        assertEquals(1.0, model.atMost(n, c, p) + model.moreThan(n, c, p), 1e-12, "tails must add to one");
    }

    @Provide
    Arbitrary<String> models() {
        return Arbitraries.of("binomial", "poisson", "hypergeometric");
    }

    @Property(tries = 100)
    void hypergeometricApproachesBinomialAsTheLotGrows(@ForAll @IntRange(min = 5, max = 300) int n,
            @ForAll @IntRange(min = 0, max = 10) int c,
            @ForAll @DoubleRange(min = 0.001, max = 0.2) @Scale(6) double p) {
        if (c >= n) {
            return;
        }
        double binomial = new OcModel.Binomial().atMost(n, c, p);
        double previous = Double.POSITIVE_INFINITY;
        for (int lot : new int[] {100_000, 1_000_000, 10_000_000}) {
            OcModel.Hypergeometric finite = new OcModel.Hypergeometric(lot);
            double exactP = (double) finite.defectives(p) / lot;
            double gap = Math.abs(finite.atMost(n, c, exactP) - new OcModel.Binomial().atMost(n, c, exactP));
            // The gap is of order n / N (common practice: the finite population correction).
            assertTrue(gap <= 2.0 * n / lot, "gap " + gap + " at N = " + lot);
            assertTrue(gap <= previous + 1e-12, "gap must not grow with the lot");
            previous = gap;
        }
        assertTrue(Math.abs(binomial - new OcModel.Hypergeometric(10_000_000).atMost(n, c, p)) < 0.01);
    }

    @Property(tries = 300)
    void defaultCurveRangeIsValidForEveryPlanAndEndsSoonAfterOnePercentAcceptance(
            @ForAll @IntRange(min = 1, max = 2000) int n, @ForAll @IntRange(min = 0, max = 40) int c,
            @ForAll("models") String modelName) {
        if (c >= n) {
            return;
        }
        int lotSize = Math.max(n, 3000);
        OcModel model = OcModel.of(modelName, lotSize);
        OperatingCharacteristic oc = new OperatingCharacteristic(new SinglePlan(n, c), model,
                model instanceof OcModel.Hypergeometric ? lotSize : 0);
        double range = oc.suggestedRange(0);
        double onePercent = oc.qualityAt(0.01);
        assertTrue(range > 0 && range <= model.maxQuality(), "range " + range + " outside the model's levels");
        if (range < model.maxQuality()) {
            // For a finite lot the 1% level is the largest D/N still accepted that often: one unit more falls below.
            double beyond = model instanceof OcModel.Hypergeometric h ? range + 1.0 / h.lotSize() : range;
            assertTrue(oc.acceptance(Math.min(beyond, model.maxQuality())) <= 0.01 + 1e-12, "the range must reach P(accept) = 1%");
            // Round steps 1, 1.2, 1.5, 2, 2.5, 3, 4, 5, 6, 8, 10: no step is more than 4/3 of the one before.
            assertTrue(range <= onePercent * 4.0 / 3.0 * (1 + 1e-9), "range " + range + " runs far past " + onePercent);
        }
    }
}
