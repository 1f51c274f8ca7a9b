package lotgate.report;

/**
 * Where a lot's record sits in the history store, as its outputs show it: the record's number and
 * its chain hash (which 'lotgate verify --expect SEQ:HASH' checks later), and the store, its password
 * masked. A copy of any output thus proves that the store still holds the record.
 */
public record HistoryPlace(long seq, String hash, String store) {
    /** "#12, chain hash 3f9a..." */
    public String text() {
        return "#" + seq + " in " + store + ", chain hash " + hash;
    }

    /** What to keep for verify: "SEQ:HASH". */
    public String expect() {
        return seq + ":" + hash;
    }
}
