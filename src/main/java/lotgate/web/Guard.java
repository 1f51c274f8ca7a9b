package lotgate.web;

import java.net.URI;
import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.util.Locale;
import java.util.Map;
import java.util.Set;

/**
 * The workbench's door: the host a loopback workbench answers to, the access token of one open to the
 * network, the CSRF token and same-origin check on every change, and the headers every answer carries.
 */
final class Guard {
    static final String ACCESS_COOKIE = "lotgate-access";
    static final String CSRF_HEADER = "X-Lotgate-Csrf";
    static final String POLICY = "default-src 'none'; script-src 'self'; style-src 'self'; img-src 'self' data:;"
            + " connect-src 'self'; form-action 'self'; base-uri 'none'; frame-ancestors 'none'";
    private static final Set<String> LOOPBACK_NAMES = Set.of("127.0.0.1", "localhost", "[::1]");

    private final Workbench.Settings settings;
    private final String csrfToken;

    Guard(Workbench.Settings settings, String csrfToken) {
        this.settings = settings;
        this.csrfToken = csrfToken;
    }

    /** Null when the request may pass; otherwise the answer that refuses it. */
    Reply check(Exchange exchange) {
        String method = exchange.method();
        if (!method.equals("GET") && !method.equals("HEAD") && !method.equals("POST")) {
            return Reply.text(405, "the workbench answers GET and POST only").withHeader("Allow", "GET, HEAD, POST");
        }
        if (settings.loopback() && !LOOPBACK_NAMES.contains(hostName(exchange.header("Host")))) {
            // A page elsewhere that renamed itself to this machine's address (DNS rebinding) is turned away.
            return Reply.text(403, "this workbench answers only to 127.0.0.1, localhost or [::1]");
        }
        if (settings.accessToken() != null) {
            Reply refused = checkToken(exchange);
            if (refused != null) {
                return refused;
            }
        }
        if (method.equals("POST")) {
            return checkChange(exchange);
        }
        return null;
    }

    private Reply checkToken(Exchange exchange) {
        String given = exchange.query("token");
        if (given != null) {
            if (!same(given, settings.accessToken())) {
                return Reply.text(401, "the access token is wrong: open the address the workbench printed at start");
            }
            if (exchange.method().equals("GET")) {
                // Keep the token in a cookie of this site only and take it out of the address bar.
                return Reply.redirect(exchange.path()).withHeader("Set-Cookie", ACCESS_COOKIE + "="
                        + settings.accessToken() + "; Path=/; HttpOnly; SameSite=Strict");
            }
            return null;
        }
        String authorization = exchange.header("Authorization");
        if (authorization != null && authorization.startsWith("Bearer ")
                && same(authorization.substring(7).trim(), settings.accessToken())) {
            return null;
        }
        String cookie = exchange.cookie(ACCESS_COOKIE);
        if (cookie != null && same(cookie, settings.accessToken())) {
            return null;
        }
        return Reply.text(401, "this workbench needs its access token: open the address it printed at start");
    }

    private Reply checkChange(Exchange exchange) {
        String site = exchange.header("Sec-Fetch-Site");
        if (site != null && !site.equals("same-origin") && !site.equals("none")) {
            return Reply.text(403, "refused: a change must come from the workbench's own pages");
        }
        String origin = exchange.header("Origin");
        if (origin != null && !origin.equals("null") && !sameHost(origin, exchange.header("Host"))) {
            return Reply.text(403, "refused: a change must come from the workbench's own pages");
        }
        String token = exchange.header(CSRF_HEADER);
        if (token == null || !same(token, csrfToken)) {
            return Reply.text(403, "refused: a change must come from the workbench's own pages"
                    + " (reload the page and try again)");
        }
        return null;
    }

    /** The headers every answer carries. */
    static Map<String, String> headers() {
        return Map.of(
                "Content-Security-Policy", POLICY,
                "X-Content-Type-Options", "nosniff",
                "X-Frame-Options", "DENY",
                "Referrer-Policy", "no-referrer",
                "Cross-Origin-Opener-Policy", "same-origin",
                "Cross-Origin-Resource-Policy", "same-origin");
    }

    private static boolean sameHost(String origin, String host) {
        if (host == null) {
            return false;
        }
        try {
            URI uri = URI.create(origin);
            String authority = uri.getRawAuthority();
            return authority != null && authority.equalsIgnoreCase(host);
        } catch (IllegalArgumentException e) {
            return false;
        }
    }

    private static String hostName(String host) {
        if (host == null) {
            return "";
        }
        String name = host.trim().toLowerCase(Locale.ROOT);
        if (name.startsWith("[")) {
            int end = name.indexOf(']');
            return end < 0 ? name : name.substring(0, end + 1);
        }
        int colon = name.indexOf(':');
        return colon < 0 ? name : name.substring(0, colon);
    }

    private static boolean same(String given, String expected) {
        return MessageDigest.isEqual(given.getBytes(StandardCharsets.UTF_8), expected.getBytes(StandardCharsets.UTF_8));
    }
}
