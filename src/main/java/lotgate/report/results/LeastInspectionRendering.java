package lotgate.report.results;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import lotgate.jobs.DesignLeastInspection;
import lotgate.report.Cautions;
import lotgate.report.CsvTable;
import lotgate.report.Json;
import lotgate.report.Percent;
import lotgate.report.PlanWording;
import lotgate.plan.PlanFormat;
import lotgate.sampling.DoublePlan;
import lotgate.sampling.LeastInspectionDesigner;
import lotgate.sampling.LeastInspectionDoubleSearch;
import lotgate.sampling.OcModel;
import lotgate.sampling.SinglePlan;

/** A least-inspection (Dodge-Romig) plan as text, JSON or CSV. */
public final class LeastInspectionRendering {
    private LeastInspectionRendering() {
    }

    /** The plan as text, with its ATI and protection and the plan {@code design} gives for comparison. */
    public static String text(DesignLeastInspection.Result result) {
        if (result.doubleFound() != null) {
            return doubleText(result);
        }
        return Text.of(out -> {
            DesignLeastInspection.Request request = result.request();
            OcModel model = result.model();
            int lotSize = result.lotSize();
            LeastInspectionDesigner.Result found = result.found();
            String unit = model.countsUnits() ? "" : " per unit";
            printHeading(out, result, "plan", unit);
            out.println();
            if (found.inspectEveryUnit()) {
                printEveryUnit(out, "sampling plan", lotSize);
                return;
            }
            SinglePlan plan = found.plan();
            out.println("  Inspect n = " + plan.n() + " units. Accept the lot with up to c = " + plan.c() + " "
                    + PlanWording.counted(model, plan.c()) + ";");
            out.println("  reject it at " + plan.rejectionNumber() + " or more and screen the rest of the lot.");
            out.println();
            String row = "    %-44s %s%n";
            out.printf(row, "ATI at the process average", String.format(Locale.ROOT, "%.1f units per lot (of %d)",
                    found.ati(), lotSize));
            out.printf(row, "P(accept) at the process average", Percent.probability(found.acceptanceAtAverage()));
            out.printf(row, "LTPD at a consumer's risk of 10%", Percent.measured(found.ltpd10()) + unit);
            out.printf(row, "LTPD at a consumer's risk of 5%", Percent.measured(result.ltpd5()) + unit);
            out.printf(row, "AOQL", Percent.measured(found.aoql()) + unit + " at incoming "
                    + Percent.measured(found.aoqlAt()) + unit);
            out.printf(row, "plans compared", String.valueOf(found.plansCompared()));
            DesignLeastInspection.Comparison comparison = result.comparison();
            out.println();
            if (comparison == null) {
                out.println("  'design' finds no sampling plan below the lot size for the same protection.");
            } else {
                SinglePlan plain = comparison.plan();
                out.println("  'design' for the same protection gives n = " + plain.n() + ", c = " + plain.c()
                        + " (AQL at the process average with a producer's");
                out.println("    risk of " + Percent.level(DesignLeastInspection.COMPARISON_ALPHA) + ", LTPD "
                        + Percent.measured(comparison.ltpd()) + unit + "):");
                out.println(String.format(Locale.ROOT, "    ATI %.1f units at the process average (%+.1f against this"
                        + " plan), AOQL %s%s.", comparison.ati(), comparison.ati() - found.ati(),
                        Percent.measured(comparison.aoql()), unit));
            }
            if (plan.c() == 0) {
                out.println();
                out.println(Cautions.ZERO_ACCEPTANCE.indent(2).stripTrailing());
            }
            if (result.saved() != null) {
                out.println();
                out.println("  Saved " + request.save().file() + " (fingerprint " + result.saved().shortFingerprint()
                        + ")");
            }
        });
    }

    /** What was sought (a "plan" or a "double plan"), under which model, protection and process average. */
    private static void printHeading(PrintWriter out, DesignLeastInspection.Result result, String sought, String unit) {
        out.println("Least-inspection " + sought + " for rectifying inspection (rejected lots screened 100%)");
        out.println("  " + PlanWording.model(result.model(), result.lotSize()));
        out.println("  protection: " + protection(result) + "; process average " + Percent.level(
                result.request().processAverage()) + unit);
    }

    /** The answer where screening every unit inspects least: no plan of the kind searched does better. */
    private static void printEveryUnit(PrintWriter out, String kind, int lotSize) {
        out.println("  No " + kind + " inspects fewer units on average than screening every unit: inspect every unit"
                + " of the lot (100% inspection), ATI " + lotSize + ".");
    }

    /** The double plan as text, with its ATI and protection and the single least-inspection plan beside it. */
    private static String doubleText(DesignLeastInspection.Result result) {
        return Text.of(out -> {
            DesignLeastInspection.Request request = result.request();
            OcModel model = result.model();
            int lotSize = result.lotSize();
            LeastInspectionDoubleSearch.Result found = result.doubleFound().found();
            String unit = model.countsUnits() ? "" : " per unit";
            printHeading(out, result, "double plan", unit);
            out.println("  searched: every n1 and n2 (n1 + n2 at most the lot), c1 < c2, r1 = c2 + 1; "
                    + found.plansCompared() + " plans evaluated, exact within that family");
            out.println();
            if (found.inspectEveryUnit()) {
                printEveryUnit(out, "double plan", lotSize);
                return;
            }
            DoublePlan plan = found.plan();
            out.printf("  First sample:  inspect n1 = %d units. Accept with up to c1 = %d %s; reject at r1 = %d or"
                    + " more.%n", plan.n1(), plan.c1(), PlanWording.counted(model, plan.c1()), plan.r1());
            out.printf("  Second sample: otherwise inspect n2 = %d more. Accept with up to c2 = %d over both samples;"
                    + " reject at %d or more.%n", plan.n2(), plan.c2(), plan.c2() + 1);
            out.println("  Screen the rest of every rejected lot.");
            out.println();
            String row = "    %-44s %s%n";
            out.printf(row, "ATI at the process average", String.format(Locale.ROOT, "%.1f units per lot (of %d)",
                    found.ati(), lotSize));
            out.printf(row, "ASN at the process average", String.format(Locale.ROOT, "%.1f units", found.asn()));
            out.printf(row, "P(accept) at the process average", Percent.probability(found.acceptanceAtAverage()));
            out.printf(row, "  of which on the first sample", Percent.probability(found.firstAcceptance()));
            out.printf(row, "LTPD at a consumer's risk of 10%", Percent.measured(found.ltpd10()) + unit);
            out.printf(row, "LTPD at a consumer's risk of 5%", Percent.measured(result.doubleFound().ltpd5()) + unit);
            out.printf(row, "AOQL", Percent.measured(found.aoql()) + unit + " at incoming "
                    + Percent.measured(found.aoqlAt()) + unit);
            out.println();
            LeastInspectionDesigner.Result single = result.found();
            if (single.inspectEveryUnit()) {
                out.println("  No single plan inspects fewer units on average than screening every unit.");
            } else {
                out.println("  The single least-inspection plan for the same protection is n = " + single.plan().n()
                        + ", c = " + single.plan().c() + ":");
                out.println(String.format(Locale.ROOT, "    ATI %.1f units at the process average; the double plan"
                        + " saves %.1f units per lot (%s).", single.ati(), single.ati() - found.ati(),
                        Percent.measured((single.ati() - found.ati()) / single.ati())));
            }
            if (result.saved() != null) {
                out.println();
                out.println("  Saved " + request.save().file() + " (fingerprint " + result.saved().shortFingerprint()
                        + ")");
            }
        });
    }

    private static String protection(DesignLeastInspection.Result result) {
        DesignLeastInspection.Request request = result.request();
        String unit = result.model().countsUnits() ? "" : " per unit";
        return result.byLtpd()
                ? "LTPD " + Percent.level(request.ltpd()) + unit + " at a consumer's risk of "
                        + Percent.level(request.beta())
                : "AOQL at most " + Percent.level(request.aoql()) + unit;
    }

    /** The plan as JSON: n, c, rejectionNumber, the ATI and the protection figures. */
    public static ObjectNode json(DesignLeastInspection.Result result) {
        if (result.doubleFound() != null) {
            return doubleJson(result);
        }
        DesignLeastInspection.Request request = result.request();
        LeastInspectionDesigner.Result found = result.found();
        ObjectNode node = Json.object();
        node.put("model", result.model().name());
        node.put("lotSize", result.lotSize());
        node.put("protection", result.byLtpd() ? "ltpd" : "aoql");
        if (result.byLtpd()) {
            node.put("ltpd", request.ltpd());
            node.put("beta", request.beta());
        } else {
            node.put("aoqlTarget", request.aoql());
        }
        node.put("processAverage", request.processAverage());
        node.put("planFound", !found.inspectEveryUnit());
        node.put("fullInspection", found.inspectEveryUnit());
        node.put("ati", found.ati());
        if (found.inspectEveryUnit()) {
            return node;
        }
        node.put("scheme", "single");
        node.put("n", found.plan().n());
        node.put("c", found.plan().c());
        node.put("rejectionNumber", found.plan().rejectionNumber());
        node.put("acceptanceAtAverage", found.acceptanceAtAverage());
        node.put("ltpd10", found.ltpd10());
        node.put("ltpd5", result.ltpd5());
        node.put("aoql", found.aoql());
        node.put("aoqlAt", found.aoqlAt());
        node.put("plansCompared", found.plansCompared());
        DesignLeastInspection.Comparison comparison = result.comparison();
        if (comparison != null) {
            ObjectNode design = node.putObject("designComparison");
            design.put("n", comparison.plan().n());
            design.put("c", comparison.plan().c());
            design.put("ltpd", comparison.ltpd());
            design.put("ati", comparison.ati());
            design.put("aoql", comparison.aoql());
        }
        if (result.saved() != null) {
            node.put("fingerprint", result.saved().fingerprint());
        }
        return node;
    }

    /**
     * The double plan as JSON: the request, {@code scheme} "double" and {@code stages} (each n, c, r) as
     * {@code design} gives them, the figures at the process average, and the single least-inspection plan beside it.
     */
    private static ObjectNode doubleJson(DesignLeastInspection.Result result) {
        DesignLeastInspection.Request request = result.request();
        LeastInspectionDoubleSearch.Result found = result.doubleFound().found();
        ObjectNode node = Json.object();
        node.put("model", result.model().name());
        node.put("lotSize", result.lotSize());
        node.put("protection", "ltpd");
        node.put("ltpd", request.ltpd());
        node.put("beta", request.beta());
        node.put("processAverage", request.processAverage());
        node.put("planFound", !found.inspectEveryUnit());
        node.put("fullInspection", found.inspectEveryUnit());
        node.put("ati", found.ati());
        node.put("plansCompared", found.plansCompared());
        if (!found.inspectEveryUnit()) {
            node.setAll(PlanFormat.planJson(found.plan()));
            node.put("asn", found.asn());
            node.put("acceptanceAtAverage", found.acceptanceAtAverage());
            node.put("firstSampleAcceptanceAtAverage", found.firstAcceptance());
            node.put("ltpd10", found.ltpd10());
            node.put("ltpd5", result.doubleFound().ltpd5());
            node.put("aoql", found.aoql());
            node.put("aoqlAt", found.aoqlAt());
        } else {
            node.put("scheme", "double");
        }
        LeastInspectionDesigner.Result single = result.found();
        ObjectNode comparison = node.putObject("singleComparison");
        comparison.put("planFound", !single.inspectEveryUnit());
        comparison.put("ati", single.ati());
        if (!single.inspectEveryUnit()) {
            comparison.put("n", single.plan().n());
            comparison.put("c", single.plan().c());
            comparison.put("ltpd10", single.ltpd10());
            comparison.put("aoql", single.aoql());
        }
        comparison.put("atiSaved", single.ati() - found.ati());
        if (result.saved() != null) {
            node.put("fingerprint", result.saved().fingerprint());
        }
        return node;
    }

    /** The plan as CSV, one row. */
    public static String csv(DesignLeastInspection.Result result) {
        if (result.doubleFound() != null) {
            return doubleCsv(result);
        }
        LeastInspectionDesigner.Result found = result.found();
        DesignLeastInspection.Request request = result.request();
        List<Object> row = new ArrayList<>(List.of(result.model().name(), result.lotSize(),
                result.byLtpd() ? "ltpd" : "aoql", result.byLtpd() ? request.ltpd() : request.aoql(),
                request.processAverage()));
        if (found.inspectEveryUnit()) {
            row.addAll(List.of("", "", found.ati(), "", "", true, ""));
        } else {
            row.addAll(List.of(found.plan().n(), found.plan().c(), found.ati(), found.ltpd10(), found.aoql(), false,
                    result.saved() == null ? "" : result.saved().fingerprint()));
        }
        return CsvTable.table(List.of("model", "lotSize", "protection", "target", "processAverage", "n", "c", "ati",
                "ltpd10", "aoql", "fullInspection", "fingerprint"), List.of(row));
    }

    private static String doubleCsv(DesignLeastInspection.Result result) {
        LeastInspectionDoubleSearch.Result found = result.doubleFound().found();
        DesignLeastInspection.Request request = result.request();
        List<Object> row = new ArrayList<>(List.of(result.model().name(), result.lotSize(), "ltpd", request.ltpd(),
                request.processAverage()));
        DoublePlan plan = found.plan();
        if (plan == null) {
            row.addAll(List.of("", "", "", "", "", found.ati(), "", "", "", result.found().ati(), true, ""));
        } else {
            row.addAll(List.of(plan.n1(), plan.c1(), plan.r1(), plan.n2(), plan.c2(), found.ati(), found.asn(),
                    found.ltpd10(), found.aoql(), result.found().ati(), false,
                    result.saved() == null ? "" : result.saved().fingerprint()));
        }
        return CsvTable.table(List.of("model", "lotSize", "protection", "target", "processAverage", "n1", "c1", "r1",
                "n2", "c2", "ati", "asn", "ltpd10", "aoql", "singleAti", "fullInspection", "fingerprint"),
                List.of(row));
    }
}
