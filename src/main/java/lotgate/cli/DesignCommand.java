package lotgate.cli;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.List;
import lotgate.plan.DefectClass;
import lotgate.plan.PlanFormat;
import lotgate.plan.SavedPlan;
import lotgate.sampling.OcModel;
import lotgate.sampling.PlanRisks;
import lotgate.sampling.RiskPoints;
import lotgate.sampling.SingleDesign;
import lotgate.sampling.SinglePlan;
import lotgate.sampling.SinglePlanDesigner;
import lotgate.report.CsvTable;
import picocli.CommandLine.ArgGroup;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

/** Designs a single-sampling plan from the two risks, or evaluates one given as n and c, and saves it. */
@Command(name = "design", mixinStandardHelpOptions = true, sortOptions = false, usageHelpAutoWidth = true,
        header = "Design a sampling plan from the producer's and consumer's risks.",
        description = {
                "Finds the plan (n, c) with the smallest sample size n whose producer's risk P(reject | AQL) is at"
                        + " most alpha and whose consumer's risk P(accept | LTPD) is at most beta, computed exactly."
                        + " With --acceptance alone: the smallest n for that acceptance number that meets the LTPD"
                        + " point. With --sample-size and --acceptance: the risks of that plan.",
                "",
                "--scheme variables designs a k-method plan for a measured characteristic (--lower and/or --upper,"
                        + " --sigma if known) with both risks held exactly (noncentral t for an unknown sigma).",
                "",
                "--scheme double finds the double plan with the smallest average sample number (ASN) at the AQL"
                        + " that meets both risks exactly; --scheme sequential gives Wald's item-by-item plan with"
                        + " its exact risks once truncated; --scheme multiple evaluates stages given with --stage."
                        + " Each is compared with the single plan for the same risks.",
                "",
                "Quality levels and risks are written as percent (1%%, 0.65%%) or as fractions (0.01).",
                ""})
final class DesignCommand implements Runnable {

    @Option(names = "--aql", paramLabel = "LEVEL", converter = Values.Quality.class,
            description = "Acceptable quality level: lots this good should pass (e.g. 1%%).")
    Double aql;

    @Option(names = "--alpha", paramLabel = "RISK", defaultValue = "5%", converter = Values.Risk.class,
            description = "Producer's risk: the largest allowed P(reject) at the AQL (default ${DEFAULT-VALUE}).")
    double alpha;

    @Option(names = "--ltpd", paramLabel = "LEVEL", converter = Values.Quality.class,
            description = "Lot tolerance percent defective: lots this bad should fail (e.g. 5%%).")
    Double ltpd;

    @Option(names = "--beta", paramLabel = "RISK", defaultValue = "10%", converter = Values.Risk.class,
            description = "Consumer's risk: the largest allowed P(accept) at the LTPD (default ${DEFAULT-VALUE}).")
    double beta;

    @Mixin
    ModelOptions models;

    @Option(names = {"-c", "--acceptance"}, paramLabel = "C", converter = Values.Acceptance.class,
            description = "Fix the acceptance number (e.g. 0 for a zero-acceptance plan) and find the smallest n"
                    + " that meets the LTPD point.")
    Integer acceptance;

    @Option(names = {"-n", "--sample-size"}, paramLabel = "N", converter = Values.Count.class,
            description = "With --acceptance: evaluate this plan instead of designing one.")
    Integer sampleSize;

    @Option(names = "--class", paramLabel = "CLASS:SPEC",
            description = "Criteria for one defect class instead of --aql and --ltpd, repeatable: critical, major"
                    + " or minor, then a colon and aql=, ltpd=, and optionally alpha=, beta=, c= (fixed acceptance"
                    + " number) and n= (with c=, a given plan), e.g. --class critical:c=0,aql=0.1%%,ltpd=2%%"
                    + " --class major:aql=1%%,ltpd=5%%. The lot's sample is the largest n; a class with a smaller"
                    + " n is judged on the first units of the sample.")
    List<String> classSpecs = new ArrayList<>();

    @Option(names = "--scheme", paramLabel = "SCHEME", defaultValue = "single",
            description = "The kind of plan: single (the default), double (a second sample when the first does not"
                    + " decide; designed for the smallest average sample number), multiple (up to 7 stages, given"
                    + " with --stage), sequential (item by item, Wald's lines for both risks) or variables (by"
                    + " measurements against specification limits).")
    String scheme;

    @Option(names = "--second-ratio", paramLabel = "K", defaultValue = "1",
            description = "Double plans: the second sample is K times the first (default ${DEFAULT-VALUE}, equal"
                    + " samples as in the double plans of ISO 2859-1), or 'free' to search every second sample"
                    + " size.")
    String secondRatio;

    @Option(names = "--first-rejection", paramLabel = "R1", converter = Values.Count.class,
            description = "Double plans: fix the first sample's rejection number r1 (default: c2 + 1, so that the"
                    + " first sample rejects only what the second could not accept).")
    Integer firstRejection;

    @Option(names = "--asn-at", paramLabel = "LEVEL", converter = Values.Quality.class,
            description = "Double plans: the quality level at which the average sample number is minimised"
                    + " (default: the AQL, where most lots should be).")
    Double asnAt;

    @Option(names = "--stage", paramLabel = "N:C:R",
            description = "A given stage of a double or multiple plan, repeatable in order: sample size, acceptance"
                    + " number (- where the stage cannot accept) and rejection number, on the cumulative count,"
                    + " e.g. --stage 50:1:4 --stage 100:3 (the last stage's R is C + 1 and may be left out).")
    List<String> stageSpecs = new ArrayList<>();

    @Option(names = "--truncate-at", paramLabel = "N", converter = Values.Count.class,
            description = "Sequential plans: the most units inspected (default: 3 times the single plan's n for the"
                    + " same risks).")
    Integer truncateAt;

    @Option(names = "--sigma", paramLabel = "VALUE",
            description = "Variables plans: the known process standard deviation, in the measurement's unit (leave it"
                    + " out when sigma is estimated from each sample).")
    Double sigma;

    @Option(names = "--lower", paramLabel = "LIMIT", description = "Variables plans: the lower specification limit.")
    Double lower;

    @Option(names = "--upper", paramLabel = "LIMIT", description = "Variables plans: the upper specification limit.")
    Double upper;

    @Option(names = "--limits", paramLabel = "HOW",
            description = "Variables plans with both limits: combined (default; the M-method on the estimated"
                    + " fraction beyond both, one AQL for both) or separate (the k-method at each limit, with the"
                    + " same AQL, or the lower limit's own with --lower-aql and --lower-ltpd).")
    String limits;

    @Option(names = "--k", paramLabel = "K",
            description = "Variables plans: with --sample-size, evaluate the plan (n, k) you already have.")
    Double kValue;

    @Option(names = "--lower-aql", paramLabel = "LEVEL", converter = Values.Quality.class,
            description = "Variables plans with --limits separate: the lower limit's own AQL (default --aql, which"
                    + " then holds for the upper limit).")
    Double lowerAql;

    @Option(names = "--lower-ltpd", paramLabel = "LEVEL", converter = Values.Quality.class,
            description = "Variables plans with --limits separate: the lower limit's own LTPD (default --ltpd).")
    Double lowerLtpd;

    @Option(names = "--unit", paramLabel = "UNIT", description = "Variables plans: the measurement's unit, e.g. mm.")
    String unit;

    @Option(names = "--characteristic", paramLabel = "NAME",
            description = "Variables plans: what is measured, e.g. 'bore diameter'.")
    String characteristic;

    @Option(names = "--plain-wald",
            description = "Sequential plans: keep Wald's lines for the risks as asked, even where the truncated plan's"
                    + " exact risks then exceed them (by default the lines are redrawn until both are met).")
    boolean plainWald;

    @Option(names = "--curtailed",
            description = "Double plans: show the ASN with inspection of the second sample stopped as soon as the"
                    + " rejection number is reached (the design still minimises the full ASN).")
    boolean curtailed;

    @ArgGroup(exclusive = false)
    SaveOptions save;

    static final class SaveOptions {
        @Option(names = "--save", required = true, paramLabel = "FILE",
                description = "Save the plan as a plan file (e.g. plans/bolts.json).")
        Path file;

        @Option(names = "--description", paramLabel = "TEXT", defaultValue = "",
                description = "What the plan is for, kept in the plan file.")
        String description;

        @Option(names = "--replace", description = "Overwrite an existing plan file.")
        boolean replace;
    }

    @Mixin
    OutputFormat format;

    @Spec
    CommandSpec spec;

    /** What one defect class asks for: its risk points and, optionally, a fixed c or a given plan. */
    record ClassRequest(DefectClass defectClass, RiskPoints points, Integer acceptance, Integer sampleSize) {
    }

    /** A class's design outcome with how it was obtained. */
    record ClassOutcome(ClassRequest request, SingleDesign design, String method) {
        SingleDesign.Found found() {
            return (SingleDesign.Found) design;
        }
    }

    @Override
    public void run() {
        OcModel model = models.resolve(spec);
        int lotSize = models.lotSizeOrZero();
        if (!List.of("single", "double", "multiple", "sequential", "variables").contains(scheme)) {
            throw new ParameterException(spec.commandLine(), "--scheme " + scheme + ": give single, double, multiple,"
                    + " sequential or variables");
        }
        if (scheme.equals("variables")) {
            new VariablesDesign(this, model, lotSize).run();
            return;
        }
        if (sigma != null || lower != null || upper != null || limits != null || unit != null
                || characteristic != null || lowerAql != null || lowerLtpd != null || kValue != null) {
            throw new ParameterException(spec.commandLine(), "--sigma, --lower, --upper, --limits, --unit,"
                    + " --characteristic, --lower-aql, --lower-ltpd and --k are for --scheme variables");
        }
        if (!scheme.equals("single")) {
            new SchemeDesign(this, model, lotSize).run();
            return;
        }
        if (!stageSpecs.isEmpty() || truncateAt != null || firstRejection != null || asnAt != null || curtailed
                || plainWald || !secondRatio.equals("1")) {
            throw new ParameterException(spec.commandLine(), "--stage, --truncate-at, --first-rejection, --asn-at,"
                    + " --second-ratio, --curtailed and --plain-wald are for --scheme double, multiple or sequential");
        }
        List<ClassRequest> requests = classSpecs.isEmpty()
                ? List.of(plainRequest(model, lotSize))
                : classRequests(model, lotSize);
        if (save != null) {
            checkSaveTarget();
        }
        SinglePlanDesigner designer = new SinglePlanDesigner(model, lotSize);
        List<ClassOutcome> outcomes = new ArrayList<>();
        for (ClassRequest request : requests) {
            outcomes.add(designFor(designer, model, request));
        }
        PrintWriter out = spec.commandLine().getOut();
        for (ClassOutcome outcome : outcomes) {
            if (outcome.design() instanceof SingleDesign.NotFound none) {
                String reason = (requests.size() > 1 ? "class " + outcome.request().defectClass().label() + ": " : "")
                        + none.reason();
                printNoPlan(out, reason, model, lotSize);
                throw new Main.Failure(ExitCode.NO_PLAN, format.kind == OutputFormat.Kind.text ? null
                        : "no sampling plan meets the request: " + reason);
            }
        }
        SavedPlan saved = null;
        if (save != null) {
            String name = stem(save.file);
            List<PlanFormat.ClassDraft> drafts = outcomes.stream().map(o -> new PlanFormat.ClassDraft(
                    o.request().defectClass(), o.found().plan(), o.request().points(), o.method())).toList();
            saved = PlanFormat.seal(name, save.description, Instant.now().truncatedTo(ChronoUnit.SECONDS), model,
                    lotSize, drafts);
            PlanFormat.write(save.file, saved);
        }
        switch (format.kind) {
            case json -> out.println(Json.text(json(outcomes, model, lotSize, saved)));
            case csv -> out.print(csv(outcomes, model, lotSize, saved));
            case text -> printText(out, outcomes, model, lotSize, saved);
        }
        out.flush();
    }

    private ClassRequest plainRequest(OcModel model, int lotSize) {
        if (aql == null || ltpd == null) {
            throw new ParameterException(spec.commandLine(), "give --aql and --ltpd (or criteria per defect class"
                    + " with --class)");
        }
        return checkedRequest(DefectClass.ANY, "", aql, alpha, ltpd, beta, acceptance, sampleSize, model, lotSize);
    }

    private List<ClassRequest> classRequests(OcModel model, int lotSize) {
        if (aql != null || ltpd != null || acceptance != null || sampleSize != null) {
            throw new ParameterException(spec.commandLine(), "with --class, give aql=, ltpd=, c= and n= inside each"
                    + " class's criteria, not as --aql, --ltpd, --acceptance or --sample-size");
        }
        List<ClassRequest> requests = new ArrayList<>();
        for (String text : classSpecs) {
            requests.add(parseClass(text, model, lotSize));
        }
        for (DefectClass defectClass : DefectClass.values()) {
            if (requests.stream().filter(r -> r.defectClass() == defectClass).count() > 1) {
                throw new ParameterException(spec.commandLine(), "--class " + defectClass.label() + " is given twice");
            }
        }
        requests.sort(java.util.Comparator.comparing(ClassRequest::defectClass));
        return requests;
    }

    private ClassRequest parseClass(String text, OcModel model, int lotSize) {
        String where = "--class " + text;
        int colon = text.indexOf(':');
        DefectClass defectClass = DefectClass.of(colon < 0 ? text : text.substring(0, colon));
        if (defectClass == null || defectClass == DefectClass.ANY) {
            throw new ParameterException(spec.commandLine(), where + ": start with critical, major or minor and a"
                    + " colon, as in major:aql=1%,ltpd=5%");
        }
        Double classAql = null;
        Double classLtpd = null;
        double classAlpha = alpha;
        double classBeta = beta;
        Integer c = null;
        Integer n = null;
        for (String pair : colon < 0 ? new String[0] : text.substring(colon + 1).split(",")) {
            int equals = pair.indexOf('=');
            if (equals < 0) {
                throw new ParameterException(spec.commandLine(), where + ": '" + pair + "' is not key=value");
            }
            String key = pair.substring(0, equals).trim();
            String value = pair.substring(equals + 1).trim();
            try {
                switch (key) {
                    case "aql" -> classAql = Values.fraction(value);
                    case "ltpd" -> classLtpd = Values.fraction(value);
                    case "alpha" -> classAlpha = new Values.Risk().convert(value);
                    case "beta" -> classBeta = new Values.Risk().convert(value);
                    case "c" -> c = new Values.Acceptance().convert(value);
                    case "n" -> n = new Values.Count().convert(value);
                    default -> throw new ParameterException(spec.commandLine(), where + ": unknown key '" + key
                            + "'; use aql, ltpd, alpha, beta, c or n");
                }
            } catch (picocli.CommandLine.TypeConversionException e) {
                throw new ParameterException(spec.commandLine(), where + ": " + key + ": " + e.getMessage());
            }
        }
        if (classAql == null || classLtpd == null) {
            throw new ParameterException(spec.commandLine(), where + ": give both aql= and ltpd=");
        }
        return checkedRequest(defectClass, where + ": ", classAql, classAlpha, classLtpd, classBeta, c, n, model,
                lotSize);
    }

    private ClassRequest checkedRequest(DefectClass defectClass, String where, double classAql, double classAlpha,
            double classLtpd, double classBeta, Integer c, Integer n, OcModel model, int lotSize) {
        String aqlName = where.isEmpty() ? "--aql" : "aql";
        String ltpdName = where.isEmpty() ? "--ltpd" : "ltpd";
        ModelOptions.checkLevel(spec, model, where + aqlName, classAql);
        ModelOptions.checkLevel(spec, model, where + ltpdName, classLtpd);
        if (classAql >= classLtpd) {
            throw new ParameterException(spec.commandLine(), where + aqlName + " " + Percent.level(classAql)
                    + " must be below " + ltpdName + " " + Percent.level(classLtpd));
        }
        if (classAlpha + classBeta >= 1) {
            throw new ParameterException(spec.commandLine(), where + (where.isEmpty() ? "--alpha plus --beta"
                    : "alpha plus beta") + " must be below 100%");
        }
        String sizeName = where.isEmpty() ? "--sample-size" : "n";
        String acceptanceName = where.isEmpty() ? "--acceptance" : "c";
        if (n != null && c == null) {
            throw new ParameterException(spec.commandLine(), where + sizeName + " needs " + acceptanceName
                    + " to evaluate a plan");
        }
        if (n != null && lotSize > 0 && n > lotSize) {
            throw new ParameterException(spec.commandLine(), where + sizeName + " " + n + " exceeds --lot-size "
                    + lotSize);
        }
        if (n != null && c >= n) {
            throw new ParameterException(spec.commandLine(), where + acceptanceName + " must be below " + sizeName
                    + " " + n + ", got " + c);
        }
        return new ClassRequest(defectClass, new RiskPoints(classAql, classAlpha, classLtpd, classBeta), c, n);
    }

    private static ClassOutcome designFor(SinglePlanDesigner designer, OcModel model, ClassRequest request) {
        RiskPoints points = request.points();
        if (request.sampleSize() != null) {
            SinglePlan plan = new SinglePlan(request.sampleSize(), request.acceptance());
            return new ClassOutcome(request, new SingleDesign.Found(plan, PlanRisks.of(plan, model, points), List.of()),
                    SavedPlan.GIVEN);
        }
        if (request.acceptance() != null) {
            return new ClassOutcome(request, designer.designForAcceptanceNumber(request.acceptance(), points),
                    SavedPlan.FIXED_ACCEPTANCE);
        }
        return new ClassOutcome(request, designer.design(points), SavedPlan.SMALLEST_SAMPLE);
    }

    /** The risk points of a double, multiple, sequential or variables plan, checked option by option. */
    RiskPoints schemePoints(OcModel model, String missing) {
        if (aql == null || ltpd == null) {
            throw new ParameterException(spec.commandLine(), missing);
        }
        ModelOptions.checkLevel(spec, model, "--aql", aql);
        ModelOptions.checkLevel(spec, model, "--ltpd", ltpd);
        if (aql >= ltpd) {
            throw new ParameterException(spec.commandLine(), "--aql " + Percent.level(aql) + " must be below --ltpd "
                    + Percent.level(ltpd));
        }
        if (alpha + beta >= 1) {
            throw new ParameterException(spec.commandLine(), "--alpha plus --beta must be below 100%");
        }
        return new RiskPoints(aql, alpha, ltpd, beta);
    }

    void checkSaveTarget() {
        Path file = save.file;
        if (!file.getFileName().toString().endsWith(".json")) {
            throw new ParameterException(spec.commandLine(), "--save " + file + ": a plan file name must end in .json");
        }
        if (Files.exists(file) && !save.replace) {
            throw new ParameterException(spec.commandLine(), "--save " + file + ": the file exists; add --replace to"
                    + " overwrite it (plans already in use should keep their name and fingerprint)");
        }
        if (Files.isDirectory(file)) {
            throw new ParameterException(spec.commandLine(), "--save " + file + " is a folder");
        }
    }

    static String stem(Path file) {
        String name = file.getFileName().toString();
        return name.substring(0, name.length() - ".json".length());
    }

    void printNoPlan(PrintWriter out, String reason, OcModel model, int lotSize) {
        switch (format.kind) {
            case json -> {
                ObjectNode node = Json.object();
                node.put("planFound", false);
                node.put("model", model.name());
                node.put("reason", reason);
                node.put("recommendation", "inspect every unit of the lot (100% inspection)");
                if (lotSize > 0) {
                    node.put("lotSize", lotSize);
                }
                out.println(Json.text(node));
            }
            case csv -> out.print(CsvTable.table(List.of("planFound", "reason", "recommendation"),
                    List.of(List.of(false, reason, "inspect every unit of the lot (100% inspection)"))));
            case text -> {
                out.println("No sampling plan meets the request: " + reason + ".");
                out.println("Recommendation: inspect every unit of the lot (100% inspection), or relax the risks"
                        + " or widen the gap between AQL and LTPD.");
            }
        }
        out.flush();
    }

    static String modelLine(OcModel model, int lotSize) {
        return switch (model.name()) {
            case "hypergeometric" -> "hypergeometric model (type A: an isolated lot of " + lotSize + " units)";
            case "poisson" -> "Poisson model (nonconformities per unit)"
                    + (lotSize > 0 ? ", lot size " + lotSize : "");
            default -> "binomial model (type B: units from a steady process)"
                    + (lotSize > 0 ? ", lot size " + lotSize : "");
        };
    }

    static String unitWord(OcModel model, int count) {
        if (model.countsUnits()) {
            return count == 1 ? "nonconforming unit" : "nonconforming units";
        }
        return count == 1 ? "nonconformity" : "nonconformities";
    }

    private void printText(PrintWriter out, List<ClassOutcome> outcomes, OcModel model, int lotSize,
            SavedPlan saved) {
        boolean classed = outcomes.get(0).request().defectClass() != DefectClass.ANY;
        if (classed) {
            int sample = outcomes.stream().mapToInt(o -> o.found().plan().n()).max().orElseThrow();
            out.println("Single sampling plan with criteria per defect class");
            out.println("  " + modelLine(model, lotSize));
            out.println();
            out.println("  Inspect n = " + sample + " units; a class with a smaller sample is judged on the first"
                    + " units inspected.");
        }
        boolean zeroAcceptance = false;
        for (ClassOutcome outcome : outcomes) {
            SinglePlan plan = outcome.found().plan();
            zeroAcceptance |= plan.c() == 0;
            out.println();
            if (classed) {
                out.println("  " + outcome.request().defectClass().label() + " (" + describe(outcome.method(), plan)
                        + ")");
            } else {
                out.println("Single sampling plan" + switch (outcome.method()) {
                    case SavedPlan.GIVEN -> ", as given";
                    case SavedPlan.FIXED_ACCEPTANCE -> " with acceptance number " + plan.c()
                            + ": the smallest sample that meets the LTPD point";
                    default -> ": the smallest sample that meets both risks";
                });
                out.println("  " + modelLine(model, lotSize));
                out.println();
            }
            printClass(out, outcome, model, lotSize, classed ? "    " : "  ");
        }
        if (zeroAcceptance) {
            out.println();
            out.println(Cautions.ZERO_ACCEPTANCE.indent(2).stripTrailing());
        }
        if (saved != null) {
            out.println();
            out.println("  Saved " + save.file + " (fingerprint " + saved.shortFingerprint() + ")");
        }
    }

    private static String describe(String method, SinglePlan plan) {
        return switch (method) {
            case SavedPlan.GIVEN -> "as given";
            case SavedPlan.FIXED_ACCEPTANCE -> "acceptance number " + plan.c() + " fixed";
            default -> "smallest sample meeting both risks";
        };
    }

    private static void printClass(PrintWriter out, ClassOutcome outcome, OcModel model, int lotSize, String indent) {
        SinglePlan plan = outcome.found().plan();
        PlanRisks risks = outcome.found().risks();
        RiskPoints points = outcome.request().points();
        out.printf("%sInspect n = %d units. Accept the lot with up to c = %d %s; reject it at %d or more.%n",
                indent, plan.n(), plan.c(), unitWord(model, plan.c()), plan.rejectionNumber());
        if (lotSize > 0 && plan.n() == lotSize) {
            out.println(indent + "The sample is the whole lot: this is 100% inspection.");
        }
        out.println();
        String unit = model.countsUnits() ? "" : " per unit";
        String row = indent + "%-6s %-22s %-11s %-24s %-8s%n";
        out.printf(row, "point", "quality", "P(accept)", "risk", "allowed");
        out.printf(row, "AQL", Percent.level(points.aql()) + unit + pointNote(model, risks.aqlPoint(), lotSize),
                Percent.probability(1 - risks.producerRisk()), "producer's " + Percent.probability(risks.producerRisk()),
                String.format("%-8s%s", Percent.level(points.alpha()), verdict(risks.producerRisk() <= points.alpha())));
        out.printf(row, "LTPD", Percent.level(points.ltpd()) + unit + pointNote(model, risks.ltpdPoint(), lotSize),
                Percent.probability(risks.consumerRisk()), "consumer's " + Percent.probability(risks.consumerRisk()),
                String.format("%-8s%s", Percent.level(points.beta()), verdict(risks.consumerRisk() <= points.beta())));
        List<Integer> others = outcome.found().otherAcceptanceNumbers();
        if (!others.isEmpty()) {
            out.println();
            out.println(indent + "At n = " + plan.n() + " these acceptance numbers meet both risks too: c = "
                    + String.join(", ", others.stream().map(String::valueOf).toList())
                    + " (lower producer's risk, higher consumer's risk).");
        }
    }

    static String pointNote(OcModel model, double point, int lotSize) {
        if (model instanceof OcModel.Hypergeometric) {
            return " (D = " + Math.round(point * lotSize) + ")";
        }
        return "";
    }

    static String verdict(boolean met) {
        return met ? "met" : "NOT MET";
    }

    private static void putClass(ObjectNode node, ClassOutcome outcome, OcModel model, int lotSize) {
        SinglePlan plan = outcome.found().plan();
        PlanRisks risks = outcome.found().risks();
        RiskPoints points = outcome.request().points();
        node.put("method", outcome.method());
        node.put("n", plan.n());
        node.put("c", plan.c());
        node.put("rejectionNumber", plan.rejectionNumber());
        node.put("aql", points.aql());
        node.put("alpha", points.alpha());
        node.put("ltpd", points.ltpd());
        node.put("beta", points.beta());
        node.put("producerRisk", risks.producerRisk());
        node.put("consumerRisk", risks.consumerRisk());
        node.put("risksMet", risks.meets(points));
        var others = node.putArray("otherAcceptanceNumbers");
        outcome.found().otherAcceptanceNumbers().forEach(others::add);
        if (lotSize > 0) {
            if (model instanceof OcModel.Hypergeometric) {
                node.put("defectivesAtAql", Math.round(risks.aqlPoint() * lotSize));
                node.put("defectivesAtLtpd", Math.round(risks.ltpdPoint() * lotSize));
            } else {
                node.put("defectivesAtAql", points.aql() * lotSize);
                node.put("defectivesAtLtpd", points.ltpd() * lotSize);
            }
        }
    }

    private static ObjectNode json(List<ClassOutcome> outcomes, OcModel model, int lotSize, SavedPlan saved) {
        ObjectNode node = Json.object();
        node.put("planFound", true);
        node.put("scheme", "single");
        node.put("model", model.name());
        boolean classed = outcomes.get(0).request().defectClass() != DefectClass.ANY;
        int sample = outcomes.stream().mapToInt(o -> o.found().plan().n()).max().orElseThrow();
        if (classed) {
            node.put("sampleSize", sample);
            var list = node.putArray("classes");
            for (ClassOutcome outcome : outcomes) {
                ObjectNode entry = list.addObject();
                entry.put("class", outcome.request().defectClass().label());
                putClass(entry, outcome, model, lotSize);
            }
        } else {
            putClass(node, outcomes.get(0), model, lotSize);
        }
        if (lotSize > 0) {
            node.put("lotSize", lotSize);
            node.put("fullInspection", sample == lotSize);
        }
        if (saved != null) {
            node.put("fingerprint", saved.fingerprint());
        }
        return node;
    }

    private static String csv(List<ClassOutcome> outcomes, OcModel model, int lotSize, SavedPlan saved) {
        List<String> header = List.of("class", "scheme", "model", "method", "n", "c", "rejectionNumber", "aql",
                "alpha", "ltpd", "beta", "producerRisk", "consumerRisk", "risksMet", "lotSize", "fingerprint");
        List<List<Object>> rows = new ArrayList<>();
        for (ClassOutcome outcome : outcomes) {
            SinglePlan plan = outcome.found().plan();
            RiskPoints points = outcome.request().points();
            PlanRisks risks = outcome.found().risks();
            List<Object> row = new ArrayList<>(List.of(outcome.request().defectClass().label(), plan.scheme(),
                    model.name(), outcome.method(), plan.n(), plan.c(), plan.rejectionNumber(), points.aql(),
                    points.alpha(), points.ltpd(), points.beta(), risks.producerRisk(), risks.consumerRisk(),
                    risks.meets(points)));
            row.add(lotSize > 0 ? lotSize : "");
            row.add(saved == null ? "" : saved.fingerprint());
            rows.add(row);
        }
        return CsvTable.table(header, rows);
    }
}
