package lotgate.cli;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import lotgate.jobs.DesignStagedPlan;
import lotgate.report.results.StagedDesignRendering;
import lotgate.sampling.DoublePlanDesigner;
import lotgate.sampling.MultiplePlan;
import lotgate.sampling.OcModel;
import lotgate.sampling.Stage;
import picocli.CommandLine.ParameterException;

/**
 * {@code design --scheme double|multiple|sequential}: the options of a plan in stages or an item-by-item plan,
 * checked against the scheme, as a request to {@link DesignStagedPlan}.
 */
final class SchemeDesign {
    private SchemeDesign() {
    }

    private static ParameterException usage(DesignCommand command, String message) {
        return new ParameterException(command.spec.commandLine(), message);
    }

    static void run(DesignCommand command, OcModel model, int lotSize) {
        String scheme = command.scheme;
        checkOptions(command, scheme);
        boolean isDouble = scheme.equals("double");
        List<Stage> stages = scheme.equals("sequential") ? List.of() : stages(command);
        DoublePlanDesigner.Space space = isDouble && stages.isEmpty() ? space(command) : null;
        DesignStagedPlan.Result result = DesignStagedPlan.run(new DesignStagedPlan.Request(
                DesignStagedPlan.Scheme.valueOf(scheme.toUpperCase(Locale.ROOT)), model, lotSize, command.aql,
                command.alpha, command.ltpd, command.beta, stages, space, command.asnAt, command.truncateAt,
                command.plainWald, command.curtailed, command.saveTarget()));
        if (result.noPlanReason() != null) {
            command.noPlan(result.noPlanReason(), model, lotSize);
        }
        command.format.print(command.spec, () -> StagedDesignRendering.text(result),
                () -> StagedDesignRendering.json(result), () -> StagedDesignRendering.csv(result));
    }

    private static void checkOptions(DesignCommand command, String scheme) {
        if (!command.classSpecs.isEmpty()) {
            throw usage(command, "--class: criteria per defect class are for single plans; a " + scheme + " plan counts every"
                    + " nonconformity alike");
        }
        if (command.acceptance != null || command.sampleSize != null) {
            throw usage(command, "--acceptance and --sample-size are for single plans; give the stages of a " + scheme
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
            throw usage(command, String.join(", ", misplaced) + (misplaced.size() == 1 ? " does" : " do") + " not apply to --scheme "
                    + scheme);
        }
        if (scheme.equals("multiple") && command.stageSpecs.size() < 2) {
            throw usage(command, "--scheme multiple needs its stages: give 2 to " + MultiplePlan.MOST_STAGES + " --stage options,"
                    + " e.g. --stage 20:-:3 --stage 20:1:4 --stage 20:3:4");
        }
        if (isDouble && !command.stageSpecs.isEmpty()
                && (command.firstRejection != null || command.asnAt != null || !command.secondRatio.equals("1"))) {
            throw usage(command, "--first-rejection, --asn-at and --second-ratio shape a design; with --stage the plan is given");
        }
    }

    private static DoublePlanDesigner.Space space(DesignCommand command) {
        Double ratio;
        if (command.secondRatio.trim().equalsIgnoreCase("free")) {
            ratio = null;
        } else {
            try {
                ratio = Double.parseDouble(command.secondRatio.trim());
            } catch (NumberFormatException e) {
                throw usage(command, "--second-ratio " + command.secondRatio + ": give a number such as 1 or 2, or 'free'");
            }
            if (!(ratio >= 0.25 && ratio <= 10)) {
                throw usage(command, "--second-ratio " + command.secondRatio + ": give a ratio from 0.25 to 10, or 'free'");
            }
        }
        return new DoublePlanDesigner.Space(ratio, command.firstRejection);
    }

    /** The --stage options as stages: N:C:R, with C "-" for none and R = C + 1 allowed to be left out last. */
    private static List<Stage> stages(DesignCommand command) {
        List<Stage> stages = new ArrayList<>();
        for (int i = 0; i < command.stageSpecs.size(); i++) {
            String text = command.stageSpecs.get(i);
            String[] parts = text.split(":");
            boolean last = i == command.stageSpecs.size() - 1;
            if (parts.length != 3 && !(last && parts.length == 2)) {
                throw usage(command, "--stage " + text + ": write N:C:R, such as 50:1:4 (the last stage may be N:C)");
            }
            try {
                int n = Integer.parseInt(parts[0].trim());
                int c = parts[1].trim().equals("-") ? Stage.NO_ACCEPTANCE : Integer.parseInt(parts[1].trim());
                int r = parts.length == 3 ? Integer.parseInt(parts[2].trim()) : c + 1;
                stages.add(new Stage(n, c, r));
            } catch (NumberFormatException e) {
                throw usage(command, "--stage " + text + ": N, C and R must be whole numbers (C may be - for none)");
            } catch (IllegalArgumentException e) {
                throw usage(command, "--stage " + text + ": " + e.getMessage());
            }
        }
        return stages;
    }

}
