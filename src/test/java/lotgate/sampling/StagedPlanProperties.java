package lotgate.sampling;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.IntRange;
import net.jqwik.api.constraints.Scale;

/** Properties of double, multiple and sequential plans over many random cases, with brute-force oracles. */
class StagedPlanProperties {

    @Provide
    Arbitrary<String> models() {
        return Arbitraries.of("binomial", "poisson", "hypergeometric");
    }

    @Provide
    Arbitrary<DoublePlan> doublePlans() {
        Arbitrary<Integer> n1 = Arbitraries.integers().between(1, 120);
        Arbitrary<Integer> n2 = Arbitraries.integers().between(1, 240);
        Arbitrary<Integer> c1 = Arbitraries.integers().between(0, 4);
        Arbitrary<Integer> gap = Arbitraries.integers().between(1, 5);
        Arbitrary<Integer> cut = Arbitraries.integers().between(0, 3);
        return Combinators.combine(n1, n2, c1, gap, cut).as((a, b, c, g, k) -> {
            int c2 = c + g;
            int r1 = Math.max(c + 2, c2 + 1 - k);
            return new DoublePlan(a, c, r1, b, c2);
        });
    }

    /** A worse quality level, by at least one nonconforming unit in a finite lot. */
    private static double worse(OcModel model, double p, double step) {
        if (model instanceof OcModel.Hypergeometric h && h.defectives(p + step) == h.defectives(p)) {
            return p + 1.0 / h.lotSize();
        }
        return p + step;
    }

    @Property(tries = 200)
    void doublePlanOcFallsAsQualityWorsensAndItsTailsAddToOne(@ForAll("doublePlans") DoublePlan plan,
            @ForAll @DoubleRange(min = 0.0, max = 0.3) @Scale(5) double p,
            @ForAll @DoubleRange(min = 0.001, max = 0.05) @Scale(5) double step, @ForAll("models") String name) {
        OcModel model = OcModel.of(name, 5000);
        double worse = worse(model, p, step);
        double here = plan.acceptance(model, p);
        assertTrue(plan.acceptance(model, worse) <= here + 1e-14, "P(accept) rose as quality worsened");
        assertEquals(1.0, here + plan.rejection(model, p), 1e-12, "accept and reject must add to one");
    }

    @Property(tries = 200)
    void doublePlanIsTheTwoStageMultiplePlan(@ForAll("doublePlans") DoublePlan plan,
            @ForAll @DoubleRange(min = 0.0, max = 0.3) @Scale(5) double p, @ForAll("models") String name) {
        OcModel model = OcModel.of(name, 5000);
        MultiplePlan same = new MultiplePlan(plan.stages());
        assertEquals(plan.acceptance(model, p), same.acceptance(model, p), 1e-13);
        assertEquals(plan.rejection(model, p), same.rejection(model, p), 1e-13);
        assertEquals(plan.averageSampleNumber(model, p), same.averageSampleNumber(model, p),
                1e-11 * plan.maxSampleSize());
    }

    @Property(tries = 60)
    void asnMatchesABruteForceEnumerationOfBothSamples(@ForAll @IntRange(min = 1, max = 25) int n1,
            @ForAll @IntRange(min = 1, max = 25) int n2, @ForAll @IntRange(min = 0, max = 3) int c1,
            @ForAll @IntRange(min = 1, max = 4) int gap, @ForAll @DoubleRange(min = 0.0, max = 0.4) @Scale(4) double p) {
        DoublePlan plan = DoublePlan.of(n1, c1, n2, c1 + gap);
        // Every sequence of n1 + n2 unit results, weighted by its probability: units inspected, accepted or not.
        double asn = 0;
        double accept = 0;
        double curtailed = 0;
        int units = n1 + n2;
        if (units > 22) {
            return;
        }
        for (int mask = 0; mask < 1 << units; mask++) {
            int bad = Integer.bitCount(mask);
            double weight = Math.pow(p, bad) * Math.pow(1 - p, units - bad);
            int d1 = Integer.bitCount(mask & ((1 << n1) - 1));
            if (d1 <= plan.c1() || d1 >= plan.r1()) {
                asn += weight * n1;
                curtailed += weight * n1;
                accept += d1 <= plan.c1() ? weight : 0;
                continue;
            }
            asn += weight * units;
            accept += bad <= plan.c2() ? weight : 0;
            int count = d1;
            int inspected = n1;
            for (int unit = n1; unit < units && count <= plan.c2(); unit++) {
                inspected++;
                count += (mask >> unit) & 1;
            }
            curtailed += weight * inspected;
        }
        OcModel binomial = new OcModel.Binomial();
        // The enumeration adds up to 2^22 terms: its own rounding is about 1e-12 on a probability, and grows
        // with the sample sizes it weighs, so the ASN is compared relatively.
        assertEquals(accept, plan.acceptance(binomial, p), 1e-10);
        assertEquals(asn, plan.averageSampleNumber(binomial, p), 1e-9 * Math.max(1, asn));
        assertEquals(curtailed, plan.curtailedAverageSampleNumber(binomial, p), 1e-9 * Math.max(1, curtailed));
    }

    @Property(tries = 100)
    void curtailedClosedFormAgreesWithTheSum(@ForAll("doublePlans") DoublePlan plan,
            @ForAll @DoubleRange(min = 0.0005, max = 0.3) @Scale(5) double p) {
        OcModel binomial = new OcModel.Binomial();
        for (int d1 = plan.c1() + 1; d1 < plan.r1(); d1++) {
            int k = plan.c2() + 1 - d1;
            double closed = plan.secondSampleUnits(binomial, p, d1, k);
            assertEquals(plan.secondSampleUnitsBySum(binomial, p, d1, k), closed, 1e-9 * plan.n2());
            assertTrue(closed <= plan.n2() + 1e-9);
        }
    }

    @Provide
    Arbitrary<SequentialPlan> sequentialPlans() {
        Arbitrary<Double> p1 = Arbitraries.doubles().between(0.005, 0.05).ofScale(4);
        Arbitrary<Double> ratio = Arbitraries.doubles().between(2, 8).ofScale(3);
        Arbitrary<Double> alpha = Arbitraries.doubles().between(0.01, 0.15).ofScale(3);
        Arbitrary<Double> beta = Arbitraries.doubles().between(0.01, 0.15).ofScale(3);
        Arbitrary<Integer> truncation = Arbitraries.integers().between(20, 600);
        return Combinators.combine(p1, ratio, alpha, beta, truncation).as((a, r, al, be, t) ->
                SequentialPlan.wald(new WaldSequential(a, al, Math.min(0.5, a * r), be, false), t));
    }

    @Property(tries = 150)
    void sequentialOcFallsAsQualityWorsensAndItsTailsAddToOne(@ForAll("sequentialPlans") SequentialPlan plan,
            @ForAll @DoubleRange(min = 0.0, max = 0.3) @Scale(5) double p,
            @ForAll @DoubleRange(min = 0.001, max = 0.05) @Scale(5) double step, @ForAll("models") String name) {
        OcModel model = OcModel.of(name, 5000);
        double worse = worse(model, p, step);
        double here = plan.acceptance(model, p);
        assertTrue(plan.acceptance(model, worse) <= here + 1e-13, "P(accept) rose as quality worsened");
        assertEquals(1.0, here + plan.rejection(model, p), 1e-12, "accept and reject must add to one");
        double asn = plan.averageSampleNumber(model, p);
        assertTrue(asn >= 1 && asn <= plan.truncation() + 1e-9, "ASN " + asn + " outside 1.." + plan.truncation());
    }

    @Property(tries = 80)
    void sequentialLatticeMatchesAWalkOverTheWholeLattice(@ForAll("sequentialPlans") SequentialPlan plan,
            @ForAll @DoubleRange(min = 0.0, max = 0.2) @Scale(5) double p) {
        // The naive computation: every (units, count) state, none skipped, decisions read off step().
        int t = plan.truncation();
        double[] going = new double[t + 2];
        going[0] = 1;
        double accept = 0;
        double asn = 0;
        for (int m = 1; m <= t; m++) {
            double[] next = new double[t + 2];
            for (int d = 0; d < m; d++) {
                asn += going[d];
                next[d] += going[d] * (1 - p);
                next[d + 1] += going[d] * p;
            }
            for (int d = 0; d <= m; d++) {
                SequentialPlan.Step step = plan.step(m, d);
                if (step == SequentialPlan.Step.ACCEPT) {
                    accept += next[d];
                }
                if (step != SequentialPlan.Step.CONTINUE) {
                    next[d] = 0;
                }
            }
            going = next;
        }
        OcModel binomial = new OcModel.Binomial();
        assertEquals(accept, plan.acceptance(binomial, p), 1e-12);
        assertEquals(asn, plan.averageSampleNumber(binomial, p), 1e-9 * t);
    }

    record DesignCase(RiskPoints points, Double ratio) {
    }

    @Provide
    Arbitrary<DesignCase> smallDesigns() {
        Arbitrary<Double> aql = Arbitraries.doubles().between(0.02, 0.08).ofScale(3);
        Arbitrary<Double> ratio = Arbitraries.doubles().between(3, 8).ofScale(2);
        Arbitrary<Double> alpha = Arbitraries.doubles().between(0.03, 0.15).ofScale(3);
        Arbitrary<Double> beta = Arbitraries.doubles().between(0.05, 0.15).ofScale(3);
        Arbitrary<Double> k = Arbitraries.of(1.0, 2.0, 0.5);
        return Combinators.combine(aql, ratio, alpha, beta, k).as((a, r, al, be, kk) ->
                new DesignCase(new RiskPoints(a, al, Math.min(0.6, a * r), be), kk));
    }

    @Property(tries = 25)
    void designedDoublePlanHasTheSmallestAsnOfAllThatMeetBothRisks(@ForAll("smallDesigns") DesignCase request) {
        OcModel model = new OcModel.Binomial();
        RiskPoints points = request.points();
        DoubleDesign design = new DoublePlanDesigner(model, 0).design(points,
                new DoublePlanDesigner.Space(request.ratio(), null), points.aql());
        // The oracle: every plan in a box around the answer, with n2 = k n1 as the designer rounds it.
        int firstMost = 120;
        double best = Double.POSITIVE_INFINITY;
        for (int n1 = 1; n1 <= firstMost; n1++) {
            int n2 = (int) Math.max(1, Math.round(request.ratio() * n1));
            for (int c1 = 0; c1 <= 8; c1++) {
                for (int c2 = c1 + 1; c2 <= 14; c2++) {
                    DoublePlan plan = DoublePlan.of(n1, c1, n2, c2);
                    if (PlanRisks.of(plan, model, points).meets(points)) {
                        best = Math.min(best, plan.averageSampleNumber(model, points.aql()));
                    }
                }
            }
        }
        DoubleDesign.Found found = (DoubleDesign.Found) design;
        assertTrue(found.risks().meets(points), "the designed plan must meet both risks");
        DoublePlan plan = found.plan();
        if (plan.n1() <= firstMost && plan.c2() <= 14) {
            assertEquals(best, found.asn(), 1e-9 * best, "designed " + plan + " but the oracle found a smaller ASN");
        } else {
            assertTrue(found.asn() <= best + 1e-9, "the oracle found a smaller ASN than " + plan);
        }
    }

    @Property(tries = 8)
    void designedFreeDoublePlanHasTheSmallestAsnOfAllThatMeetBothRisks(@ForAll("smallDesigns") DesignCase request) {
        OcModel model = new OcModel.Binomial();
        RiskPoints points = request.points();
        DoubleDesign.Found found = (DoubleDesign.Found) new DoublePlanDesigner(model, 0).design(points,
                new DoublePlanDesigner.Space(null, null), points.aql());
        int firstMost = 70;
        int secondMost = 140;
        double best = Double.POSITIVE_INFINITY;
        for (int c1 = 0; c1 <= 5; c1++) {
            for (int c2 = c1 + 1; c2 <= 9; c2++) {
                for (int n1 = 1; n1 <= firstMost; n1++) {
                    DoublePlan shortest = DoublePlan.of(n1, c1, 1, c2);
                    double second = shortest.secondSampleChance(model, points.aql());
                    for (int n2 = 1; n2 <= secondMost && n1 + n2 * second < best; n2++) {
                        DoublePlan plan = DoublePlan.of(n1, c1, n2, c2);
                        if (plan.acceptance(model, points.ltpd()) <= points.beta()) {
                            if (plan.rejection(model, points.aql()) <= points.alpha()) {
                                best = Math.min(best, plan.averageSampleNumber(model, points.aql()));
                            }
                            break; // a larger n2 only adds to the ASN
                        }
                    }
                }
            }
        }
        DoublePlan plan = found.plan();
        assertTrue(found.risks().meets(points));
        if (plan.n1() <= firstMost && plan.n2() <= secondMost && plan.c2() <= 9) {
            assertEquals(best, found.asn(), 1e-9 * best, "designed " + plan + " but the oracle found a smaller ASN");
        } else {
            assertTrue(found.asn() <= best + 1e-9);
        }
    }

    @org.junit.jupiter.api.Test
    void aSearchThatRunsOutOfItsBudgetSaysSoInsteadOfGuessing() {
        DoubleDesign design = new DoublePlanDesigner(new OcModel.Binomial(), 0, 100_000).design(
                new RiskPoints(0.01, 0.05, 0.015, 0.10), new DoublePlanDesigner.Space(1.0, null), 0.01);
        DoubleDesign.NotFound stopped = (DoubleDesign.NotFound) design;
        assertTrue(stopped.reason().startsWith("the search stopped after "), stopped.reason());
        assertTrue(stopped.reason().contains("without proving one the smallest"), stopped.reason());
        assertTrue(stopped.reason().contains("larger acceptance numbers were not tried"), stopped.reason());
    }

    @org.junit.jupiter.api.Test
    void aFixedFirstRejectionNumberBoundsTheSearchSoThatNoPlanIsProvedNotGuessed() {
        // A budget far below what the unbounded search spent: the bound on n1 ends the search long before.
        DoubleDesign design = new DoublePlanDesigner(new OcModel.Binomial(), 0, 2_000_000).design(
                new RiskPoints(0.01, 0.05, 0.05, 0.10), new DoublePlanDesigner.Space(1.0, 3), 0.01);
        DoubleDesign.NotFound none = (DoubleDesign.NotFound) design;
        assertTrue(none.reason().contains("a first sample larger than 82 alone rejects"), none.reason());
    }

    @Property(tries = 100)
    void multiplePlanOcFallsAndItsTailsAddToOne(@ForAll @IntRange(min = 2, max = 7) int count,
            @ForAll @IntRange(min = 1, max = 40) int size, @ForAll @DoubleRange(min = 0.0, max = 0.3) @Scale(5) double p,
            @ForAll("models") String name) {
        List<Stage> stages = new java.util.ArrayList<>();
        for (int i = 0; i < count; i++) {
            int c = i == 0 ? Stage.NO_ACCEPTANCE : i - 1;
            int r = i + 2;
            stages.add(i == count - 1 ? new Stage(size, r - 1, r) : new Stage(size, c, r));
        }
        MultiplePlan plan = new MultiplePlan(stages);
        OcModel model = OcModel.of(name, 5000);
        double here = plan.acceptance(model, p);
        assertEquals(1.0, here + plan.rejection(model, p), 1e-12);
        assertTrue(plan.acceptance(model, p + 0.01) <= here + 1e-14);
        double asn = plan.averageSampleNumber(model, p);
        assertTrue(asn >= size - 1e-9 && asn <= plan.maxSampleSize() + 1e-9);
    }
}
