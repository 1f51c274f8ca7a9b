package lotgate.report.results;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.util.List;
import java.util.Locale;
import lotgate.jobs.DesignVariablesPlan;
import lotgate.plan.Measurement;
import lotgate.plan.PlanFormat;
import lotgate.plan.SavedPlan;
import lotgate.report.Cautions;
import lotgate.report.CsvTable;
import lotgate.report.Json;
import lotgate.report.Percent;
import lotgate.report.PlanWording;
import lotgate.sampling.PlanRisks;
import lotgate.sampling.RiskPoints;
import lotgate.sampling.SinglePlan;
import lotgate.sampling.VariablesDesigner;
import lotgate.sampling.VariablesPlan;

/** A variables plan's design as text, JSON or CSV, beside the attribute plan for the same risks. */
public final class VariablesDesignRendering {
    private VariablesDesignRendering() {
    }

    /** The design as text. */
    public static String text(DesignVariablesPlan.Result result) {
        return Text.of(out -> printText(out, result));
    }

    private static void printText(PrintWriter out, DesignVariablesPlan.Result result) {
        VariablesDesigner.Design design = result.design();
        VariablesDesigner.Design known = result.known();
        SinglePlan single = result.single();
        Measurement measurement = result.measurement();
        RiskPoints points = result.points();
        SavedPlan saved = result.saved();
        VariablesDesigner.Design lowerDesign = result.lowerDesign();
        VariablesPlan plan = design.plan();
        boolean given = Double.isNaN(design.lowestK());
        out.println("Variables plan (k-method), sigma " + (plan.sigmaKnown() ? "known" : "unknown")
                + (given ? ", as given" : ": the smallest sample that meets both risks"));
        out.println("  " + PlanWording.measurement(measurement));
        out.println("  quality: the fraction of product beyond the limit" + (measurement.twoLimits() ? "s" : "")
                + ", measurements assumed normal");
        out.println();
        for (String line : PlanWording.rule(plan, measurement)) {
            out.println("  " + line);
        }
        if (!given) {
            out.printf(Locale.ROOT, "  (k = %.4f is the middle of the range %.4f to %.4f, every k of which meets both"
                    + " risks at n = %d%s.)%n", plan.k(), design.lowestK(), design.highestK(), plan.n(),
                    lowerDesign == null ? "" : " at the upper limit");
        }
        if (lowerDesign != null) {
            out.printf(Locale.ROOT, "  (the lower limit's k = %.4f is the middle of its range %.4f to %.4f.)%n",
                    lowerDesign.plan().k(), lowerDesign.lowestK(), lowerDesign.highestK());
        }
        out.println();
        PlanRisks risks = design.risks();
        String row = "  %-6s %-22s %-11s %-24s %-16s%n";
        out.printf(row, "point", "fraction beyond", "P(accept)", "risk", "allowed");
        out.printf(row, "AQL", Percent.level(points.aql()), Percent.probability(1 - risks.producerRisk()),
                "producer's " + Percent.probability(risks.producerRisk()), String.format("%-8s%s",
                        Percent.level(points.alpha()), DesignRendering.verdict(risks.producerRisk() <= points.alpha())));
        out.printf(row, "LTPD", Percent.level(points.ltpd()), Percent.probability(risks.consumerRisk()),
                "consumer's " + Percent.probability(risks.consumerRisk()), String.format("%-8s%s",
                        Percent.level(points.beta()), DesignRendering.verdict(risks.consumerRisk() <= points.beta())));
        if (lowerDesign != null) {
            RiskPoints lower = measurement.lowerDesign().designedFor();
            PlanRisks lowerRisks = lowerDesign.risks();
            out.printf(row, "AQL L", Percent.level(lower.aql()), Percent.probability(1 - lowerRisks.producerRisk()),
                    "producer's " + Percent.probability(lowerRisks.producerRisk()), String.format("%-8s%s",
                            Percent.level(lower.alpha()), DesignRendering.verdict(lowerRisks.producerRisk()
                                    <= lower.alpha())));
            out.printf(row, "LTPD L", Percent.level(lower.ltpd()), Percent.probability(lowerRisks.consumerRisk()),
                    "consumer's " + Percent.probability(lowerRisks.consumerRisk()), String.format("%-8s%s",
                            Percent.level(lower.beta()), DesignRendering.verdict(lowerRisks.consumerRisk()
                                    <= lower.beta())));
            out.println("  (AQL and LTPD: the upper limit's; AQL L and LTPD L: the lower limit's own, each with all"
                    + " nonconforming product beyond that limit)");
        } else if (measurement.twoLimits()) {
            out.println("  (risks with all nonconforming product beyond one limit; where both limits contribute the"
                    + " M-method accepts less often)");
        }
        out.println();
        if (single != null) {
            out.printf(Locale.ROOT, "  Against the attribute plan for the same risks (%s" + (lowerDesign == null ? ""
                    : ", the upper limit's") + "): %d units measured instead of %d inspected, %+.1f%%.%n", "n = " + single.n() + ", c = " + single.c(), plan.n(), single.n(),
                    100.0 * (plan.n() - single.n()) / single.n());
        }
        if (lowerDesign != null) {
            VariablesDesigner.Design upperAlone = VariablesDesigner.design(points, plan.sigmaKnown());
            VariablesDesigner.Design lowerAlone = VariablesDesigner.design(measurement.lowerDesign().designedFor(),
                    plan.sigmaKnown());
            out.printf(Locale.ROOT, "  Each limit alone would need n = %d (upper) and n = %d (lower); the plan measures"
                    + " the larger sample for both.%n", upperAlone.plan().n(), lowerAlone.plan().n());
        } else if (plan.sigmaKnown() && !given) {
            out.printf(Locale.ROOT, "  Closed form: n = %.2f, rounded up to %d; k = %.4f (common practice).%n",
                    design.exactSize(), plan.n(), design.closedFormK());
        } else if (given) {
            out.printf(Locale.ROOT, "  The smallest plan for these risks: n = %d with sigma known, n = %d with sigma"
                    + " unknown.%n", known.plan().n(), VariablesDesigner.design(points, false).plan().n());
        } else {
            out.printf(Locale.ROOT, "  With sigma known the plan would need n = %d (k = %.4f). Wallis's approximation for"
                    + " an unknown sigma, n_sigma (1 + k^2/2) = %.1f, gives %d units; the exact answer is %d.%n",
                    known.plan().n(), known.plan().k(), design.wallis(), (int) Math.ceil(design.wallis() - 1e-9),
                    plan.n());
        }
        out.println();
        out.println(Cautions.VARIABLES.indent(2).stripTrailing());
        if (saved != null) {
            out.println();
            out.println("  Saved " + result.request().save().file() + " (fingerprint " + saved.shortFingerprint() + ")");
        }
    }

    /** The design as JSON. */
    public static ObjectNode json(DesignVariablesPlan.Result result) {
        VariablesDesigner.Design design = result.design();
        Measurement measurement = result.measurement();
        RiskPoints points = result.points();
        VariablesDesigner.Design lowerDesign = result.lowerDesign();
        VariablesPlan plan = design.plan();
        ObjectNode node = Json.object();
        node.put("planFound", true);
        node.put("scheme", "variables");
        boolean given = Double.isNaN(design.lowestK());
        node.put("method", given ? SavedPlan.GIVEN : SavedPlan.SMALLEST_SAMPLE);
        node.put("n", plan.n());
        node.put("k", plan.k());
        if (!given) {
            node.put("kLowest", design.lowestK());
            node.put("kHighest", design.highestK());
        }
        node.put("sigmaKnown", plan.sigmaKnown());
        node.put("limits", measurement.limits());
        if (measurement.limits().equals(Measurement.COMBINED)) {
            node.put("maxEstimate", plan.maxEstimate());
        }
        node.put("aql", points.aql());
        node.put("alpha", points.alpha());
        node.put("ltpd", points.ltpd());
        node.put("beta", points.beta());
        node.put("producerRisk", design.risks().producerRisk());
        node.put("consumerRisk", design.risks().consumerRisk());
        node.put("risksMet", design.risks().meets(points));
        ObjectNode closed = node.putObject("knownSigma");
        closed.put("exactN", design.exactSize());
        closed.put("n", result.known().plan().n());
        closed.put("closedFormK", design.closedFormK());
        closed.put("k", result.known().plan().k());
        ObjectNode wallis = node.putObject("wallis");
        wallis.put("n", design.wallis());
        wallis.put("nRounded", (int) Math.ceil(design.wallis() - 1e-9));
        SinglePlan single = result.single();
        if (single != null) {
            ObjectNode attribute = node.putObject("attribute");
            attribute.put("n", single.n());
            attribute.put("c", single.c());
            attribute.put("unitsSaved", single.n() - plan.n());
        }
        node.set("measurement", PlanFormat.measurementJson(measurement));
        if (lowerDesign != null) {
            ObjectNode lower = node.putObject("lowerLimit");
            lower.put("k", lowerDesign.plan().k());
            lower.put("kLowest", lowerDesign.lowestK());
            lower.put("kHighest", lowerDesign.highestK());
            lower.put("aql", measurement.lowerDesign().designedFor().aql());
            lower.put("ltpd", measurement.lowerDesign().designedFor().ltpd());
            lower.put("producerRisk", lowerDesign.risks().producerRisk());
            lower.put("consumerRisk", lowerDesign.risks().consumerRisk());
            lower.put("risksMet", lowerDesign.risks().meets(measurement.lowerDesign().designedFor()));
        }
        if (result.saved() != null) {
            node.put("fingerprint", result.saved().fingerprint());
        }
        return node;
    }

    /** The design as CSV. */
    public static String csv(DesignVariablesPlan.Result result) {
        VariablesDesigner.Design design = result.design();
        Measurement measurement = result.measurement();
        RiskPoints points = result.points();
        SavedPlan saved = result.saved();
        VariablesPlan plan = design.plan();
        return CsvTable.table(List.of("scheme", "n", "k", "sigmaKnown", "limits", "maxEstimate", "aql", "alpha", "ltpd",
                "beta", "producerRisk", "consumerRisk", "risksMet", "fingerprint"), List.of(List.of("variables", plan.n(),
                plan.k(), plan.sigmaKnown(), measurement.limits(), measurement.limits().equals(Measurement.COMBINED)
                        ? plan.maxEstimate() : "", points.aql(), points.alpha(), points.ltpd(), points.beta(),
                design.risks().producerRisk(), design.risks().consumerRisk(), design.risks().meets(points),
                saved == null ? "" : saved.fingerprint())));
    }
}
