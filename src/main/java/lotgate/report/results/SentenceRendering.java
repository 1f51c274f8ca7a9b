package lotgate.report.results;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import lotgate.inspection.InspectionSample;
import lotgate.inspection.LotDetails;
import lotgate.jobs.SentenceLot;
import lotgate.plan.SavedPlan;
import lotgate.report.CsvTable;
import lotgate.report.DecisionJson;
import lotgate.report.Json;
import lotgate.report.PlanWording;
import lotgate.report.SentenceText;
import lotgate.sampling.SequentialPlan;
import lotgate.sampling.SinglePlan;
import lotgate.sentencing.ClassVerdict;
import lotgate.sentencing.Evidence;
import lotgate.sentencing.LotDecision;
import lotgate.sentencing.Pending;
import lotgate.sentencing.Sentence;
import lotgate.sentencing.Stopping;

/** A sentenced lot (or one not decided yet) as text, JSON or CSV, with its place in the supplier's history. */
public final class SentenceRendering {
    private SentenceRendering() {
    }

    /** The result as text. */
    public static String text(SentenceLot.Result result) {
        if (result instanceof SentenceLot.Undecided undecided) {
            return pending(undecided, "text");
        }
        SentenceLot.Decided decided = (SentenceLot.Decided) result;
        return Text.of(out -> {
            printText(out, decided.decision(), decided.outputs());
            if (decided.recording() != null) {
                printHistory(out, decided.recording());
            }
        });
    }

    /** The result as JSON: the decision record with its history, or the instruction to inspect more. */
    public static ObjectNode json(SentenceLot.Result result) {
        if (result instanceof SentenceLot.Undecided undecided) {
            return pendingJson(undecided);
        }
        SentenceLot.Decided decided = (SentenceLot.Decided) result;
        ObjectNode node = DecisionJson.of(decided.decision());
        if (decided.recording() != null) {
            node.set("history", history(decided.recording()));
        }
        return node;
    }

    /** The result as CSV: a row per defect class, or the instruction to inspect more. */
    public static String csv(SentenceLot.Result result) {
        if (result instanceof SentenceLot.Undecided undecided) {
            return pending(undecided, "csv");
        }
        return csv(((SentenceLot.Decided) result).decision());
    }

    private static ObjectNode history(SentenceLot.Recording recording) {
        ObjectNode node = Json.object();
        node.put("store", recording.store());
        node.put("severityApplied", recording.applied().label());
        node.put("switchingRules", recording.rulesEdition());
        node.put("recorded", recording.recorded());
        if (recording.recorded()) {
            node.put("seq", recording.record().seq());
            node.put("recordHash", recording.record().hash());
            node.put("expect", recording.record().seq() + ":" + recording.record().hash());
            node.put("severityNext", recording.next().label());
            if (recording.caused() != null) {
                node.put("switch", recording.caused().from().label() + " to " + recording.caused().to().label());
                node.put("switchReason", recording.caused().reason());
            }
            if (recording.supersedes() > 0) {
                node.put("supersedes", recording.supersedes());
            }
        }
        return node;
    }

    private static void printHistory(PrintWriter out, SentenceLot.Recording recording) {
        out.println("  inspection severity: " + recording.applied().label() + " (" + recording.rulesEdition()
                + " switching rules)");
        if (!recording.recorded()) {
            out.println("  not recorded (--no-record)");
            return;
        }
        out.println("  recorded as #" + recording.record().seq() + " in " + recording.store()
                + (recording.supersedes() > 0 ? ", superseding #" + recording.supersedes() : ""));
        out.println("  chain hash " + recording.record().hash() + " (keep it: 'lotgate verify --expect "
                + recording.record().seq() + ":" + recording.record().hash() + "' proves the store still holds it)");
        if (recording.caused() != null) {
            out.println("  SWITCH: " + recording.caused().from().label() + " to " + recording.caused().to().label()
                    + " inspection for the next lot: " + recording.caused().reason());
        } else {
            out.println("  next lot of this part: " + recording.next().label() + " inspection");
        }
    }

    /** A plan in stages or a sequential plan that has not decided yet: what to inspect next. */
    private static ObjectNode pendingJson(SentenceLot.Undecided undecided) {
        SavedPlan plan = undecided.plan();
        Pending pending = undecided.pending();
        LotDetails lot = undecided.lot();
        Stopping.Point point = pending.point();
        String what = instruction(undecided);
        var node = Json.object();
        node.put("verdict", "continue");
        node.put("lot", lot.lot());
        node.put("plan", plan.name());
        node.put("planFingerprint", plan.fingerprint());
        node.put("inspected", point.inspected());
        node.put("nonconforming", point.found());
        node.put("step", point.step());
        if (point.acceptanceNumber() >= 0) {
            node.put("acceptanceNumber", point.acceptanceNumber());
        } else {
            node.putNull("acceptanceNumber");
        }
        node.put("rejectionNumber", point.rejectionNumber());
        node.put("moreUnits", point.moreUnits());
        node.put("nextTotal", pending.nextTotal());
        if (pending.cleanAcceptance() > 0) {
            node.put("acceptedIfCleanAfterUnit", pending.cleanAcceptance());
        }
        node.put("instruction", what);
        return node;
    }

    /** What to inspect next, in words. */
    public static String instruction(SentenceLot.Undecided undecided) {
        SavedPlan plan = undecided.plan();
        Pending pending = undecided.pending();
        Stopping.Point point = pending.point();
        if (pending.plan() instanceof SequentialPlan sequential) {
            return "inspect the next unit and sentence again with it on the sheet; with no further " + (plan.model()
                    .countsUnits() ? "nonconforming unit" : "nonconformity") + " the lot is accepted after unit "
                    + pending.cleanAcceptance() + " (the plan stops by unit " + sequential.truncation() + " at the latest)";
        }
        return "inspect the " + (pending.plan() instanceof lotgate.sampling.DoublePlan ? "second sample"
                : "next stage") + ": " + point.moreUnits() + " more units, then sentence again with all "
                + pending.nextTotal() + " units on the sheet";
    }

    private static String pending(SentenceLot.Undecided undecided, String format) {
        return Text.of(out -> {
            SavedPlan plan = undecided.plan();
            InspectionSample sample = undecided.sample();
            Pending pending = undecided.pending();
            LotDetails lot = undecided.lot();
            Stopping.Point point = pending.point();
            String counted = PlanWording.counted(plan.model(), (int) Math.min(Integer.MAX_VALUE, point.found()));
            String what = instruction(undecided);
            switch (format) {
                case "csv" -> out.print(CsvTable.table(List.of("lot", "verdict", "inspected", "nonconforming", "step", "moreUnits",
                        "nextTotal", "planFingerprint"), List.of(List.of(lot.lot(), "continue", point.inspected(),
                        point.found(), point.step(), point.moreUnits(), pending.nextTotal(), plan.fingerprint()))));
                default -> {
                    out.println("NO DECISION YET " + lotLine(lot));
                    out.println("  " + point.found() + " " + counted + " found in " + point.inspected() + " units ("
                            + point.step() + "): above the acceptance number " + PlanWording.acceptance(point.acceptanceNumber())
                            + " and below the rejection number " + point.rejectionNumber());
                    out.println("  plan " + plan.name() + " (fingerprint " + plan.shortFingerprint() + "), "
                            + PlanWording.brief(pending.plan()));
                    out.println("  sample of " + sample.units() + " units from " + sample.file() + ", " + SentenceLot.rowsOf(sample));
                    out.println();
                    out.println("  Next: " + what.replace("; ", ";\n        ") + ".");
                    out.println("  Nothing was recorded.");
                }
            }
        });
    }

    private static String where(InspectionSample sample, int row) {
        return sample.file().toString().toLowerCase(Locale.ROOT).endsWith(".csv") ? "row " + row
                : "sheet '" + sample.sheet() + "' row " + row;
    }

    /** The lot in one line: "lot A-17 (Arnwick, part 4410, 2000 units, received 2026-03-14)". */
    public static String lotLine(LotDetails lot) {
        List<String> parts = new ArrayList<>();
        if (lot.supplier() != null) {
            parts.add(lot.supplier());
        }
        if (lot.part() != null) {
            parts.add("part " + lot.part());
        }
        if (lot.lotSize() > 0) {
            parts.add(lot.lotSize() + " units");
        }
        if (lot.received() != null) {
            parts.add("received " + lot.received());
        }
        return "lot " + lot.lot() + (parts.isEmpty() ? "" : " (" + String.join(", ", parts) + ")");
    }

    private static void printText(PrintWriter out, LotDecision decision, SentenceLot.Outputs outputs) {
        Sentence sentence = decision.sentence();
        InspectionSample sample = decision.sample();
        if (decision.criticalFound()) {
            out.println("!! CRITICAL NONCONFORMITY FOUND " + "!".repeat(50));
            out.println("!! Quarantine this lot now. Follow the customer's requirements and local regulations for");
            out.println("!! critical nonconformities, whatever the verdict below says. Sampling cannot clear a lot");
            out.println("!! in which a critical nonconformity was found (" + where(sample, sample.firstCriticalRow())
                    + ").");
            out.println("!".repeat(83));
            out.println();
        }
        out.println((sentence.accepted() ? "ACCEPT " : "REJECT ") + lotLine(decision.lot()));
        out.println("  " + SentenceText.reason(decision));
        if (decision.measured() != null) {
            out.println("  plan " + decision.plan().name() + " (fingerprint " + decision.plan().shortFingerprint()
                    + "), variables plan " + PlanWording.brief(decision.plan().plan()));
            out.println("  " + PlanWording.measurement(decision.plan().measurement()));
        } else {
            out.println("  plan " + decision.plan().name() + " (fingerprint " + decision.plan().shortFingerprint()
                    + "), " + PlanWording.model(decision.plan().model(), decision.lot().lotSize()));
        }
        if (decision.measured() == null && !(decision.plan().classes().get(0).plan() instanceof SinglePlan)) {
            out.println("  " + decision.plan().plan().scheme() + " plan: " + PlanWording.brief(decision.plan().plan()));
        }
        out.println("  sample of " + sample.units() + " units from " + sample.file() + ", " + SentenceLot.rowsOf(sample));
        out.println();
        if (decision.measured() != null) {
            out.println("  Evidence (exact)");
            for (String line : SentenceText.measuredLines(decision)) {
                out.println("    " + line);
            }
            for (String notice : decision.notices()) {
                out.println();
                out.println((decision.measured().warnings().contains(notice) ? "  WARNING: " : "  Note: ") + notice
                        + ".");
            }
            out.println();
            out.println("  decided " + decision.decidedAt() + " by lotgate " + decision.toolVersion() + "; sheet sha256 "
                    + decision.sheetSha256());
            printWritten(out, outputs);
            return;
        }
        String what = decision.countsUnits() ? "nonconforming units" : "nonconformities";
        boolean staged = sentence.classes().stream().anyMatch(v -> !(v.plan() instanceof SinglePlan));
        String row = staged ? "  %-9s %10s %7s %13s %10s  %-8s %s%n" : "  %-9s %10s %7s %13s %10s  %s%n";
        out.printf(row, "class", "inspected", "found", "accept up to", "reject at", "verdict", "decided at");
        for (ClassVerdict verdict : sentence.classes()) {
            out.printf(row, verdict.defectClass().label(), verdict.inspected(), verdict.found(),
                    PlanWording.acceptance(verdict.acceptanceNumber()), verdict.rejectionNumber(),
                    verdict.accepted() ? "accept" : "REJECT", verdict.step());
        }
        out.println("  (found: " + what + ")");
        out.println();
        out.println("  Evidence (exact)");
        for (String line : SentenceText.evidenceLines(decision)) {
            out.println("    " + line);
        }
        for (String notice : decision.notices()) {
            out.println();
            out.println("  Note: " + notice + ".");
        }
        out.println();
        out.println("  decided " + decision.decidedAt() + " by lotgate " + decision.toolVersion() + "; sheet sha256 "
                + decision.sheetSha256());
        printWritten(out, outputs);
    }

    private static void printWritten(PrintWriter out, SentenceLot.Outputs outputs) {
        if (outputs.record() != null) {
            out.println("  record saved to " + outputs.record());
        }
        for (Path report : outputs.reports()) {
            out.println("  report written to " + report);
        }
        if (outputs.chart() != null) {
            out.println("  sampling chart written to " + outputs.chart());
        }
    }

    private static String csv(LotDecision decision) {
        List<List<Object>> rows = new ArrayList<>();
        for (ClassVerdict verdict : decision.sentence().classes()) {
            Evidence evidence = verdict.evidence();
            rows.add(List.of(decision.lot().lot(), verdict.defectClass().label(), verdict.inspected(), verdict.found(),
                    SentenceText.acceptanceCell(verdict), SentenceText.rejectionCell(verdict),
                    verdict.accepted() ? "accept" : "reject",
                    evidence.pValue(), evidence.lower(), evidence.upper(),
                    evidence.lotUpperBound() >= 0 ? evidence.lotUpperBound() : "", decision.sentence().verdict(),
                    decision.plan().fingerprint(), decision.sheetSha256()));
        }
        return CsvTable.table(List.of("lot", "class", "inspected", "nonconforming", "acceptanceNumber", "rejectionNumber",
                "classVerdict", "pValueAtAql", "lowerBound", "upperBound", "lotUpperBound", "verdict", "planFingerprint",
                "sheetSha256"), rows);
    }
}
