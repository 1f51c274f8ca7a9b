package lotgate.bench;

import java.io.BufferedWriter;
import java.io.PrintWriter;
import java.io.Writer;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.Random;
import lotgate.cli.Main;

/**
 * An import of 100,000 invented past lots into a fresh embedded store, the whole command in a JVM with
 * -Xmx256m (its memory stays flat), against Debian's sqlite3 importing the same csv into a bare table.
 *
 * <p>The two are timed in alternating rounds, each side first in every other round, and the ratio is the median of
 * the rounds' ratios: on a shared machine the load changes within a minute (sqlite3's import alone took 190 ms in
 * one run and 345 ms in the next), and two JMH benchmarks one after the other measured the load as much as the code.
 * The first import of the JVM, which still compiles its code, is printed apart.
 */
public final class ImportBenchmark {
    static final int LOTS = 100_000;
    /** Alternating rounds before the measured ones: the third import ran as fast as the later ones. */
    static final int WARM_UP_ROUNDS = 4;
    static final int ROUNDS = 9;

    private final Path folder;
    private final Path csv;
    private final PrintWriter nowhere = new PrintWriter(Writer.nullWriter());

    private ImportBenchmark() throws Exception {
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

    /** Runs the rounds in a JVM of their own with -Xmx256m, as the benchmarks' runner does with JMH's. */
    static void compareRounds() throws Exception {
        Path java = Path.of(System.getProperty("java.home"), "bin", "java");
        Process rounds = new ProcessBuilder(java.toString(), "-Xmx256m",
                "-Dlog4j.provider=org.apache.logging.log4j.simple.internal.SimpleProvider", "-cp",
                System.getProperty("java.class.path"), ImportBenchmark.class.getName()).inheritIO().start();
        if (rounds.waitFor() != 0) {
            throw new IllegalStateException("the import rounds failed with exit code " + rounds.exitValue());
        }
    }

    public static void main(String[] args) throws Exception {
        ImportBenchmark bench = new ImportBenchmark();
        try {
            bench.run();
        } finally {
            Files.deleteIfExists(bench.csv);
            Files.delete(bench.folder);
        }
    }

    private void run() throws Exception {
        System.out.println("Import of " + LOTS + " lots into a fresh store, -Xmx256m, " + ROUNDS + " rounds alternating"
                + " with sqlite3's bare import of the same csv after " + WARM_UP_ROUNDS + " (ms, medians; target: at"
                + " most 5 times the bare import); load average before: " + HistoryBenchmark.load());
        double first = 0;
        double[] imports = new double[ROUNDS];
        double[] bare = new double[ROUNDS];
        double[] ratios = new double[ROUNDS];
        for (int round = -WARM_UP_ROUNDS; round < ROUNDS; round++) {
            double lotgate;
            double sqlite3;
            // Each side goes first in every other round, so that neither always runs after the other.
            if (round % 2 == 0) {
                lotgate = timed(this::importLots);
                sqlite3 = timed(this::bareSqlite3Import);
            } else {
                sqlite3 = timed(this::bareSqlite3Import);
                lotgate = timed(this::importLots);
            }
            if (round == -WARM_UP_ROUNDS) {
                first = lotgate;
            }
            if (round >= 0) {
                imports[round] = lotgate;
                bare[round] = sqlite3;
                ratios[round] = lotgate / sqlite3;
            }
        }
        System.out.printf("%-32s %8.0f   sqlite3 %8.0f   ratio %5.2f (quartiles of the rounds %.2f to %.2f)%n",
                "lotgate import (whole command)", HistoryBenchmark.median(imports), HistoryBenchmark.median(bare),
                HistoryBenchmark.median(ratios), HistoryBenchmark.quantile(ratios, 0.25),
                HistoryBenchmark.quantile(ratios, 0.75));
        System.out.printf("%-32s %8.0f   (the JVM's first import, still compiling its code)%n", "first import", first);
        System.out.println("load average after: " + HistoryBenchmark.load() + " ("
                + Runtime.getRuntime().availableProcessors() + " cores)");
    }

    private interface Work {
        void run(Path store) throws Exception;
    }

    /** Times one run into a fresh store, which is removed afterwards (untimed). */
    private double timed(Work work) throws Exception {
        Path store = folder.resolve("history-" + System.nanoTime() + ".sqlite");
        long begin = System.nanoTime();
        work.run(store);
        double millis = (System.nanoTime() - begin) / 1e6;
        try (var files = Files.list(folder)) {
            for (Path file : files.toList()) {
                if (!file.equals(csv)) {
                    Files.delete(file);
                }
            }
        }
        return millis;
    }

    private void importLots(Path store) {
        int code = Main.run(nowhere, nowhere, "import", csv.toString(), "--store", store.toString(), "--create-store");
        if (code != 0) {
            throw new IllegalStateException("import failed with exit code " + code);
        }
    }

    private void bareSqlite3Import(Path store) throws Exception {
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
    }
}
