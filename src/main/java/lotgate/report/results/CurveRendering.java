package lotgate.report.results;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.List;
import lotgate.jobs.EvaluatePlan;
import lotgate.jobs.KeyLevels;
import lotgate.jobs.PlanChoice;
import lotgate.plan.PlanFormat;
import lotgate.report.Cautions;
import lotgate.report.CsvTable;
import lotgate.report.Json;
import lotgate.report.Percent;
import lotgate.report.PlanWording;
import lotgate.sampling.CurvePoint;
import lotgate.sampling.SinglePlan;
import lotgate.sampling.VariablesPlan;
import lotgate.sampling.WaldSequential;

/** A plan's curves and key quality levels as text, JSON or CSV. */
public final class CurveRendering {
    private CurveRendering() {
    }

    /** The curve table and key levels as text. */
    public static String text(EvaluatePlan.Result result) {
        return Text.of(out -> printText(out, result));
    }

    private static String quality(PlanChoice choice, double level) {
        if (choice.model().countsUnits()) {
            return Percent.measured(level);
        }
        return Percent.measured(level) + " per unit";
    }

    private static void printText(PrintWriter out, EvaluatePlan.Result result) {
        PlanChoice choice = result.choice();
        List<CurvePoint> table = result.table();
        KeyLevels keys = result.keys();
        Double markAql = result.markAql();
        Double markLtpd = result.markLtpd();
        boolean curtailed = result.curtailed();
        boolean staged = !(choice.plan() instanceof SinglePlan) && !(choice.plan() instanceof VariablesPlan);
        WaldSequential wald = result.wald();
        out.println("Operating characteristics of " + choice.title());
        out.println("  " + PlanWording.model(choice.plan(), choice.model(), choice.lotSize()));
        if (choice.saved() != null) {
            out.println("  plan file fingerprint " + choice.saved().shortFingerprint());
        }
        out.println();
        boolean finite = table.get(0).defectives() >= 0;
        boolean ati = choice.lotSize() > 0;
        String qualityHeading = choice.model().countsUnits() ? "incoming" : "per unit";
        StringBuilder heading = new StringBuilder(String.format("  %10s", qualityHeading));
        if (finite) {
            heading.append(String.format(" %8s", "D"));
        }
        heading.append(String.format(" %11s %10s", "P(accept)", "AOQ"));
        if (ati) {
            heading.append(String.format(" %10s", "ATI"));
        }
        if (staged) {
            heading.append(String.format(" %10s", curtailed ? "ASN curt." : "ASN"));
        }
        if (wald != null) {
            heading.append(String.format(" %12s %10s", "Wald P(acc)", "Wald ASN"));
        }
        out.println(heading);
        for (CurvePoint point : table) {
            StringBuilder row = new StringBuilder(String.format("  %10s", Percent.level(point.quality())));
            if (finite) {
                row.append(Text.format(" %8d", point.defectives()));
            }
            row.append(String.format(" %11s %10s", Percent.probability(point.acceptance()),
                    Percent.measured(point.aoq())));
            if (ati) {
                row.append(Text.format(" %10.1f", point.ati()));
            }
            if (staged) {
                row.append(Text.format(" %10.1f", result.asn(point)));
            }
            if (wald != null) {
                row.append(Text.format(" %12s %10.1f", Percent.probability(wald.acceptance(point.quality())),
                        wald.averageSampleNumber(point.quality())));
            }
            out.println(row);
        }
        out.println();
        out.println("  Quality levels");
        String staircase = finite ? " (largest D/N with at least that P(accept))" : "";
        out.println("    P(accept) = 95% at " + quality(choice, keys.at95()) + staircase);
        out.println("    P(accept) = 50% at " + quality(choice, keys.at50()) + " (indifference quality)");
        out.println("    P(accept) = 10% at " + quality(choice, keys.at10()));
        out.println("    AOQL " + quality(choice, keys.aoql().limit()) + ", reached at incoming "
                + quality(choice, keys.aoql().quality())
                + (ati ? "" : " (for a very large lot; give --lot-size for the exact value)"));
        if (markAql != null) {
            out.println("    at the AQL " + Percent.level(markAql) + ": P(accept) = "
                    + Percent.probability(result.acceptanceAtAql()));
        }
        if (markLtpd != null) {
            out.println("    at the LTPD " + Percent.level(markLtpd) + ": P(accept) = "
                    + Percent.probability(result.acceptanceAtLtpd()));
        }
        if (wald != null) {
            out.println();
            out.println("  Wald's columns approximate the untruncated test; P(accept) and ASN are exact for the plan as"
                    + " truncated.");
        }
        if (choice.plan() instanceof SinglePlan single && single.c() == 0) {
            out.println();
            out.println(Cautions.ZERO_ACCEPTANCE.indent(2).stripTrailing());
        }
    }

    /** The curve table as CSV. */
    public static String csv(EvaluatePlan.Result result) {
        List<CurvePoint> table = result.table();
        WaldSequential wald = result.wald();
        List<List<Object>> rows = new ArrayList<>();
        for (CurvePoint point : table) {
            rows.add(List.of(point.quality(), point.defectives() >= 0 ? point.defectives() : "",
                    point.acceptance(), point.aoq(), Double.isNaN(point.ati()) ? "" : point.ati(), result.asn(point),
                    wald == null ? "" : wald.acceptance(point.quality()),
                    wald == null ? "" : wald.averageSampleNumber(point.quality())));
        }
        return CsvTable.table(List.of("quality", "defectivesInLot", "acceptance", "aoq", "ati", "asn",
                "waldAcceptance", "waldAsn"), rows);
    }

    /** The curves and key levels as JSON. */
    public static ObjectNode json(EvaluatePlan.Result result) {
        PlanChoice choice = result.choice();
        KeyLevels keys = result.keys();
        WaldSequential wald = result.wald();
        ObjectNode node = Json.object();
        node.put("scheme", choice.plan().scheme());
        node.put("model", choice.model().name());
        ObjectNode structure = PlanFormat.planJson(choice.plan());
        structure.remove("scheme");
        node.setAll(structure);
        node.put("curtailed", result.curtailed());
        if (choice.lotSize() > 0) {
            node.put("lotSize", choice.lotSize());
        }
        if (choice.saved() != null) {
            node.put("plan", choice.saved().name());
            node.put("fingerprint", choice.saved().fingerprint());
        }
        node.put("qualityAtAcceptance95", keys.at95());
        node.put("qualityAtAcceptance50", keys.at50());
        node.put("qualityAtAcceptance10", keys.at10());
        node.put("aoql", keys.aoql().limit());
        node.put("aoqlAt", keys.aoql().quality());
        if (result.markAql() != null) {
            node.put("acceptanceAtAql", result.acceptanceAtAql());
        }
        if (result.markLtpd() != null) {
            node.put("acceptanceAtLtpd", result.acceptanceAtLtpd());
        }
        ArrayNode points = node.putArray("points");
        for (CurvePoint point : result.table()) {
            ObjectNode row = points.addObject();
            row.put("quality", point.quality());
            if (point.defectives() >= 0) {
                row.put("defectivesInLot", point.defectives());
            }
            row.put("acceptance", point.acceptance());
            row.put("aoq", point.aoq());
            if (!Double.isNaN(point.ati())) {
                row.put("ati", point.ati());
            }
            row.put("asn", result.asn(point));
            if (wald != null) {
                row.put("waldAcceptance", wald.acceptance(point.quality()));
                row.put("waldAsn", wald.averageSampleNumber(point.quality()));
            }
        }
        return node;
    }
}
