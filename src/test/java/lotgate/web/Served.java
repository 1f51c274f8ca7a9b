package lotgate.web;

import java.io.IOException;
import java.net.InetAddress;
import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/** A workbench on a free loopback port over temporary plans, reports and store, for tests. */
final class Served implements AutoCloseable {
    final Path folder;
    final Path plans;
    final Path reports;
    final String store;
    final Workbench workbench;
    final HttpClient client = HttpClient.newBuilder().followRedirects(HttpClient.Redirect.NEVER)
            .connectTimeout(Duration.ofSeconds(30)).build();

    private Served(Path folder, Path plans, Path reports, String store, Workbench workbench) {
        this.folder = folder;
        this.plans = plans;
        this.reports = reports;
        this.store = store;
        this.workbench = workbench;
    }

    static Served start(Path folder) throws Exception {
        return start(folder, null, Workbench.DEFAULT_UPLOAD_LIMIT, folder.resolve("history.sqlite").toString());
    }

    static Served start(Path folder, String token, long uploadLimit, String store) throws Exception {
        Path plans = Files.createDirectories(folder.resolve("plans"));
        if (!store.startsWith("jdbc:")) {
            lotgate.history.HistoryStore.open(store, true).close();
        }
        Path reports = folder.resolve("reports");
        Workbench workbench = Workbench.start(new Workbench.Settings(InetAddress.getLoopbackAddress(), 0, token,
                store, plans, uploadLimit, reports));
        return new Served(folder, plans, reports, store, workbench);
    }

    URI uri(String pathAndQuery) {
        return workbench.address().resolve(pathAndQuery);
    }

    HttpResponse<String> get(String pathAndQuery) throws IOException, InterruptedException {
        return client.send(HttpRequest.newBuilder(uri(pathAndQuery)).GET().build(), HttpResponse.BodyHandlers.ofString());
    }

    /** The CSRF token the design page carries. */
    String csrf() throws IOException, InterruptedException {
        Matcher m = Pattern.compile("name=\"lotgate-csrf\" content=\"([0-9a-f]+)\"").matcher(get("/").body());
        if (!m.find()) {
            throw new AssertionError("no CSRF token in the page");
        }
        return m.group(1);
    }

    /** A form POST as the workbench's own page sends it. */
    HttpResponse<String> post(String path, String form) throws IOException, InterruptedException {
        return client.send(HttpRequest.newBuilder(uri(path)).header("Content-Type", "application/x-www-form-urlencoded")
                .header(Guard.CSRF_HEADER, csrf()).header("Origin", origin())
                .POST(HttpRequest.BodyPublishers.ofString(form)).build(), HttpResponse.BodyHandlers.ofString());
    }

    /** A sheet upload as the sentencing page sends it. */
    HttpResponse<String> upload(String pathAndQuery, Path sheet) throws IOException, InterruptedException {
        return client.send(HttpRequest.newBuilder(uri(pathAndQuery)).header("Content-Type", "application/octet-stream")
                .header(Guard.CSRF_HEADER, csrf()).header("Origin", origin())
                .POST(HttpRequest.BodyPublishers.ofFile(sheet)).build(), HttpResponse.BodyHandlers.ofString());
    }

    String origin() {
        String address = workbench.address().toString();
        return address.substring(0, address.length() - 1);
    }

    @Override
    public void close() throws Exception {
        workbench.close();
    }
}
