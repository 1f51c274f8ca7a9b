package lotgate.jobs;

import lotgate.plan.DefectClass;

/**
 * One defect class's criteria as a quality engineer writes them, "major:aql=1%,ltpd=5%" (keys aql, ltpd,
 * alpha, beta, c and n), read the same way by the design command's --class and the workbench's form.
 */
public final class ClassCriteria {
    private ClassCriteria() {
    }

    /**
     * The criteria written in the text, with the given alpha and beta where it names none.
     *
     * @throws IllegalArgumentException with a message that starts with "--class TEXT"
     */
    public static DesignSinglePlan.Criteria parse(String text, double alpha, double beta) {
        String where = "--class " + text;
        int colon = text.indexOf(':');
        DefectClass defectClass = DefectClass.of(colon < 0 ? text : text.substring(0, colon));
        if (defectClass == null || defectClass == DefectClass.ANY) {
            throw new IllegalArgumentException(where + ": start with critical, major or minor and a colon, as in"
                    + " major:aql=1%,ltpd=5%");
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
                throw new IllegalArgumentException(where + ": '" + pair + "' is not key=value");
            }
            String key = pair.substring(0, equals).trim();
            String value = pair.substring(equals + 1).trim();
            try {
                switch (key) {
                    case "aql" -> classAql = TypedValues.fraction(value);
                    case "ltpd" -> classLtpd = TypedValues.fraction(value);
                    case "alpha" -> classAlpha = TypedValues.risk(value);
                    case "beta" -> classBeta = TypedValues.risk(value);
                    case "c" -> c = TypedValues.wholeNumber(value, 0);
                    case "n" -> n = TypedValues.wholeNumber(value, 1);
                    default -> throw new UnknownKey(where + ": unknown key '" + key + "'; use aql, ltpd, alpha, beta,"
                            + " c or n");
                }
            } catch (UnknownKey e) {
                throw new IllegalArgumentException(e.getMessage());
            } catch (IllegalArgumentException e) {
                throw new IllegalArgumentException(where + ": " + key + ": " + e.getMessage());
            }
        }
        if (classAql == null || classLtpd == null) {
            throw new IllegalArgumentException(where + ": give both aql= and ltpd=");
        }
        return new DesignSinglePlan.Criteria(defectClass, text, classAql, classAlpha, classLtpd, classBeta, c, n);
    }

    /** A key the criteria do not know: its message is final. */
    private static final class UnknownKey extends RuntimeException {
        private static final long serialVersionUID = 1L;

        UnknownKey(String message) {
            super(message, null, false, false);
        }
    }
}
