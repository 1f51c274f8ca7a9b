package lotgate.inspection;

import java.util.ArrayList;
import java.util.List;

/**
 * Finds repeated unit identifiers in constant memory per unit: a 64-bit hash and a row number per
 * identifier. Two rows whose hashes meet are only suspects; the caller confirms them by reading the
 * earlier row's identifier again, so a hash collision never reports a false duplicate.
 */
final class UnitIds {
    /** Two rows whose identifiers hash alike. */
    record Suspect(int earlierRow, int row, String unit) {
    }

    private long[] hashes = new long[1 << 12];
    private int[] rows = new int[1 << 12];
    private int size;
    private final List<Suspect> suspects = new ArrayList<>();

    void add(String unit, int row) {
        long hash = hash(unit);
        if (hash == 0) {
            hash = 1;
        }
        if (2 * (size + 1) > hashes.length) {
            grow();
        }
        int mask = hashes.length - 1;
        for (int slot = (int) (hash ^ (hash >>> 32)) & mask; ; slot = (slot + 1) & mask) {
            if (hashes[slot] == 0) {
                hashes[slot] = hash;
                rows[slot] = row;
                size++;
                return;
            }
            if (hashes[slot] == hash) {
                if (suspects.size() < 1000) {
                    suspects.add(new Suspect(rows[slot], row, unit));
                }
                return;
            }
        }
    }

    List<Suspect> suspects() {
        return suspects;
    }

    /** Reads the suspected rows' identifiers again and refuses the first true repeat. */
    void confirm(SheetSource source, String sheet, int unitColumn) {
        if (suspects.isEmpty()) {
            return;
        }
        java.util.Map<Integer, String> wanted = new java.util.HashMap<>();
        suspects.forEach(s -> wanted.put(s.earlierRow(), null));
        source.read(sheet, (row, cells) -> {
            if (wanted.containsKey(row)) {
                for (Cell cell : cells) {
                    if (cell.column() == unitColumn) {
                        wanted.put(row, cell.text().trim());
                    }
                }
            }
        });
        for (Suspect suspect : suspects) {
            if (suspect.unit().equals(wanted.get(suspect.earlierRow()))) {
                throw new SheetException(source.file(), "unit '" + suspect.unit() + "' appears twice, "
                        + source.whereRow(sheet, suspect.earlierRow()) + " and row " + suspect.row()
                        + "; each unit of the sample must be recorded once");
            }
        }
    }

    private void grow() {
        long[] oldHashes = hashes;
        int[] oldRows = rows;
        hashes = new long[oldHashes.length * 2];
        rows = new int[oldRows.length * 2];
        size = 0;
        int mask = hashes.length - 1;
        for (int i = 0; i < oldHashes.length; i++) {
            long hash = oldHashes[i];
            if (hash != 0) {
                int slot = (int) (hash ^ (hash >>> 32)) & mask;
                while (hashes[slot] != 0) {
                    slot = (slot + 1) & mask;
                }
                hashes[slot] = hash;
                rows[slot] = oldRows[i];
                size++;
            }
        }
    }

    /** FNV-1a over the characters, then a 64-bit finalising mix. */
    private static long hash(String text) {
        long h = 0xcbf29ce484222325L;
        for (int i = 0; i < text.length(); i++) {
            h ^= text.charAt(i);
            h *= 0x100000001b3L;
        }
        h ^= h >>> 33;
        h *= 0xff51afd7ed558ccdL;
        h ^= h >>> 33;
        h *= 0xc4ceb9fe1a85ec53L;
        h ^= h >>> 33;
        return h;
    }
}
