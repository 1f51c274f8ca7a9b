package lotgate.bench;

import java.util.Collection;
import java.util.HashMap;
import java.util.Map;
import java.util.TreeMap;
import org.openjdk.jmh.results.RunResult;
import org.openjdk.jmh.runner.Runner;
import org.openjdk.jmh.runner.RunnerException;
import org.openjdk.jmh.runner.options.ChainedOptionsBuilder;
import org.openjdk.jmh.runner.options.OptionsBuilder;
import org.openjdk.jmh.runner.options.TimeValue;

/**
 * Runs lotgate's benchmarks (mvn -Pbench -DskipTests verify) sized for a 2-core machine, and prints
 * each case against its baseline measured in the same run, as a ratio. An argument names the
 * benchmarks to run (a regular expression, e.g. DesignBenchmark).
 */
public final class BenchmarkMain {
    /** Every benchmark, and then the workbench's load test. */
    private static final String ALL = "lotgate.bench.*Benchmark";

    private BenchmarkMain() {
    }

    public static void main(String[] args) throws Exception {
        String include = args.length > 0 && !args[0].isBlank() ? args[0] : ALL;
        if (include.equals("WorkbenchLoad")) {
            WorkbenchLoad.run();
            return;
        }
        if (include.equals("ImportBenchmark")) {
            ImportBenchmark.compareRounds();
            return;
        }
        if (include.equals("DesignLatency")) {
            DesignLatency.run();
            return;
        }
        ChainedOptionsBuilder options = new OptionsBuilder().include(include);
        if (include.contains("DesignBenchmark") || include.contains("StagedBenchmark")
                || include.contains("TablesBenchmark") || include.endsWith("*Benchmark")) {
            // Design cases take milliseconds: short timed iterations. The sentencing benchmark sets its own.
            options = options.warmupTime(TimeValue.seconds(1)).measurementTime(TimeValue.seconds(1));
        }
        Collection<RunResult> results = new Runner(options.build()).run();
        Map<String, Double> scores = new HashMap<>();
        Map<String, String> units = new HashMap<>();
        for (RunResult result : results) {
            String method = result.getParams().getBenchmark();
            String request = result.getParams().getParam("request");
            String key = method + (request == null ? "" : "|" + request);
            scores.put(key, result.getPrimaryResult().getScore());
            units.put(key, result.getPrimaryResult().getScoreUnit());
        }
        System.out.println();
        Map<String, double[]> design = new TreeMap<>();
        scores.forEach((key, score) -> {
            if (key.contains("DesignBenchmark")) {
                String request = key.substring(key.indexOf('|') + 1);
                design.computeIfAbsent(request, k -> new double[2])[key.contains("naiveScan|") ? 1 : 0] = score;
            }
        });
        if (!design.isEmpty()) {
            System.out.println("Single-plan design: bisection search against the naive scan (ms per design, same run)");
            System.out.printf("%-42s %14s %14s %12s%n", "case (model:aql:ltpd:lotSize)", "bisection", "naive scan",
                    "naive/fast");
            design.forEach((request, pair) -> System.out.printf("%-42s %14.3f %14.3f %11.0fx%n", request, pair[0],
                    pair[1], pair[1] / pair[0]));
            System.out.println();
        }
        String staged = StagedBenchmark.class.getName() + ".";
        if (scores.containsKey(staged + "sequentialLattice")) {
            System.out.println("Exact OC of a sequential plan truncated at " + StagedBenchmark.TRUNCATION
                    + " units (ms per quality level, same run)");
            System.out.printf("%-44s %12.3f%n", "lattice between the lines", scores.get(staged + "sequentialLattice"));
            System.out.printf("%-44s %12.3f%n", "naive walk over the whole lattice",
                    scores.get(staged + "sequentialFullLattice"));
            System.out.printf("%-44s %11.0fx%n", "naive / lattice", scores.get(staged + "sequentialFullLattice")
                    / scores.get(staged + "sequentialLattice"));
            System.out.println("Double-plan design, AQL 0.1% / LTPD 1% (ms per design, same run)");
            System.out.printf("%-44s %12.3f%n", "search, n2 = n1", scores.get(staged + "doubleDesign"));
            System.out.printf("%-44s %12.3f%n", "search, n2 free", scores.get(staged + "doubleDesignFree"));
            System.out.printf("%-44s %12.3f%n", "exhaustive box, n2 = n1", scores.get(staged + "doubleExhaustive"));
            System.out.printf("%-44s %11.0fx%n", "exhaustive / search (n2 = n1)", scores.get(staged + "doubleExhaustive")
                    / scores.get(staged + "doubleDesign"));
            System.out.println();
        }
        String tables = TablesBenchmark.class.getName() + ".";
        if (scores.containsKey(tables + "design")) {
            double baseline = scores.get(tables + "design");
            System.out.println("Plans from the tables and least-inspection plans against the single-plan design"
                    + " (binomial, AQL 1%, LTPD 5%) of the same run (ms per call)");
            System.out.printf("%-52s %10.3f%n", "single-plan design (baseline)", baseline);
            String[][] cases = {
                    {"tableLookupSingle", "table look-up with risks, single (target < 10 ms)"},
                    {"tableLookupDouble", "table look-up with risks, double (target < 10 ms)"},
                    {"leastInspectionLtpd", "least ATI, N = 10^6, LTPD 1% (target < 50 ms)"},
                    {"leastInspectionDoubleLtpd", "least ATI double, N = 10^6, LTPD 1% (target < 500 ms)"},
                    {"leastInspectionDoubleLot5000", "least ATI double, N = 5,000, LTPD 5%"},
                    {"leastInspectionAoql", "least ATI, N = 10^6, AOQL 1% (target < 50 ms)"}};
            for (String[] entry : cases) {
                double score = scores.get(tables + entry[0]);
                System.out.printf("%-52s %10.3f   ratio to design %8.2f%n", entry[1], score, score / baseline);
            }
            System.out.println();
        }
        String history = HistoryBenchmark.class.getName() + ".";
        if (scores.containsKey(history + "recordOneLot")) {
            System.out.printf("%-44s %10.2f ms per lot (one transaction, synchronous=FULL)%n", "recording one lot",
                    scores.get(history + "recordOneLot"));
            // The reports against their bare SQL: alternating rounds in this JVM, after the JMH runs.
            HistoryBenchmark.comparePairs();
            System.out.println();
        }
        Double sentence = scores.get(SentencingBenchmark.class.getName() + ".sentence");
        Double bare = scores.get(SentencingBenchmark.class.getName() + ".bareSaxPass");
        if (sentence != null && bare != null) {
            System.out.println("Sentencing a " + SentencingBenchmark.ROWS + "-row xlsx sheet with -Xmx256m (ms, same run)");
            System.out.printf("%-44s %12.0f%n", "lotgate sentence (whole command)", sentence);
            System.out.printf("%-44s %12.0f%n", "bare POI SAX pass counting cells", bare);
            System.out.printf("%-44s %12.2f   (target: at most 1.30)%n", "ratio sentence / bare pass", sentence / bare);
        }
        if (include.equals(ALL)) {
            // The import against sqlite3, in alternating rounds of a JVM of its own, after the JMH benchmarks.
            ImportBenchmark.compareRounds();
            System.out.println();
            // The workbench's bounded load test on loopback runs after the JMH benchmarks.
            System.out.println();
            WorkbenchLoad.run();
        }
    }
}
