package lotgate.cli;

import lotgate.jobs.DesignSinglePlan;
import lotgate.plan.DefectClass;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.ParameterException;

/** A --class option of design: a defect class, a colon, and its criteria as key=value pairs. */
final class ClassSpec {
    private ClassSpec() {
    }

    /** One --class option as a class's criteria; alpha and beta default to the command's. */
    static DesignSinglePlan.Criteria parse(CommandSpec spec, String text, double alpha, double beta) {
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
        return new DesignSinglePlan.Criteria(defectClass, text, classAql, classAlpha, classLtpd, classBeta, c, n);
    }
}
