package lotgate.files;

import com.fasterxml.jackson.databind.JsonNode;
import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;

/**
 * The canonical form of a JSON value that fingerprints and hash chains are computed over: object
 * keys sorted at every level, no white space, numbers as Jackson writes Java doubles and ints, UTF-8.
 */
public final class CanonicalJson {
    private CanonicalJson() {
    }

    public static String text(JsonNode node) {
        return JsonTree.sortedCompact(node);
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
}
