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
    /**
     * One digest per thread, reset by each use, with room for the bytes it is fed: looking the algorithm up, and a
     * copy of each text in UTF-8, cost an import of many lots.
     */
    private static final ThreadLocal<Hashing> SHA_256 = ThreadLocal.withInitial(Hashing::new);

    private static final class Hashing {
        final MessageDigest digest;
        final byte[] bytes = new byte[4096];

        Hashing() {
            try {
                digest = MessageDigest.getInstance("SHA-256");
            } catch (NoSuchAlgorithmException e) {
                throw new IllegalStateException(e);
            }
        }

        /** Feeds the text's UTF-8 bytes to the digest: ASCII through the buffer, the rest from the first other character encoded. */
        void update(String text) {
            int length = text.length();
            int held = 0;
            for (int i = 0; i < length; i++) {
                char c = text.charAt(i);
                if (c >= 0x80) {
                    digest.update(bytes, 0, held);
                    digest.update(text.substring(i).getBytes(StandardCharsets.UTF_8));
                    return;
                }
                if (held == bytes.length) {
                    digest.update(bytes, 0, held);
                    held = 0;
                }
                bytes[held++] = (byte) c;
            }
            digest.update(bytes, 0, held);
        }
    }

    private CanonicalJson() {
    }

    public static String text(JsonNode node) {
        return JsonTree.sortedCompact(node);
    }

    /** The canonical text of an array of texts (a lot key's), as {@link #text} writes it. */
    public static String textArray(String... texts) {
        return JsonTree.textArray(texts);
    }

    /** The SHA-256 of a text's UTF-8 bytes, in hexadecimal. */
    public static String sha256(String text) {
        return sha256Lines(text);
    }

    /** The SHA-256 of the UTF-8 bytes of the lines joined by line feeds, as {@code sha256(String.join("\n", lines))}. */
    public static String sha256Lines(String... lines) {
        Hashing hashing = SHA_256.get();
        hashing.digest.reset();
        for (int i = 0; i < lines.length; i++) {
            if (i > 0) {
                hashing.digest.update((byte) '\n');
            }
            hashing.update(lines[i]);
        }
        return HexFormat.of().formatHex(hashing.digest.digest());
    }
}
