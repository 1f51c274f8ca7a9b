package lotgate.cli;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.List;
import lotgate.plan.PlanFormat;
import lotgate.plan.SavedPlan;
import lotgate.sampling.OcModel;
import lotgate.sampling.PlanRisks;
import lotgate.sampling.RiskPoints;
import lotgate.sampling.SingleDesign;
import lotgate.sampling.SinglePlan;
import lotgate.sampling.SinglePlanDesigner;
import picocli.CommandLine.ArgGroup;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

/** Designs a single-sampling plan from the two risks, or evaluates one given as n and c, and saves it. */
@Command(name = "design", mixinStandardHelpOptions = true, sortOptions = false, usageHelpAutoWidth = true,
        header = "Design a single-sampling plan from the producer's and consumer's risks.",
        description = {
                "Finds the plan (n, c) with the smallest sample size n whose producer's risk P(reject | AQL) is at"
                        + " most alpha and whose consumer's risk P(accept | LTPD) is at most beta, computed exactly."
                        + " With --acceptance alone: the smallest n for that acceptance number that meets the LTPD"
                        + " point. With --sample-size and --acceptance: the risks of that plan.",
                "",
                "Quality levels and risks are written as percent (1%%, 0.65%%) or as fractions (0.01).",
                ""})
final class DesignCommand implements Runnable {

    @Option(names = "--aql", required = true, paramLabel = "LEVEL", converter = Values.Quality.class,
            description = "Acceptable quality level: lots this good should pass (e.g. 1%%).")
    double aql;

    @Option(names = "--alpha", paramLabel = "RISK", defaultValue = "5%", converter = Values.Risk.class,
            description = "Producer's risk: the largest allowed P(reject) at the AQL (default ${DEFAULT-VALUE}).")
    double alpha;

    @Option(names = "--ltpd", required = true, paramLabel = "LEVEL", converter = Values.Quality.class,
            description = "Lot tolerance percent defective: lots this bad should fail (e.g. 5%%).")
    double ltpd;

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

    @Override
    public void run() {
        OcModel model = models.resolve(spec);
        ModelOptions.checkLevel(spec, model, "--aql", aql);
        ModelOptions.checkLevel(spec, model, "--ltpd", ltpd);
        if (aql >= ltpd) {
            throw new ParameterException(spec.commandLine(), "--aql " + Percent.level(aql)
                    + " must be below --ltpd " + Percent.level(ltpd));
        }
        if (alpha + beta >= 1) {
            throw new ParameterException(spec.commandLine(), "--alpha plus --beta must be below 100%");
        }
        if (sampleSize != null && acceptance == null) {
            throw new ParameterException(spec.commandLine(), "--sample-size needs --acceptance to evaluate a plan");
        }
        int lotSize = models.lotSizeOrZero();
        if (sampleSize != null && lotSize > 0 && sampleSize > lotSize) {
            throw new ParameterException(spec.commandLine(), "--sample-size " + sampleSize
                    + " exceeds --lot-size " + lotSize);
        }
        if (sampleSize != null && acceptance >= sampleSize) {
            throw new ParameterException(spec.commandLine(), "--acceptance must be below --sample-size "
                    + sampleSize + ", got " + acceptance);
        }
        if (save != null) {
            checkSaveTarget();
        }
        RiskPoints points = new RiskPoints(aql, alpha, ltpd, beta);
        SinglePlanDesigner designer = new SinglePlanDesigner(model, lotSize);
        String method;
        SingleDesign outcome;
        if (sampleSize != null) {
            SinglePlan plan = new SinglePlan(sampleSize, acceptance);
            outcome = new SingleDesign.Found(plan, PlanRisks.of(plan, model, points), List.of());
            method = SavedPlan.GIVEN;
        } else if (acceptance != null) {
            outcome = designer.designForAcceptanceNumber(acceptance, points);
            method = SavedPlan.FIXED_ACCEPTANCE;
        } else {
            outcome = designer.design(points);
            method = SavedPlan.SMALLEST_SAMPLE;
        }
        PrintWriter out = spec.commandLine().getOut();
        if (outcome instanceof SingleDesign.NotFound none) {
            printNoPlan(out, none.reason(), model, lotSize);
            throw new Main.Failure(ExitCode.NO_PLAN, format.kind == OutputFormat.Kind.text ? null
                    : "no sampling plan meets the request: " + none.reason());
        }
        SingleDesign.Found found = (SingleDesign.Found) outcome;
        SavedPlan saved = null;
        if (save != null) {
            String name = stem(save.file);
            saved = PlanFormat.seal(name, save.description, Instant.now().truncatedTo(ChronoUnit.SECONDS),
                    found.plan(), model, lotSize, points, method);
            PlanFormat.write(save.file, saved);
        }
        switch (format.kind) {
            case json -> out.println(Json.text(json(found, model, lotSize, points, method, saved)));
            case csv -> out.print(csv(found, model, lotSize, points, method, saved));
            case text -> printText(out, found, model, lotSize, points, method, saved);
        }
        out.flush();
    }

    private void checkSaveTarget() {
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

    private static String stem(Path file) {
        String name = file.getFileName().toString();
        return name.substring(0, name.length() - ".json".length());
    }

    private void printNoPlan(PrintWriter out, String reason, OcModel model, int lotSize) {
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
            case csv -> out.print(Csv.table(List.of("planFound", "reason", "recommendation"),
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

    private void printText(PrintWriter out, SingleDesign.Found found, OcModel model, int lotSize,
            RiskPoints points, String method, SavedPlan saved) {
        SinglePlan plan = found.plan();
        PlanRisks risks = found.risks();
        out.println(switch (method) {
            case SavedPlan.GIVEN -> "Single sampling plan, as given";
            case SavedPlan.FIXED_ACCEPTANCE -> "Single sampling plan with acceptance number " + plan.c()
                    + ": the smallest sample that meets the LTPD point";
            default -> "Single sampling plan: the smallest sample that meets both risks";
        });
        out.println("  " + modelLine(model, lotSize));
        out.println();
        out.printf("  Inspect n = %d units. Accept the lot with up to c = %d %s; reject it at %d or more.%n",
                plan.n(), plan.c(), unitWord(model, plan.c()), plan.rejectionNumber());
        if (lotSize > 0 && plan.n() == lotSize) {
            out.println("  The sample is the whole lot: this is 100% inspection.");
        }
        out.println();
        String unit = model.countsUnits() ? "" : " per unit";
        out.printf("  %-6s %-22s %-11s %-24s %-8s%n", "point", "quality", "P(accept)", "risk", "allowed");
        out.printf("  %-6s %-22s %-11s %-24s %s%n", "AQL", Percent.level(points.aql()) + unit + pointNote(model,
                risks.aqlPoint(), lotSize), Percent.probability(1 - risks.producerRisk()),
                "producer's " + Percent.probability(risks.producerRisk()),
                String.format("%-8s%s", Percent.level(points.alpha()), verdict(risks.producerRisk() <= points.alpha())));
        out.printf("  %-6s %-22s %-11s %-24s %s%n", "LTPD", Percent.level(points.ltpd()) + unit + pointNote(model,
                risks.ltpdPoint(), lotSize), Percent.probability(risks.consumerRisk()),
                "consumer's " + Percent.probability(risks.consumerRisk()),
                String.format("%-8s%s", Percent.level(points.beta()), verdict(risks.consumerRisk() <= points.beta())));
        if (!found.otherAcceptanceNumbers().isEmpty()) {
            out.println();
            out.println("  At n = " + plan.n() + " these acceptance numbers meet both risks too: c = "
                    + String.join(", ", found.otherAcceptanceNumbers().stream().map(String::valueOf).toList())
                    + " (lower producer's risk, higher consumer's risk).");
        }
        if (plan.c() == 0) {
            out.println();
            out.println(Cautions.ZERO_ACCEPTANCE.indent(2).stripTrailing());
        }
        if (saved != null) {
            out.println();
            out.println("  Saved " + save.file + " (fingerprint " + saved.shortFingerprint() + ")");
        }
    }

    private static String pointNote(OcModel model, double point, int lotSize) {
        if (model instanceof OcModel.Hypergeometric) {
            return " (D = " + Math.round(point * lotSize) + ")";
        }
        return "";
    }

    private static String verdict(boolean met) {
        return met ? "met" : "NOT MET";
    }

    private static ObjectNode json(SingleDesign.Found found, OcModel model, int lotSize, RiskPoints points,
            String method, SavedPlan saved) {
        SinglePlan plan = found.plan();
        PlanRisks risks = found.risks();
        ObjectNode node = Json.object();
        node.put("planFound", true);
        node.put("scheme", plan.scheme());
        node.put("model", model.name());
        node.put("method", method);
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
        found.otherAcceptanceNumbers().forEach(others::add);
        if (lotSize > 0) {
            node.put("lotSize", lotSize);
            if (model instanceof OcModel.Hypergeometric) {
                node.put("defectivesAtAql", Math.round(risks.aqlPoint() * lotSize));
                node.put("defectivesAtLtpd", Math.round(risks.ltpdPoint() * lotSize));
            } else {
                node.put("defectivesAtAql", points.aql() * lotSize);
                node.put("defectivesAtLtpd", points.ltpd() * lotSize);
            }
            node.put("fullInspection", plan.n() == lotSize);
        }
        if (saved != null) {
            node.put("fingerprint", saved.fingerprint());
        }
        return node;
    }

    private static String csv(SingleDesign.Found found, OcModel model, int lotSize, RiskPoints points,
            String method, SavedPlan saved) {
        SinglePlan plan = found.plan();
        List<String> header = List.of("scheme", "model", "method", "n", "c", "rejectionNumber", "aql", "alpha",
                "ltpd", "beta", "producerRisk", "consumerRisk", "risksMet", "lotSize", "fingerprint");
        List<Object> row = new ArrayList<>(List.of(plan.scheme(), model.name(), method, plan.n(), plan.c(),
                plan.rejectionNumber(), points.aql(), points.alpha(), points.ltpd(), points.beta(),
                found.risks().producerRisk(), found.risks().consumerRisk(), found.risks().meets(points)));
        row.add(lotSize > 0 ? lotSize : "");
        row.add(saved == null ? "" : saved.fingerprint());
        return Csv.table(header, List.of(row));
    }
}
