package lotgate.sampling;

/**
 * Wald's sequential probability ratio test for two quality levels: the acceptance and rejection lines, and
 * Wald's approximate OC and ASN curves (Wald, Sequential Analysis, 1947). With {@code perUnit} the counts are
 * nonconformities per unit (Poisson), otherwise nonconforming units (binomial).
 *
 * <p>Per unit inspected the log-likelihood ratio of the LTPD against the AQL grows by k for a nonconforming
 * unit (by k per nonconformity under Poisson) and falls by k s otherwise, with k = ln(p2 (1 - p1) / (p1 (1 -
 * p2))) and s = ln((1 - p1)/(1 - p2)) / k (Poisson: k = ln(p2 / p1), s = (p2 - p1) / k). The test stops
 * when the ratio leaves (ln B, ln A), A = (1 - beta)/alpha, B = beta/(1 - alpha), which gives the lines
 * -h1 + s m and h2 + s m with h1 = ln(1/B)/k and h2 = ln(A)/k.
 */
public record WaldSequential(double p1, double alpha, double p2, double beta, boolean perUnit) {

    public WaldSequential {
        if (!(p1 > 0) || !(p2 > p1) || (!perUnit && !(p2 < 1)) || Double.isInfinite(p2)) {
            throw new IllegalArgumentException("the AQL and LTPD must satisfy 0 < AQL < LTPD"
                    + (perUnit ? "" : " < 1") + ", got " + p1 + " and " + p2);
        }
        if (!(alpha > 0 && beta > 0 && alpha + beta < 1)) {
            throw new IllegalArgumentException("alpha and beta must be positive with alpha + beta below 1");
        }
    }

    public static WaldSequential of(RiskPoints points, OcModel model) {
        return new WaldSequential(points.aql(), points.alpha(), points.ltpd(), points.beta(), !model.countsUnits());
    }

    /**
     * The test whose lines for the two quality levels have the given intercepts: the nominal risks they stand
     * for are alpha = (1 - e^(-h1 k)) / (e^(h2 k) - e^(-h1 k)) and beta = (1 - alpha) e^(-h1 k).
     */
    public static WaldSequential fromLines(double p1, double p2, boolean perUnit, double h1, double h2) {
        WaldSequential shape = new WaldSequential(p1, 0.05, p2, 0.10, perUnit);
        double k = shape.k();
        double below = Math.exp(-h1 * k);
        double alpha = -Math.expm1(-h1 * k) / (Math.exp(h2 * k) - below);
        return new WaldSequential(p1, alpha, p2, (1 - alpha) * below, perUnit);
    }

    /** The log-likelihood ratio added by one nonconformity. */
    public double k() {
        return perUnit ? Math.log(p2 / p1) : Math.log(p2 * (1 - p1) / (p1 * (1 - p2)));
    }

    public double h1() {
        return Math.log((1 - alpha) / beta) / k();
    }

    public double h2() {
        return Math.log((1 - beta) / alpha) / k();
    }

    public double slope() {
        return perUnit ? (p2 - p1) / k() : Math.log1p((p2 - p1) / (1 - p2)) / k();
    }

    /** Wald's approximate P(accept) at a quality level. */
    public double acceptance(double quality) {
        return acceptanceAt(parameter(quality));
    }

    /** Wald's approximate average sample number at a quality level, for the untruncated test. */
    public double averageSampleNumber(double quality) {
        double logA = Math.log((1 - beta) / alpha);
        double logB = Math.log(beta / (1 - alpha));
        double drift = drift(quality);
        if (Math.abs(drift) < 1e-12 * k()) {
            // At the slope the drift vanishes: ASN = -ln A ln B / E[z^2] (Wald).
            double spread = perUnit ? quality * k() * k() : quality * (1 - quality) * k() * k();
            return -logA * logB / spread;
        }
        double pa = acceptance(quality);
        return (pa * logB + (1 - pa) * logA) / drift;
    }

    /** The expected log-likelihood ratio added by one unit. */
    private double drift(double quality) {
        if (perUnit) {
            return quality * Math.log(p2 / p1) - (p2 - p1);
        }
        return quality * Math.log(p2 / p1) + (1 - quality) * Math.log((1 - p2) / (1 - p1));
    }

    /** Wald's P(accept) for the OC curve's parameter h: (A^h - 1) / (A^h - B^h). */
    private double acceptanceAt(double h) {
        if (h == 0) {
            double logA = Math.log((1 - beta) / alpha);
            double logB = Math.log(beta / (1 - alpha));
            return logA / (logA - logB);
        }
        double logA = Math.log((1 - beta) / alpha);
        double logB = Math.log(beta / (1 - alpha));
        // Written with exponentials of differences so that large |h| neither overflows nor loses digits.
        if (h > 0) {
            return -Math.expm1(-h * logA) / (1 - Math.exp(h * (logB - logA)));
        }
        return Math.expm1(h * logA) / (Math.exp(h * logA) - Math.exp(h * logB));
    }

    /** The quality level for the OC parameter h. */
    private double qualityAt(double h) {
        if (h == 0) {
            return slope();
        }
        if (perUnit) {
            double ratio = p2 / p1;
            return h * (p2 - p1) / Math.expm1(h * Math.log(ratio));
        }
        double up = Math.log(p2 / p1);
        double down = Math.log((1 - p2) / (1 - p1));
        // p(h) = (1 - b^h) / (a^h - b^h), a = p2/p1, b = (1 - p2)/(1 - p1)
        return -Math.expm1(h * down) / (Math.exp(h * up) - Math.exp(h * down));
    }

    /** The OC parameter h whose quality level is the one given (the quality falls as h grows). */
    private double parameter(double quality) {
        if (quality <= 0) {
            return Double.POSITIVE_INFINITY;
        }
        double low = -1;
        double high = 1;
        while (qualityAt(low) < quality && low > -1e4) {
            low *= 2;
        }
        while (qualityAt(high) > quality && high < 1e4) {
            high *= 2;
        }
        for (int i = 0; i < 200; i++) {
            double mid = 0.5 * (low + high);
            if (qualityAt(mid) > quality) {
                low = mid;
            } else {
                high = mid;
            }
        }
        return 0.5 * (low + high);
    }
}
