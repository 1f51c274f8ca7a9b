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
    /** One digest per thread, reset by each use: looking the algorithm up costs an import of many lots. */
    private static final ThreadLocal<MessageDigest> SHA_256 = ThreadLocal.withInitial(() -> {
        try {
            return MessageDigest.getInstance("SHA-256");
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException(e);
        }
    });

    private CanonicalJson() {
    }

    public static String text(JsonNode node) {
        return JsonTree.sortedCompact(node);
    }

    /** "sha256:" and the SHA-256 of a text's UTF-8 bytes, in hexadecimal. */
    public static String sha256(String text) {
        return HexFormat.of().formatHex(SHA_256.get().digest(text.getBytes(StandardCharsets.UTF_8)));
    }
}
