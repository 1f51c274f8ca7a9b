package lotgate.cli;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import lotgate.jobs.DesignSinglePlan;
import lotgate.jobs.SaveTarget;
import lotgate.plan.DefectClass;
import lotgate.report.results.DesignRendering;
import lotgate.sampling.OcModel;
import picocli.CommandLine.ArgGroup;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

/** Designs a single-sampling plan from the two risks, or evaluates one given as n and c, and saves it. */
@Command(name = "design", header = "Design a sampling plan from the producer's and consumer's risks.",
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
    @Spec
    CommandSpec spec;

    @Mixin
    SharedOptions.Aql aql;

    @Option(names = "--alpha", paramLabel = "RISK", defaultValue = "5%", converter = Values.Risk.class,
            description = "Producer's risk: the largest allowed P(reject) at the AQL (default ${DEFAULT-VALUE}).")
    double alpha;

    @Mixin
    SharedOptions.Ltpd ltpd;

    @Mixin
    SharedOptions.ConsumerRisk beta;

    @Mixin
    ModelOptions models;

    @Mixin
    SharedOptions.Acceptance acceptance;

    @Mixin
    SharedOptions.SampleSize sampleSize;

    @Option(names = "--class", paramLabel = "CLASS:SPEC",
            description = "Criteria for one defect class instead of --aql and --ltpd, repeatable: critical, major"
                    + " or minor, then a colon and aql=, ltpd=, and optionally alpha=, beta=, c= (fixed acceptance"
                    + " number) and n= (with c=, a given plan), e.g. --class critical:c=0,aql=0.1%%,ltpd=2%%"
                    + " --class major:aql=1%%,ltpd=5%%. The lot's sample is the largest n; a class with a smaller"
                    + " n is judged on the first units of the sample.")
    List<String> classSpecs = new ArrayList<>();

    @Mixin
    SharedOptions.Scheme schemes;

    @Mixin
    SchemeDesign.Options staged;

    @Mixin
    VariablesDesign.Options variables;

    @ArgGroup(exclusive = false)
    SaveOptions save;

    static final class SaveOptions {
        @Option(names = "--save", required = true, paramLabel = "FILE",
                description = "Save the plan as a plan file (e.g. plans/bolts.json).")
        Path file;

        @Option(names = "--description", paramLabel = "TEXT", defaultValue = "",
                description = "What the plan is for, kept in the plan file.")
        String description;

        @ArgGroup(exclusive = false)
        SharedOptions.Replace replace;

        /** Where to save the plan, or null without --save. */
        static SaveTarget target(SaveOptions save) {
            return save == null ? null : new SaveTarget(save.file, save.description, save.replace != null
                    && save.replace.on);
        }
    }

    @Mixin
    OutputFormat format;

    @Override
    public void run() {
        format.outputs(save == null ? null : save.file);
        design();
        format.written();
    }

    private void design() {
        OcModel model = models.resolve();
        int lotSize = models.lotSizeOrZero();
        String scheme = schemes.name;
        if (!List.of("single", "double", "multiple", "sequential", "variables").contains(scheme)) {
            throw new ParameterException(spec.commandLine(), "--scheme " + scheme + ": give single, double, multiple,"
                    + " sequential or variables");
        }
        if (scheme.equals("variables")) {
            VariablesDesign.run(this, model, lotSize);
            return;
        }
        if (variables.given()) {
            throw new ParameterException(spec.commandLine(), "--sigma, --lower, --upper, --limits, --unit,"
                    + " --characteristic, --lower-aql, --lower-ltpd and --k are for --scheme variables");
        }
        if (!scheme.equals("single")) {
            SchemeDesign.run(this, model, lotSize);
            return;
        }
        if (staged.given()) {
            throw new ParameterException(spec.commandLine(), "--stage, --truncate-at, --first-rejection, --asn-at,"
                    + " --second-ratio, --curtailed and --plain-wald are for --scheme double, multiple or sequential");
        }
        List<DesignSinglePlan.Criteria> criteria = classSpecs.isEmpty() ? List.of(plainCriteria()) : classCriteria();
        DesignSinglePlan.Result result = DesignSinglePlan.run(new DesignSinglePlan.Request(model, lotSize, criteria,
                saveTarget()));
        if (result.noPlanReason() != null) {
            noPlan(result.noPlanReason(), model, lotSize);
        }
        format.print(result, DesignRendering::text, DesignRendering::json, DesignRendering::csv);
    }

    /** Where to save the plan, or null. */
    SaveTarget saveTarget() {
        return SaveOptions.target(save);
    }

    /** Prints that no plan meets the request and fails with its exit code. */
    void noPlan(String reason, OcModel model, int lotSize) {
        format.print(reason, DesignRendering::noPlanText, why -> DesignRendering.noPlanJson(why, model, lotSize),
                DesignRendering::noPlanCsv);
        throw new Main.Failure(ExitCode.NO_PLAN, format.kind == OutputFormat.Kind.text ? null
                : "no sampling plan meets the request: " + reason);
    }

    private DesignSinglePlan.Criteria plainCriteria() {
        if (aql.level == null || ltpd.level == null) {
            throw new ParameterException(spec.commandLine(), "give --aql and --ltpd (or criteria per defect class"
                    + " with --class)");
        }
        return new DesignSinglePlan.Criteria(DefectClass.ANY, null, aql.level, alpha, ltpd.level, beta.beta,
                acceptance.c, sampleSize.n);
    }

    private List<DesignSinglePlan.Criteria> classCriteria() {
        if (aql.level != null || ltpd.level != null || acceptance.c != null || sampleSize.n != null) {
            throw new ParameterException(spec.commandLine(), "with --class, give aql=, ltpd=, c= and n= inside each"
                    + " class's criteria, not as --aql, --ltpd, --acceptance or --sample-size");
        }
        List<DesignSinglePlan.Criteria> criteria = new ArrayList<>();
        for (String text : classSpecs) {
            criteria.add(ClassSpec.parse(spec, text, alpha, beta.beta));
        }
        return criteria;
    }
}
