package lotgate.cli;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.time.Instant;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import lotgate.plan.Measurement;
import lotgate.plan.PlanFormat;
import lotgate.plan.SavedPlan;
import lotgate.report.CsvTable;
import lotgate.sampling.OcModel;
import lotgate.sampling.PlanRisks;
import lotgate.sampling.RiskPoints;
import lotgate.sampling.SingleDesign;
import lotgate.sampling.SinglePlan;
import lotgate.sampling.SinglePlanDesigner;
import lotgate.sampling.VariablesDesigner;
import lotgate.sampling.VariablesPlan;
import picocli.CommandLine.ParameterException;

/**
 * {@code design --scheme variables}: a k-method plan for a measured characteristic, with known or unknown
 * sigma, set beside the attribute plan for the same risks.
 */
final class VariablesDesign {
    private final DesignCommand command;
    private final OcModel model;
    private final int lotSize;

    VariablesDesign(DesignCommand command, OcModel model, int lotSize) {
        this.command = command;
        this.model = model;
        this.lotSize = lotSize;
    }

    private ParameterException usage(String message) {
        return new ParameterException(command.spec.commandLine(), message);
    }

    void run() {
        Measurement measurement = measurement();
        RiskPoints points = points();
        if (command.save != null) {
            command.checkSaveTarget();
        }
        RiskPoints lowerPoints = lowerPoints(points, measurement);
        boolean given = command.sampleSize != null || command.kValue != null;
        if (given && (command.sampleSize == null || command.kValue == null || !Double.isFinite(command.kValue))) {
            throw usage("give both --sample-size N and --k K to evaluate a variables plan you already have");
        }
        if (given && lowerPoints != null) {
            throw usage("--lower-aql and --lower-ltpd shape a design; a given plan (--sample-size, --k) has one k");
        }
        if (given && command.sampleSize < (measurement.sigmaKnown() ? 1 : 2)) {
            throw usage("--sample-size " + command.sampleSize + ": a variables plan with sigma unknown needs at least 2"
                    + " units");
        }
        VariablesDesigner.Design design = given
                ? VariablesDesigner.evaluate(points, new VariablesPlan(command.sampleSize, command.kValue,
                        measurement.sigmaKnown()))
                : VariablesDesigner.design(points, measurement.sigmaKnown());
        VariablesDesigner.Design lowerDesign = null;
        if (lowerPoints != null && design != null) {
            // Both limits share one sample: the larger n, with each limit's k in its own range there.
            lowerDesign = VariablesDesigner.design(lowerPoints, measurement.sigmaKnown());
            for (int round = 0; round < 100 && lowerDesign != null && design != null
                    && lowerDesign.plan().n() != design.plan().n(); round++) {
                int n = Math.max(lowerDesign.plan().n(), design.plan().n());
                design = VariablesDesigner.design(points, measurement.sigmaKnown(), n);
                lowerDesign = VariablesDesigner.design(lowerPoints, measurement.sigmaKnown(), n);
            }
            if (lowerDesign == null) {
                design = null;
            } else {
                measurement = new Measurement(measurement.characteristic(), measurement.lower(), measurement.upper(),
                        measurement.unit(), measurement.sigma(), measurement.limits(),
                        new Measurement.LimitDesign(lowerPoints, lowerDesign.plan().k()));
            }
        }
        PrintWriter out = command.spec.commandLine().getOut();
        if (design == null) {
            String reason = "no variables plan with at most " + VariablesDesigner.MOST_UNITS + " units meets both risks";
            command.printNoPlan(out, reason, model, lotSize);
            throw new Main.Failure(ExitCode.NO_PLAN, command.format.kind == OutputFormat.Kind.text ? null
                    : "no sampling plan meets the request: " + reason);
        }
        VariablesPlan plan = design.plan();
        if (measurement.limits().equals(Measurement.COMBINED) && plan.n() < (plan.sigmaKnown() ? 2 : 3)) {
            throw usage("the M-method needs at least " + (plan.sigmaKnown() ? 2 : 3) + " units; these risks give n = "
                    + plan.n() + ": use --limits separate");
        }
        if (lotSize > 0 && plan.n() > lotSize) {
            throw usage("the plan measures " + plan.n() + " units, more than --lot-size " + lotSize);
        }
        SingleDesign attribute = new SinglePlanDesigner(model, lotSize).design(points);
        SinglePlan single = attribute instanceof SingleDesign.Found found ? found.plan() : null;
        VariablesDesigner.Design known = measurement.sigmaKnown() && !given ? design
                : VariablesDesigner.design(points, true);
        SavedPlan saved = null;
        if (command.save != null) {
            saved = PlanFormat.seal(DesignCommand.stem(command.save.file), command.save.description,
                    Instant.now().truncatedTo(ChronoUnit.SECONDS), plan, model, lotSize, points,
                    given ? SavedPlan.GIVEN : SavedPlan.SMALLEST_SAMPLE, measurement);
            PlanFormat.write(command.save.file, saved);
        }
        switch (command.format.kind) {
            case json -> out.println(Json.text(json(design, known, single, measurement, points, saved, lowerDesign)));
            case csv -> out.print(csv(design, measurement, points, saved));
            case text -> printText(out, design, known, single, measurement, points, saved, lowerDesign);
        }
        out.flush();
    }

    private Measurement measurement() {
        if (!command.classSpecs.isEmpty() || command.acceptance != null
                || !command.stageSpecs.isEmpty() || command.truncateAt != null || command.firstRejection != null
                || command.asnAt != null || command.curtailed || command.plainWald || !command.secondRatio.equals("1")) {
            throw usage("--scheme variables takes the risks, --lower and/or --upper, --sigma, --limits, --unit,"
                    + " --characteristic, and --sample-size with --k for a given plan; --class, --acceptance, --stage and"
                    + " the double and sequential options are for attribute plans");
        }
        if (!model.countsUnits() || model instanceof OcModel.Hypergeometric) {
            throw usage("--model " + model.name() + ": a variables plan judges the fraction of a steady process beyond"
                    + " its limits (type B); leave out --model");
        }
        if (command.lower == null && command.upper == null) {
            throw usage("--scheme variables needs a specification limit: give --lower, --upper or both");
        }
        for (Double limit : new Double[] {command.lower, command.upper, command.sigma}) {
            if (limit != null && !Double.isFinite(limit)) {
                throw usage("the limits and --sigma must be numbers");
            }
        }
        if (command.lower != null && command.upper != null && !(command.lower < command.upper)) {
            throw usage("--lower " + command.lower + " must be below --upper " + command.upper);
        }
        if (command.sigma != null && !(command.sigma > 0)) {
            throw usage("--sigma " + command.sigma + ": the known process standard deviation must be above 0");
        }
        boolean two = command.lower != null && command.upper != null;
        String limits;
        if (!two) {
            if (command.limits != null) {
                throw usage("--limits is for plans with both --lower and --upper");
            }
            limits = Measurement.ONE;
        } else if (command.limits == null || command.limits.equals(Measurement.COMBINED)) {
            limits = Measurement.COMBINED;
        } else if (command.limits.equals(Measurement.SEPARATE)) {
            limits = Measurement.SEPARATE;
        } else {
            throw usage("--limits " + command.limits + ": give combined or separate");
        }
        return new Measurement(command.characteristic == null ? "" : command.characteristic.trim(), command.lower,
                command.upper, command.unit == null ? "" : command.unit.trim(), command.sigma, limits);
    }

    /** The lower limit's own design points, or null when it shares the plan's. */
    private RiskPoints lowerPoints(RiskPoints points, Measurement measurement) {
        if (command.lowerAql == null && command.lowerLtpd == null) {
            return null;
        }
        if (!measurement.limits().equals(Measurement.SEPARATE)) {
            throw usage("--lower-aql and --lower-ltpd give the lower limit a design of its own: add --limits separate"
                    + " (with both --lower and --upper)");
        }
        double aql = command.lowerAql != null ? command.lowerAql : points.aql();
        double ltpd = command.lowerLtpd != null ? command.lowerLtpd : points.ltpd();
        ModelOptions.checkLevel(command.spec, model, "--lower-aql", aql);
        ModelOptions.checkLevel(command.spec, model, "--lower-ltpd", ltpd);
        if (aql >= ltpd) {
            throw usage("the lower limit's AQL " + Percent.level(aql) + " must be below its LTPD " + Percent.level(ltpd));
        }
        return new RiskPoints(aql, points.alpha(), ltpd, points.beta());
    }

    private RiskPoints points() {
        return command.schemePoints(model, "give --aql and --ltpd: the fractions beyond the limit(s) that should pass and fail");
    }

    private static String number(double value) {
        return String.format(Locale.ROOT, "%.6g", value).replaceAll("(\\.\\d*?)0+$", "$1").replaceAll("\\.$", "");
    }

    /** What is measured, in one line: "bore diameter in mm, limits 9.95 to 10.05, sigma 0.012 known". */
    static String describe(Measurement measurement) {
        String what = measurement.characteristic().isEmpty() ? "measurements" : measurement.characteristic();
        String unit = measurement.unit().isEmpty() ? "" : " " + measurement.unit();
        String limits = measurement.twoLimits() ? "limits " + number(measurement.lower()) + " to "
                + number(measurement.upper()) + unit + " (" + measurement.limits() + ")"
                : measurement.lower() != null ? "lower limit " + number(measurement.lower()) + unit
                        : "upper limit " + number(measurement.upper()) + unit;
        String own = measurement.lowerDesign() == null ? "" : String.format(Locale.ROOT, ", the lower limit held to its"
                + " own AQL %s and LTPD %s (k = %.4f)", Percent.level(measurement.lowerDesign().designedFor().aql()),
                Percent.level(measurement.lowerDesign().designedFor().ltpd()), measurement.lowerDesign().k());
        return what + ", " + limits + own + ", " + (measurement.sigmaKnown() ? "sigma " + number(measurement.sigma())
                + unit + " known" : "sigma unknown (estimated by each sample's s)");
    }

    /** The acceptance rule in words. */
    static List<String> rule(VariablesPlan plan, Measurement measurement) {
        String deviation = plan.sigmaKnown() ? "sigma" : "s";
        List<String> lines = new ArrayList<>();
        lines.add(String.format(Locale.ROOT, "Measure n = %d units; compute their mean%s.", plan.n(),
                plan.sigmaKnown() ? "" : " and standard deviation s"));
        String k = String.format(Locale.ROOT, "k = %.4f", plan.k());
        switch (measurement.limits()) {
            case Measurement.COMBINED -> lines.add(String.format(Locale.ROOT, "Accept the lot when the estimated fraction"
                    + " beyond both limits (M-method, from (U - mean)/%s and (mean - L)/%s) is at most M = %s.",
                    deviation, deviation, Percent.probability(plan.maxEstimate())));
            case Measurement.SEPARATE -> lines.add(measurement.lowerDesign() == null
                    ? "Accept the lot when both (U - mean)/" + deviation + " and (mean - L)/" + deviation
                            + " are at least " + k + "."
                    : String.format(Locale.ROOT, "Accept the lot when (U - mean)/%s is at least k = %.4f and (mean - L)/%s"
                            + " at least k = %.4f.", deviation, plan.k(), deviation, measurement.lowerDesign().k()));
            default -> lines.add("Accept the lot when " + (measurement.upper() != null ? "(U - mean)/" : "(mean - L)/")
                    + deviation + " is at least " + k + "; reject it otherwise.");
        }
        return lines;
    }

    private void printText(PrintWriter out, VariablesDesigner.Design design, VariablesDesigner.Design known,
            SinglePlan single, Measurement measurement, RiskPoints points, SavedPlan saved,
            VariablesDesigner.Design lowerDesign) {
        VariablesPlan plan = design.plan();
        boolean given = Double.isNaN(design.lowestK());
        out.println("Variables plan (k-method), sigma " + (plan.sigmaKnown() ? "known" : "unknown")
                + (given ? ", as given" : ": the smallest sample that meets both risks"));
        out.println("  " + describe(measurement));
        out.println("  quality: the fraction of product beyond the limit" + (measurement.twoLimits() ? "s" : "")
                + ", measurements assumed normal");
        out.println();
        for (String line : rule(plan, measurement)) {
            out.println("  " + line);
        }
        if (!given) {
            out.printf(Locale.ROOT, "  (k = %.4f is the middle of the range %.4f to %.4f, every k of which meets both"
                    + " risks at n = %d%s.)%n", plan.k(), design.lowestK(), design.highestK(), plan.n(),
                    lowerDesign == null ? "" : " at the upper limit");
        }
        if (lowerDesign != null) {
            out.printf(Locale.ROOT, "  (the lower limit's k = %.4f is the middle of its range %.4f to %.4f.)%n",
                    lowerDesign.plan().k(), lowerDesign.lowestK(), lowerDesign.highestK());
        }
        out.println();
        PlanRisks risks = design.risks();
        String row = "  %-6s %-22s %-11s %-24s %-16s%n";
        out.printf(row, "point", "fraction beyond", "P(accept)", "risk", "allowed");
        out.printf(row, "AQL", Percent.level(points.aql()), Percent.probability(1 - risks.producerRisk()),
                "producer's " + Percent.probability(risks.producerRisk()), String.format("%-8s%s",
                        Percent.level(points.alpha()), DesignCommand.verdict(risks.producerRisk() <= points.alpha())));
        out.printf(row, "LTPD", Percent.level(points.ltpd()), Percent.probability(risks.consumerRisk()),
                "consumer's " + Percent.probability(risks.consumerRisk()), String.format("%-8s%s",
                        Percent.level(points.beta()), DesignCommand.verdict(risks.consumerRisk() <= points.beta())));
        if (lowerDesign != null) {
            RiskPoints lower = measurement.lowerDesign().designedFor();
            PlanRisks lowerRisks = lowerDesign.risks();
            out.printf(row, "AQL L", Percent.level(lower.aql()), Percent.probability(1 - lowerRisks.producerRisk()),
                    "producer's " + Percent.probability(lowerRisks.producerRisk()), String.format("%-8s%s",
                            Percent.level(lower.alpha()), DesignCommand.verdict(lowerRisks.producerRisk()
                                    <= lower.alpha())));
            out.printf(row, "LTPD L", Percent.level(lower.ltpd()), Percent.probability(lowerRisks.consumerRisk()),
                    "consumer's " + Percent.probability(lowerRisks.consumerRisk()), String.format("%-8s%s",
                            Percent.level(lower.beta()), DesignCommand.verdict(lowerRisks.consumerRisk()
                                    <= lower.beta())));
            out.println("  (AQL and LTPD: the upper limit's; AQL L and LTPD L: the lower limit's own, each with all"
                    + " nonconforming product beyond that limit)");
        } else if (measurement.twoLimits()) {
            out.println("  (risks with all nonconforming product beyond one limit; where both limits contribute the"
                    + " M-method accepts less often)");
        }
        out.println();
        if (single != null) {
            out.printf(Locale.ROOT, "  Against the attribute plan for the same risks (%s" + (lowerDesign == null ? ""
                    : ", the upper limit's") + "): %d units measured instead of %d inspected, %+.1f%%.%n", "n = " + single.n() + ", c = " + single.c(), plan.n(), single.n(),
                    100.0 * (plan.n() - single.n()) / single.n());
        }
        if (lowerDesign != null) {
            VariablesDesigner.Design upperAlone = VariablesDesigner.design(points, plan.sigmaKnown());
            VariablesDesigner.Design lowerAlone = VariablesDesigner.design(measurement.lowerDesign().designedFor(),
                    plan.sigmaKnown());
            out.printf(Locale.ROOT, "  Each limit alone would need n = %d (upper) and n = %d (lower); the plan measures"
                    + " the larger sample for both.%n", upperAlone.plan().n(), lowerAlone.plan().n());
        } else if (plan.sigmaKnown() && !given) {
            out.printf(Locale.ROOT, "  Closed form: n = %.2f, rounded up to %d; k = %.4f (common practice).%n",
                    design.exactSize(), plan.n(), design.closedFormK());
        } else if (given) {
            out.printf(Locale.ROOT, "  The smallest plan for these risks: n = %d with sigma known, n = %d with sigma"
                    + " unknown.%n", known.plan().n(), VariablesDesigner.design(points, false).plan().n());
        } else {
            out.printf(Locale.ROOT, "  With sigma known the plan would need n = %d (k = %.4f). Wallis's approximation for"
                    + " an unknown sigma, n_sigma (1 + k^2/2) = %.1f, gives %d units; the exact answer is %d.%n",
                    known.plan().n(), known.plan().k(), design.wallis(), (int) Math.ceil(design.wallis() - 1e-9),
                    plan.n());
        }
        out.println();
        out.println(Cautions.VARIABLES.indent(2).stripTrailing());
        if (saved != null) {
            out.println();
            out.println("  Saved " + command.save.file + " (fingerprint " + saved.shortFingerprint() + ")");
        }
    }

    private ObjectNode json(VariablesDesigner.Design design, VariablesDesigner.Design known, SinglePlan single,
            Measurement measurement, RiskPoints points, SavedPlan saved, VariablesDesigner.Design lowerDesign) {
        VariablesPlan plan = design.plan();
        ObjectNode node = Json.object();
        node.put("planFound", true);
        node.put("scheme", "variables");
        boolean given = Double.isNaN(design.lowestK());
        node.put("method", given ? SavedPlan.GIVEN : SavedPlan.SMALLEST_SAMPLE);
        node.put("n", plan.n());
        node.put("k", plan.k());
        if (!given) {
            node.put("kLowest", design.lowestK());
            node.put("kHighest", design.highestK());
        }
        node.put("sigmaKnown", plan.sigmaKnown());
        node.put("limits", measurement.limits());
        if (measurement.limits().equals(Measurement.COMBINED)) {
            node.put("maxEstimate", plan.maxEstimate());
        }
        node.put("aql", points.aql());
        node.put("alpha", points.alpha());
        node.put("ltpd", points.ltpd());
        node.put("beta", points.beta());
        node.put("producerRisk", design.risks().producerRisk());
        node.put("consumerRisk", design.risks().consumerRisk());
        node.put("risksMet", design.risks().meets(points));
        ObjectNode closed = node.putObject("knownSigma");
        closed.put("exactN", design.exactSize());
        closed.put("n", known.plan().n());
        closed.put("closedFormK", design.closedFormK());
        closed.put("k", known.plan().k());
        ObjectNode wallis = node.putObject("wallis");
        wallis.put("n", design.wallis());
        wallis.put("nRounded", (int) Math.ceil(design.wallis() - 1e-9));
        if (single != null) {
            ObjectNode attribute = node.putObject("attribute");
            attribute.put("n", single.n());
            attribute.put("c", single.c());
            attribute.put("unitsSaved", single.n() - plan.n());
        }
        node.set("measurement", PlanFormat.measurementJson(measurement));
        if (lowerDesign != null) {
            ObjectNode lower = node.putObject("lowerLimit");
            lower.put("k", lowerDesign.plan().k());
            lower.put("kLowest", lowerDesign.lowestK());
            lower.put("kHighest", lowerDesign.highestK());
            lower.put("aql", measurement.lowerDesign().designedFor().aql());
            lower.put("ltpd", measurement.lowerDesign().designedFor().ltpd());
            lower.put("producerRisk", lowerDesign.risks().producerRisk());
            lower.put("consumerRisk", lowerDesign.risks().consumerRisk());
            lower.put("risksMet", lowerDesign.risks().meets(measurement.lowerDesign().designedFor()));
        }
        if (saved != null) {
            node.put("fingerprint", saved.fingerprint());
        }
        return node;
    }

    private String csv(VariablesDesigner.Design design, Measurement measurement, RiskPoints points, SavedPlan saved) {
        VariablesPlan plan = design.plan();
        return CsvTable.table(List.of("scheme", "n", "k", "sigmaKnown", "limits", "maxEstimate", "aql", "alpha", "ltpd",
                "beta", "producerRisk", "consumerRisk", "risksMet", "fingerprint"), List.of(List.of("variables", plan.n(),
                plan.k(), plan.sigmaKnown(), measurement.limits(), measurement.limits().equals(Measurement.COMBINED)
                        ? plan.maxEstimate() : "", points.aql(), points.alpha(), points.ltpd(), points.beta(),
                design.risks().producerRisk(), design.risks().consumerRisk(), design.risks().meets(points),
                saved == null ? "" : saved.fingerprint())));
    }
}
