package lotgate.cli;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import lotgate.jobs.DesignStagedPlan;
import lotgate.jobs.TypedValues;
import lotgate.report.results.StagedDesignRendering;
import lotgate.sampling.DoublePlanDesigner;
import lotgate.sampling.MultiplePlan;
import lotgate.sampling.OcModel;
import lotgate.sampling.Stage;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;

/**
 * {@code design --scheme double|multiple|sequential}: the options of a plan in stages or an item-by-item plan,
 * checked against the scheme, as a request to {@link DesignStagedPlan}.
 */
final class SchemeDesign {
    /** The options of plans in stages and sequential plans. */
    static final class Options {
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

        @Option(names = "--truncate-at", paramLabel = "N", converter = Values.Truncation.class,
                description = "Sequential plans: the most units inspected, 1 to 1000000 (default: 3 times the single"
                        + " plan's n for the same risks).")
        Integer truncateAt;

        @Option(names = "--plain-wald",
                description = "Sequential plans: keep Wald's lines for the risks as asked, even where the truncated plan's"
                        + " exact risks then exceed them (by default the lines are redrawn until both are met).")
        boolean plainWald;

        @Mixin
        SharedOptions.Curtailed curtailed;

        /** Whether any of these options was given. */
        boolean given() {
            return !stageSpecs.isEmpty() || truncateAt != null || firstRejection != null || asnAt != null || curtailed.on
                    || plainWald || !secondRatio.equals("1");
        }
    }

    private SchemeDesign() {
    }

    private static ParameterException usage(DesignCommand command, String message) {
        return new ParameterException(command.spec.commandLine(), message);
    }

    static void run(DesignCommand command, OcModel model, int lotSize) {
        String scheme = command.schemes.name;
        checkOptions(command, scheme);
        boolean isDouble = scheme.equals("double");
        List<Stage> stages = scheme.equals("sequential") ? List.of() : stages(command);
        DoublePlanDesigner.Space space = isDouble && stages.isEmpty() ? space(command) : null;
        DesignStagedPlan.Result result = DesignStagedPlan.run(new DesignStagedPlan.Request(
                DesignStagedPlan.Scheme.valueOf(scheme.toUpperCase(Locale.ROOT)), model, lotSize, command.aql.level,
                command.alpha, command.ltpd.level, command.beta.beta, stages, space, command.staged.asnAt, command.staged.truncateAt,
                command.staged.plainWald, command.staged.curtailed.on, command.saveTarget()));
        if (result.noPlanReason() != null) {
            command.noPlan(result.noPlanReason(), model, lotSize);
        }
        command.format.print(result, StagedDesignRendering::text, StagedDesignRendering::json,
                StagedDesignRendering::csv);
    }

    private static void checkOptions(DesignCommand command, String scheme) {
        if (!command.classSpecs.isEmpty()) {
            throw usage(command, "--class: criteria per defect class are for single plans; a " + scheme + " plan counts every"
                    + " nonconformity alike");
        }
        if (command.acceptance.c != null || command.sampleSize.n != null) {
            throw usage(command, "--acceptance and --sample-size are for single plans; give the stages of a " + scheme
                    + " plan with --stage");
        }
        boolean isDouble = scheme.equals("double");
        List<String> misplaced = new ArrayList<>();
        if (!isDouble && (command.staged.firstRejection != null)) {
            misplaced.add("--first-rejection");
        }
        if (!isDouble && command.staged.asnAt != null) {
            misplaced.add("--asn-at");
        }
        if (!isDouble && !command.staged.secondRatio.equals("1")) {
            misplaced.add("--second-ratio");
        }
        if (!isDouble && command.staged.curtailed.on) {
            misplaced.add("--curtailed");
        }
        if (!scheme.equals("sequential") && command.staged.truncateAt != null) {
            misplaced.add("--truncate-at");
        }
        if (!scheme.equals("sequential") && command.staged.plainWald) {
            misplaced.add("--plain-wald");
        }
        if (scheme.equals("sequential") && !command.staged.stageSpecs.isEmpty()) {
            misplaced.add("--stage");
        }
        if (!misplaced.isEmpty()) {
            throw usage(command, String.join(", ", misplaced) + (misplaced.size() == 1 ? " does" : " do") + " not apply to --scheme "
                    + scheme);
        }
        if (scheme.equals("multiple") && command.staged.stageSpecs.size() < 2) {
            throw usage(command, "--scheme multiple needs its stages: give 2 to " + MultiplePlan.MOST_STAGES + " --stage options,"
                    + " e.g. --stage 20:-:3 --stage 20:1:4 --stage 20:3:4");
        }
        if (isDouble && !command.staged.stageSpecs.isEmpty()
                && (command.staged.firstRejection != null || command.staged.asnAt != null || !command.staged.secondRatio.equals("1"))) {
            throw usage(command, "--first-rejection, --asn-at and --second-ratio shape a design; with --stage the plan is given");
        }
    }

    private static DoublePlanDesigner.Space space(DesignCommand command) {
        try {
            return new DoublePlanDesigner.Space(TypedValues.secondRatio(command.staged.secondRatio),
                    command.staged.firstRejection);
        } catch (IllegalArgumentException e) {
            throw usage(command, e.getMessage());
        }
    }

    /** The --stage options as stages: N:C:R, with C "-" for none and R = C + 1 allowed to be left out last. */
    private static List<Stage> stages(DesignCommand command) {
        try {
            return TypedValues.stages(command.staged.stageSpecs);
        } catch (IllegalArgumentException e) {
            throw usage(command, e.getMessage());
        }
    }
}
