package lotgate.web;

import java.io.IOException;
import java.io.InputStream;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;

/** The style sheet and scripts shipped inside the jar, served by name from a fixed list. */
final class Assets {
    private static final Map<String, String> TYPES = Map.of(
            "workbench.css", "text/css; charset=utf-8",
            "common.js", "text/javascript; charset=utf-8",
            "chart.js", "text/javascript; charset=utf-8",
            "design.js", "text/javascript; charset=utf-8",
            "sentence.js", "text/javascript; charset=utf-8",
            "suppliers.js", "text/javascript; charset=utf-8");
    private final Map<String, byte[]> loaded = new ConcurrentHashMap<>();

    /** The asset of that name, or null when there is none (names outside the list are never looked up). */
    Reply get(String name) throws IOException {
        String type = TYPES.get(name);
        if (type == null) {
            return null;
        }
        byte[] body = loaded.get(name);
        if (body == null) {
            try (InputStream in = Assets.class.getResourceAsStream("/lotgate/web/assets/" + name)) {
                if (in == null) {
                    return null;
                }
                body = in.readAllBytes();
            }
            loaded.put(name, body);
        }
        return new Reply(200, type, body, Map.of("Cache-Control", "max-age=300"));
    }
}
