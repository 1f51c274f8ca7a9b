package lotgate.bench;

import java.util.concurrent.TimeUnit;
import lotgate.sampling.BruteForce;
import lotgate.sampling.OcModel;
import lotgate.sampling.RiskPoints;
import lotgate.sampling.SingleDesign;
import lotgate.sampling.SinglePlanDesigner;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Warmup;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;

/** Single-plan design by the bisection search against a naive scan of every n and, at each n, every c. */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Fork(value = 1, jvmArgs = {"-Xmx1g"})
@Warmup(iterations = 3)
@Measurement(iterations = 5)
public class DesignBenchmark {

    /** model:aql:ltpd:lotSize */
    @Param({"binomial:0.01:0.05:0", "binomial:0.0001:0.0005:0", "hypergeometric:0.0001:0.0005:10000000"})
    public String request;

    private OcModel model;
    private int lotSize;
    private RiskPoints points;

    @Setup
    public void setUp() {
        String[] parts = request.split(":");
        lotSize = Integer.parseInt(parts[3]);
        model = OcModel.of(parts[0], lotSize);
        points = new RiskPoints(Double.parseDouble(parts[1]), 0.05, Double.parseDouble(parts[2]), 0.10);
    }

    @Benchmark
    public SingleDesign bisection() {
        return new SinglePlanDesigner(model, lotSize).design(points);
    }

    @Benchmark
    public int naiveScan() {
        int limit = model.lotSize() > 0 ? model.lotSize() : SinglePlanDesigner.MAX_SAMPLE_SIZE;
        return BruteForce.smallestSample(model, points, limit);
    }

}
