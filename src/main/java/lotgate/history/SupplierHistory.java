package lotgate.history;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * A supplier's part as its lot sequence: corrections replace the records they supersede in place,
 * and the switching rules are replayed over the lots and corrective actions in order.
 */
public final class SupplierHistory {
    /** A lot with the severity it was inspected under and the switch it caused, if any. */
    public record Entry(LotRow row, Severity inspectedUnder, SeverityTracker.Switch caused) {
    }

    private final List<Entry> entries = new ArrayList<>();
    private final List<SeverityTracker.Switch> switches = new ArrayList<>();
    private final Severity current;
    private final SeverityTracker tracker;

    /** Builds the history of one supplier's part from its rows in record order. */
    public SupplierHistory(List<LotRow> rows, SwitchingRules rules) {
        Map<Long, LotRow> replacement = new HashMap<>();
        for (LotRow row : rows) {
            if (row.supersedes() > 0) {
                replacement.put(row.supersedes(), row);
            }
        }
        tracker = new SeverityTracker(rules);
        for (LotRow row : rows) {
            if (row.supersedes() > 0) {
                continue;
            }
            LotRow effective = row;
            while (replacement.containsKey(effective.seq())) {
                effective = replacement.get(effective.seq());
            }
            if (row.isLot()) {
                Severity under = tracker.severity();
                SeverityTracker.Switch change = under == Severity.DISCONTINUED ? null
                        : tracker.lot(effective.lot(), effective.accepted(), effective.reinstatesNormal(),
                                effective.nonconforming(), effective.steady());
                entries.add(new Entry(effective, under, change));
                if (change != null) {
                    switches.add(change);
                }
            } else {
                SeverityTracker.Switch change = tracker.correctiveAction(reasonOf(row));
                if (change != null) {
                    switches.add(change);
                }
            }
        }
        current = tracker.severity();
    }

    private static String reasonOf(LotRow row) {
        return "recorded " + row.recordedAt().toString().substring(0, 10);
    }

    /** The severity the next lot is to be inspected under. */
    public Severity current() {
        return current;
    }

    /**
     * The switching state after the last record, to be carried forward over lots that follow it, so that
     * an import of many lots judges each without replaying the history again. Advancing it leaves this
     * history's entries and {@link #current()} as they are.
     */
    public SeverityTracker continuation() {
        return tracker;
    }

    public List<Entry> entries() {
        return List.copyOf(entries);
    }

    public List<SeverityTracker.Switch> switches() {
        return List.copyOf(switches);
    }

    /** The supplier's rows grouped by part, in record order. */
    public static Map<String, List<LotRow>> byPart(List<LotRow> rows) {
        Map<String, List<LotRow>> parts = new LinkedHashMap<>();
        for (LotRow row : rows) {
            parts.computeIfAbsent(row.part(), p -> new ArrayList<>()).add(row);
        }
        return parts;
    }
}
