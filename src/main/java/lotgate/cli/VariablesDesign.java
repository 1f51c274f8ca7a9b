package lotgate.cli;

import lotgate.jobs.DesignVariablesPlan;
import lotgate.report.results.VariablesDesignRendering;
import lotgate.sampling.OcModel;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;

/** {@code design --scheme variables}: the options of a k-method plan as a request to {@link DesignVariablesPlan}. */
final class VariablesDesign {
    /** The options of variables plans. */
    static final class Options {
        @Option(names = "--sigma", paramLabel = "VALUE", converter = Values.Measure.class,
                description = "Variables plans: the known process standard deviation, in the measurement's unit (leave it"
                        + " out when sigma is estimated from each sample).")
        Double sigma;

        @Option(names = "--lower", paramLabel = "LIMIT", converter = Values.Measure.class,
                description = "Variables plans: the lower specification limit.")
        Double lower;

        @Option(names = "--upper", paramLabel = "LIMIT", converter = Values.Measure.class,
                description = "Variables plans: the upper specification limit.")
        Double upper;

        @Option(names = "--limits", paramLabel = "HOW",
                description = "Variables plans with both limits: combined (default; the M-method on the estimated"
                        + " fraction beyond both, one AQL for both) or separate (the k-method at each limit, with the"
                        + " same AQL, or the lower limit's own with --lower-aql and --lower-ltpd).")
        String limits;

        @Option(names = "--k", paramLabel = "K", converter = Values.Measure.class,
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

        /** Whether any of these options was given. */
        boolean given() {
            return sigma != null || lower != null || upper != null || limits != null || unit != null
                    || characteristic != null || lowerAql != null || lowerLtpd != null || kValue != null;
        }
    }

    private VariablesDesign() {
    }

    static void run(DesignCommand command, OcModel model, int lotSize) {
        if (!command.classSpecs.isEmpty() || command.acceptance.c != null || command.staged.given()) {
            throw new ParameterException(command.spec.commandLine(), "--scheme variables takes the risks, --lower"
                    + " and/or --upper, --sigma, --limits, --unit, --characteristic, and --sample-size with --k for a"
                    + " given plan; --class, --acceptance, --stage and the double and sequential options are for"
                    + " attribute plans");
        }
        DesignVariablesPlan.Result result = DesignVariablesPlan.run(new DesignVariablesPlan.Request(model, lotSize,
                command.aql.level, command.alpha, command.ltpd.level, command.beta.beta, command.variables.lower,
                command.variables.upper, command.variables.sigma, command.variables.limits,
                command.variables.characteristic, command.variables.unit, command.variables.lowerAql,
                command.variables.lowerLtpd, command.sampleSize.n, command.variables.kValue, command.saveTarget()));
        if (result.noPlanReason() != null) {
            command.noPlan(result.noPlanReason(), model, lotSize);
        }
        command.format.print(result, VariablesDesignRendering::text, VariablesDesignRendering::json,
                VariablesDesignRendering::csv);
    }
}
