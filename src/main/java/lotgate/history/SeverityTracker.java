package lotgate.history;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.List;

/**
 * Follows one supplier's part through its lots and applies the switching rules: each lot is judged
 * under the severity in force when it arrives, and its outcome may switch the severity for the next.
 */
public final class SeverityTracker {
    /** A change of severity, after the lot that caused it, with the reason in words. */
    public record Switch(String lot, Severity from, Severity to, String reason) {
    }

    private final SwitchingRules rules;
    private Severity severity = Severity.NORMAL;
    private final Deque<Boolean> recentOnNormal = new ArrayDeque<>();
    private final Deque<String> recentLots = new ArrayDeque<>();
    private int acceptedInRow;
    private long defectivesInRow;
    private int rejectedOnTightened;
    private int lotsOnTightened;
    private final List<Switch> switches = new ArrayList<>();

    public SeverityTracker(SwitchingRules rules) {
        this.rules = rules;
    }

    /** The severity the next lot is to be inspected under. */
    public Severity severity() {
        return severity;
    }

    public List<Switch> switches() {
        return List.copyOf(switches);
    }

    /**
     * Takes the outcome of a lot sentenced on original inspection.
     *
     * @param defectives    the nonconforming units found in its sample
     * @param steady        whether production was steady
     * @return the switch this lot caused, or null
     */
    public Switch lot(String lot, boolean accepted, long defectives, boolean steady) {
        return lot(lot, accepted, false, defectives, steady);
    }

    /**
     * Takes the outcome of a lot sentenced on original inspection.
     *
     * @param reinstatesNormal whether the lot was accepted with a count between the reduced plan's acceptance
     *                         and rejection numbers, which ends reduced inspection
     */
    public Switch lot(String lot, boolean accepted, boolean reinstatesNormal, long defectives, boolean steady) {
        if (severity == Severity.DISCONTINUED) {
            throw new IllegalStateException("inspection is discontinued until a corrective action is recorded");
        }
        return switch (severity) {
            case NORMAL -> onNormal(lot, accepted, defectives, steady);
            case TIGHTENED -> onTightened(lot, accepted);
            case REDUCED -> onReduced(lot, accepted, reinstatesNormal, steady);
            case DISCONTINUED -> null;
        };
    }

    /** A supplier's corrective action lifts a discontinuation: inspection resumes on tightened. */
    public Switch correctiveAction(String reason) {
        if (severity != Severity.DISCONTINUED) {
            return null;
        }
        return move(null, Severity.TIGHTENED, "corrective action recorded: " + reason);
    }

    private Switch onNormal(String lot, boolean accepted, long defectives, boolean steady) {
        recentOnNormal.addLast(accepted);
        recentLots.addLast(lot);
        while (recentOnNormal.size() > rules.tightenWithin()) {
            recentOnNormal.removeFirst();
            recentLots.removeFirst();
        }
        long rejected = recentOnNormal.stream().filter(a -> !a).count();
        if (rejected >= rules.tightenRejected()) {
            List<String> which = new ArrayList<>();
            var outcomes = new ArrayList<>(recentOnNormal);
            var lots = new ArrayList<>(recentLots);
            for (int i = 0; i < outcomes.size(); i++) {
                if (!outcomes.get(i)) {
                    which.add(lots.get(i));
                }
            }
            return move(lot, Severity.TIGHTENED, rejected + " of the last " + outcomes.size()
                    + " lots not accepted (" + String.join(", ", which) + ")");
        }
        if (accepted) {
            acceptedInRow++;
            defectivesInRow += defectives;
        } else {
            acceptedInRow = 0;
            defectivesInRow = 0;
        }
        if (acceptedInRow >= rules.reduceAfterAccepted() && steady
                && (rules.reduceDefectiveLimit() < 0 || defectivesInRow <= rules.reduceDefectiveLimit())) {
            String limit = rules.reduceDefectiveLimit() < 0 ? "" : ", " + defectivesInRow
                    + " nonconforming units found in them (limit " + rules.reduceDefectiveLimit() + ")";
            return move(lot, Severity.REDUCED, acceptedInRow + " consecutive lots accepted on normal inspection with"
                    + " steady production" + limit);
        }
        if (acceptedInRow >= rules.reduceAfterAccepted()) {
            // Keep a sliding run of the latest lots, so that a limit can still be met later.
            acceptedInRow = rules.reduceAfterAccepted() - 1;
        }
        return null;
    }

    private Switch onTightened(String lot, boolean accepted) {
        lotsOnTightened++;
        if (accepted) {
            acceptedInRow++;
        } else {
            acceptedInRow = 0;
            rejectedOnTightened++;
        }
        if (rules.discontinueRejected() > 0 && rejectedOnTightened >= rules.discontinueRejected()) {
            return move(lot, Severity.DISCONTINUED, rejectedOnTightened + " lots not accepted while on tightened"
                    + " inspection: inspection is discontinued until the supplier's corrective action is recorded");
        }
        if (rules.discontinueLotsOnTightened() > 0 && lotsOnTightened >= rules.discontinueLotsOnTightened()
                && acceptedInRow < rules.normalAfterAccepted()) {
            return move(lot, Severity.DISCONTINUED, lotsOnTightened + " consecutive lots on tightened inspection:"
                    + " inspection is discontinued until the supplier's corrective action is recorded");
        }
        if (acceptedInRow >= rules.normalAfterAccepted()) {
            return move(lot, Severity.NORMAL, acceptedInRow + " consecutive lots accepted on tightened inspection");
        }
        return null;
    }

    private Switch onReduced(String lot, boolean accepted, boolean reinstatesNormal, boolean steady) {
        if (!accepted) {
            return move(lot, Severity.NORMAL, "lot " + lot + " not accepted on reduced inspection");
        }
        if (reinstatesNormal) {
            return move(lot, Severity.NORMAL, "lot " + lot + " accepted on reduced inspection with a count between"
                    + " the acceptance and rejection numbers");
        }
        if (!steady) {
            return move(lot, Severity.NORMAL, "irregular production");
        }
        return null;
    }

    private Switch move(String lot, Severity to, String reason) {
        Switch change = new Switch(lot, severity, to, reason);
        severity = to;
        recentOnNormal.clear();
        recentLots.clear();
        acceptedInRow = 0;
        defectivesInRow = 0;
        rejectedOnTightened = 0;
        lotsOnTightened = 0;
        switches.add(change);
        return change;
    }
}
