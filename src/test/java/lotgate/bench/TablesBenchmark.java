package lotgate.bench;

import java.util.concurrent.TimeUnit;
import lotgate.jobs.PlanFromTables;
import lotgate.sampling.LeastInspectionDesigner;
import lotgate.sampling.LeastInspectionDoubleSearch;
import lotgate.sampling.OcModel;
import lotgate.sampling.RiskPoints;
import lotgate.sampling.SingleDesign;
import lotgate.sampling.SinglePlanDesigner;
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
 * A table look-up with its risks (level II, AQL 0.65%, lot of 2,000, single and double) and the least-inspection
 * plan for a lot of 1,000,000 (hypergeometric, LTPD 1% and AOQL 1% at a process average of 0.25%; for LTPD 1% the
 * double plan too, and for LTPD 5% at 0.5% in a lot of 5,000, the README's example), against the
 * single-plan design of DesignBenchmark's first case (binomial, AQL 1%, LTPD 5%) in the same run.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Fork(value = 1, jvmArgs = {"-Xmx1g"})
@Warmup(iterations = 3)
@Measurement(iterations = 5)
public class TablesBenchmark {
    static final int LOT = 1_000_000;

    private static PlanFromTables.Request lookup(String scheme) {
        return new PlanFromTables.Request(2000, "II", 0.65, "normal", scheme, null, null, null);
    }

    @Benchmark
    public PlanFromTables.Result tableLookupSingle() {
        return PlanFromTables.run(lookup("single"));
    }

    @Benchmark
    public PlanFromTables.Result tableLookupDouble() {
        return PlanFromTables.run(lookup("double"));
    }

    @Benchmark
    public LeastInspectionDesigner.Result leastInspectionLtpd() {
        return new LeastInspectionDesigner(new OcModel.Hypergeometric(LOT), LOT).forLtpd(0.01, 0.10, 0.0025);
    }

    @Benchmark
    public LeastInspectionDoubleSearch.Result leastInspectionDoubleLtpd() {
        return new LeastInspectionDoubleSearch(new OcModel.Hypergeometric(LOT), LOT).forLtpd(0.01, 0.10, 0.0025);
    }

    @Benchmark
    public LeastInspectionDoubleSearch.Result leastInspectionDoubleLot5000() {
        return new LeastInspectionDoubleSearch(new OcModel.Hypergeometric(5000), 5000).forLtpd(0.05, 0.10, 0.005);
    }

    @Benchmark
    public LeastInspectionDesigner.Result leastInspectionAoql() {
        return new LeastInspectionDesigner(new OcModel.Hypergeometric(LOT), LOT).forAoql(0.01, 0.0025);
    }

    @Benchmark
    public SingleDesign design() {
        return new SinglePlanDesigner(new OcModel.Binomial(), 0).design(new RiskPoints(0.01, 0.05, 0.05, 0.10));
    }
}
