package lotgate.cli;

import lotgate.jobs.DesignVariablesPlan;
import lotgate.report.results.VariablesDesignRendering;
import lotgate.sampling.OcModel;
import picocli.CommandLine.ParameterException;

/** {@code design --scheme variables}: the options of a k-method plan as a request to {@link DesignVariablesPlan}. */
final class VariablesDesign {
    private VariablesDesign() {
    }

    static void run(DesignCommand command, OcModel model, int lotSize) {
        if (!command.classSpecs.isEmpty() || command.acceptance != null
                || !command.stageSpecs.isEmpty() || command.truncateAt != null || command.firstRejection != null
                || command.asnAt != null || command.curtailed || command.plainWald || !command.secondRatio.equals("1")) {
            throw new ParameterException(command.spec.commandLine(), "--scheme variables takes the risks, --lower"
                    + " and/or --upper, --sigma, --limits, --unit, --characteristic, and --sample-size with --k for a"
                    + " given plan; --class, --acceptance, --stage and the double and sequential options are for"
                    + " attribute plans");
        }
        DesignVariablesPlan.Result result = DesignVariablesPlan.run(new DesignVariablesPlan.Request(model, lotSize,
                command.aql, command.alpha, command.ltpd, command.beta, command.lower, command.upper, command.sigma,
                command.limits, command.characteristic, command.unit, command.lowerAql, command.lowerLtpd,
                command.sampleSize, command.kValue, command.saveTarget()));
        if (result.noPlanReason() != null) {
            command.noPlan(result.noPlanReason(), model, lotSize);
        }
        command.format.print(command.spec, () -> VariablesDesignRendering.text(result),
                () -> VariablesDesignRendering.json(result), () -> VariablesDesignRendering.csv(result));
    }
}
