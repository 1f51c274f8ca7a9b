package lotgate.jobs;

import java.nio.file.Path;
import java.time.Instant;
import java.time.temporal.ChronoUnit;
import java.util.List;
import lotgate.history.HistoryStore;
import lotgate.history.LotRow;
import lotgate.history.RecordContent;
import lotgate.history.Severity;
import lotgate.history.SeverityTracker;
import lotgate.history.StoredRecord;
import lotgate.history.SupplierHistory;
import lotgate.history.SwitchingRules;
import lotgate.inspection.LotDetails;
import lotgate.plan.DefectClass;
import lotgate.plan.PlanFamily;
import lotgate.plan.PlanFormat;
import lotgate.plan.SavedPlan;
import lotgate.report.DecisionJson;
import lotgate.sentencing.LotDecision;

/**
 * A lot's place in its supplier's history while it is sentenced: the severity the switching rules
 * ask for, the plan that severity selects from a family, and the record the decision becomes.
 *
 * @param lot the lot's details with its supplier and part spelt as the store records them
 * @param notice a note for the answer (the plan a family fell back to, the names respelt), or null
 * @param supersedes the record the lot's sentence corrects, or 0
 */
record Inspection(HistoryStore store, SwitchingRules rules, LotDetails lot, Severity severity, SavedPlan plan,
        Path planFile, String notice, long supersedes) implements AutoCloseable {

    static Inspection open(String storeLocation, Path planFile, boolean family, LotDetails lot, Long supersedes) {
        PlanFamily plans = family ? PlanFamily.read(planFile) : null;
        SwitchingRules rules = family ? SwitchingRules.fromJson(plans.switching()) : SwitchingRules.CURRENT;
        // The job never creates a store: the face decides where one may be created (and says so).
        HistoryStore store = HistoryStore.open(storeLocation, false);
        try {
            RecordedNames.Names names = RecordedNames.of(store, lot.supplier(), lot.part());
            String renamed = null;
            if (!names.supplier().equals(lot.supplier()) || !names.part().equals(lot.part())) {
                renamed = "recorded under the store's spelling '" + names.supplier() + "', part '" + names.part()
                        + "' (given as '" + lot.supplier() + "', part '" + lot.part() + "')";
                lot = new LotDetails(lot.lot(), names.supplier(), names.part(), lot.lotSize(), lot.received(),
                        lot.inspector());
            }
            List<LotRow> rows = store.rows(lot.supplier(), lot.part());
            SupplierHistory history = new SupplierHistory(rows, rules);
            Severity severity = history.current();
            if (supersedes == null) {
                for (SupplierHistory.Entry entry : history.entries()) {
                    if (entry.row().lot().equals(lot.lot())) {
                        throw new JobException(JobException.Kind.CONFLICT, "lot", "lot " + lot.lot() + " of " + lot.supplier() + ", part "
                                + lot.part() + " is already recorded as #" + entry.row().seq() + " in "
                                + store.location() + "; to correct that record, sentence again with --supersedes "
                                + entry.row().seq() + " --reason TEXT");
                    }
                }
            }
            if (supersedes != null) {
                severity = correctedSeverity(store, history, lot, supersedes);
            } else if (severity == Severity.DISCONTINUED) {
                SeverityTracker.Switch last = history.switches().get(history.switches().size() - 1);
                throw new JobException(JobException.Kind.DISCONTINUED, "part", "inspection of part " + lot.part() + " from "
                        + lot.supplier() + " is discontinued since lot " + last.lot() + " (" + last.reason() + ");"
                        + " record the supplier's corrective action with 'lotgate corrective-action' first");
            }
            SavedPlan plan;
            Path file = planFile;
            String notice = null;
            if (plans == null) {
                plan = PlanFormat.read(planFile);
                if (severity != Severity.NORMAL) {
                    notice = "the switching rules call for " + severity.label() + " inspection of this part; the plan"
                            + " given was applied as it is (a plan family switches plans with the severity)";
                }
            } else {
                String wanted = severity.label();
                if (!plans.variants().containsKey(wanted)) {
                    if (severity == Severity.TIGHTENED) {
                        throw new JobException(JobException.Kind.BAD_INPUT, "planFile", planFile + ": the switching rules call for tightened"
                                + " inspection, but the family has no tightened plan");
                    }
                    notice = "the family has no " + wanted + " plan: the normal plan was applied";
                    wanted = "normal";
                }
                plan = plans.variants().get(wanted);
                file = plans.files().get(wanted);
            }
            if (renamed != null) {
                notice = notice == null ? renamed : renamed + "; " + notice;
            }
            return new Inspection(store, rules, lot, severity, plan, file, notice, supersedes == null ? 0 : supersedes);
        } catch (RuntimeException e) {
            store.close();
            throw e;
        }
    }

    /** The severity the corrected lot was inspected under, after checking that the record can be corrected. */
    private static Severity correctedSeverity(HistoryStore store, SupplierHistory history, LotDetails lot, long seq) {
        StoredRecord old = store.record(seq);
        if (old == null) {
            throw new JobException(JobException.Kind.CONFLICT, "supersedes", "--supersedes " + seq + ": the store " + store.location()
                    + " has no record " + seq);
        }
        var content = old.json();
        if (!"lot".equals(content.path("kind").asText()) || !lot.supplier().equals(content.path("supplier").asText())
                || !lot.part().equals(content.path("part").asText())) {
            throw new JobException(JobException.Kind.CONFLICT, "supersedes", "--supersedes " + seq + ": record " + seq + " is not a lot of "
                    + lot.supplier() + ", part " + lot.part());
        }
        for (SupplierHistory.Entry entry : history.entries()) {
            if (entry.row().seq() == seq || entry.row().supersedes() == seq) {
                return entry.inspectedUnder();
            }
        }
        throw new JobException(JobException.Kind.CONFLICT, "supersedes", "--supersedes " + seq + ": record " + seq + " was already corrected;"
                + " supersede its latest correction instead");
    }

    /** The store's location as shown to people. */
    String storeLocation() {
        return store.location();
    }

    /** What the lot was inspected under, with nothing recorded. */
    SentenceLot.Recording unrecorded() {
        return new SentenceLot.Recording(store.location(), severity, rules.edition(), null, null, null, supersedes);
    }

    /** Appends the lot's record and says what it was inspected under and what comes next. */
    SentenceLot.Recording record(LotDecision decision, String production, String reason,
            java.util.function.Consumer<StoredRecord> beforeCommit) {
        int nonconforming = decision.sample().all().nonconformingUnits(DefectClass.ANY);
        RecordContent.Lot content = new RecordContent.Lot(lot.supplier(), lot.part(), decision.lot().lot(),
                decision.lot().lotSize(), decision.lot().received(), decision.lot().inspector(),
                decision.sentence().verdict(), decision.sample().units(), nonconforming, decision.sample().defectTypes(),
                severity.label(), production, supersedes, reason);
        var record = RecordContent.lot(content, DecisionJson.of(decision), "sentence");
        if (decision.sentence().reinstatesNormal()) {
            record.put(RecordContent.REINSTATES_NORMAL, true);
        }
        StoredRecord stored = store.append(record,
                Instant.now().truncatedTo(ChronoUnit.MILLIS), beforeCommit);
        SupplierHistory after = new SupplierHistory(store.rows(lot.supplier(), lot.part()), rules);
        SeverityTracker.Switch caused = null;
        for (SupplierHistory.Entry entry : after.entries()) {
            if (entry.row().seq() == stored.seq()) {
                caused = entry.caused();
            }
        }
        return new SentenceLot.Recording(store.location(), severity, rules.edition(), stored, after.current(), caused,
                supersedes);
    }

    @Override
    public void close() {
        store.close();
    }
}
