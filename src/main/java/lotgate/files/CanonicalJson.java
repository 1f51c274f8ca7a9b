package lotgate.files;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.json.JsonMapper;
import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

/**
 * The canonical form of a JSON value that fingerprints and hash chains are computed over: object
 * keys sorted at every level, no white space, numbers as Jackson writes Java doubles and ints, UTF-8.
 */
public final class CanonicalJson {
    private static final ObjectMapper COMPACT = JsonMapper.builder().build();

    private CanonicalJson() {
    }

    public static String text(JsonNode node) {
        try {
            return COMPACT.writeValueAsString(sorted(node));
        } catch (JsonProcessingException e) {
            throw new IllegalStateException(e);
        }
    }

    /** "sha256:" and the SHA-256 of a text's UTF-8 bytes, in hexadecimal. */
    public static String sha256(String text) {
        try {
            byte[] digest = MessageDigest.getInstance("SHA-256").digest(text.getBytes(StandardCharsets.UTF_8));
            return HexFormat.of().formatHex(digest);
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException(e);
        }
    }

    private static Object sorted(JsonNode node) {
        if (node.isObject()) {
            Map<String, Object> map = new TreeMap<>();
            node.fields().forEachRemaining(e -> map.put(e.getKey(), sorted(e.getValue())));
            return map;
        }
        if (node.isArray()) {
            List<Object> list = new ArrayList<>();
            node.forEach(element -> list.add(sorted(element)));
            return list;
        }
        return node;
    }
}
