package lotgate.bench;

import java.util.Collection;
import java.util.Map;
import java.util.TreeMap;
import org.openjdk.jmh.results.RunResult;
import org.openjdk.jmh.runner.Runner;
import org.openjdk.jmh.runner.RunnerException;
import org.openjdk.jmh.runner.options.Options;
import org.openjdk.jmh.runner.options.OptionsBuilder;
import org.openjdk.jmh.runner.options.TimeValue;

/**
 * Runs lotgate's benchmarks (mvn -Pbench -DskipTests verify) sized for a 2-core machine, and prints
 * each case's time against its baseline measured in the same run, as a ratio.
 */
public final class BenchmarkMain {
    private BenchmarkMain() {
    }

    public static void main(String[] args) throws RunnerException {
        String include = args.length > 0 ? args[0] : DesignBenchmark.class.getSimpleName();
        Options options = new OptionsBuilder()
                .include(include)
                .forks(1)
                .warmupIterations(3)
                .warmupTime(TimeValue.seconds(1))
                .measurementIterations(5)
                .measurementTime(TimeValue.seconds(1))
                .jvmArgs("-Xmx1g")
                .build();
        Collection<RunResult> results = new Runner(options).run();
        Map<String, double[]> byCase = new TreeMap<>();
        for (RunResult result : results) {
            String method = result.getParams().getBenchmark();
            String request = result.getParams().getParam("request");
            double score = result.getPrimaryResult().getScore();
            double[] pair = byCase.computeIfAbsent(request, k -> new double[2]);
            pair[method.endsWith("naiveScan") ? 1 : 0] = score;
        }
        System.out.println();
        System.out.println("Single-plan design: bisection search against the naive scan (ms per design, same run)");
        System.out.printf("%-42s %14s %14s %12s%n", "case (model:aql:ltpd:lotSize)", "bisection", "naive scan",
                "naive/fast");
        for (Map.Entry<String, double[]> entry : byCase.entrySet()) {
            double[] pair = entry.getValue();
            System.out.printf("%-42s %14.3f %14.3f %11.0fx%n", entry.getKey(), pair[0], pair[1], pair[1] / pair[0]);
        }
    }
}
