package lotgate.bench;

import java.io.BufferedWriter;
import java.io.PrintWriter;
import java.io.Writer;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.Random;
import java.util.concurrent.TimeUnit;
import lotgate.cli.Main;
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
 * An import of 100,000 invented past lots into a fresh embedded store, the whole command in a JVM with
 * -Xmx256m (its memory stays flat), against Debian's sqlite3 importing the same csv into a bare table.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.SingleShotTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Fork(value = 1, jvmArgs = {"-Xmx256m", "-Dlog4j.provider=org.apache.logging.log4j.simple.internal.SimpleProvider"})
@Warmup(iterations = 1)
@Measurement(iterations = 3)
public class ImportBenchmark {
    static final int LOTS = 100_000;

    private Path folder;
    private Path csv;
    private Path store;
    private final PrintWriter nowhere = new PrintWriter(Writer.nullWriter());

    @Setup(Level.Trial)
    public void write() throws Exception {
        folder = Files.createTempDirectory("lotgate-import-bench");
        csv = folder.resolve("lots.csv");
        Random random = new Random(LOTS);
        try (BufferedWriter out = Files.newBufferedWriter(csv)) {
            out.write("lot,supplier,part,received,lot size,sample size,nonconforming,verdict,acceptance number,"
                    + "inspector,defects,production\n");
            for (int i = 0; i < LOTS; i++) {
                int supplier = i % 200;
                int found = random.nextInt(5);
                String defects = found == 0 ? "" : (random.nextBoolean() ? "burr:" : "crack:") + found;
                out.write("L-" + i + ",Invented Supplier " + supplier + ",P-" + supplier % 7 + ","
                        + LocalDate.of(2020, 1, 1).plusDays(i / 200) + ",5000,132," + found + ","
                        + (found <= 3 ? "accept" : "reject") + ",3,bench," + defects + ",steady\n");
            }
        }
    }

    @Setup(Level.Invocation)
    public void freshStore() throws Exception {
        store = folder.resolve("history-" + System.nanoTime() + ".sqlite");
    }

    @TearDown(Level.Invocation)
    public void removeStore() throws Exception {
        try (var files = Files.list(folder)) {
            for (Path file : files.toList()) {
                if (!file.equals(csv)) {
                    Files.delete(file);
                }
            }
        }
    }

    @TearDown(Level.Trial)
    public void remove() throws Exception {
        Files.deleteIfExists(csv);
        Files.delete(folder);
    }

    @Benchmark
    public int importLots() {
        int code = Main.run(nowhere, nowhere, "import", csv.toString(), "--store", store.toString(), "--create-store");
        if (code != 0) {
            throw new IllegalStateException("import failed with exit code " + code);
        }
        return code;
    }

    @Benchmark
    public int bareSqlite3Import() throws Exception {
        Process process = new ProcessBuilder("sqlite3", store.toString(),
                "CREATE TABLE lots (lot TEXT, supplier TEXT, part TEXT, received TEXT, lot_size INTEGER,"
                        + " sample_size INTEGER, nonconforming INTEGER, verdict TEXT, acceptance INTEGER,"
                        + " inspector TEXT, defects TEXT, production TEXT);",
                ".import --csv --skip 1 " + csv + " lots").redirectErrorStream(true).start();
        String output = new String(process.getInputStream().readAllBytes());
        int code = process.waitFor();
        if (code != 0) {
            throw new IllegalStateException("sqlite3 (Debian's sqlite3 package) failed: " + output);
        }
        return code;
    }
}
