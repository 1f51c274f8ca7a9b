package lotgate.cli;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.time.Instant;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import lotgate.plan.PlanFormat;
import lotgate.plan.SavedPlan;
import lotgate.report.CsvTable;
import lotgate.report.PlanWording;
import lotgate.sampling.DoubleDesign;
import lotgate.sampling.DoublePlan;
import lotgate.sampling.DoublePlanDesigner;
import lotgate.sampling.MultiplePlan;
import lotgate.sampling.OcModel;
import lotgate.sampling.Plan;
import lotgate.sampling.PlanRisks;
import lotgate.sampling.RiskPoints;
import lotgate.sampling.SequentialPlan;
import lotgate.sampling.SequentialPlanDesigner;
import lotgate.sampling.SingleDesign;
import lotgate.sampling.SinglePlan;
import lotgate.sampling.SinglePlanDesigner;
import lotgate.sampling.Stage;
import lotgate.sampling.WaldSequential;
import picocli.CommandLine.ParameterException;

/**
 * {@code design --scheme double|multiple|sequential}: designs or evaluates a plan in stages or an item-by-item
 * plan and sets it beside the single plan for the same risks.
 */
final class SchemeDesign {
    private final DesignCommand command;
    private final OcModel model;
    private final int lotSize;

    SchemeDesign(DesignCommand command, OcModel model, int lotSize) {
        this.command = command;
        this.model = model;
        this.lotSize = lotSize;
    }

    private ParameterException usage(String message) {
        return new ParameterException(command.spec.commandLine(), message);
    }

    /** What was designed or evaluated, with how. */
    private record Result(Plan plan, String method, PlanRisks risks, long candidates, SinglePlan single) {
    }

    void run() {
        String scheme = command.scheme;
        checkOptions(scheme);
        RiskPoints points = points();
        if (command.save != null) {
            command.checkSaveTarget();
        }
        SingleDesign singleDesign = new SinglePlanDesigner(model, lotSize).design(points);
        SinglePlan single = singleDesign instanceof SingleDesign.Found found ? found.plan() : null;
        PrintWriter out = command.spec.commandLine().getOut();
        Plan plan;
        String method;
        long candidates = 0;
        switch (scheme) {
            case "double" -> {
                if (command.stageSpecs.isEmpty()) {
                    DoubleDesign design = new DoublePlanDesigner(model, lotSize).design(points, space(), asnLevel(points));
                    if (design instanceof DoubleDesign.NotFound none) {
                        command.printNoPlan(out, none.reason(), model, lotSize);
                        throw new Main.Failure(ExitCode.NO_PLAN, command.format.kind == OutputFormat.Kind.text ? null
                                : "no sampling plan meets the request: " + none.reason());
                    }
                    DoubleDesign.Found found = (DoubleDesign.Found) design;
                    plan = found.plan();
                    candidates = found.candidates();
                    method = SavedPlan.SMALLEST_ASN;
                } else {
                    List<Stage> stages = stages();
                    if (stages.size() != 2 || stages.get(0).c() == Stage.NO_ACCEPTANCE) {
                        throw usage("--scheme double takes two --stage options, the first with an acceptance number,"
                                + " e.g. --stage 50:1:4 --stage 100:3");
                    }
                    plan = given(() -> new DoublePlan(stages.get(0).n(), stages.get(0).c(), stages.get(0).r(),
                            stages.get(1).n(), stages.get(1).c()));
                    method = SavedPlan.GIVEN;
                }
            }
            case "multiple" -> {
                List<Stage> stages = stages();
                plan = given(() -> new MultiplePlan(stages));
                method = SavedPlan.GIVEN;
            }
            default -> {
                int truncation = truncation(single);
                plan = command.plainWald ? SequentialPlan.wald(WaldSequential.of(points, model), truncation)
                        : new SequentialPlanDesigner(model).design(points, truncation).plan();
                method = SavedPlan.WALD;
            }
        }
        if (lotSize > 0 && plan.maxSampleSize() > lotSize) {
            throw usage("the plan may inspect " + plan.maxSampleSize() + " units, more than --lot-size " + lotSize);
        }
        Result result = new Result(plan, method, PlanRisks.of(plan, model, points), candidates, single);
        SavedPlan saved = null;
        if (command.save != null) {
            saved = PlanFormat.seal(DesignCommand.stem(command.save.file), command.save.description,
                    Instant.now().truncatedTo(ChronoUnit.SECONDS), plan, model, lotSize, points, method);
            PlanFormat.write(command.save.file, saved);
        }
        switch (command.format.kind) {
            case json -> out.println(Json.text(json(result, points, saved)));
            case csv -> out.print(csv(result, points, saved));
            case text -> printText(out, result, points, saved);
        }
        out.flush();
    }

    private Plan given(java.util.function.Supplier<Plan> build) {
        try {
            return build.get();
        } catch (IllegalArgumentException e) {
            throw usage("--stage: " + e.getMessage());
        }
    }

    private void checkOptions(String scheme) {
        if (!command.classSpecs.isEmpty()) {
            throw usage("--class: criteria per defect class are for single plans; a " + scheme + " plan counts every"
                    + " nonconformity alike");
        }
        if (command.acceptance != null || command.sampleSize != null) {
            throw usage("--acceptance and --sample-size are for single plans; give the stages of a " + scheme
                    + " plan with --stage");
        }
        boolean isDouble = scheme.equals("double");
        List<String> misplaced = new ArrayList<>();
        if (!isDouble && (command.firstRejection != null)) {
            misplaced.add("--first-rejection");
        }
        if (!isDouble && command.asnAt != null) {
            misplaced.add("--asn-at");
        }
        if (!isDouble && !command.secondRatio.equals("1")) {
            misplaced.add("--second-ratio");
        }
        if (!isDouble && command.curtailed) {
            misplaced.add("--curtailed");
        }
        if (!scheme.equals("sequential") && command.truncateAt != null) {
            misplaced.add("--truncate-at");
        }
        if (!scheme.equals("sequential") && command.plainWald) {
            misplaced.add("--plain-wald");
        }
        if (scheme.equals("sequential") && !command.stageSpecs.isEmpty()) {
            misplaced.add("--stage");
        }
        if (!misplaced.isEmpty()) {
            throw usage(String.join(", ", misplaced) + (misplaced.size() == 1 ? " does" : " do") + " not apply to --scheme "
                    + scheme);
        }
        if (scheme.equals("multiple") && command.stageSpecs.size() < 2) {
            throw usage("--scheme multiple needs its stages: give 2 to " + MultiplePlan.MOST_STAGES + " --stage options,"
                    + " e.g. --stage 20:-:3 --stage 20:1:4 --stage 20:3:4");
        }
        if (isDouble && !command.stageSpecs.isEmpty()
                && (command.firstRejection != null || command.asnAt != null || !command.secondRatio.equals("1"))) {
            throw usage("--first-rejection, --asn-at and --second-ratio shape a design; with --stage the plan is given");
        }
    }

    private RiskPoints points() {
        return command.schemePoints(model, "give --aql and --ltpd: the " + command.scheme + " plan is designed for them, or evaluated at them");
    }

    private DoublePlanDesigner.Space space() {
        Double ratio;
        if (command.secondRatio.trim().equalsIgnoreCase("free")) {
            ratio = null;
        } else {
            try {
                ratio = Double.parseDouble(command.secondRatio.trim());
            } catch (NumberFormatException e) {
                throw usage("--second-ratio " + command.secondRatio + ": give a number such as 1 or 2, or 'free'");
            }
            if (!(ratio >= 0.25 && ratio <= 10)) {
                throw usage("--second-ratio " + command.secondRatio + ": give a ratio from 0.25 to 10, or 'free'");
            }
        }
        return new DoublePlanDesigner.Space(ratio, command.firstRejection);
    }

    private double asnLevel(RiskPoints points) {
        if (command.asnAt == null) {
            return model.producerPoint(points.aql());
        }
        ModelOptions.checkLevel(command.spec, model, "--asn-at", command.asnAt);
        return command.asnAt;
    }

    private int truncation(SinglePlan single) {
        if (command.truncateAt != null) {
            if (lotSize > 0 && command.truncateAt > lotSize) {
                throw usage("--truncate-at " + command.truncateAt + " exceeds --lot-size " + lotSize);
            }
            return command.truncateAt;
        }
        if (single == null) {
            throw usage("no single plan meets these risks, so there is no default truncation point; give"
                    + " --truncate-at N");
        }
        long three = 3L * single.n();
        return (int) Math.min(lotSize > 0 ? lotSize : Integer.MAX_VALUE, three);
    }

    /** The --stage options as stages: N:C:R, with C "-" for none and R = C + 1 allowed to be left out last. */
    private List<Stage> stages() {
        List<Stage> stages = new ArrayList<>();
        for (int i = 0; i < command.stageSpecs.size(); i++) {
            String text = command.stageSpecs.get(i);
            String[] parts = text.split(":");
            boolean last = i == command.stageSpecs.size() - 1;
            if (parts.length != 3 && !(last && parts.length == 2)) {
                throw usage("--stage " + text + ": write N:C:R, such as 50:1:4 (the last stage may be N:C)");
            }
            try {
                int n = Integer.parseInt(parts[0].trim());
                int c = parts[1].trim().equals("-") ? Stage.NO_ACCEPTANCE : Integer.parseInt(parts[1].trim());
                int r = parts.length == 3 ? Integer.parseInt(parts[2].trim()) : c + 1;
                stages.add(new Stage(n, c, r));
            } catch (NumberFormatException e) {
                throw usage("--stage " + text + ": N, C and R must be whole numbers (C may be - for none)");
            } catch (IllegalArgumentException e) {
                throw usage("--stage " + text + ": " + e.getMessage());
            }
        }
        return stages;
    }

    private double aqlPoint(RiskPoints points) {
        return model.producerPoint(points.aql());
    }

    private double ltpdPoint(RiskPoints points) {
        return model.consumerPoint(points.ltpd());
    }

    private double curtailedAsn(Plan plan, double quality) {
        return ((DoublePlan) plan).curtailedAverageSampleNumber(model, quality);
    }

    private void printText(PrintWriter out, Result result, RiskPoints points, SavedPlan saved) {
        Plan plan = result.plan();
        out.println(PlanWording.kind(plan) + switch (result.method()) {
            case SavedPlan.SMALLEST_ASN -> ": the smallest ASN at " + (command.asnAt == null ? "the AQL"
                    : Percent.level(command.asnAt)) + " that meets both risks";
            case SavedPlan.WALD -> ": Wald's lines, truncated at " + ((SequentialPlan) plan).truncation()
                    + " units" + (command.truncateAt == null ? " (3 times the single plan's n)" : "");
            default -> ", as given";
        });
        out.println("  " + DesignCommand.modelLine(model, lotSize));
        if (result.method().equals(SavedPlan.SMALLEST_ASN)) {
            DoublePlanDesigner.Space space = space();
            out.println("  searched: " + (space.ratio() == null ? "every n2" : "n2 = " + ratioText(space.ratio())
                    + " x n1") + ", " + (space.firstRejection() == null ? "r1 = c2 + 1" : "r1 = " + space.firstRejection())
                    + "; " + result.candidates() + " plans evaluated, exact within that space");
        }
        out.println();
        String counted = model.countsUnits() ? "nonconforming units" : "nonconformities";
        if (plan instanceof DoublePlan twice) {
            out.printf("  First sample:  inspect n1 = %d units. Accept with up to c1 = %d %s; reject at r1 = %d or more.%n",
                    twice.n1(), twice.c1(), DesignCommand.unitWord(model, twice.c1()), twice.r1());
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
            printLines(out, (SequentialPlan) plan, counted, points);
        }
        out.println();
        printRisks(out, result, points);
        out.println();
        printCosts(out, result, points);
        if (saved != null) {
            out.println();
            out.println("  Saved " + command.save.file + " (fingerprint " + saved.shortFingerprint() + ")");
        }
    }

    private static String ratioText(double ratio) {
        return ratio == Math.rint(ratio) ? String.valueOf((long) ratio) : String.valueOf(ratio);
    }

    /** Wald's test whose lines the plan has: the nominal risks they were drawn for. */
    private WaldSequential linesOf(SequentialPlan plan, RiskPoints points) {
        return WaldSequential.fromLines(points.aql(), points.ltpd(), !model.countsUnits(), plan.h1(), plan.h2());
    }

    private void printLines(PrintWriter out, SequentialPlan plan, String counted, RiskPoints points) {
        WaldSequential lines = linesOf(plan, points);
        boolean adjusted = Math.abs(lines.alpha() - points.alpha()) > 1e-9 * points.alpha()
                || Math.abs(lines.beta() - points.beta()) > 1e-9 * points.beta();
        out.println(adjusted ? "  Lines drawn for nominal risks alpha = " + Percent.probability(lines.alpha())
                + " and beta = " + Percent.probability(lines.beta()) + ", so that the truncated plan meets "
                + Percent.level(points.alpha()) + " and " + Percent.level(points.beta()) + " exactly."
                : "  Lines drawn for alpha = " + Percent.level(points.alpha()) + " and beta = "
                        + Percent.level(points.beta()) + " (Wald).");
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
            int acceptFrom = firstUnitAccepting(plan, count);
            int rejectUpTo = lastUnitRejecting(plan, count);
            out.printf("  %-7d %28s %28s%n", count, acceptFrom > 0 ? String.valueOf(acceptFrom) : "never",
                    rejectUpTo > 0 ? (rejectUpTo == plan.truncation() ? "the end (" + rejectUpTo + ")"
                            : String.valueOf(rejectUpTo)) : "never");
        }
        if (finalAcceptance + 1 > 12) {
            out.println("  (counts above 12: see 'lotgate curve' or the plan's lines)");
        }
    }

    /** The first unit after which a count accepts the lot, or 0 if it never does (acceptance numbers never fall). */
    static int firstUnitAccepting(SequentialPlan plan, long count) {
        for (int m = 1; m <= plan.truncation(); m++) {
            if (plan.acceptanceNumber(m) >= count) {
                return m;
            }
        }
        return 0;
    }

    /** The last unit up to which a count rejects the lot, or 0 if it never does (rejection numbers never fall). */
    static int lastUnitRejecting(SequentialPlan plan, long count) {
        int last = 0;
        for (int m = 1; m <= plan.truncation() && plan.rejectionNumber(m) <= count; m++) {
            last = m;
        }
        return last;
    }

    private void printRisks(PrintWriter out, Result result, RiskPoints points) {
        PlanRisks risks = result.risks();
        String unit = model.countsUnits() ? "" : " per unit";
        boolean wald = result.plan() instanceof SequentialPlan;
        WaldSequential lines = wald ? linesOf((SequentialPlan) result.plan(), points) : null;
        if (wald) {
            out.println("  Risks of the truncated plan, exact; Wald's approximation for its lines, untruncated, beside"
                    + " them");
        }
        String row = "  %-6s %-22s %-11s %-24s %-16s%s%n";
        out.printf(row, "point", "quality", "P(accept)", "risk", "allowed", wald ? "Wald's P(accept)" : "");
        out.printf(row, "AQL", Percent.level(points.aql()) + unit + DesignCommand.pointNote(model, risks.aqlPoint(), lotSize),
                Percent.probability(1 - risks.producerRisk()), "producer's " + Percent.probability(risks.producerRisk()),
                String.format("%-8s%s", Percent.level(points.alpha()), DesignCommand.verdict(risks.producerRisk()
                        <= points.alpha())), wald ? Percent.probability(lines.acceptance(points.aql())) : "");
        out.printf(row, "LTPD", Percent.level(points.ltpd()) + unit + DesignCommand.pointNote(model, risks.ltpdPoint(),
                lotSize), Percent.probability(risks.consumerRisk()), "consumer's " + Percent.probability(
                risks.consumerRisk()), String.format("%-8s%s", Percent.level(points.beta()), DesignCommand.verdict(
                risks.consumerRisk() <= points.beta())), wald ? Percent.probability(lines.acceptance(points.ltpd())) : "");
        if (!risks.meets(points)) {
            out.println();
            out.println("  The plan does not meet every risk asked for" + (wald ? ": truncation changes Wald's risks;"
                    + (command.plainWald ? " leave out --plain-wald to redraw the lines until it does."
                    : " try a later --truncate-at, or a double plan.") : "."));
        }
    }

    private void printCosts(PrintWriter out, Result result, RiskPoints points) {
        Plan plan = result.plan();
        SinglePlan single = result.single();
        double aql = aqlPoint(points);
        double ltpd = ltpdPoint(points);
        out.println("  What it costs" + (single == null ? "" : ", against the single plan for the same risks ("
                + PlanWording.brief(single) + ")") + ":");
        String row = "  %-42s %10s %10s %9s%n";
        out.printf(row, "", single == null ? "" : "single", plan.scheme(), single == null ? "" : "change");
        costRow(out, row, "ASN at the AQL " + Percent.level(points.aql()), single == null ? Double.NaN : single.n(),
                plan.averageSampleNumber(model, aql));
        costRow(out, row, "ASN at the LTPD " + Percent.level(points.ltpd()), single == null ? Double.NaN : single.n(),
                plan.averageSampleNumber(model, ltpd));
        if (plan instanceof DoublePlan && command.curtailed) {
            costRow(out, row, "ASN at the AQL, second sample curtailed", single == null ? Double.NaN : single.n(),
                    curtailedAsn(plan, aql));
            costRow(out, row, "ASN at the LTPD, second sample curtailed", single == null ? Double.NaN : single.n(),
                    curtailedAsn(plan, ltpd));
        }
        if (plan instanceof SequentialPlan sequential) {
            WaldSequential lines = linesOf(sequential, points);
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

    private ObjectNode json(Result result, RiskPoints points, SavedPlan saved) {
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
        double aql = aqlPoint(points);
        double ltpd = ltpdPoint(points);
        node.put("asnAtAql", plan.averageSampleNumber(model, aql));
        node.put("asnAtLtpd", plan.averageSampleNumber(model, ltpd));
        node.put("maxSampleSize", plan.maxSampleSize());
        if (plan instanceof DoublePlan twice) {
            node.put("curtailedAsnAtAql", twice.curtailedAverageSampleNumber(model, aql));
            node.put("curtailedAsnAtLtpd", twice.curtailedAverageSampleNumber(model, ltpd));
            if (result.method().equals(SavedPlan.SMALLEST_ASN)) {
                DoublePlanDesigner.Space space = space();
                ObjectNode search = node.putObject("search");
                if (space.ratio() == null) {
                    search.put("secondRatio", "free");
                } else {
                    search.put("secondRatio", space.ratio());
                }
                if (space.firstRejection() != null) {
                    search.put("firstRejection", space.firstRejection());
                }
                search.put("asnAt", asnLevel(points));
                search.put("plansEvaluated", result.candidates());
            }
        }
        if (plan instanceof SequentialPlan sequential) {
            WaldSequential lines = linesOf(sequential, points);
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

    private static void putRisks(ObjectNode node, Result result, RiskPoints points) {
        node.put("aql", points.aql());
        node.put("alpha", points.alpha());
        node.put("ltpd", points.ltpd());
        node.put("beta", points.beta());
        node.put("producerRisk", result.risks().producerRisk());
        node.put("consumerRisk", result.risks().consumerRisk());
        node.put("risksMet", result.risks().meets(points));
    }

    private String csv(Result result, RiskPoints points, SavedPlan saved) {
        Plan plan = result.plan();
        return CsvTable.table(List.of("scheme", "model", "method", "plan", "aql", "alpha", "ltpd", "beta",
                "producerRisk", "consumerRisk", "risksMet", "asnAtAql", "asnAtLtpd", "maxSampleSize", "lotSize",
                "fingerprint"), List.of(List.of(plan.scheme(), model.name(), result.method(), PlanWording.brief(plan),
                points.aql(), points.alpha(), points.ltpd(), points.beta(), result.risks().producerRisk(),
                result.risks().consumerRisk(), result.risks().meets(points),
                plan.averageSampleNumber(model, aqlPoint(points)), plan.averageSampleNumber(model, ltpdPoint(points)),
                plan.maxSampleSize(), lotSize > 0 ? lotSize : "", saved == null ? "" : saved.fingerprint())));
    }
}
