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
import lotgate.sampling.CurvePoint;
import lotgate.sampling.OperatingCharacteristic;
import lotgate.sampling.RiskPoints;
import lotgate.plan.PlanFormat;
import lotgate.report.PlanWording;
import lotgate.sampling.DoublePlan;
import lotgate.sampling.Plan;
import lotgate.sampling.SequentialPlan;
import lotgate.sampling.SinglePlan;
import lotgate.sampling.VariablesPlan;
import lotgate.sampling.WaldSequential;
import lotgate.sentencing.Stopping;
import lotgate.report.CsvTable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

/** Tabulates and draws a plan's OC, AOQ and ATI curves with their key quality levels. */
@Command(name = "curve", mixinStandardHelpOptions = true, sortOptions = false, usageHelpAutoWidth = true,
        header = "Tabulate and draw a plan's OC, AOQ, ATI and ASN curves.",
        description = {
                "Shows a plan's operating characteristics over a range of incoming quality levels: P(accept)"
                        + " (the OC curve), AOQ, and ATI when the lot size is known; the quality levels at"
                        + " P(accept) = 95%%, 50%% (indifference quality) and 10%%; and the AOQL. For double, multiple"
                        + " and sequential plans also the ASN (average sample number), and for a sequential plan"
                        + " Wald's approximate P(accept) and ASN beside the exact values of the truncated plan.",
                "",
                "Give a saved plan file, or the plan as --sample-size and --acceptance with a model.",
                ""})
final class CurveCommand implements Runnable {

    @Parameters(index = "0", arity = "0..1", paramLabel = "PLAN", description = "A saved plan file (plans/*.json).")
    Path planFile;

    @Option(names = {"-n", "--sample-size"}, paramLabel = "N", converter = Values.Count.class,
            description = "Sample size of a plan given directly.")
    Integer sampleSize;

    @Option(names = {"-c", "--acceptance"}, paramLabel = "C", converter = Values.Acceptance.class,
            description = "Acceptance number of a plan given directly.")
    Integer acceptance;

    @Mixin
    ModelOptions models;

    @Option(names = "--class", paramLabel = "CLASS",
            description = "For a plan with criteria per defect class: the class to show (critical, major, minor).")
    String defectClass;

    @Option(names = "--aql", paramLabel = "LEVEL", converter = Values.Quality.class,
            description = "AQL to mark on the OC curve (default: the saved plan's).")
    Double aql;

    @Option(names = "--ltpd", paramLabel = "LEVEL", converter = Values.Quality.class,
            description = "LTPD to mark on the OC curve (default: the saved plan's).")
    Double ltpd;

    @Option(names = "--up-to", paramLabel = "LEVEL", converter = Values.Quality.class,
            description = "Highest incoming quality in the table and charts (default: where P(accept) is 1%%).")
    Double upTo;

    @Option(names = "--steps", paramLabel = "K", defaultValue = "20", converter = Values.Count.class,
            description = "Number of equal steps in the table (default ${DEFAULT-VALUE}).")
    int steps;

    @Option(names = "--chart", paramLabel = "FILE",
            description = "Draw OC, AOQ and (with a lot size) ATI stacked in one chart; .png or .svg.")
    Path chart;

    @Option(names = "--oc-chart", paramLabel = "FILE", description = "Draw the OC curve alone; .png or .svg.")
    Path ocChart;

    @Option(names = "--aoq-chart", paramLabel = "FILE", description = "Draw the AOQ curve alone; .png or .svg.")
    Path aoqChart;

    @Option(names = "--ati-chart", paramLabel = "FILE",
            description = "Draw the ATI curve alone (needs a lot size); .png or .svg.")
    Path atiChart;

    @Option(names = "--asn-chart", paramLabel = "FILE",
            description = "Draw the ASN curve alone (average units inspected per lot); .png or .svg.")
    Path asnChart;

    @Option(names = "--curtailed",
            description = "For a double plan: the ASN with inspection of the second sample stopped as soon as the"
                    + " lot is rejected.")
    boolean curtailed;

    @Mixin
    OutputFormat format;

    @Spec
    CommandSpec spec;

    @Override
    public void run() {
        PlanChoice choice = choose(spec, planFile, defectClass, sampleSize, acceptance, models);
        for (Path file : new Path[] {chart, ocChart, aoqChart, atiChart, asnChart}) {
            checkChartName(spec, file);
        }
        if (curtailed && !(choice.plan() instanceof DoublePlan)) {
            throw new ParameterException(spec.commandLine(), "--curtailed is for double plans");
        }
        if (atiChart != null && choice.lotSize() == 0) {
            throw new ParameterException(spec.commandLine(), "--ati-chart needs a lot size: add --lot-size N");
        }
        RiskPoints design = choice.designedFor();
        Double markAql = aql != null ? aql : design == null ? null : (Double) design.aql();
        Double markLtpd = ltpd != null ? ltpd : design == null ? null : (Double) design.ltpd();
        OperatingCharacteristic oc = new OperatingCharacteristic(choice.plan(), choice.model(), choice.lotSize());
        double range = upTo != null ? upTo : oc.suggestedRange(markLtpd == null ? 0 : markLtpd);
        ModelOptions.checkLevel(spec, choice.model(), "--up-to", range);
        List<CurvePoint> table = oc.curve(range, steps);
        KeyLevels keys = KeyLevels.of(oc);
        drawCharts(choice, oc, range, markAql, markLtpd, keys);
        PrintWriter out = spec.commandLine().getOut();
        switch (format.kind) {
            case text -> printText(out, choice, table, keys, markAql, markLtpd, oc);
            case csv -> out.print(csv(choice, table));
            case json -> out.println(Json.text(json(choice, table, keys, markAql, markLtpd, oc)));
        }
        out.flush();
    }

    static PlanChoice choose(CommandSpec spec, Path planFile, String defectClass, Integer sampleSize,
            Integer acceptance, ModelOptions models) {
        if (planFile != null) {
            if (sampleSize != null || acceptance != null) {
                throw new ParameterException(spec.commandLine(), "give either a plan file or --sample-size and"
                        + " --acceptance, not both");
            }
            return PlanChoice.saved(spec, planFile, defectClass, models);
        }
        if (defectClass != null) {
            throw new ParameterException(spec.commandLine(), "--class chooses a defect class of a saved plan file");
        }
        if (sampleSize == null || acceptance == null) {
            throw new ParameterException(spec.commandLine(), "name a plan: a plan file, or --sample-size N and"
                    + " --acceptance C");
        }
        return PlanChoice.given(spec, sampleSize, acceptance, models);
    }

    static void checkChartName(CommandSpec spec, Path file) {
        if (file != null && !ChartFile.supported(file)) {
            throw new ParameterException(spec.commandLine(), "chart file " + file + " must end in .png or .svg");
        }
    }

    /** The quality levels at the usual probabilities of acceptance and the AOQL. */
    record KeyLevels(double at95, double at50, double at10, OperatingCharacteristic.Aoql aoql) {
        static KeyLevels of(OperatingCharacteristic oc) {
            return new KeyLevels(oc.qualityAt(0.95), oc.qualityAt(0.50), oc.qualityAt(0.10), oc.aoql());
        }
    }

    static List<Charts.RiskMark> marks(PlanChoice choice, Double markAql, Double markLtpd) {
        List<Charts.RiskMark> marks = new ArrayList<>();
        RiskPoints design = choice.designedFor();
        double alpha = design == null ? 0.05 : design.alpha();
        double beta = design == null ? 0.10 : design.beta();
        if (markAql != null) {
            marks.add(new Charts.RiskMark("AQL " + Percent.level(markAql) + ": asked P(accept) >= "
                    + Percent.level(1 - alpha), markAql, 1 - alpha));
        }
        if (markLtpd != null) {
            marks.add(new Charts.RiskMark("LTPD " + Percent.level(markLtpd) + ": asked P(accept) <= "
                    + Percent.level(beta), markLtpd, beta));
        }
        return marks;
    }

    private void drawCharts(PlanChoice choice, OperatingCharacteristic oc, double range, Double markAql,
            Double markLtpd, KeyLevels keys) {
        if (chart == null && ocChart == null && aoqChart == null && atiChart == null && asnChart == null) {
            return;
        }
        boolean perUnit = !choice.model().countsUnits();
        ChartCurve curve = new ChartCurve(planLabel(choice), oc.curve(range, 400));
        List<Charts.RiskMark> marks = marks(choice, markAql, markLtpd);
        int fewest = fewestInspected(choice.plan());
        String subject = planLabel(choice);
        String about = modelLine(choice);
        if (chart != null) {
            ChartFile.write(Charts.withSubtitle(Charts.all("OC, AOQ and ATI of " + subject, perUnit, curve, marks,
                    keys.aoql().limit(), keys.aoql().quality(), fewest, choice.lotSize()), about), chart, 900,
                    choice.lotSize() > 0 ? 1100 : 850);
        }
        if (ocChart != null) {
            ChartFile.write(Charts.withSubtitle(Charts.oc("OC curve of " + subject, perUnit, List.of(curve), marks),
                    about), ocChart, 900, 600);
        }
        if (aoqChart != null) {
            ChartFile.write(Charts.withSubtitle(Charts.aoq("Average outgoing quality of " + subject, perUnit, curve,
                    keys.aoql().limit(), keys.aoql().quality()), about), aoqChart, 900, 600);
        }
        if (atiChart != null) {
            ChartFile.write(Charts.withSubtitle(Charts.ati("Average total inspection of " + subject, perUnit, curve,
                    fewest, choice.lotSize()), about), atiChart, 900, 600);
        }
        if (asnChart != null) {
            ChartFile.write(Charts.withSubtitle(Charts.asn("Average sample number of " + subject, perUnit,
                    List.of(curve)), about), asnChart, 900, 600);
        }
    }

    static String planLabel(PlanChoice choice) {
        String numbers = PlanWording.brief(choice.plan());
        return choice.saved() == null ? numbers : choice.label() + " (" + numbers + ")";
    }

    /** The model in words; for a variables plan, what its quality means. */
    static String modelLine(PlanChoice choice) {
        if (choice.plan() instanceof VariablesPlan) {
            return "variables plan: quality is the fraction beyond the limit(s) of normal measurements (type B)"
                    + (choice.lotSize() > 0 ? ", lot size " + choice.lotSize() : "");
        }
        return DesignCommand.modelLine(choice.model(), choice.lotSize());
    }

    /** The fewest units the plan can inspect: its first stage, or the first unit that can accept. */
    static int fewestInspected(Plan plan) {
        if (plan instanceof VariablesPlan variables) {
            return variables.n();
        }
        if (plan instanceof SequentialPlan sequential) {
            int first = SchemeDesign.firstUnitAccepting(sequential, 0);
            return Math.min(first > 0 ? first : sequential.truncation(), sequential.rejectionNumber(1));
        }
        return Stopping.stages(plan).get(0).n();
    }

    /** Wald's approximation for a saved sequential plan, or null. */
    private static WaldSequential wald(PlanChoice choice) {
        if (choice.plan() instanceof SequentialPlan sequential && choice.designedFor() != null) {
            return WaldSequential.fromLines(choice.designedFor().aql(), choice.designedFor().ltpd(),
                    !choice.model().countsUnits(), sequential.h1(), sequential.h2());
        }
        return null;
    }

    private double asn(PlanChoice choice, CurvePoint point) {
        return curtailed ? ((DoublePlan) choice.plan()).curtailedAverageSampleNumber(choice.model(), point.quality())
                : point.asn();
    }

    private static String quality(PlanChoice choice, double level) {
        if (choice.model().countsUnits()) {
            return Percent.measured(level);
        }
        return Percent.measured(level) + " per unit";
    }

    private void printText(PrintWriter out, PlanChoice choice, List<CurvePoint> table, KeyLevels keys,
            Double markAql, Double markLtpd, OperatingCharacteristic oc) {
        boolean staged = !(choice.plan() instanceof SinglePlan) && !(choice.plan() instanceof VariablesPlan);
        WaldSequential wald = wald(choice);
        out.println("Operating characteristics of " + planLabel(choice));
        out.println("  " + modelLine(choice));
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
                row.append(String.format(" %8d", point.defectives()));
            }
            row.append(String.format(" %11s %10s", Percent.probability(point.acceptance()),
                    Percent.measured(point.aoq())));
            if (ati) {
                row.append(String.format(" %10.1f", point.ati()));
            }
            if (staged) {
                row.append(String.format(" %10.1f", asn(choice, point)));
            }
            if (wald != null) {
                row.append(String.format(" %12s %10.1f", Percent.probability(wald.acceptance(point.quality())),
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
                    + Percent.probability(oc.acceptance(choice.model().producerPoint(markAql))));
        }
        if (markLtpd != null) {
            out.println("    at the LTPD " + Percent.level(markLtpd) + ": P(accept) = "
                    + Percent.probability(oc.acceptance(choice.model().consumerPoint(markLtpd))));
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

    private String csv(PlanChoice choice, List<CurvePoint> table) {
        WaldSequential wald = wald(choice);
        List<List<Object>> rows = new ArrayList<>();
        for (CurvePoint point : table) {
            rows.add(List.of(point.quality(), point.defectives() >= 0 ? point.defectives() : "",
                    point.acceptance(), point.aoq(), Double.isNaN(point.ati()) ? "" : point.ati(), asn(choice, point),
                    wald == null ? "" : wald.acceptance(point.quality()),
                    wald == null ? "" : wald.averageSampleNumber(point.quality())));
        }
        return CsvTable.table(List.of("quality", "defectivesInLot", "acceptance", "aoq", "ati", "asn",
                "waldAcceptance", "waldAsn"), rows);
    }

    private ObjectNode json(PlanChoice choice, List<CurvePoint> table, KeyLevels keys, Double markAql,
            Double markLtpd, OperatingCharacteristic oc) {
        WaldSequential wald = wald(choice);
        ObjectNode node = Json.object();
        node.put("scheme", choice.plan().scheme());
        node.put("model", choice.model().name());
        ObjectNode structure = PlanFormat.planJson(choice.plan());
        structure.remove("scheme");
        node.setAll(structure);
        node.put("curtailed", curtailed);
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
        if (markAql != null) {
            node.put("acceptanceAtAql", oc.acceptance(choice.model().producerPoint(markAql)));
        }
        if (markLtpd != null) {
            node.put("acceptanceAtLtpd", oc.acceptance(choice.model().consumerPoint(markLtpd)));
        }
        ArrayNode points = node.putArray("points");
        for (CurvePoint point : table) {
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
            row.put("asn", asn(choice, point));
            if (wald != null) {
                row.put("waldAcceptance", wald.acceptance(point.quality()));
                row.put("waldAsn", wald.averageSampleNumber(point.quality()));
            }
        }
        return node;
    }
}
