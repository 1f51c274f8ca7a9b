package lotgate.report.results;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import lotgate.jobs.PlanFromTables;
import lotgate.report.Cautions;
import lotgate.report.CsvTable;
import lotgate.report.Json;
import lotgate.report.Percent;
import lotgate.report.PlanWording;
import lotgate.sampling.DoublePlan;
import lotgate.sampling.OcModel;
import lotgate.sampling.Plan;
import lotgate.sampling.SinglePlan;
import lotgate.sampling.Stage;
import lotgate.tables.TableLookup;
import lotgate.tables.TableRisks;

/** A plan looked up in the attribute sampling tables, with the risks the tables do not print, as text, JSON or CSV. */
public final class TableRendering {
    private TableRendering() {
    }

    /** The look-up as text. */
    public static String text(PlanFromTables.Result result) {
        return Text.of(out -> {
            TableLookup lookup = result.lookup();
            OcModel model = result.model();
            out.println("Plan from the attribute sampling tables: " + lookup.source());
            out.println("  lot of " + result.lotSize() + " units, " + (result.level().special() ? "special" : "general")
                    + " inspection level " + result.level().label() + ", AQL " + aqlText(result) + ", "
                    + result.severity().word() + " inspection, " + result.request().scheme().trim().toLowerCase(Locale.ROOT)
                    + " sampling");
            out.println("  sample size code letter " + lookup.letter() + " (Table I)");
            for (String step : lookup.steps()) {
                out.println("  " + capital(step) + ".");
                if (step.contains("points down")) {
                    out.println("  Why: the sample of code letter " + lookup.letter() + " is too small for this AQL;"
                            + " the plan of code letter " + lookup.usedLetter() + " is used,");
                    out.println("  with its own, larger sample size.");
                } else if (step.contains("points up")) {
                    out.println("  Why: the table gives no plan for this AQL at code letter " + lookup.letter()
                            + "; the plan of code letter " + lookup.usedLetter() + " is used,");
                    out.println("  with its own, smaller sample size.");
                }
            }
            out.println();
            printPlan(out, lookup, model, "  ");
            if (lookup.hundredPercent()) {
                out.println();
                out.println("  The table's sample of " + lookup.plan().maxSampleSize() + " units reaches the lot of "
                        + result.lotSize() + ":");
                out.println("  inspect every unit of the lot (100% inspection), as the tables say.");
            } else {
                out.println();
                printRisks(out, result, result.risks(), "  ");
            }
            if (lookup.plan() instanceof SinglePlan single && single.c() == 0) {
                out.println();
                out.println(Cautions.ZERO_ACCEPTANCE.indent(2).stripTrailing());
            }
            if (result.saved() != null) {
                out.println();
                out.println("  Saved " + result.request().save().file() + " (fingerprint "
                        + result.saved().shortFingerprint() + ")");
            }
            if (!result.family().isEmpty()) {
                out.println();
                out.println("  Saved the plan family " + result.request().family().file() + " with the switching rules"
                        + " (edition " + result.switching().path("edition").asText() + "):");
                for (PlanFromTables.Variant variant : result.family()) {
                    out.println("    " + String.format("%-10s", variant.severity().word()) + " "
                            + result.request().family().variant(variant.severity()) + ": code letter "
                            + variant.lookup().usedLetter() + ", " + PlanWording.brief(variant.lookup().plan())
                            + ", producer's risk " + Percent.probability(variant.risks().producerRisk())
                            + ", LTPD (10%) " + Percent.measured(variant.risks().ltpd10()));
                }
                out.println("  'lotgate sentence " + result.request().family().file() + " SHEET' applies the variant"
                        + " the supplier's history calls for.");
            }
        });
    }

    private static String aqlText(PlanFromTables.Result result) {
        return result.model() instanceof OcModel.Poisson
                ? Percent.level(result.aql()).replace("%", "") + " nonconformities per hundred units"
                : Percent.level(result.aql());
    }

    private static String capital(String text) {
        return text.isEmpty() ? text : Character.toUpperCase(text.charAt(0)) + text.substring(1);
    }

    /** The plan's rule in words: one line per stage, with the cumulative sample sizes of a double plan. */
    static void printPlan(PrintWriter out, TableLookup lookup, OcModel model, String indent) {
        Plan plan = lookup.plan();
        if (plan instanceof SinglePlan single) {
            out.println(indent + "Single sampling, code letter " + lookup.usedLetter() + ": inspect n = " + single.n()
                    + " units.");
            out.println(indent + "Accept the lot with up to Ac = " + single.c() + " " + PlanWording.counted(model,
                    single.c()) + "; reject it at Re = " + single.rejectionNumber() + " or more.");
            if (single.hasGap()) {
                out.println(indent + "A count above " + single.c() + " and below " + single.rejectionNumber()
                        + " accepts the lot but ends reduced inspection:");
                out.println(indent + "normal inspection is reinstated from the next lot (the tables' rule).");
            }
            return;
        }
        DoublePlan twice = (DoublePlan) plan;
        out.println(indent + "Double sampling, code letter " + lookup.usedLetter() + " (numbers on the cumulative count):");
        out.println(indent + "  first sample  n1 = " + twice.n1() + " (cumulative " + twice.n1() + "): accept with up to Ac = "
                + twice.c1() + ", reject at Re = " + twice.r1() + " or more;");
        out.println(indent + "                otherwise take the second sample");
        out.println(indent + "  second sample n2 = " + twice.n2() + " (cumulative " + (twice.n1() + twice.n2())
                + "): accept with up to Ac = " + twice.c2() + ", reject at Re = " + (twice.c2() + 1) + " or more");
    }

    private static void printRisks(PrintWriter out, PlanFromTables.Result result, TableRisks risks, String indent) {
        OcModel model = result.model();
        out.println(indent + "What the tables do not print, computed exactly under the");
        out.println(indent + PlanWording.model(model, result.lotSize()) + ":");
        String row = indent + "  %-46s %s%n";
        out.printf(row, "producer's risk at the AQL " + aqlText(result), Percent.probability(risks.producerRisk())
                + oneIn(risks.producerRisk(), "a lot at the AQL is rejected"));
        if (risks.reinstateAtAql() > 0) {
            out.printf(row, "at the AQL, accepted but normal reinstated", Percent.probability(risks.reinstateAtAql()));
        }
        out.printf(row, "LTPD at a consumer's risk of 10%", Percent.measured(risks.ltpd10()) + unit(model)
                + " (such a lot passes one time in ten)");
        out.printf(row, "LTPD at a consumer's risk of 5%", Percent.measured(risks.ltpd5()) + unit(model));
        out.printf(row, "quality accepted half the time", Percent.measured(risks.indifference()) + unit(model));
        out.printf(row, "AOQL, rejected lots of " + result.lotSize() + " screened", Percent.measured(risks.aoql())
                + unit(model) + " at incoming " + Percent.measured(risks.aoqlAt()) + unit(model));
        if (result.lookup().plan() instanceof DoublePlan) {
            out.printf(row, "ASN at the AQL", String.format(Locale.ROOT, "%.1f units", risks.asnAtAql()));
        }
    }

    private static String unit(OcModel model) {
        return model.countsUnits() ? "" : " per unit";
    }

    private static String oneIn(double probability, String what) {
        if (!(probability > 0) || probability >= 0.5) {
            return "";
        }
        long times = Math.round(1 / probability);
        return times > 1_000_000 ? "" : " (" + what + " about one time in " + times + ")";
    }

    /** The look-up as JSON: codeLetter, n, c, rejectionNumber for a single plan, stages for a double plan. */
    public static ObjectNode json(PlanFromTables.Result result) {
        ObjectNode node = Json.object();
        TableLookup lookup = result.lookup();
        node.put("planFound", true);
        node.put("source", lookup.source());
        node.put("lotSize", result.lotSize());
        node.put("level", result.level().label());
        node.put("aql", result.aql());
        node.put("severity", result.severity().word());
        node.put("model", result.model().name());
        node.put("codeLetter", String.valueOf(lookup.letter()));
        node.put("usedLetter", String.valueOf(lookup.usedLetter()));
        node.put("arrowFollowed", lookup.arrowFollowed());
        ArrayNode steps = node.putArray("steps");
        lookup.steps().forEach(steps::add);
        putPlan(node, lookup.plan());
        node.put("fullInspection", lookup.hundredPercent());
        if (result.risks() != null) {
            putRisks(node, result.risks(), lookup.plan());
        }
        if (result.saved() != null) {
            node.put("fingerprint", result.saved().fingerprint());
        }
        if (!result.family().isEmpty()) {
            ObjectNode family = node.putObject("family");
            family.put("file", result.request().family().file().toString());
            family.set("switching", result.switching());
            ObjectNode variants = family.putObject("variants");
            for (PlanFromTables.Variant variant : result.family()) {
                ObjectNode entry = variants.putObject(variant.severity().word());
                entry.put("file", result.request().family().variant(variant.severity()).toString());
                entry.put("usedLetter", String.valueOf(variant.lookup().usedLetter()));
                putPlan(entry, variant.lookup().plan());
                putRisks(entry, variant.risks(), variant.lookup().plan());
            }
        }
        return node;
    }

    private static void putPlan(ObjectNode node, Plan plan) {
        node.put("scheme", plan.scheme());
        if (plan instanceof SinglePlan single) {
            node.put("n", single.n());
            node.put("c", single.c());
            node.put("rejectionNumber", single.rejectionNumber());
        } else if (plan instanceof DoublePlan twice) {
            ArrayNode stages = node.putArray("stages");
            for (Stage stage : twice.stages()) {
                ObjectNode entry = stages.addObject();
                entry.put("n", stage.n());
                entry.put("c", stage.c());
                entry.put("r", stage.r());
            }
        }
    }

    private static void putRisks(ObjectNode node, TableRisks risks, Plan plan) {
        node.put("producerRisk", risks.producerRisk());
        if (plan instanceof SinglePlan single && single.hasGap()) {
            node.put("reinstateAtAql", risks.reinstateAtAql());
        }
        node.put("ltpd10", risks.ltpd10());
        node.put("ltpd5", risks.ltpd5());
        node.put("indifference", risks.indifference());
        node.put("aoql", risks.aoql());
        node.put("aoqlAt", risks.aoqlAt());
        node.put("asnAtAql", risks.asnAtAql());
    }

    /** The look-up as CSV: one row for the plan (stages as n/c/r separated by spaces). */
    public static String csv(PlanFromTables.Result result) {
        TableLookup lookup = result.lookup();
        TableRisks risks = result.risks();
        List<Object> row = new ArrayList<>(List.of(result.lotSize(), result.level().label(), result.aql(),
                result.severity().word(), result.model().name(), String.valueOf(lookup.letter()),
                String.valueOf(lookup.usedLetter()), lookup.plan().scheme(), stages(lookup.plan()),
                lookup.hundredPercent()));
        if (risks == null) {
            row.addAll(List.of("", "", "", "", "", ""));
        } else {
            row.addAll(List.of(risks.producerRisk(), risks.ltpd10(), risks.ltpd5(), risks.indifference(), risks.aoql(),
                    risks.asnAtAql()));
        }
        row.add(result.saved() == null ? "" : result.saved().fingerprint());
        return CsvTable.table(List.of("lotSize", "level", "aql", "severity", "model", "codeLetter", "usedLetter",
                "scheme", "stages", "fullInspection", "producerRisk", "ltpd10", "ltpd5", "indifference", "aoql",
                "asnAtAql", "fingerprint"), List.of(row));
    }

    private static String stages(Plan plan) {
        if (plan instanceof SinglePlan single) {
            return single.n() + "/" + single.c() + "/" + single.rejectionNumber();
        }
        List<String> parts = new ArrayList<>();
        for (Stage stage : ((DoublePlan) plan).stages()) {
            parts.add(stage.n() + "/" + stage.c() + "/" + stage.r());
        }
        return String.join(" ", parts);
    }
}
