package lotgate.bench;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.io.Writer;
import java.lang.management.ManagementFactory;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.Statement;
import java.time.Instant;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.concurrent.Callable;
import java.util.concurrent.TimeUnit;
import lotgate.cli.Main;
import lotgate.history.HistoryStore;
import lotgate.history.RecordContent;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.TearDown;
import org.openjdk.jmh.annotations.Warmup;

/**
 * The supplier reports over 100,000 recorded lots of 200 invented suppliers, each against the bare SQL it
 * needs, and the cost of recording one lot in the embedded store (JMH).
 *
 * <p>A report and its bare SQL are timed in alternating rounds ({@link #comparePairs}), not as two JMH
 * benchmarks one after the other: on a shared machine the load changes within a minute, and a ratio of two
 * runs taken a minute apart measured the load as much as the code. Both sides open their connection as the
 * store does (same driver, same settings), and the bare SQL reads every column and record the report uses.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Fork(value = 1, jvmArgs = {"-Xmx1g", "-Dlog4j.provider=org.apache.logging.log4j.simple.internal.SimpleProvider"})
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
public class HistoryBenchmark {
    static final int SUPPLIERS = 200;
    static final int LOTS = 100_000;
    static final String AUDITED = "Invented Supplier 17";
    /** Alternating rounds per report; each round times a batch of about {@link #BATCH_NANOS} on each side. */
    static final int ROUNDS = 40;
    static final long BATCH_NANOS = TimeUnit.MILLISECONDS.toNanos(100);
    /** Alternating runs before the rounds: with 5 s the audit still ran 1.7 times slower than after 20 s. */
    static final long WARM_UP_NANOS = TimeUnit.SECONDS.toNanos(20);

    private Path folder;
    private HistoryStore recorder;
    private int recorded;

    @Setup(Level.Trial)
    public void fill() throws Exception {
        folder = filledStore();
        recorder = HistoryStore.open(folder.resolve("history.sqlite").toString());
    }

    @TearDown(Level.Trial)
    public void remove() throws Exception {
        recorder.close();
        delete(folder);
    }

    @Benchmark
    public long recordOneLot() {
        int i = recorded++;
        return recorder.append(RecordContent.lot(new RecordContent.Lot("Invented Recorder", "R-1", "R-" + i, 5000,
                LocalDate.of(2026, 1, 1), "bench", "accept", 132, 1, Map.of("burr", 1), "normal", "steady", 0, null),
                null, "sentence"), Instant.now()).seq();
    }

    /** A folder holding history.sqlite with {@link #LOTS} lots of {@link #SUPPLIERS} suppliers. */
    static Path filledStore() throws Exception {
        Path folder = Files.createTempDirectory("lotgate-history-bench");
        Random random = new Random(100_000);
        try (HistoryStore history = HistoryStore.open(folder.resolve("history.sqlite").toString(), true)) {
            List<ObjectNode> batch = new ArrayList<>();
            for (int i = 0; i < LOTS; i++) {
                int supplier = i % SUPPLIERS;
                int found = random.nextInt(5);
                batch.add(RecordContent.lot(new RecordContent.Lot("Invented Supplier " + supplier, "P-" + supplier % 7,
                        "L-" + i, 5000, LocalDate.of(2020, 1, 1).plusDays(i / SUPPLIERS), "bench",
                        found <= 3 ? "accept" : "reject", 132, found, found == 0 ? Map.of()
                                : Map.of(random.nextBoolean() ? "burr" : "crack", found), "normal", "steady", 0, null),
                        null, "import"));
                if (batch.size() == 5000) {
                    history.appendAll(batch, Instant.now());
                    batch.clear();
                }
            }
        }
        return folder;
    }

    private static void delete(Path folder) throws Exception {
        try (var files = Files.list(folder)) {
            for (Path file : files.toList()) {
                Files.delete(file);
            }
        }
        Files.delete(folder);
    }

    /** A report's time and its bare SQL's, per run (medians of the rounds), and their ratio round by round. */
    record Pair(double command, double bare, double ratio, double lowerQuartile, double upperQuartile) {
    }

    /** Times the reports against their bare SQL alone, without the JMH benchmark. */
    public static void main(String[] args) throws Exception {
        comparePairs();
    }

    /** Times the ranking and one audit against their bare SQL in alternating rounds and prints them. */
    static void comparePairs() throws Exception {
        Path folder = filledStore();
        String store = folder.resolve("history.sqlite").toString();
        PrintWriter nowhere = new PrintWriter(Writer.nullWriter());
        try {
            System.out.println("Supplier reports over " + LOTS + " lots of " + SUPPLIERS + " suppliers, embedded store,"
                    + " each in " + ROUNDS + " rounds alternating with its bare SQL (ms per run, medians; target: at"
                    + " most 3 times the bare SQL); load average before: " + load());
            print("ranking of all suppliers", pair(() -> command(nowhere, "suppliers", "--store", store, "--format",
                    "json"), () -> rankingBareSql(store)));
            print("one supplier's audit", pair(() -> command(nowhere, "supplier", AUDITED, "--store", store,
                    "--format", "json"), () -> auditBareSql(store)));
            System.out.println("load average after: " + load() + " (" + Runtime.getRuntime().availableProcessors()
                    + " cores)");
        } finally {
            delete(folder);
        }
    }

    private static int command(PrintWriter out, String... args) {
        int code = Main.run(out, out, args);
        if (code != 0) {
            throw new IllegalStateException("lotgate " + String.join(" ", args) + " ended with exit code " + code);
        }
        return code;
    }

    private static void print(String what, Pair pair) {
        System.out.printf("%-32s %8.2f   bare SQL %8.2f   ratio %5.2f (quartiles of the rounds %.2f to %.2f)%n", what,
                pair.command(), pair.bare(), pair.ratio(), pair.lowerQuartile(), pair.upperQuartile());
    }

    static Pair pair(Callable<?> command, Callable<?> bare) throws Exception {
        long warmedUp = System.nanoTime() + WARM_UP_NANOS;
        while (System.nanoTime() < warmedUp) {
            command.call();
            bare.call();
        }
        int commandBatch = batch(command);
        int bareBatch = batch(bare);
        double[] commandTimes = new double[ROUNDS];
        double[] bareTimes = new double[ROUNDS];
        double[] ratios = new double[ROUNDS];
        for (int round = 0; round < ROUNDS; round++) {
            // Each side goes first in every other round, so that neither always runs after the other.
            if (round % 2 == 0) {
                commandTimes[round] = millisPerRun(command, commandBatch);
                bareTimes[round] = millisPerRun(bare, bareBatch);
            } else {
                bareTimes[round] = millisPerRun(bare, bareBatch);
                commandTimes[round] = millisPerRun(command, commandBatch);
            }
            ratios[round] = commandTimes[round] / bareTimes[round];
        }
        return new Pair(median(commandTimes), median(bareTimes), median(ratios), quantile(ratios, 0.25),
                quantile(ratios, 0.75));
    }

    /** How many runs take about {@link #BATCH_NANOS}, at least one. */
    private static int batch(Callable<?> work) throws Exception {
        double millis = millisPerRun(work, 3);
        return (int) Math.max(1, Math.round(BATCH_NANOS / 1e6 / millis));
    }

    private static double millisPerRun(Callable<?> work, int runs) throws Exception {
        long begin = System.nanoTime();
        for (int i = 0; i < runs; i++) {
            work.call();
        }
        return (System.nanoTime() - begin) / 1e6 / runs;
    }

    static double median(double[] values) {
        return quantile(values, 0.5);
    }

    static double quantile(double[] values, double q) {
        double[] sorted = values.clone();
        Arrays.sort(sorted);
        double place = q * (sorted.length - 1);
        int below = (int) Math.floor(place);
        int above = Math.min(sorted.length - 1, below + 1);
        return sorted[below] + (place - below) * (sorted[above] - sorted[below]);
    }

    static String load() {
        return String.format(java.util.Locale.ROOT, "%.2f", ManagementFactory.getOperatingSystemMXBean()
                .getSystemLoadAverage());
    }

    /** A connection opened as the store opens its own (HistoryStore.open): the same driver, settings and mode. */
    private static Connection connect(String store) throws Exception {
        Connection connection = new org.sqlite.JDBC().connect("jdbc:sqlite:" + store, HistoryStore.sqliteSettings());
        try (Statement statement = connection.createStatement()) {
            statement.execute("PRAGMA journal_mode = WAL");
        }
        return connection;
    }

    /** The totals per supplier of the current lots, which the ranking ranks. */
    static long rankingBareSql(String store) throws Exception {
        long sum = 0;
        try (Connection connection = connect(store);
                Statement statement = connection.createStatement();
                // The table read in its own order, not through the supplier index: twice as quick.
                ResultSet rows = statement.executeQuery("SELECT supplier, COUNT(*), SUM(CASE WHEN verdict = 'reject'"
                        + " THEN 1 ELSE 0 END), SUM(inspected), SUM(nonconforming) FROM lot_record NOT INDEXED WHERE"
                        + " kind = 'lot' AND lot_key IS NOT NULL GROUP BY supplier")) {
            while (rows.next()) {
                sum += rows.getString(1).length() + rows.getLong(2) + rows.getLong(3) + rows.getLong(4) + rows.getLong(5);
            }
        }
        return sum;
    }

    /**
     * What one supplier's audit reads: the supplier's records with every column the audit uses and, in the same
     * pass, the content of the lots it shows more of (the rejected ones, for their evidence, and those judged on
     * measurements, for the mean and s charts), then the defect counts of its lots that no correction superseded.
     */
    static long auditBareSql(String store) throws Exception {
        long sum = 0;
        try (Connection connection = connect(store)) {
            try (PreparedStatement lots = connection.prepareStatement("SELECT seq, recorded_at, kind, supplier, part,"
                    + " lot, lot_size, received, verdict, inspected, nonconforming, severity, production, supersedes,"
                    + " hash, reinstates, CASE WHEN verdict = 'reject' OR content LIKE ? THEN content END FROM"
                    + " lot_record WHERE supplier = ? ORDER BY seq")) {
                lots.setString(1, "%\"recording\":\"measurements\"%");
                lots.setString(2, AUDITED);
                try (ResultSet rows = lots.executeQuery()) {
                    while (rows.next()) {
                        sum += rows.getLong(1) + rows.getString(2).length() + rows.getString(3).length()
                                + rows.getString(4).length() + rows.getString(5).length() + rows.getString(6).length()
                                + rows.getInt(7) + rows.getString(8).length() + rows.getString(9).length()
                                + rows.getInt(10) + rows.getInt(11) + rows.getString(12).length()
                                + rows.getString(13).length() + rows.getLong(14) + rows.getString(15).length()
                                + rows.getInt(16);
                        String content = rows.getString(17);
                        sum += content == null ? 0 : content.length();
                    }
                }
            }
            // Of the ways to leave out superseded records' counts, the quickest: a join on the records'
            // lot key took 2 to 4 ms here, this subquery over the index of the corrections 0.4 ms.
            try (PreparedStatement types = connection.prepareStatement("SELECT seq, defect, units FROM defect_count"
                    + " WHERE supplier = ? AND seq NOT IN (SELECT supersedes FROM lot_record WHERE supersedes > 0)")) {
                types.setString(1, AUDITED);
                try (ResultSet rows = types.executeQuery()) {
                    while (rows.next()) {
                        sum += rows.getLong(1) + rows.getString(2).length() + rows.getLong(3);
                    }
                }
            }
        }
        return sum;
    }
}
