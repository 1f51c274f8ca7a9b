package lotgate.sampling;

import org.apache.commons.math3.distribution.NormalDistribution;

/**
 * A variables plan by the k-method for one specification limit: measure n units and accept the lot when the
 * quality statistic (U - mean) / sigma (or (mean - L) / sigma for a lower limit) is at least k, with sigma the
 * known process standard deviation, or the sample's s when sigma is unknown. Quality is the fraction of
 * product beyond the limit, the measurements being normal.
 *
 * <p>With p beyond the limit, z_p = Phi^-1(1 - p) standard deviations separate the process mean from it, and
 * P(accept) = Phi(sqrt(n) (z_p - k)) for a known sigma; for an unknown sigma sqrt(n) (U - mean) / s is
 * noncentral t with n - 1 degrees of freedom and noncentrality sqrt(n) z_p, so P(accept) = P(T' >= k sqrt(n)).
 */
public record VariablesPlan(int n, double k, boolean sigmaKnown) implements Plan {
    private static final NormalDistribution STANDARD = new NormalDistribution(null, 0, 1);

    public VariablesPlan {
        if (n < (sigmaKnown ? 1 : 2)) {
            throw new IllegalArgumentException("a variables plan needs at least " + (sigmaKnown ? 1 : 2)
                    + " units, got " + n);
        }
        if (!Double.isFinite(k)) {
            throw new IllegalArgumentException("the acceptability constant k must be a number, got " + k);
        }
    }

    /** z_p: how many standard deviations lie between the process mean and the limit when p is beyond it. */
    public static double standardDistance(double p) {
        return -STANDARD.inverseCumulativeProbability(p);
    }

    /**
     * The estimate of the fraction beyond one limit from its quality statistic Q ((U - mean)/s, or with sigma):
     * the minimum variance unbiased estimate under normality, I_x((n - 2)/2, (n - 2)/2) with
     * x = 1/2 - Q sqrt(n) / (2 (n - 1)) clamped to [0, 1] for an unknown sigma, and Phi(-Q sqrt(n / (n - 1)))
     * for a known one (the estimates of the M-method, as in ISO 3951-1 and ANSI/ASQ Z1.9; from memory).
     */
    public double estimateBeyond(double statistic) {
        if (n < (sigmaKnown ? 2 : 3)) {
            throw new IllegalArgumentException("the estimate needs at least " + (sigmaKnown ? 2 : 3) + " units");
        }
        if (sigmaKnown) {
            return NoncentralT.phi(-statistic * Math.sqrt(n / (n - 1.0)));
        }
        double x = 0.5 - statistic * Math.sqrt(n) / (2.0 * (n - 1));
        if (x <= 0) {
            return 0.0;
        }
        if (x >= 1) {
            return 1.0;
        }
        double shape = (n - 2) / 2.0;
        return org.apache.commons.math3.special.Beta.regularizedBeta(x, shape, shape, 1e-16, Integer.MAX_VALUE);
    }

    /**
     * M, the largest estimated fraction beyond the limits that the M-method accepts: the estimate at Q = k, so
     * that with all nonconforming product beyond one limit the M-method and the k-method decide alike.
     */
    public double maxEstimate() {
        return estimateBeyond(k);
    }

    /**
     * The exact one-sided upper confidence bound on the fraction beyond one limit from its quality statistic Q:
     * with a known sigma, Phi(-(Q - z_c / sqrt(n))); with an unknown one, Phi(-d / sqrt(n)) where d is the
     * noncentrality for which the observed sqrt(n) Q is the upper (1 - c) point of the noncentral t with n - 1
     * degrees of freedom. NaN (no such limit) gives 0.
     */
    public double upperBoundBeyond(double statistic, double confidence) {
        if (Double.isNaN(statistic)) {
            return 0.0;
        }
        if (Double.isInfinite(statistic)) {
            return statistic > 0 ? 0.0 : 1.0;
        }
        double root = Math.sqrt(n);
        if (sigmaKnown) {
            return NoncentralT.phi(-(statistic - standardDistance(1 - confidence) / root));
        }
        double t = root * statistic;
        // P(T' >= t | d) grows with d: the bound's d is where it equals 1 - confidence.
        double low = t - 10 - 2 * Math.abs(t);
        double high = t + 10 + 2 * Math.abs(t);
        for (int i = 0; i < 200 && high - low > 1e-12 * Math.max(1, Math.abs(high)); i++) {
            double mid = 0.5 * (low + high);
            if (NoncentralT.survival(t, n - 1, mid) < 1 - confidence) {
                low = mid;
            } else {
                high = mid;
            }
        }
        return NoncentralT.phi(-0.5 * (low + high) / root);
    }

    @Override
    public String scheme() {
        return "variables";
    }

    @Override
    public int maxSampleSize() {
        return n;
    }

    private static void checkModel(OcModel model) {
        if (!model.countsUnits() || model.lotSize() > 0) {
            throw new IllegalArgumentException("a variables plan judges the fraction of a steady process beyond a"
                    + " limit (type B); it has no " + model.name() + " form");
        }
    }

    @Override
    public double acceptance(OcModel model, double quality) {
        return tail(model, quality, true);
    }

    @Override
    public double rejection(OcModel model, double quality) {
        return tail(model, quality, false);
    }

    /** P(accept) or P(reject), each computed as its own tail of the statistic's distribution. */
    private double tail(OcModel model, double quality, boolean accepting) {
        checkModel(model);
        if (quality <= 0) {
            return accepting ? 1.0 : 0.0;
        }
        if (quality >= 1) {
            return accepting ? 0.0 : 1.0;
        }
        double z = standardDistance(quality);
        double root = Math.sqrt(n);
        if (sigmaKnown) {
            return NoncentralT.phi(accepting ? root * (z - k) : root * (k - z));
        }
        return accepting ? NoncentralT.survival(k * root, n - 1, root * z) : NoncentralT.cdf(k * root, n - 1, root * z);
    }

    @Override
    public double averageSampleNumber(OcModel model, double quality) {
        return n;
    }

    @Override
    public double averageOutgoingQuality(OcModel model, double quality, int lotSize) {
        double uninspected = lotSize == 0 ? 1.0 : (lotSize - n) / (double) lotSize;
        return acceptance(model, quality) * quality * uninspected;
    }

    @Override
    public double averageTotalInspection(OcModel model, double quality, int lotSize) {
        return n + rejection(model, quality) * (lotSize - n);
    }
}
