package lotgate.cli;

import lotgate.jobs.DesignSinglePlan;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.ParameterException;

/** A --class option of design: a defect class, a colon, and its criteria as key=value pairs. */
final class ClassSpec {
    private ClassSpec() {
    }

    /** One --class option as a class's criteria; alpha and beta default to the command's. */
    static DesignSinglePlan.Criteria parse(CommandSpec spec, String text, double alpha, double beta) {
        try {
            return lotgate.jobs.ClassCriteria.parse(text, alpha, beta);
        } catch (IllegalArgumentException e) {
            throw new ParameterException(spec.commandLine(), e.getMessage());
        }
    }
}
