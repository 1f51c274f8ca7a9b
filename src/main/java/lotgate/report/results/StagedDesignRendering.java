package lotgate.report.results;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.util.List;
import java.util.Locale;
import lotgate.jobs.DesignStagedPlan;
import lotgate.plan.PlanFormat;
import lotgate.plan.SavedPlan;
import lotgate.report.CsvTable;
import lotgate.report.Json;
import lotgate.report.Percent;
import lotgate.report.PlanWording;
import lotgate.sampling.DoublePlan;
import lotgate.sampling.DoublePlanDesigner;
import lotgate.sampling.MultiplePlan;
import lotgate.sampling.OcModel;
import lotgate.sampling.Plan;
import lotgate.sampling.PlanRisks;
import lotgate.sampling.RiskPoints;
import lotgate.sampling.SequentialPlan;
import lotgate.sampling.SinglePlan;
import lotgate.sampling.Stage;
import lotgate.sampling.WaldSequential;

/** A double, multiple or sequential plan's design as text, JSON or CSV, beside the single plan for its risks. */
public final class StagedDesignRendering {
    private StagedDesignRendering() {
    }

    /** The design as text. */
    public static String text(DesignStagedPlan.Result result) {
        return Text.of(out -> printText(out, result, result.points(), result.saved()));
    }

    /** The design as JSON. */
    public static ObjectNode json(DesignStagedPlan.Result result) {
        return json(result, result.points(), result.saved());
    }

    /** The design as CSV. */
    public static String csv(DesignStagedPlan.Result result) {
        return csv(result, result.points(), result.saved());
    }

    private static void printText(PrintWriter out, DesignStagedPlan.Result result, RiskPoints points, SavedPlan saved) {
        OcModel model = result.request().model();
        int lotSize = result.request().lotSize();
        Plan plan = result.plan();
        out.println(PlanWording.kind(plan) + switch (result.method()) {
            case SavedPlan.SMALLEST_ASN -> ": the smallest ASN at " + (result.request().asnAt() == null ? "the AQL"
                    : Percent.level(result.request().asnAt())) + " that meets both risks";
            case SavedPlan.WALD -> ": Wald's lines, truncated at " + ((SequentialPlan) plan).truncation()
                    + " units" + (result.request().truncateAt() == null ? " (3 times the single plan's n)" : "");
            default -> ", as given";
        });
        out.println("  " + PlanWording.model(model, lotSize));
        if (result.method().equals(SavedPlan.SMALLEST_ASN)) {
            DoublePlanDesigner.Space space = result.request().space();
            out.println("  searched: " + (space.ratio() == null ? "every n2" : "n2 = " + ratioText(space.ratio())
                    + " x n1") + ", " + (space.firstRejection() == null ? "r1 = c2 + 1" : "r1 = " + space.firstRejection())
                    + "; " + result.candidates() + " plans evaluated, exact within that space");
        }
        out.println();
        String counted = model.countsUnits() ? "nonconforming units" : "nonconformities";
        if (plan instanceof DoublePlan twice) {
            out.printf("  First sample:  inspect n1 = %d units. Accept with up to c1 = %d %s; reject at r1 = %d or more.%n",
                    twice.n1(), twice.c1(), PlanWording.counted(model, twice.c1()), twice.r1());
            out.printf("  Second sample: otherwise inspect n2 = %d more. Accept with up to c2 = %d over both samples;"
                    + " reject at %d or more.%n", twice.n2(), twice.c2(), twice.c2() + 1);
        } else if (plan instanceof MultiplePlan multiple) {
            out.printf("  %-6s %8s %10s %13s %10s%n", "stage", "inspect", "in total", "accept up to", "reject at");
            int total = 0;
            for (int i = 0; i < multiple.stages().size(); i++) {
                Stage stage = multiple.stages().get(i);
                total += stage.n();
                out.printf("  %-6d %8d %10d %13s %10d%n", i + 1, stage.n(), total, PlanWording.acceptance(stage.c()),
                        stage.r());
            }
            out.println("  (counts over all units inspected so far: " + counted + ")");
        } else {
            printLines(out, result, (SequentialPlan) plan, counted, points);
        }
        out.println();
        printRisks(out, result, points);
        out.println();
        printCosts(out, result, points);
        if (saved != null) {
            out.println();
            out.println("  Saved " + result.request().save().file() + " (fingerprint " + saved.shortFingerprint() + ")");
        }
    }

    private static String ratioText(double ratio) {
        return ratio == Math.rint(ratio) ? String.valueOf((long) ratio) : String.valueOf(ratio);
    }

    private static void printLines(PrintWriter out, DesignStagedPlan.Result result, SequentialPlan plan, String counted,
            RiskPoints points) {
        WaldSequential lines = result.lines();
        boolean adjusted = Math.abs(lines.alpha() - points.alpha()) > 1e-9 * points.alpha()
                || Math.abs(lines.beta() - points.beta()) > 1e-9 * points.beta();
        String nominal = "  Lines drawn for nominal risks alpha = " + Percent.probability(lines.alpha()) + " and beta = "
                + Percent.probability(lines.beta());
        out.println(!adjusted ? "  Lines drawn for alpha = " + Percent.level(points.alpha()) + " and beta = "
                + Percent.level(points.beta()) + " (Wald)."
                : result.risks().meets(points) ? nominal + ", so that the truncated plan meets "
                        + Percent.level(points.alpha()) + " and " + Percent.level(points.beta()) + " exactly."
                        : nominal + "; the truncated plan does not meet " + Percent.level(points.alpha()) + " and "
                                + Percent.level(points.beta()) + " (see its risks below).");
        out.printf(Locale.ROOT, "  After each unit m: accept the lot when the count is at most -%.4f + %.6f m,%n"
                + "  reject it when the count is at least %.4f + %.6f m, otherwise inspect the next unit.%n", plan.h1(),
                plan.slope(), plan.h2(), plan.slope());
        out.printf(Locale.ROOT, "  h1 = %.6f, h2 = %.6f, s = %.6f. At unit %d accept with up to %d %s, reject at %d.%n",
                plan.h1(), plan.h2(), plan.slope(), plan.truncation(), plan.acceptanceNumber(plan.truncation()), counted,
                plan.rejectionNumber(plan.truncation()));
        out.println();
        out.printf("  %-7s %28s %28s%n", "count", "accepts from unit", "rejects up to unit");
        int finalAcceptance = plan.acceptanceNumber(plan.truncation());
        for (int count = 0; count <= Math.min(finalAcceptance + 1, 12); count++) {
            int acceptFrom = PlanWording.firstUnitAccepting(plan, count);
            int rejectUpTo = PlanWording.lastUnitRejecting(plan, count);
            out.printf("  %-7d %28s %28s%n", count, acceptFrom > 0 ? String.valueOf(acceptFrom) : "never",
                    rejectUpTo > 0 ? (rejectUpTo == plan.truncation() ? "the end (" + rejectUpTo + ")"
                            : String.valueOf(rejectUpTo)) : "never");
        }
        if (finalAcceptance + 1 > 12) {
            out.println("  (counts above 12: see 'lotgate curve' or the plan's lines)");
        }
    }

    private static void printRisks(PrintWriter out, DesignStagedPlan.Result result, RiskPoints points) {
        OcModel model = result.request().model();
        int lotSize = result.request().lotSize();
        PlanRisks risks = result.risks();
        String unit = model.countsUnits() ? "" : " per unit";
        boolean wald = result.plan() instanceof SequentialPlan;
        WaldSequential lines = wald ? result.lines() : null;
        if (wald) {
            out.println("  Risks of the truncated plan, exact; Wald's approximation for its lines, untruncated, beside"
                    + " them");
        }
        String row = "  %-6s %-22s %-11s %-24s %-16s%s%n";
        out.printf(row, "point", "quality", "P(accept)", "risk", "allowed", wald ? "Wald's P(accept)" : "");
        out.printf(row, "AQL", Percent.level(points.aql()) + unit + DesignRendering.pointNote(model, risks.aqlPoint(), lotSize),
                Percent.probability(1 - risks.producerRisk()), "producer's " + Percent.probability(risks.producerRisk()),
                String.format("%-8s%s", Percent.level(points.alpha()), DesignRendering.verdict(risks.producerRisk()
                        <= points.alpha())), wald ? Percent.probability(lines.acceptance(points.aql())) : "");
        out.printf(row, "LTPD", Percent.level(points.ltpd()) + unit + DesignRendering.pointNote(model, risks.ltpdPoint(),
                lotSize), Percent.probability(risks.consumerRisk()), "consumer's " + Percent.probability(
                risks.consumerRisk()), String.format("%-8s%s", Percent.level(points.beta()), DesignRendering.verdict(
                risks.consumerRisk() <= points.beta())), wald ? Percent.probability(lines.acceptance(points.ltpd())) : "");
        if (!risks.meets(points)) {
            out.println();
            out.println("  The plan does not meet every risk asked for" + (wald ? ": truncation changes Wald's risks;"
                    + (result.request().plainWald() ? " leave out --plain-wald to redraw the lines until it does."
                    : " try a later --truncate-at, or a double plan.") : "."));
        }
    }

    private static void printCosts(PrintWriter out, DesignStagedPlan.Result result, RiskPoints points) {
        OcModel model = result.request().model();
        Plan plan = result.plan();
        SinglePlan single = result.single();
        double aql = model.producerPoint(points.aql());
        double ltpd = model.consumerPoint(points.ltpd());
        out.println("  What it costs" + (single == null ? "" : ", against the single plan for the same risks ("
                + PlanWording.brief(single) + ")") + ":");
        String row = "  %-42s %10s %10s %9s%n";
        out.printf(row, "", single == null ? "" : "single", plan.scheme(), single == null ? "" : "change");
        costRow(out, row, "ASN at the AQL " + Percent.level(points.aql()), single == null ? Double.NaN : single.n(),
                plan.averageSampleNumber(model, aql));
        costRow(out, row, "ASN at the LTPD " + Percent.level(points.ltpd()), single == null ? Double.NaN : single.n(),
                plan.averageSampleNumber(model, ltpd));
        if (plan instanceof DoublePlan && result.request().curtailed()) {
            costRow(out, row, "ASN at the AQL, second sample curtailed", single == null ? Double.NaN : single.n(),
                    ((DoublePlan) plan).curtailedAverageSampleNumber(model, aql));
            costRow(out, row, "ASN at the LTPD, second sample curtailed", single == null ? Double.NaN : single.n(),
                    ((DoublePlan) plan).curtailedAverageSampleNumber(model, ltpd));
        }
        if (plan instanceof SequentialPlan sequential) {
            WaldSequential lines = result.lines();
            out.printf(row, "Wald's ASN at the AQL (untruncated)", "", String.format(Locale.ROOT, "%.1f",
                    lines.averageSampleNumber(points.aql())), "");
            out.printf(row, "Wald's ASN at the LTPD (untruncated)", "", String.format(Locale.ROOT, "%.1f",
                    lines.averageSampleNumber(points.ltpd())), "");
            double top = sequential.slope();
            out.printf(row, "ASN at its peak, near " + Percent.measured(top), "", String.format(Locale.ROOT, "%.1f",
                    sequential.averageSampleNumber(model, top)), "");
        }
        costRow(out, row, "most units inspected", single == null ? Double.NaN : single.n(), plan.maxSampleSize());
    }

    private static void costRow(PrintWriter out, String row, String label, double single, double value) {
        double change = (value - single) / single;
        String saving = Double.isNaN(single) ? "" : String.format(Locale.ROOT, "%+.1f%%", 100 * change);
        out.printf(row, label, Double.isNaN(single) ? "" : String.format(Locale.ROOT, "%.0f", single),
                value == Math.rint(value) ? String.format(Locale.ROOT, "%.0f", value)
                        : String.format(Locale.ROOT, "%.1f", value), saving);
    }

    private static ObjectNode json(DesignStagedPlan.Result result, RiskPoints points, SavedPlan saved) {
        OcModel model = result.request().model();
        int lotSize = result.request().lotSize();
        Plan plan = result.plan();
        ObjectNode node = Json.object();
        node.put("planFound", true);
        node.put("scheme", plan.scheme());
        node.put("model", model.name());
        node.put("method", result.method());
        ObjectNode structure = PlanFormat.planJson(plan);
        structure.remove("scheme");
        node.setAll(structure);
        putRisks(node, result, points);
        double aql = model.producerPoint(points.aql());
        double ltpd = model.consumerPoint(points.ltpd());
        node.put("asnAtAql", plan.averageSampleNumber(model, aql));
        node.put("asnAtLtpd", plan.averageSampleNumber(model, ltpd));
        node.put("maxSampleSize", plan.maxSampleSize());
        if (plan instanceof DoublePlan twice) {
            node.put("curtailedAsnAtAql", twice.curtailedAverageSampleNumber(model, aql));
            node.put("curtailedAsnAtLtpd", twice.curtailedAverageSampleNumber(model, ltpd));
            if (result.method().equals(SavedPlan.SMALLEST_ASN)) {
                DoublePlanDesigner.Space space = result.request().space();
                ObjectNode search = node.putObject("search");
                if (space.ratio() == null) {
                    search.put("secondRatio", "free");
                } else {
                    search.put("secondRatio", space.ratio());
                }
                if (space.firstRejection() != null) {
                    search.put("firstRejection", space.firstRejection());
                }
                search.put("asnAt", result.asnLevel());
                search.put("plansEvaluated", result.candidates());
            }
        }
        if (plan instanceof SequentialPlan sequential) {
            WaldSequential lines = result.lines();
            ObjectNode wald = node.putObject("wald");
            wald.put("nominalAlpha", lines.alpha());
            wald.put("nominalBeta", lines.beta());
            wald.put("producerRisk", 1 - lines.acceptance(points.aql()));
            wald.put("consumerRisk", lines.acceptance(points.ltpd()));
            wald.put("asnAtAql", lines.averageSampleNumber(points.aql()));
            wald.put("asnAtLtpd", lines.averageSampleNumber(points.ltpd()));
        }
        if (result.single() != null) {
            ObjectNode single = node.putObject("single");
            single.put("n", result.single().n());
            single.put("c", result.single().c());
        }
        if (lotSize > 0) {
            node.put("lotSize", lotSize);
        }
        if (saved != null) {
            node.put("fingerprint", saved.fingerprint());
        }
        return node;
    }

    private static void putRisks(ObjectNode node, DesignStagedPlan.Result result, RiskPoints points) {
        node.put("aql", points.aql());
        node.put("alpha", points.alpha());
        node.put("ltpd", points.ltpd());
        node.put("beta", points.beta());
        node.put("producerRisk", result.risks().producerRisk());
        node.put("consumerRisk", result.risks().consumerRisk());
        node.put("risksMet", result.risks().meets(points));
    }

    private static String csv(DesignStagedPlan.Result result, RiskPoints points, SavedPlan saved) {
        OcModel model = result.request().model();
        int lotSize = result.request().lotSize();
        Plan plan = result.plan();
        return CsvTable.table(List.of("scheme", "model", "method", "plan", "aql", "alpha", "ltpd", "beta",
                "producerRisk", "consumerRisk", "risksMet", "asnAtAql", "asnAtLtpd", "maxSampleSize", "lotSize",
                "fingerprint"), List.of(List.of(plan.scheme(), model.name(), result.method(), PlanWording.brief(plan),
                points.aql(), points.alpha(), points.ltpd(), points.beta(), result.risks().producerRisk(),
                result.risks().consumerRisk(), result.risks().meets(points),
                plan.averageSampleNumber(model, model.producerPoint(points.aql())),
                plan.averageSampleNumber(model, model.consumerPoint(points.ltpd())),
                plan.maxSampleSize(), lotSize > 0 ? lotSize : "", saved == null ? "" : saved.fingerprint())));
    }
}
