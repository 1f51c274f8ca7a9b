package lotgate.cli;

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
import lotgate.sampling.SinglePlan;
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
        header = "Compare plans side by side and on one OC chart.",
        description = {
                "Compares plans at the same quality levels: P(accept) at the AQL and the LTPD, the producer's and"
                        + " consumer's risks there, the quality levels at 95%%, 50%% and 10%% acceptance, and the"
                        + " AOQL. Each PLAN is a saved plan file or a plan written as n,c (such as 45,0), under"
                        + " --model.",
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

    @Mixin
    OutputFormat format;

    @Spec
    CommandSpec spec;

    record Row(PlanChoice choice, OperatingCharacteristic oc, double atAql, double atLtpd,
            CurveCommand.KeyLevels keys) {
    }

    @Override
    public void run() {
        CurveCommand.checkChartName(spec, chart);
        List<PlanChoice> choices = new ArrayList<>();
        for (String text : plans) {
            choices.add(PlanChoice.parse(spec, text, models));
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
            ModelOptions.checkLevel(spec, choice.model(), "--ltpd", atLtpd);
            OperatingCharacteristic oc = new OperatingCharacteristic(choice.plan(), choice.model(), choice.lotSize());
            rows.add(new Row(choice, oc, oc.acceptance(choice.model().producerPoint(atAql)),
                    oc.acceptance(choice.model().consumerPoint(atLtpd)), CurveCommand.KeyLevels.of(oc)));
        }
        if (chart != null) {
            drawChart(rows, atAql, atLtpd);
        }
        PrintWriter out = spec.commandLine().getOut();
        switch (format.kind) {
            case text -> printText(out, rows, atAql, atLtpd);
            case csv -> out.print(csv(rows, atAql, atLtpd));
            case json -> out.println(Json.text(json(rows, atAql, atLtpd)));
        }
        out.flush();
    }

    private void drawChart(List<Row> rows, double atAql, double atLtpd) {
        double range = 0;
        List<ChartCurve> curves = new ArrayList<>();
        for (Row row : rows) {
            range = Math.max(range, row.oc().suggestedRange(atLtpd));
        }
        for (Row row : rows) {
            curves.add(new ChartCurve(CurveCommand.planLabel(row.choice()) + ", " + row.choice().model().name(),
                    row.oc().curve(range, 400)));
        }
        boolean perUnit = rows.stream().allMatch(r -> !r.choice().model().countsUnits());
        PlanChoice firstChoice = rows.get(0).choice();
        ChartFile.write(Charts.oc("OC curves compared", perUnit, curves,
                CurveCommand.marks(firstChoice, atAql, atLtpd)), chart, 900, 600);
    }

    private static void printText(PrintWriter out, List<Row> rows, double atAql, double atLtpd) {
        out.println("Plans compared at AQL " + Percent.level(atAql) + " and LTPD " + Percent.level(atLtpd));
        out.println();
        out.printf("  %-34s %-15s %23s %32s%n", "", "", "----- P(accept) -----", "-- quality where P(accept) is --");
        out.printf("  %-34s %-15s %11s %11s %10s %10s %10s %10s%n", "plan", "model", "at AQL", "at LTPD",
                "95%", "50%", "10%", "AOQL");
        for (Row row : rows) {
            out.printf("  %-34s %-15s %11s %11s %10s %10s %10s %10s%n", CurveCommand.planLabel(row.choice()),
                    row.choice().model().name(), Percent.probability(row.atAql()), Percent.probability(row.atLtpd()),
                    Percent.measured(row.keys().at95()), Percent.measured(row.keys().at50()),
                    Percent.measured(row.keys().at10()), Percent.measured(row.keys().aoql().limit()));
        }
        out.println();
        out.println("  Producer's risk = 100% - P(accept) at the AQL; consumer's risk = P(accept) at the LTPD.");
        out.println("  AOQL is for the lot size of each plan, or for a very large lot where none is given.");
        for (Row row : rows) {
            if (row.choice().saved() != null) {
                out.println("  " + row.choice().label() + ": fingerprint " + row.choice().saved().shortFingerprint());
            }
        }
    }

    private static List<Object> fields(Row row) {
        SinglePlan plan = (SinglePlan) row.choice().plan();
        List<Object> fields = new ArrayList<>();
        fields.add(row.choice().label());
        fields.add(row.choice().model().name());
        fields.add(plan.n());
        fields.add(plan.c());
        fields.add(row.choice().lotSize() > 0 ? row.choice().lotSize() : "");
        fields.add(row.atAql());
        fields.add(1 - row.atAql());
        fields.add(row.atLtpd());
        fields.add(row.keys().at95());
        fields.add(row.keys().at50());
        fields.add(row.keys().at10());
        fields.add(row.keys().aoql().limit());
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
        return CsvTable.table(List.of("plan", "aql", "ltpd", "model", "n", "c", "lotSize", "acceptanceAtAql",
                "producerRisk", "consumerRisk", "qualityAtAcceptance95", "qualityAtAcceptance50",
                "qualityAtAcceptance10", "aoql"), table);
    }

    private static ObjectNode json(List<Row> rows, double atAql, double atLtpd) {
        ObjectNode node = Json.object();
        node.put("aql", atAql);
        node.put("ltpd", atLtpd);
        ArrayNode list = node.putArray("plans");
        for (Row row : rows) {
            SinglePlan plan = (SinglePlan) row.choice().plan();
            ObjectNode item = list.addObject();
            item.put("plan", row.choice().label());
            item.put("scheme", plan.scheme());
            item.put("model", row.choice().model().name());
            item.put("n", plan.n());
            item.put("c", plan.c());
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
        }
        return node;
    }
}
