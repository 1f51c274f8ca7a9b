package lotgate.history;

import java.time.Instant;
import java.time.LocalDate;

/**
 * A record as the audit reads it, without its full content: a sentenced or imported lot, or a
 * supplier's corrective action ({@code kind} "action").
 *
 * @param supersedes the record this one corrects, or 0
 * @param hash       the record's chain hash, which with {@code seq} places it in the chain ({@code verify --expect})
 * @param reinstatesNormal whether the lot was accepted with a count between a reduced plan's acceptance and
 *                   rejection numbers, which reinstates normal inspection
 */
public record LotRow(long seq, Instant recordedAt, String kind, String supplier, String part, String lot,
        int lotSize, LocalDate received, String verdict, int inspected, int nonconforming, String severity,
        String production, long supersedes, String hash, boolean reinstatesNormal) {

    public boolean accepted() {
        return "accept".equals(verdict);
    }

    public boolean isLot() {
        return "lot".equals(kind);
    }

    public boolean steady() {
        return !"irregular".equals(production);
    }
}
