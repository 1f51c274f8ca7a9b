package lotgate.sampling;

/**
 * The two points a plan is designed for: the producer's risk alpha at the AQL and the consumer's
 * risk beta at the LTPD. As a hypothesis test, H0 "the lot is at the AQL" is rejected wrongly with
 * probability alpha, and H1 "the lot is at the LTPD" is accepted wrongly with probability beta.
 */
public record RiskPoints(double aql, double alpha, double ltpd, double beta) {

    public RiskPoints {
        requireProbability("alpha", alpha);
        requireProbability("beta", beta);
        if (!(aql > 0) || !(ltpd > 0) || Double.isInfinite(ltpd)) {
            throw new IllegalArgumentException("AQL and LTPD must be positive, got " + aql + " and " + ltpd);
        }
        if (aql >= ltpd) {
            throw new IllegalArgumentException("the AQL must be below the LTPD, got " + aql + " and " + ltpd);
        }
        if (alpha + beta >= 1) {
            throw new IllegalArgumentException("alpha + beta must be below 1, got " + (alpha + beta));
        }
    }

    private static void requireProbability(String name, double value) {
        if (!(value > 0 && value < 1)) {
            throw new IllegalArgumentException(name + " must lie strictly between 0 and 1, got " + value);
        }
    }
}
