package lotgate.history;

import com.fasterxml.jackson.databind.JsonNode;
import java.time.Instant;

/**
 * One record of the store as written: its place in the chain, when it was written, its canonical
 * content and the hashes that chain it to the record before.
 */
public record StoredRecord(long seq, Instant recordedAt, String content, String previousHash, String hash) {
    public JsonNode json() {
        try {
            return lotgate.files.JsonTree.lenient(content);
        } catch (java.io.IOException e) {
            throw new StoreException("record " + seq + " holds malformed content", e);
        }
    }

    /** The chain's hash of a record: SHA-256 over the previous hash, the place, the time and the content. */
    public static String hashOf(String previousHash, long seq, Instant recordedAt, String content) {
        return hashOf(previousHash, seq, recordedAt.toString(), content);
    }

    /** The chain's hash of a record whose time is given as the store writes it (ISO-8601, as Instant prints). */
    static String hashOf(String previousHash, long seq, String recordedAt, String content) {
        return lotgate.files.CanonicalJson.sha256Lines(previousHash, Long.toString(seq), recordedAt, content);
    }
}
