package lotgate.bench;

import java.net.InetAddress;
import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.atomic.AtomicLong;
import java.util.function.IntFunction;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import lotgate.web.Workbench;

/**
 * A bounded load test of the workbench on loopback: CLIENTS concurrent clients for SECONDS seconds
 * (and at most MAX_REQUESTS each) on the design answer, then on sentencing a demo lot by upload. It
 * stops by itself and prints the request count, errors and the latency percentiles. Run it with
 * {@code mvn -Pbench -DskipTests verify} (all benchmarks) or BenchmarkMain WorkbenchLoad.
 */
public final class WorkbenchLoad {
    static final int CLIENTS = 20;
    static final int SECONDS = 20;
    static final int MAX_REQUESTS = 20_000;

    private WorkbenchLoad() {
    }

    public static void main(String[] args) throws Exception {
        run();
    }

    /** One phase's outcome: latencies in ms of the successful requests, and the count of errors. */
    record Phase(String name, double[] millis, long errors, double seconds) {
        double percentile(double p) {
            if (millis.length == 0) {
                return Double.NaN;
            }
            double[] sorted = millis.clone();
            Arrays.sort(sorted);
            int index = (int) Math.ceil(p / 100 * sorted.length) - 1;
            return sorted[Math.max(0, Math.min(sorted.length - 1, index))];
        }

        void print() {
            System.out.printf("%-44s %8d requests %6d errors %8.1f per s   p50 %7.1f ms   p95 %7.1f ms   max %7.1f ms%n",
                    name, millis.length, errors, millis.length / seconds, percentile(50), percentile(95),
                    percentile(100));
        }
    }

    static void run() throws Exception {
        Path folder = Files.createTempDirectory("lotgate-load-");
        Path plans = Files.createDirectories(folder.resolve("plans"));
        Path sheet = folder.resolve("arnwick-af2618.csv");
        try (var in = WorkbenchLoad.class.getResourceAsStream("/lotgate/demo-data/arnwick-af2618.csv")) {
            Files.copy(in, sheet);
        }
        try (Workbench workbench = Workbench.start(new Workbench.Settings(InetAddress.getLoopbackAddress(), 0, null,
                folder.resolve("history.sqlite").toString(), plans, Workbench.DEFAULT_UPLOAD_LIMIT,
                folder.resolve("reports")))) {
            HttpClient client = HttpClient.newBuilder().connectTimeout(Duration.ofSeconds(30)).build();
            URI base = workbench.address();
            String csrf = csrf(client, base);
            String origin = base.toString().substring(0, base.toString().length() - 1);
            // The plan the lots are sentenced by, saved through the workbench as a user would.
            HttpResponse<String> saved = client.send(HttpRequest.newBuilder(base.resolve("/api/plans"))
                    .header("Content-Type", "application/x-www-form-urlencoded").header("X-Lotgate-Csrf", csrf)
                    .header("Origin", origin).POST(HttpRequest.BodyPublishers.ofString(
                            "scheme=single&aql=1%25&ltpd=5%25&alpha=5%25&beta=10%25&model=binomial&name=load-plan"))
                    .build(), HttpResponse.BodyHandlers.ofString());
            if (saved.statusCode() != 200) {
                throw new IllegalStateException("cannot save the load test's plan: " + saved.body());
            }
            System.out.println("Workbench under load on loopback: " + CLIENTS + " concurrent clients, " + SECONDS
                    + " s per phase (at most " + MAX_REQUESTS + " requests per client)");
            Phase design = phase("design answer (GET /api/design)", client, i -> HttpRequest.newBuilder(
                    base.resolve("/api/design?scheme=single&aql=" + (0.5 + (i % 10) * 0.1) + "%25&ltpd=5%25&alpha=5%25"
                            + "&beta=10%25&model=binomial")).GET().build());
            design.print();
            Phase sentence = phase("sentencing an uploaded csv (POST /api/sentence)", client, i -> {
                try {
                    return HttpRequest.newBuilder(base.resolve("/api/sentence?plan=load-plan&file=arnwick-af2618.csv"
                            + "&lot=AF-" + i)).header("Content-Type", "application/octet-stream")
                            .header("X-Lotgate-Csrf", csrf).header("Origin", origin)
                            .POST(HttpRequest.BodyPublishers.ofFile(sheet)).build();
                } catch (java.io.FileNotFoundException e) {
                    throw new IllegalStateException(e);
                }
            });
            sentence.print();
        } finally {
            try (var files = Files.walk(folder)) {
                files.sorted(java.util.Comparator.reverseOrder()).forEach(p -> p.toFile().delete());
            }
        }
    }

    private static String csrf(HttpClient client, URI base) throws Exception {
        String page = client.send(HttpRequest.newBuilder(base).GET().build(), HttpResponse.BodyHandlers.ofString()).body();
        Matcher m = Pattern.compile("name=\"lotgate-csrf\" content=\"([0-9a-f]+)\"").matcher(page);
        if (!m.find()) {
            throw new IllegalStateException("no CSRF token in the design page");
        }
        return m.group(1);
    }

    private static Phase phase(String name, HttpClient client, IntFunction<HttpRequest> request) throws Exception {
        AtomicLong counter = new AtomicLong();
        AtomicLong errors = new AtomicLong();
        long start = System.nanoTime();
        long deadline = start + SECONDS * 1_000_000_000L;
        ExecutorService pool = Executors.newFixedThreadPool(CLIENTS);
        List<Future<double[]>> clients = new ArrayList<>();
        for (int c = 0; c < CLIENTS; c++) {
            clients.add(pool.submit(() -> {
                double[] times = new double[MAX_REQUESTS];
                int done = 0;
                while (done < MAX_REQUESTS && System.nanoTime() < deadline) {
                    int i = (int) counter.incrementAndGet();
                    long begin = System.nanoTime();
                    try {
                        HttpResponse<String> reply = client.send(request.apply(i), HttpResponse.BodyHandlers.ofString());
                        if (reply.statusCode() != 200 || !reply.body().startsWith("{\"ok\":true")) {
                            if (errors.incrementAndGet() == 1) {
                                System.out.println("first error: " + reply.statusCode() + " " + reply.body());
                            }
                            continue;
                        }
                    } catch (java.io.IOException e) {
                        errors.incrementAndGet();
                        continue;
                    }
                    times[done++] = (System.nanoTime() - begin) / 1e6;
                }
                return Arrays.copyOf(times, done);
            }));
        }
        List<double[]> all = new ArrayList<>();
        for (Future<double[]> each : clients) {
            all.add(each.get());
        }
        pool.shutdown();
        double seconds = (System.nanoTime() - start) / 1e9;
        double[] millis = all.stream().flatMapToDouble(Arrays::stream).toArray();
        return new Phase(name, millis, errors.get(), seconds);
    }
}
