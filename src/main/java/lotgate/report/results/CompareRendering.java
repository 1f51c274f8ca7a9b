package lotgate.report.results;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.List;
import lotgate.jobs.ComparePlans;
import lotgate.jobs.ComparePlans.Row;
import lotgate.jobs.PlanChoice;
import lotgate.plan.PlanFormat;
import lotgate.report.CsvTable;
import lotgate.report.Json;
import lotgate.report.Percent;
import lotgate.report.PlanWording;

/** Plans compared side by side, as text, JSON or CSV. */
public final class CompareRendering {
    private CompareRendering() {
    }

    /** The comparison as text. */
    public static String text(ComparePlans.Result result) {
        return Text.of(out -> printText(out, result.rows(), result.aql(), result.ltpd()));
    }

    private static void printText(PrintWriter out, List<Row> rows, double atAql, double atLtpd) {
        out.println("Plans compared at AQL " + Percent.level(atAql) + " and LTPD " + Percent.level(atLtpd));
        out.println();
        for (int i = 0; i < rows.size(); i++) {
            PlanChoice choice = rows.get(i).choice();
            out.printf("  %d  %s, %s%s%n", i + 1, choice.title(),
                    choice.plan() instanceof lotgate.sampling.VariablesPlan ? "normal measurements"
                            : choice.model().name() + " model", choice.lotSize() > 0 ? ", lot size " + choice.lotSize() : "");
        }
        out.println();
        out.printf("  %-3s %23s %43s %27s%n", "", "----- P(accept) -----", "----- quality where P(accept) is -----",
                "---- units inspected ----");
        out.printf("  %-3s %11s %11s %10s %10s %10s %10s %9s %9s %7s%n", "", "at AQL", "at LTPD", "95%", "50%",
                "10%", "AOQL", "ASN AQL", "ASN LTPD", "most");
        for (int i = 0; i < rows.size(); i++) {
            Row row = rows.get(i);
            out.printf("  %-3d %11s %11s %10s %10s %10s %10s %9s %9s %7d%n", i + 1, Percent.probability(row.atAql()),
                    Percent.probability(row.atLtpd()), Percent.measured(row.keys().at95()),
                    Percent.measured(row.keys().at50()), Percent.measured(row.keys().at10()),
                    Percent.measured(row.keys().aoql().limit()), units(row.asnAtAql()), units(row.asnAtLtpd()),
                    row.choice().plan().maxSampleSize());
        }
        out.println();
        out.println("  Producer's risk = 100% - P(accept) at the AQL; consumer's risk = P(accept) at the LTPD.");
        out.println("  AOQL is for the lot size of each plan, or for a very large lot where none is given.");
        out.println("  ASN: units inspected on average to reach a decision; most: the largest number a lot can need.");
        for (Row row : rows) {
            if (row.choice().saved() != null) {
                out.println("  " + row.choice().label() + ": fingerprint " + row.choice().saved().shortFingerprint());
            }
        }
    }

    private static String units(double value) {
        return value == Math.rint(value) ? String.format(java.util.Locale.ROOT, "%.0f", value)
                : String.format(java.util.Locale.ROOT, "%.1f", value);
    }

    private static List<Object> fields(Row row) {
        List<Object> fields = new ArrayList<>();
        fields.add(row.choice().label());
        fields.add(row.choice().plan().scheme());
        fields.add(PlanWording.brief(row.choice().plan()));
        fields.add(row.choice().model().name());
        fields.add(row.choice().lotSize() > 0 ? row.choice().lotSize() : "");
        fields.add(row.atAql());
        fields.add(1 - row.atAql());
        fields.add(row.atLtpd());
        fields.add(row.keys().at95());
        fields.add(row.keys().at50());
        fields.add(row.keys().at10());
        fields.add(row.keys().aoql().limit());
        fields.add(row.asnAtAql());
        fields.add(row.asnAtLtpd());
        fields.add(row.choice().plan().maxSampleSize());
        return fields;
    }

    /** The comparison as CSV, a row per plan. */
    public static String csv(ComparePlans.Result result) {
        List<Row> rows = result.rows();
        double atAql = result.aql();
        double atLtpd = result.ltpd();
        List<List<Object>> table = new ArrayList<>();
        for (Row row : rows) {
            List<Object> line = fields(row);
            line.add(1, atAql);
            line.add(2, atLtpd);
            table.add(line);
        }
        return CsvTable.table(List.of("plan", "aql", "ltpd", "scheme", "numbers", "model", "lotSize",
                "acceptanceAtAql", "producerRisk", "consumerRisk", "qualityAtAcceptance95", "qualityAtAcceptance50",
                "qualityAtAcceptance10", "aoql", "asnAtAql", "asnAtLtpd", "maxSampleSize"), table);
    }

    /** The comparison as JSON. */
    public static ObjectNode json(ComparePlans.Result result) {
        List<Row> rows = result.rows();
        double atAql = result.aql();
        ObjectNode node = Json.object();
        node.put("aql", atAql);
        node.put("ltpd", result.ltpd());
        ArrayNode list = node.putArray("plans");
        for (Row row : rows) {
            ObjectNode item = list.addObject();
            item.put("plan", row.choice().label());
            item.put("scheme", row.choice().plan().scheme());
            item.put("model", row.choice().model().name());
            ObjectNode structure = PlanFormat.planJson(row.choice().plan());
            structure.remove("scheme");
            item.setAll(structure);
            if (row.choice().lotSize() > 0) {
                item.put("lotSize", row.choice().lotSize());
            }
            if (row.choice().saved() != null) {
                item.put("fingerprint", row.choice().saved().fingerprint());
            }
            item.put("producerRisk", row.producerRisk());
            item.put("consumerRisk", row.atLtpd());
            item.put("qualityAtAcceptance95", row.keys().at95());
            item.put("qualityAtAcceptance50", row.keys().at50());
            item.put("qualityAtAcceptance10", row.keys().at10());
            item.put("aoql", row.keys().aoql().limit());
            item.put("asnAtAql", row.asnAtAql());
            item.put("asnAtLtpd", row.asnAtLtpd());
            item.put("maxSampleSize", row.choice().plan().maxSampleSize());
        }
        return node;
    }
}
