package lotgate.report.results;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.List;
import lotgate.jobs.DesignSinglePlan;
import lotgate.plan.SavedPlan;
import lotgate.report.Cautions;
import lotgate.report.CsvTable;
import lotgate.report.Json;
import lotgate.report.Percent;
import lotgate.report.PlanWording;
import lotgate.sampling.OcModel;
import lotgate.sampling.OperatingCharacteristic;
import lotgate.sampling.PlanRisks;
import lotgate.sampling.RiskPoints;
import lotgate.sampling.SinglePlan;

/** A single-plan design as text, JSON or CSV, and the answer when no plan meets a request. */
public final class DesignRendering {
    static final String FULL_INSPECTION = "inspect every unit of the lot (100% inspection)";

    private DesignRendering() {
    }

    /** The answer when no plan meets the request, as text. */
    public static String noPlanText(String reason) {
        return "No sampling plan meets the request: " + reason + "." + System.lineSeparator()
                + "Recommendation: inspect every unit of the lot (100% inspection), or relax the risks"
                + " or widen the gap between AQL and LTPD." + System.lineSeparator();
    }

    /** The answer when no plan meets the request, as JSON. */
    public static ObjectNode noPlanJson(String reason, OcModel model, int lotSize) {
        ObjectNode node = Json.object();
        node.put("planFound", false);
        node.put("model", model.name());
        node.put("reason", reason);
        node.put("recommendation", FULL_INSPECTION);
        if (lotSize > 0) {
            node.put("lotSize", lotSize);
        }
        return node;
    }

    /** The answer when no plan meets the request, as CSV. */
    public static String noPlanCsv(String reason) {
        return CsvTable.table(List.of("planFound", "reason", "recommendation"),
                List.of(List.of(false, reason, FULL_INSPECTION)));
    }

    /** "met" or "NOT MET". */
    static String verdict(boolean met) {
        return met ? "met" : "NOT MET";
    }

    /** The lot's defectives at a point of a hypergeometric model, " (D = 5)", or nothing. */
    static String pointNote(OcModel model, double point, int lotSize) {
        if (model instanceof OcModel.Hypergeometric) {
            return " (D = " + Math.round(point * lotSize) + ")";
        }
        return "";
    }

    /** A single-plan design as text. */
    public static String text(DesignSinglePlan.Result result) {
        return Text.of(out -> {
            OcModel model = result.model();
            int lotSize = result.lotSize();
            boolean classed = result.classed();
            if (classed) {
                out.println("Single sampling plan with criteria per defect class");
                out.println("  " + PlanWording.model(model, lotSize));
                out.println();
                out.println("  Inspect n = " + result.sampleSize() + " units; a class with a smaller sample is judged on"
                        + " the first units inspected.");
            }
            boolean zeroAcceptance = false;
            for (DesignSinglePlan.ClassOutcome outcome : result.classes()) {
                SinglePlan plan = outcome.found().plan();
                zeroAcceptance |= plan.c() == 0;
                out.println();
                if (classed) {
                    out.println("  " + outcome.defectClass().label() + " (" + describe(outcome.method(), plan) + ")");
                } else {
                    out.println("Single sampling plan" + switch (outcome.method()) {
                        case SavedPlan.GIVEN -> ", as given";
                        case SavedPlan.FIXED_ACCEPTANCE -> " with acceptance number " + plan.c()
                                + ": the smallest sample that meets the LTPD point";
                        default -> ": the smallest sample that meets both risks";
                    });
                    out.println("  " + PlanWording.model(model, lotSize));
                    out.println();
                }
                printClass(out, outcome, model, lotSize, classed ? "    " : "  ");
            }
            if (zeroAcceptance) {
                out.println();
                out.println(Cautions.ZERO_ACCEPTANCE.indent(2).stripTrailing());
            }
            if (result.saved() != null) {
                out.println();
                out.println("  Saved " + result.save().file() + " (fingerprint " + result.saved().shortFingerprint() + ")");
            }
        });
    }

    private static String describe(String method, SinglePlan plan) {
        return switch (method) {
            case SavedPlan.GIVEN -> "as given";
            case SavedPlan.FIXED_ACCEPTANCE -> "acceptance number " + plan.c() + " fixed";
            default -> "smallest sample meeting both risks";
        };
    }

    private static void printClass(PrintWriter out, DesignSinglePlan.ClassOutcome outcome, OcModel model, int lotSize,
            String indent) {
        SinglePlan plan = outcome.found().plan();
        PlanRisks risks = outcome.found().risks();
        RiskPoints points = outcome.points();
        out.printf("%sInspect n = %d units. Accept the lot with up to c = %d %s; reject it at %d or more.%n",
                indent, plan.n(), plan.c(), PlanWording.counted(model, plan.c()), plan.rejectionNumber());
        if (lotSize > 0 && plan.n() == lotSize) {
            out.println(indent + "The sample is the whole lot: this is 100% inspection.");
        }
        out.println();
        String unit = model.countsUnits() ? "" : " per unit";
        String row = indent + "%-6s %-22s %-11s %-24s %-8s%n";
        out.printf(indent + "%-6s %-22s %-11s %-24s %s%n", "point", "quality", "P(accept)", "risk", "allowed");
        out.printf(row, "AQL", Percent.level(points.aql()) + unit + pointNote(model, risks.aqlPoint(), lotSize),
                Percent.probability(1 - risks.producerRisk()), "producer's " + Percent.probability(risks.producerRisk()),
                String.format("%-8s%s", Percent.level(points.alpha()), verdict(risks.producerRisk() <= points.alpha())));
        out.printf(row, "LTPD", Percent.level(points.ltpd()) + unit + pointNote(model, risks.ltpdPoint(), lotSize),
                Percent.probability(risks.consumerRisk()), "consumer's " + Percent.probability(risks.consumerRisk()),
                String.format("%-8s%s", Percent.level(points.beta()), verdict(risks.consumerRisk() <= points.beta())));
        List<Integer> others = outcome.found().otherAcceptanceNumbers();
        if (!others.isEmpty()) {
            out.println();
            out.println(indent + "At n = " + plan.n() + " these acceptance numbers meet both risks too: c = "
                    + String.join(", ", others.stream().map(String::valueOf).toList())
                    + " (lower producer's risk, higher consumer's risk).");
        }
        for (String note : lotNotes(outcome, model, lotSize)) {
            out.println();
            out.println(wrap(note, indent));
        }
    }

    /** Text broken into lines of at most 104 characters, each starting with the indent. */
    private static String wrap(String text, String indent) {
        StringBuilder out = new StringBuilder();
        StringBuilder line = new StringBuilder(indent);
        for (String word : text.split(" ")) {
            if (line.length() > indent.length() && line.length() + 1 + word.length() > 104) {
                out.append(line).append('\n');
                line = new StringBuilder(indent);
            }
            if (line.length() > indent.length()) {
                line.append(' ');
            }
            line.append(word);
        }
        return out.append(line).toString();
    }

    /**
     * What a lot size adds to a single plan: the AOQ and ATI of rectifying inspection (a type B model), a hint
     * that the hypergeometric model fits a sample of more than a tenth of the lot, and for the hypergeometric
     * model an AQL below one nonconforming unit of the lot, which leaves no producer's risk to control.
     */
    static List<String> lotNotes(DesignSinglePlan.ClassOutcome outcome, OcModel model, int lotSize) {
        List<String> notes = new ArrayList<>();
        if (lotSize <= 0) {
            return notes;
        }
        SinglePlan plan = outcome.found().plan();
        RiskPoints points = outcome.points();
        if (model instanceof OcModel.Hypergeometric) {
            if (Math.round(outcome.found().risks().aqlPoint() * lotSize) == 0) {
                double oneUnit = 1.0 / lotSize;
                double accepted = plan.acceptance(model, oneUnit);
                notes.add("Note: the AQL " + Percent.level(points.aql()) + " is less than one nonconforming unit of a lot"
                        + " of " + lotSize + " (D = 0), so the producer's risk there is 0 by construction and the AQL"
                        + " point does not shape the plan. The lowest quality the plan can be judged at is one"
                        + " nonconforming unit, " + Percent.level(oneUnit) + " (D = 1): such a lot is accepted "
                        + Percent.probability(accepted) + " of the time (producer's risk " + Percent.probability(1
                        - accepted) + "). State the AQL as D = 1 or more to control the producer's risk.");
            }
            return notes;
        }
        if (plan.n() > 0.1 * lotSize && plan.n() < lotSize && model.countsUnits()) {
            notes.add("Note: the sample is " + Percent.level((double) plan.n() / lotSize) + " of the lot of " + lotSize
                    + " units, more than a tenth: for an isolated lot the hypergeometric model (--model"
                    + " hypergeometric --lot-size " + lotSize + ") is exact and often needs a smaller sample.");
        }
        if (plan.n() < lotSize) {
            OperatingCharacteristic oc = new OperatingCharacteristic(plan, model, lotSize);
            OperatingCharacteristic.Aoql aoql = oc.aoql();
            notes.add("With rectifying inspection (rejected lots of " + lotSize + " inspected 100%): AOQ "
                    + Percent.probability(plan.averageOutgoingQuality(model, points.aql(), lotSize)) + " at the AQL and "
                    + Percent.probability(plan.averageOutgoingQuality(model, points.ltpd(), lotSize)) + " at the LTPD;"
                    + " AOQL " + Percent.probability(aoql.limit()) + " at incoming " + Percent.probability(aoql.quality())
                    + "; ATI "
                    + String.format(java.util.Locale.ROOT, "%.1f", plan.averageTotalInspection(model, points.aql(),
                            lotSize)) + " units at the AQL and " + String.format(java.util.Locale.ROOT, "%.1f",
                            plan.averageTotalInspection(model, points.ltpd(), lotSize)) + " at the LTPD.");
        }
        return notes;
    }

    private static void putClass(ObjectNode node, DesignSinglePlan.ClassOutcome outcome, OcModel model, int lotSize) {
        SinglePlan plan = outcome.found().plan();
        PlanRisks risks = outcome.found().risks();
        RiskPoints points = outcome.points();
        node.put("method", outcome.method());
        node.put("n", plan.n());
        node.put("c", plan.c());
        node.put("rejectionNumber", plan.rejectionNumber());
        node.put("aql", points.aql());
        node.put("alpha", points.alpha());
        node.put("ltpd", points.ltpd());
        node.put("beta", points.beta());
        node.put("producerRisk", risks.producerRisk());
        node.put("consumerRisk", risks.consumerRisk());
        node.put("risksMet", risks.meets(points));
        var others = node.putArray("otherAcceptanceNumbers");
        outcome.found().otherAcceptanceNumbers().forEach(others::add);
        if (lotSize > 0 && !(model instanceof OcModel.Hypergeometric) && plan.n() < lotSize) {
            node.put("aoqAtAql", plan.averageOutgoingQuality(model, points.aql(), lotSize));
            node.put("aoqAtLtpd", plan.averageOutgoingQuality(model, points.ltpd(), lotSize));
            node.put("aoql", new OperatingCharacteristic(plan, model, lotSize).aoql().limit());
            node.put("atiAtAql", plan.averageTotalInspection(model, points.aql(), lotSize));
            node.put("atiAtLtpd", plan.averageTotalInspection(model, points.ltpd(), lotSize));
        }
        var notes = node.putArray("notes");
        lotNotes(outcome, model, lotSize).stream().filter(n -> n.startsWith("Note: ")).forEach(notes::add);
        if (lotSize > 0) {
            if (model instanceof OcModel.Hypergeometric) {
                node.put("defectivesAtAql", Math.round(risks.aqlPoint() * lotSize));
                node.put("defectivesAtLtpd", Math.round(risks.ltpdPoint() * lotSize));
            } else {
                node.put("defectivesAtAql", points.aql() * lotSize);
                node.put("defectivesAtLtpd", points.ltpd() * lotSize);
            }
        }
    }

    /** A single-plan design as JSON. */
    public static ObjectNode json(DesignSinglePlan.Result result) {
        OcModel model = result.model();
        int lotSize = result.lotSize();
        ObjectNode node = Json.object();
        node.put("planFound", true);
        node.put("scheme", "single");
        node.put("model", model.name());
        int sample = result.sampleSize();
        if (result.classed()) {
            node.put("sampleSize", sample);
            var list = node.putArray("classes");
            for (DesignSinglePlan.ClassOutcome outcome : result.classes()) {
                ObjectNode entry = list.addObject();
                entry.put("class", outcome.defectClass().label());
                putClass(entry, outcome, model, lotSize);
            }
        } else {
            putClass(node, result.classes().get(0), model, lotSize);
        }
        if (lotSize > 0) {
            node.put("lotSize", lotSize);
            node.put("fullInspection", sample == lotSize);
        }
        if (result.saved() != null) {
            node.put("fingerprint", result.saved().fingerprint());
        }
        return node;
    }

    /** A single-plan design as CSV, a row per class. */
    public static String csv(DesignSinglePlan.Result result) {
        List<String> header = List.of("class", "scheme", "model", "method", "n", "c", "rejectionNumber", "aql",
                "alpha", "ltpd", "beta", "producerRisk", "consumerRisk", "risksMet", "lotSize", "fingerprint");
        List<List<Object>> rows = new ArrayList<>();
        for (DesignSinglePlan.ClassOutcome outcome : result.classes()) {
            SinglePlan plan = outcome.found().plan();
            RiskPoints points = outcome.points();
            PlanRisks risks = outcome.found().risks();
            List<Object> row = new ArrayList<>(List.of(outcome.defectClass().label(), plan.scheme(),
                    result.model().name(), outcome.method(), plan.n(), plan.c(), plan.rejectionNumber(), points.aql(),
                    points.alpha(), points.ltpd(), points.beta(), risks.producerRisk(), risks.consumerRisk(),
                    risks.meets(points)));
            row.add(result.lotSize() > 0 ? result.lotSize() : "");
            row.add(result.saved() == null ? "" : result.saved().fingerprint());
            rows.add(row);
        }
        return CsvTable.table(header, rows);
    }
}
