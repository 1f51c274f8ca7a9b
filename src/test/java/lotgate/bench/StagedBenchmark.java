package lotgate.bench;

import java.util.concurrent.TimeUnit;
import lotgate.sampling.DoubleDesign;
import lotgate.sampling.DoublePlan;
import lotgate.sampling.DoublePlanDesigner;
import lotgate.sampling.OcModel;
import lotgate.sampling.PlanRisks;
import lotgate.sampling.RiskPoints;
import lotgate.sampling.SequentialPlan;
import lotgate.sampling.WaldSequential;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/**
 * The exact lattice of a truncated sequential plan against a naive walk over the whole (units, count)
 * lattice, and the double-plan design search against an exhaustive scan of a box that holds its answer.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Fork(value = 1, jvmArgs = {"-Xmx1g"})
@Warmup(iterations = 3)
@Measurement(iterations = 5)
public class StagedBenchmark {
    /** The truncation point of the sequential case. */
    public static final int TRUNCATION = 10_000;
    static final OcModel BINOMIAL = new OcModel.Binomial();
    static final SequentialPlan SEQUENTIAL = SequentialPlan.wald(new WaldSequential(0.001, 0.05, 0.005, 0.10, false),
            TRUNCATION);
    static final RiskPoints POINTS = new RiskPoints(0.001, 0.05, 0.01, 0.10);

    @Benchmark
    public double sequentialLattice() {
        return SEQUENTIAL.acceptance(BINOMIAL, 0.002);
    }

    /** Every (units, count) state with count up to units, none skipped, decisions read off the plan. */
    @Benchmark
    public double sequentialFullLattice() {
        double p = 0.002;
        double[] going = new double[TRUNCATION + 2];
        double[] next = new double[TRUNCATION + 2];
        going[0] = 1;
        double accept = 0;
        for (int m = 1; m <= TRUNCATION; m++) {
            java.util.Arrays.fill(next, 0, m + 1, 0.0);
            for (int d = 0; d < m; d++) {
                next[d] += going[d] * (1 - p);
                next[d + 1] += going[d] * p;
            }
            for (int d = 0; d <= m; d++) {
                SequentialPlan.Step step = SEQUENTIAL.step(m, d);
                if (step == SequentialPlan.Step.ACCEPT) {
                    accept += next[d];
                }
                if (step != SequentialPlan.Step.CONTINUE) {
                    next[d] = 0;
                }
            }
            double[] swap = going;
            going = next;
            next = swap;
        }
        return accept;
    }

    @Benchmark
    public DoubleDesign doubleDesign() {
        return new DoublePlanDesigner(BINOMIAL, 0).design(POINTS, new DoublePlanDesigner.Space(1.0, null),
                POINTS.aql());
    }

    @Benchmark
    public DoubleDesign doubleDesignFree() {
        return new DoublePlanDesigner(BINOMIAL, 0).design(POINTS, new DoublePlanDesigner.Space(null, null),
                POINTS.aql());
    }

    /** Every plan with n2 = n1, n1 up to 800 and c1 < c2 <= 5: a box that holds the designed plan (291, 0, 291, 2). */
    @Benchmark
    public DoublePlan doubleExhaustive() {
        DoublePlan best = null;
        double bestAsn = Double.POSITIVE_INFINITY;
        for (int n1 = 1; n1 <= 800; n1++) {
            for (int c1 = 0; c1 < 5; c1++) {
                for (int c2 = c1 + 1; c2 <= 5; c2++) {
                    DoublePlan plan = DoublePlan.of(n1, c1, n1, c2);
                    if (PlanRisks.of(plan, BINOMIAL, POINTS).meets(POINTS)) {
                        double asn = plan.averageSampleNumber(BINOMIAL, POINTS.aql());
                        if (asn < bestAsn) {
                            bestAsn = asn;
                            best = plan;
                        }
                    }
                }
            }
        }
        return best;
    }
}
