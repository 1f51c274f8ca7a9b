package lotgate.bench;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.io.Writer;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.Statement;
import java.time.Instant;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Random;
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
 * The supplier reports over 100,000 recorded lots of 200 invented suppliers, each against the bare SQL
 * aggregation it needs (connection included), and the cost of recording one lot in the embedded store.
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

    private Path folder;
    private String store;
    private HistoryStore recorder;
    private int recorded;
    private final PrintWriter nowhere = new PrintWriter(Writer.nullWriter());

    @Setup(Level.Trial)
    public void fill() throws Exception {
        folder = Files.createTempDirectory("lotgate-history-bench");
        store = folder.resolve("history.sqlite").toString();
        Random random = new Random(100_000);
        try (HistoryStore history = HistoryStore.open(store, true)) {
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
        recorder = HistoryStore.open(store);
    }

    @TearDown(Level.Trial)
    public void remove() throws Exception {
        recorder.close();
        try (var files = Files.list(folder)) {
            for (Path file : files.toList()) {
                Files.delete(file);
            }
        }
        Files.delete(folder);
    }

    @Benchmark
    public int ranking() {
        return Main.run(nowhere, nowhere, "suppliers", "--store", store, "--format", "json");
    }

    @Benchmark
    public long rankingBareSql() throws Exception {
        long sum = 0;
        try (Connection connection = DriverManager.getConnection("jdbc:sqlite:" + store);
                Statement statement = connection.createStatement();
                ResultSet rows = statement.executeQuery("SELECT supplier, COUNT(*), SUM(CASE WHEN verdict = 'reject'"
                        + " THEN 1 ELSE 0 END), SUM(inspected), SUM(nonconforming) FROM lot_record WHERE kind = 'lot'"
                        + " AND lot_key IS NOT NULL GROUP BY supplier")) {
            while (rows.next()) {
                sum += rows.getLong(2) + rows.getLong(5);
            }
        }
        return sum;
    }

    @Benchmark
    public int supplierReport() {
        return Main.run(nowhere, nowhere, "supplier", "Invented Supplier 17", "--store", store, "--format", "json");
    }

    @Benchmark
    public long supplierBareSql() throws Exception {
        long sum = 0;
        try (Connection connection = DriverManager.getConnection("jdbc:sqlite:" + store)) {
            try (PreparedStatement lots = connection.prepareStatement("SELECT seq, recorded_at, kind, supplier, part,"
                    + " lot, lot_size, received, verdict, inspected, nonconforming, severity, production, supersedes"
                    + " FROM lot_record WHERE supplier = ? ORDER BY seq")) {
                lots.setString(1, "Invented Supplier 17");
                try (ResultSet rows = lots.executeQuery()) {
                    while (rows.next()) {
                        sum += rows.getLong(11);
                        if ("reject".equals(rows.getString(9))) {
                            try (PreparedStatement content = connection.prepareStatement(
                                    "SELECT content FROM lot_record WHERE seq = ?")) {
                                content.setLong(1, rows.getLong(1));
                                try (ResultSet text = content.executeQuery()) {
                                    text.next();
                                    sum += text.getString(1).length();
                                }
                            }
                        }
                    }
                }
            }
            try (PreparedStatement types = connection.prepareStatement("SELECT d.defect, SUM(d.units) FROM defect_count d"
                    + " JOIN lot_record r ON r.seq = d.seq WHERE d.supplier = ? AND r.lot_key IS NOT NULL"
                    + " GROUP BY d.defect")) {
                types.setString(1, "Invented Supplier 17");
                try (ResultSet rows = types.executeQuery()) {
                    while (rows.next()) {
                        sum += rows.getLong(2);
                    }
                }
            }
        }
        return sum;
    }

    @Benchmark
    public long recordOneLot() {
        int i = recorded++;
        return recorder.append(RecordContent.lot(new RecordContent.Lot("Invented Recorder", "R-1", "R-" + i, 5000,
                LocalDate.of(2026, 1, 1), "bench", "accept", 132, 1, Map.of("burr", 1), "normal", "steady", 0, null),
                null, "sentence"), Instant.now()).seq();
    }
}
