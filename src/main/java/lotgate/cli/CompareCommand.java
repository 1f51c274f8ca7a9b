package lotgate.cli;

import lotgate.jobs.Checks;
import lotgate.jobs.EvaluatePlan;
import lotgate.jobs.KeyLevels;
import lotgate.jobs.PlanChoice;
import lotgate.report.Percent;
import lotgate.report.Json;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import lotgate.report.ChartCurve;
import lotgate.report.ChartFile;
import lotgate.report.Charts;
import lotgate.sampling.OperatingCharacteristic;
import lotgate.sampling.RiskPoints;
import lotgate.plan.PlanFormat;
import lotgate.report.PlanWording;
import lotgate.report.CsvTable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

/** Puts several plans side by side: their risks at the same AQL and LTPD, key levels, and one OC chart. */
@Command(name = "compare", mixinStandardHelpOptions = true, sortOptions = false, usageHelpAutoWidth = true,
        header = "Compare plans side by side, on one OC chart and one ASN chart.",
        description = {
                "Compares plans at the same quality levels: P(accept) at the AQL and the LTPD, the producer's and"
                        + " consumer's risks there, the quality levels at 95%%, 50%% and 10%% acceptance, and the"
                        + " AOQL, and what each costs: the average sample number (ASN) at the AQL and the LTPD and the"
                        + " most units it can inspect. Each PLAN is a saved plan file of any kind (single, double,"
                        + " multiple, sequential) or a single plan written as n,c (such as 45,0), under --model.",
                ""})
final class CompareCommand implements Runnable {

    @Parameters(arity = "2..*", paramLabel = "PLAN", description = "Two or more plans: plans/*.json files or n,c.")
    List<String> plans;

    @Mixin
    ModelOptions models;

    @Option(names = "--aql", paramLabel = "LEVEL", converter = Values.Quality.class,
            description = "AQL to compare at (default: the first saved plan's).")
    Double aql;

    @Option(names = "--ltpd", paramLabel = "LEVEL", converter = Values.Quality.class,
            description = "LTPD to compare at (default: the first saved plan's).")
    Double ltpd;

    @Option(names = "--chart", paramLabel = "FILE", description = "Draw all OC curves on one chart; .png or .svg.")
    Path chart;

    @Option(names = "--asn-chart", paramLabel = "FILE",
            description = "Draw all ASN curves (average units inspected per lot) on one chart; .png or .svg.")
    Path asnChart;

    @Mixin
    OutputFormat format;

    @Spec
    CommandSpec spec;

    record Row(PlanChoice choice, OperatingCharacteristic oc, double atAql, double atLtpd,
            KeyLevels keys, double asnAtAql, double asnAtLtpd) {
    }

    @Override
    public void run() {
        Checks.chartName("chart", chart);
        Checks.chartName("asnChart", asnChart);
        List<PlanChoice> choices = new ArrayList<>();
        for (String text : plans) {
            choices.add(PlanChoice.parse(text, models.named(), models.lotSize));
        }
        RiskPoints first = choices.stream().map(PlanChoice::designedFor).filter(p -> p != null).findFirst().orElse(null);
        double atAql = aql != null ? aql : first != null ? first.aql() : Double.NaN;
        double atLtpd = ltpd != null ? ltpd : first != null ? first.ltpd() : Double.NaN;
        if (Double.isNaN(atAql) || Double.isNaN(atLtpd)) {
            throw new ParameterException(spec.commandLine(), "give --aql and --ltpd to compare at (no saved plan"
                    + " among the plans supplies them)");
        }
        if (atAql >= atLtpd) {
            throw new ParameterException(spec.commandLine(), "--aql " + Percent.level(atAql)
                    + " must be below --ltpd " + Percent.level(atLtpd));
        }
        List<Row> rows = new ArrayList<>();
        for (PlanChoice choice : choices) {
            Checks.level(choice.model(), "--ltpd", atLtpd);
            OperatingCharacteristic oc = new OperatingCharacteristic(choice.plan(), choice.model(), choice.lotSize());
            double aqlPoint = choice.model().producerPoint(atAql);
            double ltpdPoint = choice.model().consumerPoint(atLtpd);
            rows.add(new Row(choice, oc, oc.acceptance(aqlPoint), oc.acceptance(ltpdPoint), KeyLevels.of(oc),
                    oc.asn(aqlPoint), oc.asn(ltpdPoint)));
        }
        if (chart != null || asnChart != null) {
            drawCharts(rows, atAql, atLtpd);
        }
        PrintWriter out = spec.commandLine().getOut();
        switch (format.kind) {
            case text -> printText(out, rows, atAql, atLtpd);
            case csv -> out.print(csv(rows, atAql, atLtpd));
            case json -> out.println(Json.text(json(rows, atAql, atLtpd)));
        }
        out.flush();
    }

    private void drawCharts(List<Row> rows, double atAql, double atLtpd) {
        double range = 0;
        List<ChartCurve> curves = new ArrayList<>();
        for (Row row : rows) {
            range = Math.max(range, row.oc().suggestedRange(atLtpd));
        }
        for (Row row : rows) {
            curves.add(new ChartCurve(row.choice().title() + ", " + row.choice().model().name(),
                    row.oc().curve(range, 400)));
        }
        boolean perUnit = rows.stream().allMatch(r -> !r.choice().model().countsUnits());
        PlanChoice firstChoice = rows.get(0).choice();
        if (chart != null) {
            ChartFile.write(Charts.oc("OC curves compared", perUnit, curves,
                    EvaluatePlan.marks(firstChoice, atAql, atLtpd)), chart, 900, 600);
        }
        if (asnChart != null) {
            ChartFile.write(Charts.asn("Average sample number compared", perUnit, curves), asnChart, 900, 600);
        }
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

    private static String csv(List<Row> rows, double atAql, double atLtpd) {
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

    private static ObjectNode json(List<Row> rows, double atAql, double atLtpd) {
        ObjectNode node = Json.object();
        node.put("aql", atAql);
        node.put("ltpd", atLtpd);
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
            item.put("producerRisk", row.oc().rejection(row.choice().model().producerPoint(atAql)));
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
