package lotgate.bench;

import java.net.InetAddress;
import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.Map;
import lotgate.web.Workbench;

/**
 * How long the design page waits for its answer: one client on loopback, as one person typing, sends each
 * typical design request (a single plan as the AQL changes, a double plan with a larger second sample, a
 * truncated sequential plan, a variables plan, a plan per defect class) 200 times one after the other, after
 * 50 to warm up, and prints p50, p95 and the largest latency with the machine's load. The page's target is
 * 100 ms. Run it with {@code mvn -Pbench -DskipTests verify -Dlotgate.bench=DesignLatency}.
 */
public final class DesignLatency {
    static final int WARM_UP = 50;
    static final int MEASURED = 200;

    private DesignLatency() {
    }

    public static void main(String[] args) throws Exception {
        run();
    }

    static void run() throws Exception {
        Map<String, String> requests = new LinkedHashMap<>();
        // %s: the AQL, 0.5% to 1.49%, changed from one request to the next as a person typing would.
        requests.put("single, LTPD 5%", "scheme=single&aql=%s&ltpd=5%%25");
        requests.put("double, n2 = 2 n1", "scheme=double&aql=%s&ltpd=5%%25&second-ratio=2");
        requests.put("double, second sample free", "scheme=double&aql=%s&ltpd=5%%25&second-ratio=free");
        requests.put("sequential, default truncation", "scheme=sequential&aql=%s&ltpd=5%%25");
        requests.put("sequential, truncated at 300", "scheme=sequential&aql=%s&ltpd=5%%25&truncate-at=300");
        requests.put("variables, two limits, sigma unknown", "scheme=variables&aql=%s&ltpd=5%%25&lower=9.95&upper=10.05"
                + "&characteristic=bore&unit=mm");
        requests.put("three defect classes", "scheme=single&classes=critical:c=0,aql=0.1%%25,ltpd=2%%25%%0A"
                + "major:aql=%s,ltpd=5%%25%%0Aminor:aql=2.5%%25,ltpd=10%%25");
        requests.put("hypergeometric, lot of 5000", "scheme=single&aql=%s&ltpd=5%%25&model=hypergeometric&lot-size=5000");
        Path folder = Files.createTempDirectory("lotgate-latency-");
        try (Workbench workbench = Workbench.start(new Workbench.Settings(InetAddress.getLoopbackAddress(), 0, null,
                folder.resolve("history.sqlite").toString(), Files.createDirectories(folder.resolve("plans")),
                Workbench.DEFAULT_UPLOAD_LIMIT, folder.resolve("reports")))) {
            HttpClient client = HttpClient.newBuilder().connectTimeout(Duration.ofSeconds(30)).build();
            URI base = workbench.address();
            System.out.println("Design answer latency on loopback, one client, " + MEASURED + " requests each after "
                    + WARM_UP + " to warm up (target: 100 ms); load average before: " + load());
            System.out.printf("%-40s %9s %9s %9s%n", "request", "p50 ms", "p95 ms", "max ms");
            for (Map.Entry<String, String> request : requests.entrySet()) {
                double[] millis = new double[MEASURED];
                for (int i = -WARM_UP; i < MEASURED; i++) {
                    // AQL 0.50% to 1.49%: every request is a new design.
                    String aql = String.format(java.util.Locale.ROOT, "%.2f%%25", 0.5 + Math.floorMod(i, 100) * 0.01);
                    URI uri = base.resolve("/api/design?" + String.format(request.getValue(), aql));
                    long begin = System.nanoTime();
                    HttpResponse<String> reply = client.send(HttpRequest.newBuilder(uri).GET().build(),
                            HttpResponse.BodyHandlers.ofString());
                    double elapsed = (System.nanoTime() - begin) / 1e6;
                    if (reply.statusCode() != 200 || !reply.body().startsWith("{\"ok\":true")) {
                        throw new IllegalStateException(request.getKey() + ": " + reply.statusCode() + " " + reply.body());
                    }
                    if (i >= 0) {
                        millis[i] = elapsed;
                    }
                }
                Arrays.sort(millis);
                System.out.printf("%-40s %9.1f %9.1f %9.1f%n", request.getKey(), percentile(millis, 50),
                        percentile(millis, 95), millis[MEASURED - 1]);
            }
            System.out.println("load average after: " + load() + " (" + Runtime.getRuntime().availableProcessors()
                    + " cores)");
        } finally {
            try (var files = Files.walk(folder)) {
                files.sorted(java.util.Comparator.reverseOrder()).forEach(p -> p.toFile().delete());
            }
        }
    }

    private static double percentile(double[] sorted, double p) {
        int index = (int) Math.ceil(p / 100 * sorted.length) - 1;
        return sorted[Math.max(0, Math.min(sorted.length - 1, index))];
    }

    /** The 1, 5 and 15 minute load averages where the system tells them. */
    private static String load() {
        try {
            String[] parts = Files.readString(Path.of("/proc/loadavg")).trim().split("\\s+");
            return parts[0] + " " + parts[1] + " " + parts[2];
        } catch (java.io.IOException e) {
            return String.format(java.util.Locale.ROOT, "%.2f", java.lang.management.ManagementFactory
                    .getOperatingSystemMXBean().getSystemLoadAverage());
        }
    }
}
