package lotgate.web;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The workbench's door: token, cross-site changes, upload size, names that are paths, hostile text. */
class WorkbenchSecurityTest {
    private static final String TOKEN = "5f0c1e2d3b4a69788796a5b4c3d2e1f0";

    @TempDir
    Path folder;

    @Test
    void aRequestWithoutTheAccessTokenIsRefused() throws Exception {
        try (Served served = Served.start(folder, TOKEN, Workbench.DEFAULT_UPLOAD_LIMIT, folder.resolve("h.sqlite").toString())) {
            HttpResponse<String> bare = served.get("/");
            assertEquals(401, bare.statusCode());
            assertEquals("this workbench needs its access token: open the address it printed at start", bare.body());
            assertEquals(401, served.get("/api/plans").statusCode());
            assertEquals(401, served.get("/assets/common.js").statusCode());
            assertEquals(401, served.get("/?token=" + TOKEN.replace('5', '6')).statusCode());

            HttpResponse<String> opened = served.get("/?token=" + TOKEN);
            assertEquals(303, opened.statusCode());
            String cookie = opened.headers().firstValue("Set-Cookie").orElseThrow();
            assertTrue(cookie.startsWith("lotgate-access=" + TOKEN + ";"), cookie);
            assertTrue(cookie.contains("HttpOnly") && cookie.contains("SameSite=Strict"), cookie);
            assertEquals("/", opened.headers().firstValue("Location").orElseThrow());

            HttpResponse<String> withCookie = served.client.send(HttpRequest.newBuilder(served.uri("/"))
                    .header("Cookie", "lotgate-access=" + TOKEN).build(), HttpResponse.BodyHandlers.ofString());
            assertEquals(200, withCookie.statusCode());
            HttpResponse<String> withBearer = served.client.send(HttpRequest.newBuilder(served.uri("/api/plans"))
                    .header("Authorization", "Bearer " + TOKEN).build(), HttpResponse.BodyHandlers.ofString());
            assertEquals(200, withBearer.statusCode());
        }
    }

    @Test
    void aCrossSitePostChangesNothing() throws Exception {
        try (Served served = Served.start(folder)) {
            String form = "aql=1%25&ltpd=5%25&name=bolts";
            HttpResponse<String> noToken = served.client.send(HttpRequest.newBuilder(served.uri("/api/plans"))
                    .header("Content-Type", "application/x-www-form-urlencoded").header("Origin", "http://evil.example")
                    .POST(HttpRequest.BodyPublishers.ofString(form)).build(), HttpResponse.BodyHandlers.ofString());
            assertEquals(403, noToken.statusCode());
            assertEquals("refused: a change must come from the workbench's own pages", noToken.body());

            HttpResponse<String> otherOrigin = served.client.send(HttpRequest.newBuilder(served.uri("/api/plans"))
                    .header("Content-Type", "application/x-www-form-urlencoded").header("Origin", "http://evil.example")
                    .header(Guard.CSRF_HEADER, served.csrf())
                    .POST(HttpRequest.BodyPublishers.ofString(form)).build(), HttpResponse.BodyHandlers.ofString());
            assertEquals(403, otherOrigin.statusCode());

            HttpResponse<String> fetchedCrossSite = served.client.send(HttpRequest.newBuilder(served.uri("/api/plans"))
                    .header("Content-Type", "application/x-www-form-urlencoded").header("Sec-Fetch-Site", "cross-site")
                    .header(Guard.CSRF_HEADER, served.csrf())
                    .POST(HttpRequest.BodyPublishers.ofString(form)).build(), HttpResponse.BodyHandlers.ofString());
            assertEquals(403, fetchedCrossSite.statusCode());

            HttpResponse<String> forgedToken = served.client.send(HttpRequest.newBuilder(served.uri("/api/plans"))
                    .header("Content-Type", "application/x-www-form-urlencoded").header(Guard.CSRF_HEADER, "0".repeat(32))
                    .POST(HttpRequest.BodyPublishers.ofString(form)).build(), HttpResponse.BodyHandlers.ofString());
            assertEquals(403, forgedToken.statusCode());
            assertEquals("refused: a change must come from the workbench's own pages (reload the page and try again)",
                    forgedToken.body());
            try (Stream<Path> saved = Files.list(served.plans)) {
                assertEquals(0, saved.count());
            }
        }
    }

    @Test
    void anOversizedUploadIsRefusedAndLeavesNoFile() throws Exception {
        try (Served served = Served.start(folder, null, 1024, folder.resolve("h.sqlite").toString())) {
            Path sheet = folder.resolve("big.csv");
            Files.writeString(sheet, "unit,result\n" + "U-1,pass\n".repeat(600));
            long before = uploadFolders();
            HttpResponse<String> reply = served.upload("/api/sentence?plan=bolts&file=big.csv", sheet);
            assertEquals(413, reply.statusCode());
            assertTrue(reply.body().contains("the sheet is larger than the workbench accepts (1 KiB; start it with a"
                    + " larger --upload-limit)"), reply.body());
            assertEquals(before, uploadFolders());
        }
    }

    @Test
    void aPlanNameThatIsAPathIsRefused() throws Exception {
        try (Served served = Served.start(folder)) {
            HttpResponse<String> saved = served.post("/api/plans", "aql=1%25&ltpd=5%25&name=..%2F..%2Fetc%2Fpasswd");
            assertEquals(400, saved.statusCode());
            assertTrue(saved.body().contains("\"field\":\"name\""), saved.body());
            assertTrue(saved.body().contains("the plan name '../../etc/passwd' may hold only letters, digits, '-' and"
                    + " '_'"), saved.body());
            HttpResponse<String> opened = served.get("/api/plan?name=..%2F..%2Fetc%2Fpasswd");
            assertEquals(400, opened.statusCode());
            assertFalse(opened.body().contains("root:"), opened.body());
            try (Stream<Path> files = Files.walk(folder)) {
                assertFalse(files.anyMatch(p -> p.getFileName().toString().startsWith("passwd")));
            }
        }
    }

    @Test
    void aSupplierNamedLikeAScriptIsShownAsText() throws Exception {
        try (Served served = Served.start(folder)) {
            HttpResponse<String> page = served.get("/supplier?name=%3Cscript%3Ealert(1)%3C%2Fscript%3E");
            assertEquals(200, page.statusCode());
            assertFalse(page.body().contains("<script>alert(1)"), page.body());
            assertTrue(page.body().contains("&lt;script&gt;alert(1)&lt;/script&gt;"), page.body());
            assertEquals(Guard.POLICY, page.headers().firstValue("Content-Security-Policy").orElseThrow());
            assertEquals("nosniff", page.headers().firstValue("X-Content-Type-Options").orElseThrow());
        }
    }

    @Test
    void aPageRenamedToThisMachineByAnotherSiteIsTurnedAway() throws Exception {
        try (Served served = Served.start(folder)) {
            // The JDK's client will not send a Host header of our choosing; a socket will.
            try (java.net.Socket socket = new java.net.Socket(served.workbench.address().getHost(),
                    served.workbench.address().getPort())) {
                socket.getOutputStream().write(("GET / HTTP/1.1\r\nHost: rebound.example:" + served.workbench.address().getPort()
                        + "\r\nConnection: close\r\n\r\n").getBytes(java.nio.charset.StandardCharsets.US_ASCII));
                String answer = new String(socket.getInputStream().readAllBytes(), java.nio.charset.StandardCharsets.UTF_8);
                assertTrue(answer.startsWith("HTTP/1.1 403"), answer);
                assertTrue(answer.endsWith("this workbench answers only to 127.0.0.1, localhost or [::1]"), answer);
            }
        }
    }

    @Test
    void uploadsTakeTheirNameFromTheWorkbenchNotTheBrowser() {
        assertEquals("csv", Uploads.kindOf("../../etc/passwd.csv"));
        assertEquals("xlsx", Uploads.kindOf("Lot 7.XLSX"));
        assertEquals(null, Uploads.kindOf("../../etc/passwd"));
        assertEquals(null, Uploads.kindOf("sheet.csv/.."));
    }

    private static long uploadFolders() throws Exception {
        try (Stream<Path> files = Files.list(Path.of(System.getProperty("java.io.tmpdir")))) {
            return files.filter(p -> p.getFileName().toString().startsWith("lotgate-upload-")).count();
        }
    }
}
