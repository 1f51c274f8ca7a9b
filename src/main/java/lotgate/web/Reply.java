package lotgate.web;

import java.nio.charset.StandardCharsets;
import java.util.LinkedHashMap;
import java.util.Map;

/** What the workbench answers: a status, a media type, the body and any extra headers. */
record Reply(int status, String contentType, byte[] body, Map<String, String> headers) {
    static final String HTML = "text/html; charset=utf-8";
    static final String JSON = "application/json; charset=utf-8";
    static final String TEXT = "text/plain; charset=utf-8";

    static Reply html(String page) {
        return new Reply(200, HTML, page.getBytes(StandardCharsets.UTF_8), Map.of());
    }

    static Reply json(int status, String json) {
        return new Reply(status, JSON, json.getBytes(StandardCharsets.UTF_8), Map.of());
    }

    static Reply text(int status, String text) {
        return new Reply(status, TEXT, text.getBytes(StandardCharsets.UTF_8), Map.of());
    }

    static Reply redirect(String location) {
        return new Reply(303, TEXT, new byte[0], Map.of("Location", location));
    }

    /** A file offered for download under a name the workbench chose. */
    static Reply download(String contentType, byte[] body, String fileName) {
        return new Reply(200, contentType, body,
                Map.of("Content-Disposition", "attachment; filename=\"" + fileName.replaceAll("[^A-Za-z0-9._-]", "_")
                        + "\""));
    }

    Reply withHeader(String name, String value) {
        Map<String, String> more = new LinkedHashMap<>(headers);
        more.put(name, value);
        return new Reply(status, contentType, body, more);
    }
}
