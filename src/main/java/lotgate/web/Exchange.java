package lotgate.web;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.net.URLDecoder;
import java.nio.charset.StandardCharsets;
import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;
import java.util.function.Function;

/**
 * One request as the workbench sees it: method, path, query and form fields, headers and cookies, and
 * the body as a stream read at most once. Independent of the server library.
 */
final class Exchange {
    /** Largest form body read into memory (form fields, not sheets). */
    static final int FORM_LIMIT = 256 * 1024;

    private final String method;
    private final String path;
    private final Map<String, String> query;
    private final Function<String, String> headers;
    private final Map<String, String> cookies;
    private final long contentLength;
    private final InputStream body;
    private Map<String, String> form;

    Exchange(String method, String path, Map<String, String> query, Function<String, String> headers,
            Map<String, String> cookies, long contentLength, InputStream body) {
        this.method = method.toUpperCase(Locale.ROOT);
        this.path = path;
        this.query = query;
        this.headers = headers;
        this.cookies = cookies;
        this.contentLength = contentLength;
        this.body = body;
    }

    String method() {
        return method;
    }

    String path() {
        return path;
    }

    /** A query parameter, or null. */
    String query(String name) {
        return query.get(name);
    }

    Map<String, String> queryParameters() {
        return query;
    }

    /** A request header (any case), or null. */
    String header(String name) {
        return headers.apply(name);
    }

    String cookie(String name) {
        return cookies.get(name);
    }

    /** The declared body length, or -1 when the client did not say. */
    long contentLength() {
        return contentLength;
    }

    InputStream body() {
        return body;
    }

    /**
     * The fields of a url-encoded form body, read once (at most FORM_LIMIT bytes).
     *
     * @throws Refusal when the body is larger
     */
    Map<String, String> form() throws IOException {
        if (form == null) {
            if (contentLength > FORM_LIMIT) {
                throw new Refusal(413, "the form is larger than " + FORM_LIMIT / 1024 + " KiB");
            }
            ByteArrayOutputStream bytes = new ByteArrayOutputStream();
            byte[] buffer = new byte[8192];
            int read;
            while ((read = body.read(buffer)) >= 0) {
                bytes.write(buffer, 0, read);
                if (bytes.size() > FORM_LIMIT) {
                    throw new Refusal(413, "the form is larger than " + FORM_LIMIT / 1024 + " KiB");
                }
            }
            form = parseFields(bytes.toString(StandardCharsets.UTF_8));
        }
        return form;
    }

    /** A form field, or null. */
    String field(String name) throws IOException {
        return form().get(name);
    }

    /** Fields of a query string or url-encoded body; the first of repeated names wins. */
    static Map<String, String> parseFields(String text) {
        Map<String, String> fields = new LinkedHashMap<>();
        if (text == null || text.isEmpty()) {
            return fields;
        }
        for (String pair : text.split("&")) {
            if (pair.isEmpty()) {
                continue;
            }
            int equals = pair.indexOf('=');
            String name = equals < 0 ? pair : pair.substring(0, equals);
            String value = equals < 0 ? "" : pair.substring(equals + 1);
            try {
                fields.putIfAbsent(URLDecoder.decode(name, StandardCharsets.UTF_8),
                        URLDecoder.decode(value, StandardCharsets.UTF_8));
            } catch (IllegalArgumentException e) {
                throw new Refusal(400, "a form field is not properly encoded");
            }
        }
        return fields;
    }

    /** A request the workbench will not serve, with the HTTP status and the reason shown to the user. */
    static class Refusal extends RuntimeException {
        private static final long serialVersionUID = 1L;
        private final int status;

        Refusal(int status, String message) {
            super(message, null, false, false);
            this.status = status;
        }

        int status() {
            return status;
        }

        /** The answer: the reason as plain text. */
        Reply reply() {
            return Reply.text(status, getMessage());
        }
    }
}
